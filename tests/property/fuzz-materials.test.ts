/**
 * Hostile input where the user gives optical constants: a pasted n,k table (parseNkTable), a material
 * object (validateUserMaterial), a user-materials file (readUserMaterialsFile) and a typed index or
 * material name (resolveIndex). None may throw (resolveIndex throws RangeError only, by contract); a
 * refusal names the line or field and the allowed range; an accepted material gives a physical index
 * everywhere in its range; size limits hold and are stated in the message.
 */
import { describe, it, expect, afterAll } from 'vitest';
import fc from 'fast-check';
import { parseNkTable, MAX_TABLE_CHARS } from '../../src/lib/materials/nk-table';
import { validateUserMaterial } from '../../src/lib/materials/user-material';
import { resolveIndex } from '../../src/lib/materials/resolve-index';
import { indexAt } from '../../src/lib/materials/dispersion';
import { MATERIAL_LIMITS } from '../../src/lib/materials/limits';
import { readUserMaterialsFile, MAX_FILE_BYTES, MAX_USER_MATERIALS } from '../../src/lib/materials-user/user-materials-file';
import { check, deeplyNested, hostileNumber, hostileValue, prototypePolluted, real, RUNS } from './support';

const W = MATERIAL_LIMITS.wavelengthNm;
const ROWS = MATERIAL_LIMITS.tableRows;

afterAll(() => {
  expect(prototypePolluted(), 'Object.prototype polluted by a fuzz input').toBe(false);
});

/**
 * A message fit to show: text, short, and free of NaN, "undefined" and "[object Object]" unless it
 * quotes the user's own input (`echoes`: the input held such a value, e.g. a cell reading "NaN").
 */
function cleanMessage(message: unknown, echoes = false): void {
  expect(typeof message).toBe('string');
  const text = message as string;
  expect(text.length > 0 && text.length <= 400, `message length ${text.length}`).toBe(true);
  if (!echoes) expect(text).not.toMatch(/\bNaN\b|undefined|\[object Object\]/);
}

/** True when the input's text or JSON holds a word a message may quote back. */
function holdsOddWord(input: unknown): boolean {
  const text = typeof input === 'string' ? input : (JSON.stringify(input) ?? 'undefined');
  return /NaN|undefined|object Object/.test(text) || (typeof input === 'number' && !Number.isFinite(input));
}

// ---------------------------------------------------------------- pasted n,k tables

const cell = fc.oneof(
  real(-10, 3000).map(String),
  fc.constantFrom('NaN', 'Infinity', '-Infinity', '1e999', '-0', '0x10', '1,5', '', ' ', '1e-400', '.', '-', '+', 'λ', 'µm', '１'),
  fc.string({ maxLength: 6 })
);
const separator = fc.constantFrom(' ', ',', ';', '\t', ', ', '  ', '|');
const line = fc.oneof(
  fc.array(cell, { minLength: 0, maxLength: 5 }).chain((cells) => separator.map((sep) => cells.join(sep))),
  fc.constantFrom('# comment', '// note', 'wavelength_nm n k', 'lambda,n,k', ''),
  fc.string({ maxLength: 30 })
);
const newline = fc.constantFrom('\n', '\r\n', '\r');
const table = fc.array(line, { maxLength: 40 }).chain((lines) => newline.map((nl) => lines.join(nl)));

describe('parseNkTable(text)', () => {
  it(`never throws; refusals carry a line number in the text and a message; accepted rows are physical (${RUNS.fuzz} cases)`, () => {
    check(
      'parseNkTable on generated tables',
      fc.property(table, (text) => {
        const r = parseNkTable(text);
        const lineCount = text.split(/\r\n|\r|\n/).length;
        if (!r.ok) {
          expect(r.errors.length >= 1 && r.errors.length <= 20, `${r.errors.length} errors`).toBe(true);
          for (const e of r.errors) {
            expect(Number.isInteger(e.line) && e.line >= 0 && e.line <= lineCount, `line ${e.line} of ${lineCount}`).toBe(true);
            cleanMessage(e.message, holdsOddWord(text));
          }
          return;
        }
        expect(r.rows.length >= ROWS.min && r.rows.length <= ROWS.max).toBe(true);
        for (let i = 0; i < r.rows.length; i++) {
          const [wl, n, k] = r.rows[i];
          expect(wl >= W.min && wl <= W.max && n > 0 && Number.isFinite(n) && k >= 0 && k <= MATERIAL_LIMITS.k.max, `row ${r.rows[i]}`).toBe(true);
          if (i > 0) expect(wl).toBeGreaterThan(r.rows[i - 1][0]);
        }
      }),
      RUNS.fuzz
    );
  });

  it(`reads back any valid table it is given, in any order, unit and separator (${RUNS.fuzz} cases)`, () => {
    check(
      'parseNkTable on valid tables',
      fc.property(
        fc.uniqueArray(fc.integer({ min: 200_000, max: 2_000_000 }), { minLength: 2, maxLength: 60 }),
        real(0.1, 9),
        real(0, 40),
        separator.filter((s) => s !== '|'),
        newline,
        fc.boolean(),
        (milliNm, n, k, sep, nl, micrometres) => {
          const rows = milliNm.map((m) => [m / 1000, n, k] as const);
          const text = rows.map(([wl]) => [micrometres ? wl / 1000 : wl, n, k].join(sep)).join(nl);
          const r = parseNkTable(`wavelength${sep}n${sep}k${nl}${text}`);
          expect(r.ok, r.ok ? '' : r.errors[0].message).toBe(true);
          if (!r.ok) return;
          expect(r.unit).toBe(micrometres ? 'um' : 'nm');
          const sorted = rows.map((row) => row[0]).sort((a, b) => a - b);
          // µm × 1000 may differ from the nm value by an ulp: 1e-9 nm is far below any table's precision
          r.rows.forEach(([wl], i) => expect(Math.abs(wl - sorted[i])).toBeLessThanOrEqual(1e-9));
        }
      ),
      RUNS.fuzz
    );
  });

  it('enforces the row and size limits and states them', () => {
    const row = (i: number) => `${400 + i * 0.1} 1.5 0`;
    const atLimit = parseNkTable(Array.from({ length: ROWS.max }, (_, i) => row(i)).join('\n'));
    expect(atLimit.ok).toBe(true);
    const over = parseNkTable(Array.from({ length: ROWS.max + 1 }, (_, i) => row(i)).join('\n'));
    expect(over.ok).toBe(false);
    if (!over.ok) expect(over.errors[0].message).toContain(String(ROWS.max));

    // regression: a 10 MB paste (comment lines, or one line of 5 million numbers) took two seconds
    // before any limit applied; now the length is refused at once
    for (const huge of ['#\n'.repeat(MAX_TABLE_CHARS), '1 '.repeat(5_000_000), 'x'.repeat(MAX_TABLE_CHARS + 1)]) {
      const r = parseNkTable(huge);
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.errors[0].message).toBe(`the table is too long: at most ${MAX_TABLE_CHARS} characters and ${ROWS.max} rows are allowed`);
    }
    const notText = parseNkTable(12 as unknown as string);
    expect(notText.ok).toBe(false);
  });
});

// ---------------------------------------------------------------- user materials

const category = fc.constantFrom('semiconductor', 'substrate', 'encapsulant', 'optic', 'layer', 'metal', 'ambient');
const term = fc.record({ B: real(-3, 6), C: real(0, 30) });
const range = fc.tuple(real(W.min, W.max), real(W.min, W.max)).map(([a, b]) => ({ min: Math.min(a, b), max: Math.max(a, b) }));
const tableRows = fc
  .uniqueArray(fc.integer({ min: 100, max: 20000 }), { minLength: 2, maxLength: 30 })
  .chain((wls) =>
    fc.tuple(...wls.sort((a, b) => a - b).map((wl) => fc.tuple(fc.constant(wl), real(0.01, 6), real(0, 50))))
  );
const dispersion = fc.oneof(
  fc.record({ model: fc.constantFrom('sellmeier', 'sellmeier-glass'), terms: fc.array(term, { minLength: 1, maxLength: 8 }), a0: fc.option(real(-2, 5), { nil: undefined }) }),
  fc.record({ model: fc.constant('cauchy'), A: real(-1, 4), B: real(-0.1, 0.1), C: real(-0.01, 0.01) }),
  fc.record({ model: fc.constant('formula'), form: fc.constant('pole-sum'), a0: real(-2, 8), terms: fc.array(term, { minLength: 1, maxLength: 8 }) }),
  fc.record({ model: fc.constant('table'), rows: tableRows })
);
/** Plausible materials: many valid, many with a pole or a negative n² somewhere in their range. */
const plausibleMaterial = fc.record(
  {
    id: fc.stringMatching(/^[a-z0-9][a-z0-9-]{0,39}$/),
    name: fc.string({ minLength: 1, maxLength: 40 }),
    category,
    dispersion,
    validRangeNm: range
  },
  { requiredKeys: ['id', 'name', 'category', 'dispersion'] }
);
/** A plausible material with one field replaced by a hostile value, or with an extra field. */
const damagedMaterial = fc
  .tuple(plausibleMaterial, fc.constantFrom('id', 'name', 'category', 'dispersion', 'validRangeNm', 'aliases', 'source', 'provenance', 'notes', 'maxServiceTempC', '__proto__', 'extra'), hostileValue)
  .map(([m, key, value]) => {
    const copy = JSON.parse(JSON.stringify(m));
    Object.defineProperty(copy, key, { value, enumerable: true, writable: true, configurable: true });
    return copy as unknown;
  });

function expectPhysicalEverywhere(material: Parameters<typeof indexAt>[0], u: number): void {
  const { min, max } = material.validRangeNm;
  const wl = min + u * (max - min);
  const v = indexAt(material, wl);
  expect(v.n > 0 && Number.isFinite(v.n) && v.k >= 0 && Number.isFinite(v.k), `${material.id} at ${wl} nm: ${v.n}, ${v.k}`).toBe(true);
}

describe('validateUserMaterial(json)', () => {
  it(`never throws; refusals name a field; an accepted material is physical across its range (${RUNS.fuzz} cases)`, () => {
    let accepted = 0;
    check(
      'validateUserMaterial on plausible and damaged materials',
      fc.property(fc.oneof(plausibleMaterial, damagedMaterial, hostileValue), real(0, 1), (json, u) => {
        const r = validateUserMaterial(json);
        if (!r.ok) {
          expect(r.errors.length).toBeGreaterThan(0);
          for (const e of r.errors) {
            cleanMessage(e.message, holdsOddWord(json));
            expect(typeof e.path).toBe('string');
          }
          return;
        }
        expect(r.material.provenance).toBe('user supplied');
        expectPhysicalEverywhere(r.material, u);
        accepted++;
      }),
      RUNS.fuzz
    );
    // the generator must reach the accepting side often enough for the physical check to mean something
    console.log(`validateUserMaterial accepted ${accepted} of ${RUNS.fuzz} generated materials`);
    expect(accepted).toBeGreaterThan(RUNS.fuzz / 20);
  });
});

describe('validateUserMaterial regressions', () => {
  const formula = { id: 'my-oxide', name: 'My oxide', category: 'layer', dispersion: { model: 'cauchy', A: 1.6, B: 0, C: 0 } };

  it('regression: an empty table with a stated range is refused, not a TypeError', () => {
    // found by fuzzing: the cross-field check read rows[0][0] of an empty table and threw
    const r = validateUserMaterial({ ...formula, dispersion: { model: 'table', rows: [] }, validRangeNm: { min: 400, max: 800 } });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors[0].message).toBe(`dispersion.rows must hold ${ROWS.min} to ${ROWS.max} rows`);
  });

  it('regression: a missing or malformed range, term, alias list or note names what it must be', () => {
    // found by fuzzing: zod's defaults read "validRangeNm Invalid input: expected object, received undefined"
    const cases: [Record<string, unknown>, string][] = [
      [formula, `validRangeNm must be { min, max }, wavelengths in nm within [${W.min}, ${W.max}]`],
      [{ ...formula, validRangeNm: { min: 400, max: 800 }, aliases: 'x' }, 'aliases must be a list of names'],
      [{ ...formula, validRangeNm: { min: 400, max: 800 }, notes: [3] }, 'notes.0 must be a note { text, tag }'],
      [{ ...formula, validRangeNm: { min: 400, max: 800 }, dispersion: { model: 'sellmeier', terms: [null] } }, 'dispersion.terms.0 must be a {B, C} term of two numbers']
    ];
    for (const [input, message] of cases) {
      const r = validateUserMaterial(input);
      expect(r.ok || r.errors[0].message).toBe(message);
    }
  });

  it('regression: a range far outside the limits gives the range message, not "no physical index at NaN nm"', () => {
    const r = validateUserMaterial({ ...formula, validRangeNm: { min: -1e308, max: 1e308 } });
    expect(r.ok).toBe(false);
    if (!r.ok) for (const e of r.errors) expect(e.message).not.toMatch(/NaN/);
  });
});

// ---------------------------------------------------------------- user-material files

describe('readUserMaterialsFile(text)', () => {
  it(`never throws on any text or any JSON, and says what is wrong (${RUNS.fuzz} cases)`, () => {
    check(
      'readUserMaterialsFile on any text',
      fc.property(
        fc.oneof(
          fc.string({ maxLength: 80 }),
          hostileValue.map((v) => JSON.stringify(v) ?? ''),
          fc.array(fc.oneof(plausibleMaterial, damagedMaterial), { maxLength: 4 }).map((list) => JSON.stringify({ format: 'outcouple-user-materials', version: 1, materials: list })),
          fc.tuple(fc.oneof(fc.string({ maxLength: 20 }), fc.constant(undefined)), hostileNumber, fc.array(plausibleMaterial, { maxLength: 2 })).map(([format, version, materials]) =>
            JSON.stringify({ format, version, materials })
          )
        ),
        (text) => {
          const r = readUserMaterialsFile(text);
          if (!r.ok) cleanMessage(r.message, holdsOddWord(text));
          else for (const m of r.materials) expect(m.provenance).toBe('user supplied');
        }
      ),
      RUNS.fuzz
    );
  });

  it('enforces the file size and material count limits and states them, and survives deep nesting', () => {
    const big = readUserMaterialsFile(' '.repeat(MAX_FILE_BYTES + 1));
    expect(big.ok || big.message).toBe('The file is larger than 2 MB; user-material files must be at most 2 MB.');
    const one = { id: 'my-oxide', name: 'My oxide', category: 'layer', dispersion: { model: 'cauchy', A: 1.6, B: 0, C: 0 }, validRangeNm: { min: 400, max: 800 } };
    const many = readUserMaterialsFile(JSON.stringify(Array.from({ length: MAX_USER_MATERIALS + 1 }, (_, i) => ({ ...one, id: `m-${i}` }))));
    expect(many.ok || many.message).toBe(`The file holds ${MAX_USER_MATERIALS + 1} materials; at most ${MAX_USER_MATERIALS} are allowed.`);
    for (const kind of ['array', 'object'] as const) {
      const r = readUserMaterialsFile(deeplyNested(200_000, kind));
      expect(r.ok).toBe(false);
    }
    const polluting = readUserMaterialsFile('{"materials":[{"__proto__":{"polluted":true},"id":"x"}]}');
    expect(polluting.ok).toBe(false);
    expect(prototypePolluted()).toBe(false);
  });
});

// ---------------------------------------------------------------- typed indices and names

describe('resolveIndex(spec, wavelengthNm)', () => {
  it('regression: quotes at most 40 characters of the text it could not read', () => {
    // found by fuzzing: a 100 000-character entry came back whole inside the error message
    expect(() => resolveIndex('x'.repeat(100_000), 450)).toThrow(`index "${'x'.repeat(40)}…" is not a number`);
    expect(() => resolveIndex(`${'1'.repeat(50)}+2i`, 450)).toThrow(/^index "1{40}…": n must be/);
  });

  it(`returns a physical index or throws a RangeError with a short message, for any text (${RUNS.fuzz} cases)`, () => {
    check(
      'resolveIndex on any text',
      fc.property(
        fc.oneof(
          fc.string({ maxLength: 30 }),
          fc.tuple(real(-20, 20), fc.constantFrom('+', '-', ' + ', ''), real(-60, 60), fc.constantFrom('i', 'j', '*i', 'I', '')).map(([n, s, k, i]) => `${n}${s}${k}${i}`),
          fc.constantFrom('NaN', 'Infinity', '1e999', '0', '-0', '1e-400', '2.4+i', '2.4-0i', 'GaN', ' sio₂ ', 'x'.repeat(100_000), '1'.repeat(100_000))
        ),
        fc.oneof(real(W.min, W.max), hostileNumber),
        (spec, wl) => {
          let v;
          try {
            v = resolveIndex(spec, wl);
          } catch (error) {
            expect(error).toBeInstanceOf(RangeError);
            cleanMessage((error as Error).message, holdsOddWord(spec) || holdsOddWord(wl));
            return;
          }
          expect(v.n > 0 && Number.isFinite(v.n) && v.k >= 0 && Number.isFinite(v.k), `${spec}: ${v.n}, ${v.k}`).toBe(true);
        }
      ),
      RUNS.fuzz
    );
  });
});
