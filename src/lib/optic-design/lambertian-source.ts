/**
 * An idealised flat Lambertian source (a disc or a rectangle centred on the axis in the source plane): its area
 * and the radius of the smallest circle around it, for the étendue limit and the fit checks.
 */

export interface LambertianSource {
  shape: 'disc' | 'rect';
  /** Disc diameter, or rectangle width, mm (> 0). */
  widthMm: number;
  /** Rectangle length, mm (> 0); a square when omitted. Ignored for a disc. */
  lengthMm?: number;
}

/** Emitting area, mm²: π w²/4 for a disc, w·l for a rectangle. @throws RangeError on sizes ≤ 0 */
export function sourceAreaMm2(s: LambertianSource): number {
  const { w, l } = sides(s);
  return s.shape === 'disc' ? (Math.PI * w * w) / 4 : w * l;
}

/** Radius of the smallest circle around the source, mm: w/2 for a disc, half the diagonal for a rectangle. */
export function sourceRadiusMm(s: LambertianSource): number {
  const { w, l } = sides(s);
  return s.shape === 'disc' ? w / 2 : Math.hypot(w, l) / 2;
}

function sides(s: LambertianSource): { w: number; l: number } {
  if (s === null || typeof s !== 'object' || (s.shape !== 'disc' && s.shape !== 'rect')) {
    throw new RangeError('source.shape must be disc or rect');
  }
  const w = s.widthMm;
  const l = s.lengthMm ?? s.widthMm;
  if (typeof w !== 'number' || !(w > 0 && w <= 1000)) throw new RangeError(`source.widthMm must be a number in (0, 1000] (got ${w})`);
  if (typeof l !== 'number' || !(l > 0 && l <= 1000)) throw new RangeError(`source.lengthMm must be a number in (0, 1000] (got ${l})`);
  return { w, l };
}
