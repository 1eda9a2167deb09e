/** Reads the CIE's own CSV files from data/cie for reference tests (the app reads the generated JSON). */
import { readFileSync } from 'node:fs';
import { colorSpectrum, parseCieCsv, type ColorSpectrum } from '../../src/lib/color';

export function cieFile(name: string, columns: number): number[][] {
  const path = new URL(`../../data/cie/${name}`, import.meta.url);
  return parseCieCsv(readFileSync(path, 'utf8'), columns, name);
}

/** Column `column` (1-based after the wavelength) of a CIE file as a spectrum. */
export function cieSpectrum(name: string, columns: number, column = 1): ColorSpectrum {
  return colorSpectrum(cieFile(name, columns).map((row) => [row[0], row[column]] as [number, number]));
}
