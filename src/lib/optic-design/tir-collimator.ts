/**
 * TIR collimator: a solid of revolution (index n, in air) over a point source at the origin, with an entry cavity
 * of radius rc. Rays within the split angle θ1 of the axis meet the cavity floor, a collimating hyperbola
 * (see aspheric-lens.ts), and go straight up to the flat exit face. Wider rays, θ1 … θ2 (θ2 the cavity's bottom
 * edge, 90° with no gap), refract through the cavity's cylindrical side wall — the axial component of n·d is
 * kept: d′ = (√(1 − cos²θ/n²), cos θ / n) — and meet the outer wall, which is designed by integrating the
 * collimation condition (collimating-surface.ts: the wall normal bisects d′ and the axis) so that they reflect
 * straight up and leave through the exit face.
 *
 * Sizing, closed form: the top corner of the wall is the exit rim (R, H), on the ray θ1 refracted at the floor's
 * rim (rc, rc cot θ1):  H = rc cot θ1 + (R − rc) cot α1, cot α1 = d′z/d′r at θ1, so
 *   rc = (H − R cot α1) / (cot θ1 − cot α1).
 *
 * TIR check: the incidence on the wall is i = 90° − α/2 (α the angle of d′ from the axis, since the normal
 * bisects d′ and −ẑ… reflected to +ẑ); the wall reflects totally where i > θc = asin(1/n) (Snell; M. Born,
 * E. Wolf, Principles of Optics, §1.5.4). Every design sample is checked; failures are reported, not hidden.
 */
import { integrateCollimatingSurface, type CollimatingSurface, type RayFamily } from './collimating-surface';
import { collimatingHyperbolaRadiusMm } from './aspheric-lens';
import type { CheckedDesignOptions } from './design-options';
import { fmt } from './format-for-message';
import type { OpticDesign, TirFailure } from './optic-design';
import { paraboloidFocalLengthMm } from './paraboloid';
import { sampleCurve, straightFace } from './profile';

/** Cavity radius for split angle θ1: rc = (H − R cot α1)/(cot θ1 − cot α1), cot α1 = d′z/d′r of ray θ1. */
export function cavityRadiusMm(theta1: number, n: number, R: number, H: number): number {
  const dz1 = Math.cos(theta1) / n;
  const cotA1 = dz1 / Math.sqrt(1 - dz1 * dz1);
  return (H - R * cotA1) / (1 / Math.tan(theta1) - cotA1);
}

/**
 * Default split angle: the one giving a cavity radius equal to the focal length f of the paraboloid through the
 * exit rim (R, H) with its focus at the source (or 1.25 source radii, if larger). Our own rule: the wall's foot
 * lies near that paraboloid's base circle r = 2f, so the cavity keeps about half of it for the wall's rays; found
 * (`fraction` of it, when a smaller cavity is tried) by bisection (rc grows with θ1), searched below 0.95·acos(1/n) — the floor
 * hyperbola's asymptote. Returns NaN when no split angle in that range gives that cavity.
 */
export function defaultSplitAngleRad(n: number, R: number, H: number, sourceRadiusMm: number, fraction = 1): number {
  const target = Math.max(fraction * paraboloidFocalLengthMm(R, H), 1.25 * sourceRadiusMm);
  let lo = (0.5 * Math.PI) / 180;
  let hi = 0.95 * Math.acos(1 / n);
  const f = (t: number) => cavityRadiusMm(t, n, R, H) - target;
  if (!(f(lo) < 0 && f(hi) > 0)) return NaN;
  for (let i = 0; i < 100; i++) {
    const mid = 0.5 * (lo + hi);
    if (f(mid) < 0) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}

/** Ray family of the cavity's side wall (radius rc): starts on the wall, directions refracted into index n. */
export function cylinderWallFamily(rc: number, n: number): RayFamily {
  return (theta, out) => {
    const s = Math.sin(theta);
    const c = Math.cos(theta);
    const dz = c / n;
    const dr = Math.sqrt(1 - dz * dz);
    out[0] = rc;
    out[1] = (rc * c) / s;
    out[2] = 0;
    out[3] = -rc / (s * s);
    out[4] = dr;
    out[5] = dz;
    out[6] = (c * s) / (n * n * dr);
    out[7] = -s / n;
  };
}

/** Angle of incidence on a mirror that turns direction (dr, dz) to +z: i = acos √((1 − dz)/2). */
export function wallIncidenceRad(dz: number): number {
  return Math.acos(Math.sqrt((1 - dz) / 2));
}

/**
 * The collimating exit lens over a flat cavity floor at height zFloor: rays θ ≤ θ1 refract at the floor into
 * d = (sin θ / n, √(1 − sin²θ / n²)) from P = (zFloor tan θ, zFloor); the lens surface turns them to +z on leaving
 * (refraction n → 1), starting on the axis at H.
 */
function exitLensFor(zFloor: number, n: number, theta1: number, H: number, toleranceMm: number): CollimatingSurface {
  const family: RayFamily = (theta, out) => {
    const s = Math.sin(theta);
    const c = Math.cos(theta);
    const dr = s / n;
    const dz = Math.sqrt(1 - dr * dr);
    out[0] = zFloor * (s / c);
    out[1] = zFloor;
    out[2] = zFloor / (c * c);
    out[3] = 0;
    out[4] = dr;
    out[5] = dz;
    out[6] = c / n;
    out[7] = -(dr * (c / n)) / dz;
  };
  return integrateCollimatingSurface(family, { kind: 'refract', nIn: n, nOut: 1 }, 0, theta1, H - zFloor, toleranceMm);
}

/** Designs the TIR collimator (flat exit face, or a collimating exit lens over a flat cavity floor). @throws RangeError when the height or gap cannot hold it */
export function designTirCollimator(o: CheckedDesignOptions): OpticDesign {
  if (o.splitAngleDeg !== undefined) return designWithSplit(o, (o.splitAngleDeg * Math.PI) / 180);
  // A tall optic's wall closes in on the cavity: try smaller cavities before giving up
  let lastError: unknown;
  for (const fraction of [1, 0.7, 0.5, 0.35]) {
    const theta1 = defaultSplitAngleRad(o.n, o.exitDiameterMm / 2, o.heightMm as number, o.sourceRadiusMm, fraction);
    try {
      return designWithSplit(o, Number.isNaN(theta1) ? 0.85 * Math.acos(1 / o.n) : theta1);
    } catch (e) {
      lastError = e;
      if (Number.isNaN(theta1)) break;
    }
  }
  throw lastError;
}

function designWithSplit(o: CheckedDesignOptions, theta1: number): OpticDesign {
  const n = o.n;
  const R = o.exitDiameterMm / 2;
  const H = o.heightMm as number;
  const gap = o.gapMm;
  if (Math.cos(theta1) <= 1 / n) {
    throw new RangeError(
      `splitAngleDeg must be below acos(1/n) = ${fmt((Math.acos(1 / n) * 180) / Math.PI)}° at n = ${fmt(n)} (got ${fmt((theta1 * 180) / Math.PI)})`
    );
  }
  const dz1 = Math.cos(theta1) / n;
  const cotA1 = dz1 / Math.sqrt(1 - dz1 * dz1);
  const cotT1 = 1 / Math.tan(theta1);
  // The wall's top corner (R, zTop) lies on ray θ1 refracted at the cavity's top edge (rc, rc cot θ1)
  const rcForTop = (zTop: number) => (zTop - R * cotA1) / (cotT1 - cotA1);
  // Height range: the cavity wider than the source (and than the gap needs) and narrower than the exit
  const rcMin = Math.max(o.sourceRadiusMm, gap / cotT1) * 1.0001 + 1e-9;
  const hMin = R * cotA1 + rcMin * (cotT1 - cotA1);
  const hMax = R * cotT1;
  const rangeError = () =>
    new RangeError(
      `heightMm: a TIR collimator ${fmt(o.exitDiameterMm)} mm wide at n = ${fmt(n)} with a ${fmt((theta1 * 180) / Math.PI)}° split fits heights in (${fmt(hMin)}, ${fmt(hMax)}) mm (got ${H})`
    );
  let zTop = H;
  let exitLens: CollimatingSurface | undefined;
  if (o.exitFace === 'lens') {
    // Flat cavity floor, collimating exit lens from the axis at H down to its rim at the wall's top height:
    // find zTop where the lens designed for rc(zTop) ends at zTop (bisection; the lens rim falls as zTop rises)
    if (!(H > hMin)) throw rangeError();
    const mismatch = (zt: number) => exitLensFor(rcForTop(zt) * cotT1, n, theta1, H, o.toleranceMm * 10).z.at(-1)! - zt;
    let lo = hMin;
    let hi = Math.min(H, hMax);
    if (!(mismatch(lo) > 0 && mismatch(hi) < 0)) throw rangeError();
    for (let i = 0; i < 60 && hi - lo > o.toleranceMm * 1e-3; i++) {
      const mid = 0.5 * (lo + hi);
      if (mismatch(mid) > 0) lo = mid;
      else hi = mid;
    }
    zTop = 0.5 * (lo + hi);
    exitLens = exitLensFor(rcForTop(zTop) * cotT1, n, theta1, H, o.toleranceMm);
  }
  const rc = rcForTop(zTop);
  if (!(rc > rcMin && rc < R)) throw rangeError();
  const zFloorRim = rc * cotT1;
  const vertex = o.exitFace === 'lens' ? zFloorRim : ((rc / Math.sin(theta1)) * (n * Math.cos(theta1) - 1)) / (n - 1);
  if (vertex <= gap) throw new RangeError(`gapMm: the cavity floor's vertex sits ${fmt(vertex)} mm above the source; allowed [0, ${fmt(vertex)}) (got ${gap})`);
  const theta2 = Math.atan2(rc, gap);

  // Outer wall: integrate from the top corner (θ1) down to the cavity's bottom edge (θ2)
  const family = cylinderWallFamily(rc, n);
  const s1 = (R - rc) / Math.sqrt(1 - dz1 * dz1);
  let wall;
  try {
    wall = integrateCollimatingSurface(family, { kind: 'mirror' }, theta1, theta2, s1, o.toleranceMm);
  } catch {
    throw new RangeError(
      `heightMm: the outer wall of this TIR collimator would fall into its own cavity (split ${fmt((theta1 * 180) / Math.PI)}°): lower heightMm, or give a smaller splitAngleDeg (got ${H})`
    );
  }
  const last = wall.r.length - 1;
  wall.r[0] = R;
  wall.z[0] = zTop;

  // TIR check at every design sample
  const thetaC = Math.asin(1 / n);
  const failures: TirFailure[] = [];
  let margin = Infinity;
  for (let i = 0; i <= last; i++) {
    const dz = Math.cos(wall.theta[i]) / n;
    const inc = wallIncidenceRad(dz);
    margin = Math.min(margin, inc - thetaC);
    if (inc <= thetaC) failures.push({ thetaRad: wall.theta[i], rMm: wall.r[i], zMm: wall.z[i], incidenceRad: inc });
  }

  const floor =
    o.exitFace === 'lens'
      ? straightFace('cavity-floor', 0, zFloorRim, rc, zFloorRim)
      : sampleCurve(
          'cavity-floor',
          (theta, out) => {
            const rho = collimatingHyperbolaRadiusMm(theta, n, vertex);
            out[0] = rho * Math.sin(theta);
            out[1] = rho * Math.cos(theta);
          },
          0,
          theta1,
          o.toleranceMm
        );
  floor.r[floor.r.length - 1] = rc;
  floor.z[floor.z.length - 1] = zFloorRim;
  // Exit face, from the wall's top corner to the axis: flat, or a flat ring then the lens (reversed: rim to axis)
  const exit = exitLens
    ? {
        name: 'exit',
        r: Float64Array.of(R, ...Array.from(exitLens.r).reverse()),
        z: Float64Array.of(zTop, ...Array.from(exitLens.z).reverse())
      }
    : straightFace('exit', R, H, 0, H);
  if (exitLens) {
    exit.z[1] = zTop; // the lens rim meets the ring at the wall's top height (equal to the solve's tolerance)
    exit.r[exit.r.length - 1] = 0;
    exit.z[exit.z.length - 1] = H;
  }
  const rFoot = wall.r[last];
  const zFoot = wall.z[last];
  const outerWall = { name: 'tir-wall', r: wall.r.slice().reverse(), z: wall.z.slice().reverse() };
  return {
    type: 'tir',
    shape: 'tir',
    surfaces: [
      floor,
      straightFace('cavity-wall', rc, zFloorRim, rc, gap),
      { name: 'base', r: Float64Array.of(rc, rFoot, rFoot), z: Float64Array.of(gap, gap, zFoot) },
      outerWall,
      exit
    ],
    n,
    exitDiameterMm: o.exitDiameterMm,
    heightMm: H,
    gapMm: gap,
    toleranceMm: o.toleranceMm,
    focalLengthMm: o.exitFace === 'lens' ? undefined : vertex,
    rimAngleRad: Math.atan2(R, H),
    collectionHalfAngleRad: theta2,
    splitAngleRad: theta1,
    cavityRadiusMm: rc,
    tirFailures: failures,
    tirMarginRad: margin
  };
}
