/**
 * Paraboloid reflector with the source at its focus (the origin): every ray from the focus leaves parallel
 * to the axis after one reflection.
 *
 * Polar form about the focus, θ from +z: ρ(θ) = 2f / (1 − cos θ); Cartesian z = r²/(4f) − f, vertex at
 * z = −f (E. Hecht, Optics, 4th ed., §5.2 / any analytic geometry text). The mirror runs from the optic's
 * base plane z = gap to its top z = heightMm at the exit radius R: from R²/(4f) − f = H,
 *   f = (√(H² + R²) − H) / 2.
 * Rim angle θ_rim = atan(R / H) (seen from the focus); the base edge is at θ_base = atan2(r_base, gap), 90° for
 * gap 0. Rays with θ < θ_rim leave through the open front without touching the mirror; for a Lambertian source
 * (flux within θ ∝ sin² θ) the mirror receives sin² θ_base − sin² θ_rim, i.e. cos² θ_rim when gap = 0.
 */
import type { CheckedDesignOptions } from './design-options';
import { fmt } from './format-for-message';
import type { OpticDesign } from './optic-design';
import { sampleCurve } from './profile';

/** Focal length of the paraboloid through (R, H) with its focus at the origin, mm. */
export function paraboloidFocalLengthMm(exitRadiusMm: number, heightMm: number): number {
  // f² + H f − R²/4 = 0, positive root, written without cancellation: f = (R²/4) / ((√(H²+R²) + H)/2)
  return (exitRadiusMm * exitRadiusMm) / (2 * (Math.hypot(heightMm, exitRadiusMm) + heightMm));
}

/** Designs the paraboloid for checked options (heightMm present). */
export function designParaboloid(o: CheckedDesignOptions): OpticDesign {
  const R = o.exitDiameterMm / 2;
  const H = o.heightMm as number;
  const f = paraboloidFocalLengthMm(R, H);
  const gap = o.gapMm;
  // θ at the base plane z = gap: ρ cos θ = gap with ρ = 2f/(1 − cos θ) → cos θ = gap / (2f + gap)
  const thetaBase = Math.acos(gap / (2 * f + gap));
  const thetaRim = Math.atan2(R, H);
  const rBase = ((2 * f) / (1 - Math.cos(thetaBase))) * Math.sin(thetaBase);
  if (rBase <= o.sourceRadiusMm) {
    throw new RangeError(
      `heightMm: the mirror's base opening (${fmt(2 * rBase)} mm) is narrower than the source (${fmt(2 * o.sourceRadiusMm)} mm); lower heightMm or widen exitDiameterMm (got ${H})`
    );
  }
  // Parametrise by θ, from the base (widest angle) up to the rim: outward normal (Δz, −Δr) faces away from the focus
  const mirror = sampleCurve(
    'reflector',
    (theta, out) => {
      const rho = (2 * f) / (1 - Math.cos(theta));
      out[0] = rho * Math.sin(theta);
      out[1] = rho * Math.cos(theta);
    },
    thetaBase,
    thetaRim,
    o.toleranceMm
  );
  // The last sample is the rim itself; pin it to the exact requested values
  mirror.r[mirror.r.length - 1] = R;
  mirror.z[mirror.z.length - 1] = H;
  return {
    type: 'reflector',
    shape: 'paraboloid',
    surfaces: [mirror],
    n: 1,
    reflectance: o.reflectance,
    exitDiameterMm: o.exitDiameterMm,
    heightMm: H,
    gapMm: gap,
    toleranceMm: o.toleranceMm,
    focalLengthMm: f,
    rimAngleRad: thetaRim,
    collectionHalfAngleRad: thetaBase
  };
}

/**
 * Fraction of a Lambertian point source's flux (into the upper hemisphere) that meets the mirror:
 * sin² θ_base − sin² θ_rim (cos² θ_rim when the mirror reaches the source plane).
 */
export function lambertianFractionOnMirror(d: Pick<OpticDesign, 'rimAngleRad' | 'collectionHalfAngleRad'>): number {
  const sb = Math.sin(d.collectionHalfAngleRad);
  const sr = Math.sin(d.rimAngleRad);
  return sb * sb - sr * sr;
}
