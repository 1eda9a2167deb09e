/**
 * The IES LM-63 reader on garbage: any text gives either a parsed file with a finite flux or a
 * RangeError with a short message naming what is wrong — never another exception, never NaN, never a
 * hang (every case here is bounded by its input size; the run as a whole must finish, and vitest's
 * test timeout fails it if it does not).
 *
 * Inputs: random text, random keyword/number soup, files written by our own writer and then cut
 * short, with one token replaced by a hostile number or word, with huge angle counts, and with
 * TILT=INCLUDE blocks. Structure: ANSI/IES LM-63-2019 as described in src/lib/export/ies.ts.
 */
import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { parseIes, writeIes } from '../../src/lib/export/ies';
import { check, hostileNumber, real, RUNS } from './support';

/** Runs the parser and checks its contract; returns the result or null when it refused. */
function parseChecked(text: string): ReturnType<typeof parseIes> | null {
  let r: ReturnType<typeof parseIes>;
  try {
    r = parseIes(text);
  } catch (error) {
    expect(error, String(error)).toBeInstanceOf(RangeError);
    const message = (error as Error).message;
    expect(message.length > 0 && message.length <= 300, `message length ${message.length}`).toBe(true);
    expect(message).toMatch(/IES|intensity|thetaDeg/);
    return null;
  }
  expect(Number.isFinite(r.fluxLm) && r.fluxLm >= 0, `fluxLm ${r.fluxLm}`).toBe(true);
  expect(r.candela.length).toBe(r.horizontalAnglesDeg.length);
  for (const plane of r.candela) expect(plane.length).toBe(r.verticalAnglesDeg.length);
  return r;
}

/** A valid file from our own writer, for a random smooth far field. */
const validFile = fc
  .record({
    peak: real(0.1, 10),
    power: real(0, 8),
    lumens: real(1e-3, 1e5),
    step: fc.constantFrom(1, 2, 5, 10),
    name: fc.string({ maxLength: 40 })
  })
  .map(({ peak, power, lumens, step, name }) => {
    const thetaDeg = Array.from({ length: 181 }, (_, i) => i);
    const relativeIntensity = thetaDeg.map((t) => (t < 90 ? peak * Math.cos((t * Math.PI) / 180) ** power : 0));
    return writeIes({
      farField: { thetaDeg, relativeIntensity },
      lumens,
      rays: 100_000,
      seed: 1,
      issueDate: '2026-01-01',
      name,
      opening: { shape: 'cylinder', widthMm: 5, lengthMm: 5, heightMm: 2.5 },
      stepDeg: step
    });
  });

const hostileToken = fc.oneof(
  hostileNumber.map(String),
  fc.constantFrom('NaN', 'Infinity', '-1', '0', '1e308', '100001', '99999', 'TILT=NONE', '[MORE]', '', '\r\n', 'x', '1e-320', '-0'),
  fc.string({ maxLength: 8 })
);

describe('parseIes(text)', () => {
  it('reads back what writeIes writes (sanity for the mutations below)', () => {
    fc.assert(
      fc.property(validFile, (text) => {
        const r = parseChecked(text);
        expect(r).not.toBeNull();
      }),
      { seed: 1, numRuns: 50 }
    );
  });

  it(`gives a result or a RangeError for any text (${RUNS.fuzz} cases)`, () => {
    check(
      'parseIes on random text',
      fc.property(
        fc.oneof(
          fc.string({ maxLength: 300 }),
          fc.array(fc.oneof(hostileToken, fc.constantFrom('TILT=NONE', 'TILT=INCLUDE', 'IES:LM-63-2019', '[TEST] x', '1', '2')), { maxLength: 60 }).map((t) =>
            t.join(' ')
          ),
          fc.array(fc.oneof(hostileToken, fc.constantFrom('TILT=NONE', 'TILT=INCLUDE', '1', '2', '0', '90', '180')), { maxLength: 60 }).map((t) => t.join('\n'))
        ),
        (text) => {
          parseChecked(text);
        }
      ),
      RUNS.fuzz
    );
  });

  it(`gives a result or a RangeError for a valid file cut short anywhere (${RUNS.fuzz} cases)`, () => {
    check(
      'parseIes on truncated files',
      fc.property(validFile, real(0, 1), (text, at) => {
        parseChecked(text.slice(0, Math.floor(at * text.length)));
      }),
      RUNS.fuzz
    );
  });

  it(`gives a result or a RangeError for a valid file with one token replaced (${RUNS.fuzz} cases)`, () => {
    check(
      'parseIes on files with a hostile token',
      fc.property(validFile, real(0, 1), hostileToken, (text, at, token) => {
        const tokens = text.split(/( +|\r\n)/);
        const i = Math.floor(at * tokens.length);
        tokens[i] = token;
        parseChecked(tokens.join(''));
      }),
      RUNS.fuzz
    );
  });

  it('refuses huge angle counts, a separate tilt file and empty input with a message; a multi-megabyte file does not hang', () => {
    const head = 'IES:LM-63-2019\r\n[TEST] x\r\nTILT=NONE\r\n';
    for (const [line4, expected] of [
      ['1 -1 1 100001 1 1 2 0 0 0', /number of vertical angles must be an integer in \[1, 100000\]/],
      ['1 -1 1 100000 100000 1 2 0 0 0\r\n1 1 0', /IES file ends before vertical angle 1\b/],
      ['1 -1 1 2.5 1 1 2 0 0 0', /number of vertical angles/]
    ] as const) {
      expect(() => parseIes(head + line4)).toThrow(expected);
    }
    expect(() => parseIes('TILT=lamp.tlt\r\n1')).toThrow(/TILT must be NONE or INCLUDE/);
    expect(() => parseIes('')).toThrow(RangeError);
    expect(() => parseIes(12 as unknown as string)).toThrow(RangeError);

    // 1e5 × 1e5 angles declared, then a million numbers: refused when the numbers run out
    const big = `${head}1 -1 1 100000 100000 1 2 0 0 0\r\n1 1 0\r\n${'1 '.repeat(1_000_000)}`;
    expect(() => parseIes(big)).toThrow(/IES file ends before candela value/);
  });

  it('regression: a huge candela multiplier gives a RangeError, not an infinite flux', () => {
    // found while writing the fuzz cases: finite candela values times a finite multiplier overflowed to
    // fluxLm = Infinity, returned as a result
    const text = 'IES:LM-63-2019\r\nTILT=NONE\r\n1 -1 1e308 2 1 1 2 0 0 0\r\n1 1 0\r\n0 90\r\n0\r\n1e308 1e308\r\n';
    expect(() => parseIes(text)).toThrow('IES candela values times the candela multiplier give a flux too large to represent');
  });
});
