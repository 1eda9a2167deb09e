import { readFileSync, statSync } from 'node:fs';
import { colorOfSpectrum, parseSpectrumCsv } from '../../lib/color';
import { CliError } from '../cli-error';
import { parseOptions, truncate, type OptionSpec } from '../options';
import { emit, type Row } from '../output';

export const summary = 'colour of a spectrum: CIE 1931 x, y, u′v′, CCT, Duv, CRI Ra and R1–R14, luminous efficacy';
export const help = `outcouple color SPECTRUM.csv — colour of a spectral power distribution

  SPECTRUM.csv   columns wavelength_nm,value (optional header row with those names); value is spectral
                 power per nm in any unit, ≥ 0; rows sorted by wavelength; 2 to 100000 rows
  --json         print one JSON object: x, y, uPrime, vPrime, cctK, duv, ra, r (R1..R14), lerLmPerW, warnings

Colorimetry by CIE 015:2018 (CIE 1931 2° observer), CCT and Duv by Ohno (2014), colour rendering by CIE 13.3-1995,
luminous efficacy of radiation with Km = 683 lm/W. Figures that do not exist for the spectrum print as null.

Example: outcouple color led.csv --json`;

const options: OptionSpec = { json: { type: 'boolean' } };

/** Largest spectrum file read, bytes (100 000 rows of two numbers fit well within it). */
const MAX_BYTES = 8_000_000;

export function run(argv: string[]): void {
  const { values, positionals } = parseOptions(argv, options, 'color');
  if (positionals.length !== 1) throw new CliError("color: name one spectrum file (e.g. 'outcouple color led.csv')");
  const path = positionals[0];
  let text: string;
  try {
    if (statSync(path).size > MAX_BYTES) throw new CliError(`color: '${truncate(path, 80)}' is larger than ${MAX_BYTES / 1e6} MB`);
    text = readFileSync(path, 'utf8');
  } catch (error) {
    if (error instanceof CliError) throw error;
    throw new CliError(`color: cannot read '${truncate(path, 80)}'`);
  }
  let spectrum;
  try {
    spectrum = parseSpectrumCsv(text);
  } catch (error) {
    if (error instanceof RangeError) throw new CliError(`${truncate(path, 80)} ${error.message}`);
    throw error;
  }
  const c = colorOfSpectrum(spectrum);
  const result = {
    x: c.x, y: c.y, uPrime: c.uPrime, vPrime: c.vPrime, cctK: c.cctK, duv: c.duv, ra: c.ra, r: c.r,
    lerLmPerW: c.lerLmPerW, rows: spectrum.wavelengthNm.length, warnings: c.warnings
  };
  const fixed = (v: number | null, digits: number) => (v === null ? 'none' : v.toFixed(digits));
  const rows: Row[] = [
    ['x, y (CIE 1931)', `${c.x.toFixed(5)}, ${c.y.toFixed(5)}`],
    ["u′, v′ (CIE 1976)", `${c.uPrime.toFixed(5)}, ${c.vPrime.toFixed(5)}`],
    ['CCT', fixed(c.cctK, 0), c.cctK === null ? '' : 'K'],
    ['Duv', fixed(c.duv, 5)],
    ['Ra', fixed(c.ra, 1)],
    ['R9', c.r ? c.r[8].toFixed(1) : 'none'],
    ['R1–R14', c.r ? c.r.map((v) => v.toFixed(0)).join(' ') : 'none'],
    ['luminous efficacy of radiation', c.lerLmPerW.toFixed(1), 'lm/W']
  ];
  emit(values.json === true, result, 'Colour of the spectrum', rows, c.warnings);
}
