/**
 * A user's own phosphor, given by tables: the particle's relative absorption (or excitation) spectrum
 * scaled to a peak absorption index kPeak, its emission spectrum, the particle's real index, density,
 * quantum yield and typical particle size. Checked once here (validateUserPhosphor): every message
 * names the field, and for a table the row and column.
 */
import { PHOSPHOR_LIMITS } from './phosphor-schema';

export interface UserPhosphor {
  /** 'user-' and 1–34 lower-case letters, digits or dashes. */
  id: string;
  name: string;
  /** Relative absorption (or excitation) [wavelength nm, value ≥ 0], sorted; zero outside its range. */
  absorption: [number, number][];
  /** Peak absorption index k of the particle (the absorption table's peak maps to it). */
  kPeak: number;
  /** Emission [wavelength nm, power per nm ≥ 0], sorted; any scale. */
  emission: [number, number][];
  /** Real refractive index of the particle (one value over the visible). */
  n: number;
  densityGPerCm3: number;
  quantumYield: number;
  /** Typical particle diameter d50, µm. */
  d50Um: number;
}

/** Ranges of a user phosphor's fields (the band model's where they overlap). */
export const USER_PHOSPHOR_LIMITS = {
  wavelengthNm: { min: 200, max: 2500 },
  rows: { min: 2, max: 2000 },
  n: { min: 1, max: 4 },
  kPeak: PHOSPHOR_LIMITS.kPeak,
  densityGPerCm3: PHOSPHOR_LIMITS.densityGPerCm3,
  quantumYield: PHOSPHOR_LIMITS.quantumYield,
  d50Um: PHOSPHOR_LIMITS.d50Um,
  nameLength: { min: 1, max: 80 }
} as const;

export const USER_PHOSPHOR_ID = /^user-[a-z0-9][a-z0-9-]{0,33}$/;

export type UserPhosphorCheck = { ok: true; phosphor: UserPhosphor } | { ok: false; field: string; message: string };

const fail = (field: string, message: string): UserPhosphorCheck => ({ ok: false, field, message });

/** Problems of a table of [wavelength nm, value] rows, or null: sorted, no repeats, finite, value ≥ 0, some value > 0. */
export function tableProblem(label: string, rows: unknown): string | null {
  const L = USER_PHOSPHOR_LIMITS;
  if (!Array.isArray(rows) || rows.length < L.rows.min || rows.length > L.rows.max) return `${label} must hold ${L.rows.min} to ${L.rows.max} rows`;
  for (let i = 0; i < rows.length; i++) {
    const row: unknown = rows[i];
    const at = `${label} row ${i + 1}`;
    if (!Array.isArray(row) || row.length !== 2) return `${at} must be two numbers (wavelength_nm, value)`;
    const [nm, v] = row as unknown[];
    if (typeof nm !== 'number' || !Number.isFinite(nm)) return `${at}: wavelength_nm must be a number`;
    if (typeof v !== 'number' || !Number.isFinite(v)) return `${at}: value must be a number`;
    if (nm < L.wavelengthNm.min || nm > L.wavelengthNm.max) return `${at}: wavelength_nm must be from ${L.wavelengthNm.min} to ${L.wavelengthNm.max} nm (got ${nm})`;
    if (i > 0 && !(nm > (rows[i - 1] as number[])[0])) return `${at}: wavelength_nm must be above the previous row's (rows sorted, no repeats)`;
    if (v < 0) return `${at}: value must be ≥ 0 (got ${v})`;
  }
  if (!(rows as number[][]).some((r) => r[1] > 0)) return `${label} must have some value above 0`;
  return null;
}

function rangeProblem(label: string, v: unknown, r: { min: number; max: number }, unit = ''): string | null {
  if (typeof v !== 'number' || !Number.isFinite(v) || v < r.min || v > r.max) return `${label} must be a number from ${r.min} to ${r.max}${unit}`;
  return null;
}

/** Checks a user phosphor; the first problem names its field (and row). Never throws. */
export function validateUserPhosphor(value: unknown): UserPhosphorCheck {
  if (value === null || typeof value !== 'object' || Array.isArray(value)) return fail('phosphor', 'A user phosphor must be an object');
  const p = value as Record<string, unknown>;
  const L = USER_PHOSPHOR_LIMITS;
  const known = ['id', 'name', 'absorption', 'kPeak', 'emission', 'n', 'densityGPerCm3', 'quantumYield', 'd50Um'];
  const extra = Object.keys(p).find((k) => !known.includes(k));
  if (extra) return fail(extra, `Unknown field '${extra.slice(0, 40)}' in a user phosphor`);
  if (typeof p.id !== 'string' || !USER_PHOSPHOR_ID.test(p.id)) return fail('id', "Id must be 'user-' and 1–34 lower-case letters, digits or dashes");
  if (typeof p.name !== 'string' || p.name.trim().length < L.nameLength.min || p.name.trim().length > L.nameLength.max) {
    return fail('name', `Name must be ${L.nameLength.min} to ${L.nameLength.max} characters`);
  }
  const checks: [string, string | null][] = [
    ['absorption', tableProblem('Absorption', p.absorption)],
    ['kPeak', rangeProblem('Peak absorption index k', p.kPeak, L.kPeak)],
    ['emission', tableProblem('Emission', p.emission)],
    ['n', rangeProblem('Particle index n', p.n, L.n)],
    ['densityGPerCm3', rangeProblem('Density', p.densityGPerCm3, L.densityGPerCm3, ' g/cm³')],
    ['quantumYield', rangeProblem('Quantum yield', p.quantumYield, L.quantumYield)],
    ['d50Um', rangeProblem('Particle diameter d50', p.d50Um, L.d50Um, ' µm')]
  ];
  for (const [field, problem] of checks) if (problem) return fail(field, problem);
  const rows = (t: unknown) => (t as number[][]).map(([a, b]) => [a, b] as [number, number]);
  return {
    ok: true,
    phosphor: {
      id: p.id, name: (p.name as string).trim(), absorption: rows(p.absorption), kPeak: p.kPeak as number, emission: rows(p.emission),
      n: p.n as number, densityGPerCm3: p.densityGPerCm3 as number, quantumYield: p.quantumYield as number, d50Um: p.d50Um as number
    }
  };
}

/**
 * Rows of a two-column table pasted as text (comma, semicolon or tab; a header line and '#' comments
 * skipped). A line that is not two numbers is refused naming the line; order and signs are checked by
 * tableProblem.
 */
export function parseTwoColumnTable(label: string, text: string): { ok: true; rows: [number, number][] } | { ok: false; message: string } {
  const rows: [number, number][] = [];
  const lines = text.split(/\r?\n/);
  for (let i = 0; i < lines.length; i++) {
    const t = lines[i].trim();
    if (t === '' || t.startsWith('#')) continue;
    const cells = t.split(/[,;\t]/).map((c) => c.trim());
    const nums = cells.map((c) => (c === '' ? NaN : Number(c)));
    if (rows.length === 0 && nums.some((v) => Number.isNaN(v)) && /[a-z]/i.test(t)) continue; // header
    if (cells.length !== 2) return { ok: false, message: `${label} line ${i + 1} must hold two numbers (wavelength_nm, value)` };
    if (!Number.isFinite(nums[0])) return { ok: false, message: `${label} line ${i + 1}: wavelength_nm '${cells[0].slice(0, 20)}' is not a number` };
    if (!Number.isFinite(nums[1])) return { ok: false, message: `${label} line ${i + 1}: value '${cells[1].slice(0, 20)}' is not a number` };
    rows.push([nums[0], nums[1]]);
  }
  const problem = tableProblem(label, rows);
  return problem ? { ok: false, message: problem } : { ok: true, rows };
}

/** Linear interpolation in a sorted [x, y] table; zero outside its range. */
export function tableAt(rows: readonly (readonly [number, number])[], x: number): number {
  const last = rows.length - 1;
  if (x < rows[0][0] || x > rows[last][0]) return 0;
  let i = 1;
  while (i < last && rows[i][0] < x) i++;
  const [x0, y0] = rows[i - 1];
  const [x1, y1] = rows[i];
  return x1 === x0 ? y1 : y0 + ((x - x0) / (x1 - x0)) * (y1 - y0);
}
