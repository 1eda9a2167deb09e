/**
 * Parses an n,k table pasted by the user: one row per line, "wavelength n k" (k optional, taken as 0),
 * separated by commas, semicolons, tabs or spaces. A first line that starts with a word is read as a
 * header; lines starting with # or // are comments. If every wavelength is below 20 the column is
 * read as micrometres and converted to nm (a note says so).
 */
import { MATERIAL_LIMITS } from './limits';
import type { NkRow } from './types';

export type NkTableResult =
  | { ok: true; rows: NkRow[]; unit: 'nm' | 'um'; notes: string[] }
  | { ok: false; errors: { line: number; message: string }[] };

/** Wavelength column values all below this are read as micrometres. */
export const MICROMETRE_THRESHOLD = 20;
/** Longest text accepted, characters: room for the most rows with comments (a longer paste took seconds). */
export const MAX_TABLE_CHARS = 1_000_000;
const MAX_ERRORS = 20;

/**
 * Reads "wavelength_nm n k" rows from text. Limits: at most 1 000 000 characters, 2–5000 rows, finite numbers, λ > 0, n > 0,
 * 0 ≤ k ≤ 50, distinct wavelengths (rows are sorted ascending). Errors carry 1-based line numbers;
 * at most 20 are reported.
 * @returns `{ ok: true, rows, unit, notes }` with rows in nm, ascending; or `{ ok: false, errors }`
 */
export function parseNkTable(text: string): NkTableResult {
  if (typeof text !== 'string') return { ok: false, errors: [{ line: 0, message: 'the table must be text' }] };
  if (text.length > MAX_TABLE_CHARS) {
    const rows = MATERIAL_LIMITS.tableRows.max;
    return { ok: false, errors: [{ line: 0, message: `the table is too long: at most ${MAX_TABLE_CHARS} characters and ${rows} rows are allowed` }] };
  }
  const errors: { line: number; message: string }[] = [];
  const parsed: { line: number; row: NkRow }[] = [];
  const { min: minRows, max: maxRows } = MATERIAL_LIMITS.tableRows;
  const kMax = MATERIAL_LIMITS.k.max;
  let sawContent = false;
  let dataLines = 0;

  const lines = text.split(/\r\n|\r|\n/);
  for (let i = 0; i < lines.length && errors.length < MAX_ERRORS; i++) {
    const lineNo = i + 1;
    const raw = lines[i].trim();
    if (raw === '' || raw.startsWith('#') || raw.startsWith('//')) continue;
    const cells = raw.split(/[\s,;]+/).filter((c) => c !== '');
    const values = cells.map(Number);
    const isNumber = (c: string) => /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/.test(c);
    const numeric = cells.every(isNumber);
    if (!sawContent) {
      sawContent = true;
      // Header: a first line whose first cell is a word ("wavelength_nm", "lambda", "λ")
      if (!isNumber(cells[0]) && /[a-zA-Zλµ]/.test(cells[0])) continue;
    }
    dataLines++;
    if (dataLines > maxRows) {
      errors.push({ line: lineNo, message: `too many rows: at most ${maxRows} are allowed` });
      break;
    }
    if (!numeric) {
      errors.push({ line: lineNo, message: `"${raw.slice(0, 40)}" is not a row of numbers (wavelength, n[, k])` });
      continue;
    }
    if (values.length < 2 || values.length > 3) {
      errors.push({ line: lineNo, message: `expected 2 or 3 numbers (wavelength, n[, k]), found ${values.length}` });
      continue;
    }
    const [wavelength, n, k = 0] = values;
    if (!Number.isFinite(wavelength) || !Number.isFinite(n) || !Number.isFinite(k)) {
      errors.push({ line: lineNo, message: 'numbers must be finite' });
      continue;
    }
    if (!(wavelength > 0)) errors.push({ line: lineNo, message: `wavelength must be > 0 (got ${wavelength})` });
    else if (!(n > 0)) errors.push({ line: lineNo, message: `n must be > 0 (got ${n})` });
    else if (!(k >= 0 && k <= kMax)) errors.push({ line: lineNo, message: `k must be in [0, ${kMax}] (got ${k})` });
    else parsed.push({ line: lineNo, row: [wavelength, n, k] });
  }
  if (errors.length > 0) return { ok: false, errors };
  if (parsed.length < minRows) {
    return { ok: false, errors: [{ line: 0, message: `the table needs at least ${minRows} rows (found ${parsed.length})` }] };
  }

  // Unit: all wavelengths below the threshold means micrometres
  const notes: string[] = [];
  const micrometres = parsed.every((p) => p.row[0] < MICROMETRE_THRESHOLD);
  if (micrometres) {
    for (const p of parsed) p.row[0] = p.row[0] * 1000;
    notes.push(`every wavelength is below ${MICROMETRE_THRESHOLD}, so the column was read as micrometres and converted to nm`);
  }

  // Sort ascending; equal wavelengths are an error naming both lines
  parsed.sort((a, b) => a.row[0] - b.row[0]);
  for (let i = 1; i < parsed.length && errors.length < MAX_ERRORS; i++) {
    if (parsed[i].row[0] === parsed[i - 1].row[0]) {
      const [a, b] = [parsed[i - 1].line, parsed[i].line].sort((x, y) => x - y);
      errors.push({ line: b, message: `wavelength ${parsed[i].row[0]} nm appears on lines ${a} and ${b}` });
    }
  }
  if (errors.length > 0) return { ok: false, errors };

  const { min: wMin, max: wMax } = MATERIAL_LIMITS.wavelengthNm;
  const outside = parsed.find((p) => p.row[0] < wMin || p.row[0] > wMax);
  if (outside) {
    return {
      ok: false,
      errors: [{ line: outside.line, message: `wavelength ${outside.row[0]} nm is outside ${wMin}–${wMax} nm` }]
    };
  }
  return { ok: true, rows: parsed.map((p) => p.row), unit: micrometres ? 'um' : 'nm', notes };
}
