/**
 * Gain of the dome from two traces, with its standard error — and, by the same rule, any ratio of two
 * traced estimates (a candidate over the current encapsulant, a variant over the first). Pure.
 * g = η_dome / η_bare; σ_g = g · √((σ_dome/η_dome)² + (σ_bare/η_bare)²) — first-order propagation of
 * independent errors (J. R. Taylor, An Introduction to Error Analysis, 2nd ed., §3.8).
 * Returns null when the bare extraction is 0 (no gain can be formed).
 */
export function traceGain(
  etaDome: number,
  sigmaDome: number,
  etaBare: number,
  sigmaBare: number
): { gain: number; stderr: number } | null {
  if (!(etaBare > 0) || !Number.isFinite(etaDome)) return null;
  const gain = etaDome / etaBare;
  const relDome = etaDome > 0 ? sigmaDome / etaDome : 0;
  const relBare = sigmaBare / etaBare;
  return { gain, stderr: gain * Math.hypot(relDome, relBare) };
}
