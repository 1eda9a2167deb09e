/**
 * Plano-convex spherical lens, flat face toward the source, convex face up, placed so its paraxial focus
 * falls on the source.
 *
 * Thin-lens focal length f = R/(n − 1) (lensmaker's equation with one flat face); the principal plane on the
 * source side of a plano-convex lens lies at the curved vertex, so the focus is f − t/n below the flat face
 * (back focal distance; E. Hecht, Optics, 4th ed., §6.2 thick lenses). With the exit radius a, centre thickness
 * t = sag(R) + edge, sag = R − √(R² − a²), and the top vertex at H:
 *   H = BFD + t = R/(n − 1) + t (1 − 1/n),
 * solved for R (the flattest root: the least spherical aberration of the roots). Rays off the axis are not
 * collimated exactly — spherical aberration, the reason for the aspheric lens.
 */
import type { CheckedDesignOptions } from './design-options';
import { fmt } from './format-for-message';
import type { OpticDesign } from './optic-design';
import { sampleCurve, straightFace } from './profile';

function sagMm(R: number, a: number): number {
  return R - Math.sqrt(R * R - a * a);
}

/** Designs the plano-convex lens. @throws RangeError when no radius puts the focus on the source within the height */
export function designPlanoConvexLens(o: CheckedDesignOptions): OpticDesign {
  const n = o.n;
  const a = o.exitDiameterMm / 2;
  const H = o.heightMm as number;
  const te = o.edgeThicknessMm;
  const top = (R: number) => R / (n - 1) + (sagMm(R, a) + te) * (1 - 1 / n);
  // Scan R on a geometric grid from the hemisphere (R = a) up; keep the last rise through H, then bisect
  let lo = NaN;
  let hi = NaN;
  let minTop = Infinity;
  let prev = a;
  for (let R = a * 1.0001; R < a * 1e4; R *= 1.02) {
    const h = top(R);
    minTop = Math.min(minTop, h);
    if (top(prev) < H && h >= H) {
      lo = prev;
      hi = R;
    }
    prev = R;
  }
  if (Number.isNaN(lo)) {
    throw new RangeError(
      `heightMm: a plano-convex lens ${fmt(o.exitDiameterMm)} mm wide at n = ${fmt(n)} focused on the source needs a top of at least ${fmt(minTop)} mm; allowed ≥ ${fmt(minTop)} (got ${H})`
    );
  }
  for (let i = 0; i < 100; i++) {
    const mid = 0.5 * (lo + hi);
    if (top(mid) < H) lo = mid;
    else hi = mid;
  }
  const R = 0.5 * (lo + hi);
  const t = sagMm(R, a) + te;
  const zb = H - t;
  if (zb <= o.gapMm) {
    throw new RangeError(`gapMm: this lens's flat face sits ${fmt(zb)} mm above the source, below the gap; allowed [0, ${fmt(zb)}) (got ${o.gapMm})`);
  }
  const zc = H - R; // centre of the sphere
  const phiRim = Math.asin(a / R);
  const cap = sampleCurve(
    'exit',
    (phi, out) => {
      out[0] = R * Math.sin(phi);
      out[1] = zc + R * Math.cos(phi);
    },
    phiRim,
    0,
    o.toleranceMm
  );
  cap.r[0] = a;
  cap.z[0] = zb + te;
  cap.r[cap.r.length - 1] = 0;
  cap.z[cap.z.length - 1] = H;
  return {
    type: 'lens',
    shape: 'plano-convex',
    surfaces: [straightFace('entry', 0, zb, a, zb), straightFace('edge', a, zb, a, zb + te), cap],
    n,
    exitDiameterMm: o.exitDiameterMm,
    heightMm: H,
    gapMm: zb,
    toleranceMm: o.toleranceMm,
    focalLengthMm: R / (n - 1),
    rimAngleRad: Math.atan2(a, zb + te),
    collectionHalfAngleRad: Math.atan2(a, zb)
  };
}
