/**
 * Chromaticity coordinates from tristimulus values, and back.
 * - CIE 1931 x, y: x = X/(X+Y+Z), y = Y/(X+Y+Z) (CIE 015:2018 §7.3).
 * - CIE 1960 UCS u, v: u = 4X/(X+15Y+3Z), v = 6Y/(X+15Y+3Z) — the space of CCT, Duv and CIE 13.3.
 * - CIE 1976 UCS u′, v′: u′ = u, v′ = 1.5·v (CIE 015:2018 §8.1).
 * Every function needs X + Y + Z > 0 (resp. X + 15Y + 3Z > 0); callers check that once.
 */
import type { Tristimulus } from './tristimulus';

export interface Xy {
  x: number;
  y: number;
}
export interface Uv {
  u: number;
  v: number;
}

/** CIE 1931 chromaticity x, y of tristimulus values. */
export function xyOf(t: Tristimulus): Xy {
  const sum = t.X + t.Y + t.Z;
  return { x: t.X / sum, y: t.Y / sum };
}

/** CIE 1960 UCS u, v of tristimulus values: u = 4X/(X+15Y+3Z), v = 6Y/(X+15Y+3Z). */
export function uvOf(t: Tristimulus): Uv {
  const d = t.X + 15 * t.Y + 3 * t.Z;
  return { u: (4 * t.X) / d, v: (6 * t.Y) / d };
}

/** CIE 1960 u, v from x, y: u = 4x/(−2x + 12y + 3), v = 6y/(−2x + 12y + 3) (CIE 015:2018). */
export function uvFromXy(p: Xy): Uv {
  const d = -2 * p.x + 12 * p.y + 3;
  return { u: (4 * p.x) / d, v: (6 * p.y) / d };
}

/** CIE 1931 x, y from CIE 1960 u, v: x = 3u/(2u − 8v + 4), y = 2v/(2u − 8v + 4) (inverse of uvFromXy). */
export function xyFromUv(p: Uv): Xy {
  const d = 2 * p.u - 8 * p.v + 4;
  return { x: (3 * p.u) / d, y: (2 * p.v) / d };
}
