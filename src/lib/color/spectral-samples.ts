/**
 * The quadrature every colour integral uses. A spectrum is sampled on the 1 nm grid of the CIE
 * 1931 observer (360–830 nm) merged with the spectrum's own sample wavelengths, over the range where
 * both exist; each node carries S(λ)·Δλ with trapezoid weights. On a 1 nm spectrum this is the CIE's
 * 1 nm summation (CIE 015:2018 §7.1) up to half weights at the two ends; a line narrower than 1 nm is
 * still integrated through its own samples rather than missed between grid nodes.
 */
import { CMF_END_NM, CMF_START_NM } from './cie-tables';
import { powerAt, type ColorSpectrum } from './color-spectrum';

/** Quadrature nodes: wavelength (nm) and spectral power times the node's trapezoid width (power·nm). */
export interface SpectralSamples {
  readonly wavelengthNm: Float64Array;
  readonly weightedPower: Float64Array;
}

/**
 * Samples a spectrum for colour integrals over [360, 830] nm ∩ its own range.
 * @param spectrum a checked spectrum (colorSpectrum)
 * @returns nodes ascending; empty if the spectrum lies outside 360–830 nm
 * @see trapezoid rule, W. H. Press et al., Numerical Recipes, 3rd ed., §4.1
 */
export function spectralSamples(spectrum: ColorSpectrum): SpectralSamples {
  const w = spectrum.wavelengthNm;
  const lo = Math.max(CMF_START_NM, w[0]);
  const hi = Math.min(CMF_END_NM, w[w.length - 1]);
  const nodes: number[] = [];
  if (hi >= lo) {
    // Merge the integer-nm grid with the spectrum's own wavelengths inside [lo, hi]
    let j = 0;
    while (j < w.length && w[j] < lo) j++;
    let g = Math.ceil(lo);
    let last = -Infinity;
    const push = (x: number) => {
      if (x > last) nodes.push((last = x));
    };
    push(lo);
    while (g <= hi || (j < w.length && w[j] <= hi)) {
      if (j < w.length && w[j] <= hi && (g > hi || w[j] <= g)) push(w[j++]);
      else push(g++);
    }
    push(hi);
  }
  const n = nodes.length;
  const wavelengthNm = Float64Array.from(nodes);
  const weightedPower = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const left = i > 0 ? nodes[i] - nodes[i - 1] : 0;
    const right = i < n - 1 ? nodes[i + 1] - nodes[i] : 0;
    weightedPower[i] = powerAt(spectrum, nodes[i]) * 0.5 * (left + right);
  }
  return { wavelengthNm, weightedPower };
}

/**
 * Samples a spectral power function on the 1 nm grid 360–830 nm (trapezoid weights): for reference
 * illuminants (Planckian, daylight) defined by formula.
 * @param power spectral power at a wavelength in nm (finite, ≥ 0)
 */
export function gridSamples(power: (wavelengthNm: number) => number): SpectralSamples {
  const n = CMF_END_NM - CMF_START_NM + 1;
  const wavelengthNm = new Float64Array(n);
  const weightedPower = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    wavelengthNm[i] = CMF_START_NM + i;
    weightedPower[i] = power(wavelengthNm[i]) * (i === 0 || i === n - 1 ? 0.5 : 1);
  }
  return { wavelengthNm, weightedPower };
}
