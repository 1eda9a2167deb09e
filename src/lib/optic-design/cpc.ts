/**
 * Compound parabolic concentrator (CPC) of revolution, used backwards as a collimator: the source sits in the
 * small aperture (radius a′, at the base z = gap), the beam leaves the large aperture (radius a, the exit).
 *
 * Meridian profile (W. T. Welford, R. Winston, High Collection Nonimaging Optics, Academic Press 1989, §4.3):
 * the right-hand wall is an arc of the parabola whose focus is the opposite edge of the small aperture
 * (r = −a′) and whose axis is tilted by the acceptance half-angle θa from the optic's axis. About that focus,
 * with ψ measured from the parabola's axis,
 *   ρ(ψ) = 2f / (1 − cos ψ),  f = a′ (1 + sin θa),
 *   r = −a′ + ρ sin(ψ − θa),  z = gap + ρ cos(ψ − θa),  ψ from π/2 + θa (the small aperture's edge) to 2θa
 * (where the wall turns parallel to the axis, at the exit edge). Then
 *   a′ = a sin θa  and  L = (a + a′) / tan θa  (Welford & Winston 1989, eqs. 4.1–4.2).
 *
 * What holds: in a meridian section (2-D) the CPC is ideal — every meridional ray leaving the small aperture
 * exits within ±θa, and every meridional ray entering the exit within θa reaches the small aperture
 * (sin θa = a′/a). In 3-D, for the CPC of revolution, a′/a = sin θa still fixes the apertures at the étendue
 * limit (π a′² · π = π a² · π sin² θa), but skew rays are not all handled ideally: the transmission–angle
 * curve is rounded near θa, a few per cent of the rays inside θa are turned back and a few outside are
 * passed (Welford & Winston 1989, §5.3–5.4, from memory for the size of the effect). Our tests check the
 * meridional (2-D) relation exactly and the 3-D aperture relation.
 */
import type { CheckedDesignOptions } from './design-options';
import { fmt } from './format-for-message';
import type { OpticDesign } from './optic-design';
import { sampleCurve } from './profile';

/** Length of a full CPC, mm: L = (a + a′)/tan θa with a′ = a sin θa. @param thetaA (0, π/2) */
export function cpcLengthMm(exitRadiusMm: number, thetaA: number): number {
  return (exitRadiusMm * (1 + Math.sin(thetaA))) / Math.tan(thetaA);
}

/** The acceptance half-angle whose full CPC with exit radius a has length L (bisection; L decreases with θa). */
export function cpcHalfAngleForLength(exitRadiusMm: number, lengthMm: number): number {
  let lo = 1e-9;
  let hi = Math.PI / 2 - 1e-12;
  for (let i = 0; i < 200 && hi - lo > 1e-15; i++) {
    const mid = 0.5 * (lo + hi);
    if (cpcLengthMm(exitRadiusMm, mid) > lengthMm) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}

/**
 * Designs the CPC for checked options: θa from targetBeamDeg/2, else from the height (a full CPC filling
 * gap … heightMm). A given heightMm below the full CPC's top is refused (truncation is not designed here).
 * @throws RangeError (heightMm too low for the target; the small aperture narrower than the source)
 */
export function designCpc(o: CheckedDesignOptions): OpticDesign {
  const a = o.exitDiameterMm / 2;
  const gap = o.gapMm;
  let thetaA: number;
  if (o.targetBeamDeg !== undefined) {
    if (o.targetBeamDeg >= 180) throw new RangeError(`targetBeamDeg must be a number in (0, 180) for a CPC (got ${o.targetBeamDeg})`);
    thetaA = (o.targetBeamDeg * Math.PI) / 360;
    const top = gap + cpcLengthMm(a, thetaA);
    if (o.heightMm !== undefined && o.heightMm < top) {
      throw new RangeError(
        `heightMm: a CPC for a ${fmt(o.targetBeamDeg)}° beam with a ${fmt(o.exitDiameterMm)} mm exit reaches ${fmt(top)} mm; allowed ≥ ${fmt(top)} (got ${o.heightMm})`
      );
    }
  } else {
    thetaA = cpcHalfAngleForLength(a, (o.heightMm as number) - gap);
  }
  const aPrime = a * Math.sin(thetaA);
  if (aPrime <= o.sourceRadiusMm) {
    const widest = 2 * Math.asin(Math.min(1, o.sourceRadiusMm / a));
    throw new RangeError(
      `targetBeamDeg: the CPC's small aperture (${fmt(2 * aPrime)} mm) is narrower than the source (${fmt(2 * o.sourceRadiusMm)} mm); ` +
        `with a ${fmt(o.exitDiameterMm)} mm exit the narrowest CPC beam is ${fmt((widest * 180) / Math.PI)}°`
    );
  }
  const f = aPrime * (1 + Math.sin(thetaA));
  const wall = sampleCurve(
    'reflector',
    (psi, out) => {
      const rho = (2 * f) / (1 - Math.cos(psi));
      out[0] = -aPrime + rho * Math.sin(psi - thetaA);
      out[1] = gap + rho * Math.cos(psi - thetaA);
    },
    Math.PI / 2 + thetaA,
    2 * thetaA,
    o.toleranceMm
  );
  const top = wall.z[wall.z.length - 1];
  return {
    type: 'reflector',
    shape: 'cpc',
    surfaces: [wall],
    n: 1,
    reflectance: o.reflectance,
    exitDiameterMm: o.exitDiameterMm,
    heightMm: top,
    gapMm: gap,
    toleranceMm: o.toleranceMm,
    focalLengthMm: f,
    rimAngleRad: Math.atan2(a, top),
    collectionHalfAngleRad: gap > 0 ? Math.atan2(aPrime, gap) : Math.PI / 2,
    acceptanceHalfAngleRad: thetaA
  };
}
