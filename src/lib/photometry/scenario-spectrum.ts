import type { EmissionSpec } from '../scenario/schema';
import { gaussianSpectrum } from './gaussian-spectrum';
import { monochromatic } from './monochromatic';
import type { Spectrum } from './spectrum';
import { tableSpectrum } from './table-spectrum';

/**
 * The scenario's emission as a sampled spectrum: a single wavelength is one sample of weight 1 (so any
 * spectral average returns the single-wavelength value exactly), a Gaussian band is `gaussianSpectrum`,
 * a table is `tableSpectrum`. The one place the scenario's emission becomes a spectrum.
 * @param emission the scenario's emission (wavelengths in nm)
 * @throws RangeError from the spectrum builders, naming the field, for values outside their ranges
 */
export function scenarioSpectrum(emission: EmissionSpec): Spectrum {
  if (emission.kind === 'gaussian') return gaussianSpectrum(emission.peakNm, emission.fwhmNm);
  if (emission.kind === 'table') return tableSpectrum(emission.rows);
  return monochromatic(emission.wavelengthNm);
}
