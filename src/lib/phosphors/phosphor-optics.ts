/**
 * What the scattering and conversion models need from a phosphor at one wavelength: the particle's
 * complex index n + ik (n from its material's dispersion, k = kPeak × the absorption shape normalised
 * to its peak) and the emission spectrum as rows for colour or sampling.
 */
import { indexAt } from '../materials/dispersion';
import { bandEmissionAt, bandShapeAt, HC_EV_NM } from './band-model';
import type { Phosphor } from './phosphor-schema';

/** Peak of the absorption band shape over 250–800 nm (0.5 nm search), cached per phosphor. */
const peaks = new WeakMap<Phosphor, number>();
function absorptionPeak(p: Phosphor): number {
  let peak = peaks.get(p);
  if (peak === undefined) {
    peak = 0;
    for (let nm = 250; nm <= 800; nm += 0.5) peak = Math.max(peak, bandShapeAt(p.absorption.bands, nm));
    peaks.set(p, peak);
  }
  return peak;
}

/**
 * Complex index of a phosphor particle.
 * @param wavelengthNm vacuum wavelength, nm, in [100, 20000]
 * @returns n, k and the dispersion warning when outside the material's validity range
 */
export function particleIndexAt(p: Phosphor, wavelengthNm: number): { n: number; k: number; warning?: string } {
  const nk = indexAt(p.particleMaterial, wavelengthNm);
  const k = (p.absorption.kPeak * bandShapeAt(p.absorption.bands, wavelengthNm)) / absorptionPeak(p);
  return { n: nk.n, k, ...(nk.warning ? { warning: nk.warning } : {}) };
}

/**
 * Emission spectrum of a phosphor as rows [wavelength nm, power per nm], normalised to peak 1.
 * @param fromNm, toNm, stepNm grid (default 380–830 nm, 1 nm)
 */
export function emissionRows(p: Phosphor, fromNm = 380, toNm = 830, stepNm = 1): [number, number][] {
  const rows: [number, number][] = [];
  for (let nm = fromNm; nm <= toNm + 1e-9; nm += stepNm) rows.push([nm, bandEmissionAt(p.emission.bands, nm)]);
  const peak = Math.max(...rows.map((r) => r[1]));
  return rows.map(([nm, v]) => [nm, v / peak]);
}

/** Stokes efficiency of converting a photon at λin to one at λout: energy ratio λin/λout (photon energy hc/λ). */
export function stokesEfficiency(lambdaInNm: number, lambdaOutNm: number): number {
  return HC_EV_NM / lambdaOutNm / (HC_EV_NM / lambdaInNm);
}
