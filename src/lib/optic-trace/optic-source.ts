/**
 * The three sources an optic can be traced with, and where each puts the optic: the traced package of
 * the scenario (its escaping rays go on into the optic, package and optic in one scene), an idealised
 * flat Lambertian disc or rectangle, or a ray file. The design's source plane z = 0 is the chip's top
 * under a dome or a cylinder (the light leaves a dome from about there, so a reflector's focus or a
 * lens's focal point belongs there; the optic must clear the encapsulant: packageClearance), the rim
 * of a cup, the idealised source's plane, or the highest start of a file's rays. The source's
 * footprint (a disc around the package's outline) sizes the fit checks and the étendue limit.
 */
import type { LambertianSource } from '../optic-design/lambertian-source';
import type { TracePackage } from '../trace/package-spec';
import type { RayList } from './ray-file';

export type OpticSource =
  | { kind: 'package'; pkg: TracePackage; wavelengthNm: number; scenario: string }
  | { kind: 'lambertian'; shape: 'disc' | 'rect'; widthMm: number; lengthMm?: number }
  | { kind: 'rays'; list: RayList };

export interface SourceFootprint {
  /** Height of the design's source plane in the scene, mm. */
  topMm: number;
  /** Emitting area seen from above, mm² (the étendue's source area). */
  areaMm2: number;
  /** The source as the designer's fit checks see it. */
  design: LambertianSource;
  /** What the page and the JSON say the source is. */
  label: string;
}

/** The package's source plane (where the optic's design frame starts), its top height and the radius of its outline, mm. */
export function packageOutline(pkg: TracePackage): { sourcePlaneMm: number; topMm: number; radiusMm: number } {
  const body = pkg.body;
  if (body?.kind === 'cup') {
    const top = body.depthMm + (body.fill === 'dome' ? pkg.encapsulant.heightMm : 0);
    return { sourcePlaneMm: body.depthMm, topMm: top, radiusMm: body.topRadiusMm };
  }
  if (pkg.encapsulant.shape === 'none') {
    return { sourcePlaneMm: pkg.chip.heightMm, topMm: pkg.chip.heightMm, radiusMm: Math.hypot(pkg.chip.widthMm, pkg.chip.lengthMm) / 2 };
  }
  // a square box's outline circle passes through its corners
  const r = pkg.encapsulant.shape === 'box' ? pkg.encapsulant.radiusMm * Math.SQRT2 : pkg.encapsulant.radiusMm;
  return { sourcePlaneMm: pkg.chip.heightMm, topMm: pkg.encapsulant.heightMm, radiusMm: r };
}

/**
 * How far the optic's profile points dip into the package's envelope (the dome or cylinder of the flat body,
 * the cup's dome above its rim), mm: 0 when the optic clears it. The envelope of a dome is the spheroid
 * (r/R)² + (z/h)² = 1; of a cylinder r ≤ R, z ≤ h; of a square box (half side R) r ≤ R√2 at its corners, z ≤ h;
 * points are in scene heights.
 */
export function packageIntrusionMm(pkg: TracePackage, r: ArrayLike<number>, z: ArrayLike<number>): number {
  const body = pkg.body;
  const enc = pkg.encapsulant;
  const base = body?.kind === 'cup' ? body.depthMm : 0;
  const shape = body?.kind === 'cup' ? (body.fill === 'dome' ? 'dome' : 'none') : enc.shape;
  let worst = 0;
  for (let i = 0; i < r.length; i++) {
    const rr = r[i];
    if (shape === 'dome' && rr < enc.radiusMm) {
      const zTop = base + enc.heightMm * Math.sqrt(1 - (rr / enc.radiusMm) ** 2);
      worst = Math.max(worst, zTop - z[i]);
    } else if ((shape === 'cylinder' && rr <= enc.radiusMm) || (shape === 'box' && rr <= enc.radiusMm * Math.SQRT2)) {
      worst = Math.max(worst, enc.heightMm - z[i]);
    }
  }
  return worst;
}

/**
 * The area whose étendue (π A, seen from air) bounds the package's light, mm²: the chip's light fills at most
 * π n² (top + sides) in the encapsulant of index n (étendue conserved across the dome: W. T. Welford,
 * R. Winston, High Collection Nonimaging Optics, 1989, ch. 2), and no more than the outline's π R² leaves it.
 * A cup's opening bounds its light. A package is brighter at its chip than a uniform source, so a traced
 * beam may come a little under the limit this gives (the étendue use may exceed 1).
 */
export function packageEtendueAreaMm2(pkg: TracePackage): number {
  const { radiusMm } = packageOutline(pkg);
  // a square box's own face area (2R)², not its outline circle's
  const outline = pkg.encapsulant.shape === 'box' && pkg.body?.kind !== 'cup' ? 2 * radiusMm * radiusMm : Math.PI * radiusMm * radiusMm;
  if (pkg.body?.kind === 'cup') return outline;
  const c = pkg.chip;
  const chipFaces = c.widthMm * c.lengthMm + 2 * c.heightMm * (c.widthMm + c.lengthMm);
  const n = pkg.encapsulant.shape === 'none' ? pkg.outsideN : pkg.encapsulant.n;
  return Math.min(outline, ((n * n) / (pkg.outsideN * pkg.outsideN)) * chipFaces);
}

/** Where the source is and how big it looks, for placing and sizing the optic. */
export function sourceFootprint(source: OpticSource): SourceFootprint {
  if (source.kind === 'package') {
    const { sourcePlaneMm, radiusMm } = packageOutline(source.pkg);
    const area = packageEtendueAreaMm2(source.pkg);
    return {
      topMm: sourcePlaneMm,
      areaMm2: area,
      design: { shape: 'disc', widthMm: 2 * radiusMm },
      label:
        `the traced package (${source.scenario}), outline ⌀ ${(2 * radiusMm).toFixed(2)} mm, étendue area ${area.toFixed(2)} mm²` +
        (source.pkg.phosphor
          ? '; white: its phosphor converts part of the chip light, and every ray counts alike (photon fractions; cd/klm as if each ray carried the same lumens)'
          : '')
    };
  }
  if (source.kind === 'lambertian') {
    const l = source.lengthMm ?? source.widthMm;
    const area = source.shape === 'disc' ? (Math.PI * source.widthMm * source.widthMm) / 4 : source.widthMm * l;
    return {
      topMm: 0,
      areaMm2: area,
      design: { shape: source.shape, widthMm: source.widthMm, lengthMm: l },
      label: source.shape === 'disc' ? `Lambertian disc ⌀ ${source.widthMm} mm` : `Lambertian ${source.widthMm} × ${l} mm`
    };
  }
  const { rays, count } = source.list;
  let top = -Infinity;
  let r2 = 0;
  for (let i = 0; i < count; i++) {
    const o = 7 * i;
    top = Math.max(top, rays[o + 2]);
    r2 = Math.max(r2, rays[o] * rays[o] + rays[o + 1] * rays[o + 1]);
  }
  const radius = Math.max(Math.sqrt(r2), 1e-3);
  return {
    topMm: source.list.sourcePlaneMm ?? top,
    areaMm2: Math.PI * radius * radius,
    design: { shape: 'disc', widthMm: 2 * radius },
    label: `ray file${source.list.scenario ? ` (${source.list.scenario})` : ''}, ${count} rays, ⌀ ${(2 * radius).toFixed(2)} mm`
  };
}
