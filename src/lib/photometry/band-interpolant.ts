import type { Spectrum } from './spectrum';

/** Nodes at which a quantity is evaluated across a spectrum before linear interpolation. */
export const BAND_NODES = 17;

/**
 * A slowly varying f(λ) evaluated at `nodes` even nodes over the spectrum's span (ends included) and
 * interpolated linearly between them, for spectra with more samples than nodes; otherwise f itself,
 * so a short spectrum (and a single wavelength) is evaluated exactly. Refractive indices, and the
 * extraction figures built on them, change slowly across an LED band, so a 241-sample band costs
 * 17 evaluations. Linear interpolation error ≤ h²/8 · max|f''| with node step h.
 * @param spectrum samples in ascending wavelength (nm)
 * @param f quantity of the wavelength in nm
 * @param nodes number of nodes, integer ≥ 2 (default 17)
 * @see linear interpolation error bound, e.g. W. H. Press et al., Numerical Recipes, 3rd ed., §3.1
 */
export function bandInterpolant(
  spectrum: Spectrum,
  f: (wavelengthNm: number) => number,
  nodes: number = BAND_NODES
): (wavelengthNm: number) => number {
  const w = spectrum.wavelengthNm;
  const lo = w[0];
  const hi = w[w.length - 1];
  if (w.length <= nodes || !(hi > lo)) return f;
  const step = (hi - lo) / (nodes - 1);
  const values = Array.from({ length: nodes }, (_, i) => f(i === nodes - 1 ? hi : lo + i * step));
  return (nm) => {
    const t = Math.min(nodes - 1, Math.max(0, (nm - lo) / step));
    const i = Math.min(nodes - 2, Math.floor(t));
    return values[i] + (t - i) * (values[i + 1] - values[i]);
  };
}
