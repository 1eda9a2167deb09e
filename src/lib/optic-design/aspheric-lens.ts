/**
 * Collimating aspheric lens: a plano-hyperbolic lens whose hyperbolic entry surface faces the source and sends
 * every ray from the source (at the hyperbola's outer focus) parallel to the axis inside the glass; the flat
 * exit face then leaves them parallel.
 *
 * Equal optical path from the source to any plane inside the glass (Fermat): ρ + n (Z − z) = const, so
 *   ρ = n z − (n − 1) v,  i.e. in polar form about the source  ρ(θ) = (n − 1) v / (n cos θ − 1),
 * a hyperbola of eccentricity e = n with the source at its focus and the vertex at z = v (E. Hecht, Optics,
 * 4th ed., §5.2.1 "Aspherical surfaces": a hyperbolic interface with e = n collimates a point source at its
 * focus; the Cartesian surfaces of Descartes). The surface exists for cos θ > 1/n: its asymptotic cone has
 * half-angle acos(1/n) (48.2° at n = 1.5), so the lens can never take more than that cone.
 *
 * Sizing: the entry reaches the exit radius a at z = H − edge (edge thickness at the rim), so the rim angle is
 * θ_rim = atan(a / (H − edge)) and v = a / g(θ_rim), g(θ) = (n − 1) sin θ / (n cos θ − 1).
 */
import type { CheckedDesignOptions } from './design-options';
import { fmt } from './format-for-message';
import type { OpticDesign } from './optic-design';
import { sampleCurve, straightFace } from './profile';

/** ρ(θ) of the collimating hyperbola with vertex distance v, mm. Valid for cos θ > 1/n. */
export function collimatingHyperbolaRadiusMm(theta: number, n: number, vertexMm: number): number {
  return ((n - 1) * vertexMm) / (n * Math.cos(theta) - 1);
}

/** Designs the plano-hyperbolic lens. @throws RangeError when the height cannot hold it */
export function designAsphericLens(o: CheckedDesignOptions): OpticDesign {
  const n = o.n;
  const a = o.exitDiameterMm / 2;
  const H = o.heightMm as number;
  const te = o.edgeThicknessMm;
  const thetaMax = Math.acos(1 / n);
  // The rim must lie inside the hyperbola's asymptotic cone: H − edge > a / tan(acos(1/n)) = a / √(n² − 1)
  const minHeight = te + a / Math.sqrt(n * n - 1);
  if (H <= minHeight) {
    throw new RangeError(
      `heightMm: a collimating lens ${fmt(o.exitDiameterMm)} mm wide at n = ${fmt(n)} needs a top above ${fmt(minHeight)} mm; allowed > ${fmt(minHeight)} (got ${H})`
    );
  }
  const thetaRim = Math.atan2(a, H - te);
  const v = (a * (n * Math.cos(thetaRim) - 1)) / ((n - 1) * Math.sin(thetaRim));
  if (v <= o.gapMm) {
    throw new RangeError(
      `gapMm: the lens vertex sits ${fmt(v)} mm above the source, below the gap; allowed [0, ${fmt(v)}) (got ${o.gapMm})`
    );
  }
  if (thetaRim >= thetaMax) throw new RangeError(`heightMm: no collimating hyperbola reaches the rim (got ${H})`);
  const entry = sampleCurve(
    'entry',
    (theta, out) => {
      const rho = collimatingHyperbolaRadiusMm(theta, n, v);
      out[0] = rho * Math.sin(theta);
      out[1] = rho * Math.cos(theta);
    },
    0,
    thetaRim,
    o.toleranceMm
  );
  const zRim = H - te;
  entry.r[entry.r.length - 1] = a;
  entry.z[entry.z.length - 1] = zRim;
  return {
    type: 'lens',
    shape: 'aspheric',
    surfaces: [entry, straightFace('edge', a, zRim, a, H), straightFace('exit', a, H, 0, H)],
    n,
    exitDiameterMm: o.exitDiameterMm,
    heightMm: H,
    gapMm: v,
    toleranceMm: o.toleranceMm,
    focalLengthMm: v,
    rimAngleRad: Math.atan2(a, H),
    collectionHalfAngleRad: thetaRim
  };
}
