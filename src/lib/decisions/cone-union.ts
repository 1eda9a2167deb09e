/**
 * Share of all directions that lie inside at least one escape cone of a cuboid chip, counting both
 * cones about each axis that has an emitting face (a ray heading into the opposite face comes back by
 * reflection with the same direction cosines up to sign).
 *
 * Why it bounds a planar chip: reflection at a face of a rectangular box flips one direction cosine
 * and keeps the other two, so the triple (|dx|, |dy|, |dz|) of a ray never changes. A ray outside every
 * escape cone stays outside them for ever (trapped until absorbed); a ray inside one can at best leave
 * after some bounces. So no planar cuboid chip, however little it absorbs, extracts more than this share.
 * Source: the direction-cosine invariance of specular reflection in a box (common practice in LED ray
 * optics; e.g. Schubert, Light-Emitting Diodes, 2nd ed., ch. 5, trapped light in cuboid chips — from memory).
 */

const RULE_POINTS = 2000;

/**
 * Fraction of the unit sphere within angle θc of ±z (one axis), or of ±x, ±y or ±z (three axes):
 *   one axis:    1 − cos θc                                    (two disjoint cones)
 *   three axes:  3 (1 − cos θc) while θc ≤ 45° (six disjoint cones), else
 *                ∫₀¹ f(μ) dμ,  f = 1 for μ > c, else the azimuth share where |s cos φ| > c or |s sin φ| > c,
 *                s = √(1 − μ²): 1 if a ≤ 1/√2, 4·acos(a)/π if 1/√2 < a < 1, 0 if a ≥ 1, a = c/s, c = cos θc.
 * g = 1 up to μ1 = √(1 − 2c²) and is smooth from there to c, where composite Simpson on 2000 intervals
 * leaves an error far below 1e-9.
 * @param criticalAngleRad escape-cone half-angle θc, radians, [0, π/2]
 * @param axes 1 (top face only, with a reflecting bottom) or 3 (five or six emitting faces)
 * @returns a fraction in [0, 1]; 1 at θc = π/2
 * @example coneUnionFraction(Math.asin(1 / 2.45), 3) // = 3(1 − cos 24.09°) ≈ 0.2613
 */
export function coneUnionFraction(criticalAngleRad: number, axes: 1 | 3): number {
  if (typeof criticalAngleRad !== 'number' || !(criticalAngleRad >= 0 && criticalAngleRad <= Math.PI / 2)) {
    throw new RangeError(`criticalAngleRad must be a number in [0, π/2] (got ${String(criticalAngleRad)})`);
  }
  if (axes !== 1 && axes !== 3) throw new RangeError(`axes must be 1 or 3 (got ${String(axes)})`);
  // 1 − cos θc = 2 sin²(θc/2), without cancellation
  const s = Math.sin(criticalAngleRad / 2);
  const twoCones = 2 * s * s;
  if (axes === 1) return twoCones;
  if (criticalAngleRad <= Math.PI / 4) return Math.min(1, 3 * twoCones);

  // Overlapping cones, μ = |dz|: g = 1 on [0, μ1] (a ≤ 1/√2), μ1 = √(1 − 2c²); on [μ1, c] g = 4·acos(a)/π,
  // smooth there (a < 1), so composite Simpson converges fast; beyond c the z cones take everything.
  const c = Math.cos(criticalAngleRad);
  const mu1 = Math.sqrt(Math.max(0, 1 - 2 * c * c));
  if (mu1 >= c) return 1; // θc ≥ acos(1/√3): every direction has some |cosine| ≥ c
  const h = (c - mu1) / RULE_POINTS;
  const g = (mu: number) => {
    const a = c / Math.sqrt(1 - mu * mu);
    return a <= Math.SQRT1_2 ? 1 : (4 * Math.acos(a)) / Math.PI;
  };
  let sum = g(mu1) + g(c);
  for (let i = 1; i < RULE_POINTS; i++) sum += (i % 2 === 1 ? 4 : 2) * g(mu1 + i * h);
  return Math.min(1, mu1 + (sum * h) / 3 + (1 - c));
}
