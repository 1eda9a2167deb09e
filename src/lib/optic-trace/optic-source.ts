/**
 * The three sources an optic can be traced with, and where each puts the optic: the traced package of
 * the scenario (its escaping rays go on into the optic, package and optic in one scene), an idealised
 * flat Lambertian disc or rectangle, or a ray file. The design's source plane z = 0 is the package's
 * top (its highest point), the idealised source's plane, or the highest start of a file's rays; the
 * source's footprint (a disc around it) sizes the fit checks and the étendue limit.
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

/** The package's top height and the radius of its outline, mm. */
export function packageOutline(pkg: TracePackage): { topMm: number; radiusMm: number } {
  const body = pkg.body;
  if (body?.kind === 'cup') {
    return { topMm: body.depthMm + (body.fill === 'dome' ? pkg.encapsulant.heightMm : 0), radiusMm: body.topRadiusMm };
  }
  if (pkg.encapsulant.shape === 'none') return { topMm: pkg.chip.heightMm, radiusMm: Math.hypot(pkg.chip.widthMm, pkg.chip.lengthMm) / 2 };
  return { topMm: pkg.encapsulant.heightMm, radiusMm: pkg.encapsulant.radiusMm };
}

/** Where the source is and how big it looks, for placing and sizing the optic. */
export function sourceFootprint(source: OpticSource): SourceFootprint {
  if (source.kind === 'package') {
    const { topMm, radiusMm } = packageOutline(source.pkg);
    return {
      topMm,
      areaMm2: Math.PI * radiusMm * radiusMm,
      design: { shape: 'disc', widthMm: 2 * radiusMm },
      label: `the traced package (${source.scenario}), outline ⌀ ${(2 * radiusMm).toFixed(2)} mm`
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
    topMm: top,
    areaMm2: Math.PI * radius * radius,
    design: { shape: 'disc', widthMm: 2 * radius },
    label: `ray file${source.list.scenario ? ` (${source.list.scenario})` : ''}, ${count} rays, ⌀ ${(2 * radius).toFixed(2)} mm`
  };
}
