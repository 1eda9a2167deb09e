/**
 * The CIE tables of the colour core, read once from data/cie/cie-tables.json (the only reader of it):
 * CIE 1931 2° colour-matching functions (360–830 nm, 1 nm), the 14 test colour samples of CIE 13.3
 * (360–830 nm, 5 nm) and the daylight components S0, S1, S2 (300–830 nm, 5 nm). Each table is an even
 * grid; `tableAt` interpolates linearly and is 0 outside, the rule the CIE's metadata gives.
 * © CIE, CC BY-SA 4.0 — see data/cie/README.md.
 */
import data from '../../../data/cie/cie-tables.json';

/** A CIE table on an even wavelength grid. */
export interface EvenTable {
  readonly startNm: number;
  readonly stepNm: number;
  readonly values: Float64Array;
}

function even(t: { startNm: number; stepNm: number; count: number; file: string }, column: number[], name: string): EvenTable {
  if (column.length !== t.count || column.some((v) => !Number.isFinite(v))) {
    throw new Error(`data/cie/cie-tables.json: column ${name} of ${t.file} is damaged`);
  }
  return { startNm: t.startNm, stepNm: t.stepNm, values: Float64Array.from(column) };
}

/** CIE 1931 2° colour-matching functions x̄, ȳ, z̄ (CIE 018:2019; ISO/CIE 11664-1:2019). */
export const CMF_X = even(data.cmf1931, data.cmf1931.columns.x, 'x');
export const CMF_Y = even(data.cmf1931, data.cmf1931.columns.y, 'y');
export const CMF_Z = even(data.cmf1931, data.cmf1931.columns.z, 'z');
/** First and last wavelength of the colour-matching functions, nm (360, 830). */
export const CMF_START_NM = data.cmf1931.startNm;
export const CMF_END_NM = data.cmf1931.startNm + (data.cmf1931.count - 1) * data.cmf1931.stepNm;

/** Spectral radiance factors of the CIE 13.3 test colour samples TCS01…TCS14, index 0…13. */
export const TEST_COLOUR_SAMPLES: readonly EvenTable[] = Object.entries(data.testColourSamples.columns).map(([name, column]) =>
  even(data.testColourSamples, column, name)
);

/** Daylight components S0, S1, S2 (CIE 015:2018 §4.1). */
export const DAYLIGHT_S0 = even(data.daylightComponents, data.daylightComponents.columns.S0, 'S0');
export const DAYLIGHT_S1 = even(data.daylightComponents, data.daylightComponents.columns.S1, 'S1');
export const DAYLIGHT_S2 = even(data.daylightComponents, data.daylightComponents.columns.S2, 'S2');

/** Citation of the tables, for display beside colour results. */
export const CIE_TABLES_SOURCE =
  'CIE 015:2018 Colorimetry, 4th ed.; CIE 1931 2° observer (CIE 018:2019, DOI 10.25039/CIE.DS.xvudnb9b); ' +
  'CIE 13.3-1995 test colour samples (DOI 10.25039/CIE.DS.wuiuu9cz); daylight components (DOI 10.25039/CIE.DS.w7zunnny). © CIE, CC BY-SA 4.0.';

/**
 * Linear interpolation in an even CIE table; 0 outside it (CIE metadata: linear interpolation, zero extrapolation).
 * @param table the table; @param wavelengthNm wavelength, nm
 */
export function tableAt(table: EvenTable, wavelengthNm: number): number {
  const t = (wavelengthNm - table.startNm) / table.stepNm;
  const last = table.values.length - 1;
  if (!(t >= 0 && t <= last)) return 0;
  const i = Math.min(Math.floor(t), last - 1);
  const f = t - i;
  return f === 0 ? table.values[i] : table.values[i] + f * (table.values[i + 1] - table.values[i]);
}
