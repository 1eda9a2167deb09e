/**
 * Spectra as sums of Gaussian bands in photon energy: S(E) = Σ wᵢ·exp(−(E − Eᵢ)²/(2σᵢ²)),
 * σ = FWHM/(2√(2 ln 2)), E = hc/λ = 1239.84198 eV·nm / λ. Broad 5d–4f bands of Ce³⁺ and Eu²⁺ are close
 * to Gaussian in energy (configurational-coordinate model), not in wavelength.
 * @see G. Blasse, B. C. Grabmaier, Luminescent Materials (Springer, 1994), ch. 2; CODATA 2018 for hc
 */
import type { PhosphorBand } from './phosphor-schema';

/** hc in eV·nm (CODATA 2018: h·c = 1.239841984… × 10⁻⁶ eV·m). */
export const HC_EV_NM = 1239.84198;

/** Band sum per unit energy at a photon energy E (eV), relative units. */
export function bandsPerEnergy(bands: readonly PhosphorBand[], energyEv: number): number {
  let s = 0;
  for (const b of bands) {
    const sigma = b.fwhmEv / (2 * Math.sqrt(2 * Math.LN2)); // FWHM = 2√(2 ln 2)·σ
    const t = (energyEv - b.peakEv) / sigma;
    s += b.weight * Math.exp(-0.5 * t * t);
  }
  return s;
}

/**
 * Band sum as a shape over wavelength, for absorption and excitation: A(λ) = S(E(λ)), relative units
 * (a cross section at a wavelength is the same whether the axis is energy or wavelength).
 * @param wavelengthNm vacuum wavelength, nm (> 0)
 */
export function bandShapeAt(bands: readonly PhosphorBand[], wavelengthNm: number): number {
  return bandsPerEnergy(bands, HC_EV_NM / wavelengthNm);
}

/**
 * Band sum as a spectral power density per unit wavelength, for emission: S(λ) = S(E)·|dE/dλ| = S(E)·E/λ.
 * @param wavelengthNm vacuum wavelength, nm (> 0)
 */
export function bandEmissionAt(bands: readonly PhosphorBand[], wavelengthNm: number): number {
  const e = HC_EV_NM / wavelengthNm;
  return (bandsPerEnergy(bands, e) * e) / wavelengthNm;
}
