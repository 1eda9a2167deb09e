import { describe, it, expect } from 'vitest';
import { iesNumber, parseIes, writeIes, type IesWriteInput } from '../../../src/lib/export/ies';
import { assertInDelta } from '../../support/assert';

function input(over: Partial<IesWriteInput> = {}): IesWriteInput {
  const thetaDeg = Array.from({ length: 90 }, (_, i) => i + 0.5);
  return {
    farField: { thetaDeg, relativeIntensity: thetaDeg.map((t) => Math.cos((t * Math.PI) / 180)) },
    lumens: 120,
    rays: 200000,
    seed: 1,
    issueDate: '2026-12-02',
    name: 'Demo package',
    opening: { shape: 'cylinder', widthMm: 5, lengthMm: 5, heightMm: 2.5 },
    ...over
  };
}

describe('iesNumber(x)', () => {
  it('writes plain decimals with at most 6 significant digits and never an exponent', () => {
    expect(iesNumber(0)).toBe('0');
    expect(iesNumber(-0)).toBe('0');
    expect(iesNumber(38.197186342)).toBe('38.1972');
    expect(iesNumber(-0.005)).toBe('-0.005');
    expect(iesNumber(1.5e-7)).toBe('0.00000015');
    expect(iesNumber(2.5e21)).toBe('2500000000000000000000');
  });
});

describe('writeIes(input)', () => {
  it('cleans the scenario name into one printable ASCII keyword line of at most 132 characters', () => {
    const text = writeIes(input({ name: 'Blue 1 × 1 mm chip\nsecond line — µ test ' + 'x'.repeat(300) }));
    const line = text.split('\r\n').find((l) => l.startsWith('[LUMINAIRE]'))!;
    expect(line.startsWith('[LUMINAIRE] Blue 1 x 1 mm chip second line - u test')).toBe(true);
    expect(line.length).toBeLessThanOrEqual(132);
    expect(line).toMatch(/^[\x20-\x7e]+$/);
  });

  it('keeps every line within 132 characters and ends each with CR LF', () => {
    const text = writeIes(input({ stepDeg: 0.5 }));
    expect(text.endsWith('\r\n')).toBe(true);
    expect(text.replace(/\r\n/g, '')).not.toMatch(/[\r\n]/);
    for (const line of text.split('\r\n')) expect(line.length).toBeLessThanOrEqual(132);
  });

  it('rejects bad rays, seed, date, input watts, lumens and opening with the field named', () => {
    expect(() => writeIes(input({ rays: 0 }))).toThrow(/rays must be an integer in \[1, 1e9\]/);
    expect(() => writeIes(input({ seed: -1 }))).toThrow(/seed must be an integer/);
    expect(() => writeIes(input({ issueDate: '2/12/2026' }))).toThrow(/issueDate must be a date written YYYY-MM-DD/);
    expect(() => writeIes(input({ inputWatts: -2 }))).toThrow(/inputWatts must be a number in \[0, 1e6\] W/);
    expect(() => writeIes(input({ lumens: 0 }))).toThrow(/lumens must be a number/);
    expect(() => writeIes(input({ opening: { shape: 'box', widthMm: -1, lengthMm: 1, heightMm: 1 } }))).toThrow(/opening.widthMm/);
  });

  it('writes the input watts given', () => {
    const p = parseIes(writeIes(input({ inputWatts: 1.05 })));
    expect(p.inputWatts).toBe(1.05);
  });
});

describe('parseIes(text)', () => {
  it('reads an LM-63-2002 style file with commas, [MORE] lines and TILT=INCLUDE', () => {
    const text = [
      'IESNA:LM-63-2002',
      '[TEST] T-1',
      '[OTHER] first',
      '[MORE] second',
      'TILT=INCLUDE',
      '1',
      '3',
      '0 45 90',
      '1 0.9 0.8',
      '1, 1000, 1, 3, 1, 1, 2, 0, 0, 0',
      '1 1 10',
      '0 45 90',
      '0',
      '10 10 10'
    ].join('\n');
    const p = parseIes(text);
    expect(p.version).toBe('IESNA:LM-63-2002');
    expect(p.keywords.OTHER).toBe('first\nsecond');
    expect(p.tilt).toBe('INCLUDE');
    expect(p.lumensPerLamp).toBe(1000);
    expect(p.inputWatts).toBe(10);
    expect(p.verticalAnglesDeg).toEqual([0, 45, 90]);
    // uniform 10 cd over the lower hemisphere: 2π·10 lm, exact for a constant (1e-12)
    assertInDelta(p.fluxLm, 20 * Math.PI, 1e-12);
  });

  it('averages the planes of a file with several horizontal angles (bilateral 0–180°)', () => {
    // plane 0°: 10 cd, plane 90°: 20 cd, plane 180°: 10 cd → trapezoid mean 15 cd over a full sphere
    const text = ['IES:LM-63-2019', 'TILT=NONE', '1 -1 2 2 3 1 2 0 0 0', '1 1.00010 0', '0 180', '0 90 180', '10 10', '20 20', '10 10'].join('\r\n');
    const p = parseIes(text);
    expect(p.candelaMultiplier).toBe(2);
    assertInDelta(p.fluxLm, 2 * 4 * Math.PI * 15, 1e-9);
  });

  it('names what is missing or wrong', () => {
    expect(() => parseIes('')).toThrow(/non-empty/);
    expect(() => parseIes('IES:LM-63-2019\n[TEST] x\n')).toThrow(/no TILT= line/);
    expect(() => parseIes('IES:LM-63-2019\nTILT=lamp.tlt\n')).toThrow(/TILT must be NONE or INCLUDE/);
    expect(() => parseIes('IES:LM-63-2019\nTILT=NONE\n1 -1 1 3 1 1 2 0 0 0\n1 1 0\n0 45')).toThrow(/ends before vertical angle 3/);
    expect(() => parseIes('IES:LM-63-2019\nTILT=NONE\n1 -1 1 0 1 1 2 0 0 0\n')).toThrow(/number of vertical angles must be an integer in \[1, 100000\]/);
    expect(() => parseIes('IES:LM-63-2019\nTILT=NONE\n1 -1 1 2 1 2 2 0 0 0\n1 1 0\n0 90\n0\n1 1')).toThrow(/photometric type must be 1/);
    expect(() => parseIes('IES:LM-63-2019\nTILT=NONE\n1 -1 x')).toThrow(/candela multiplier must be a number/);
  });
});

describe('writeIes keyword lines are printable ASCII (LM-63 files are ASCII text)', () => {
  const text = writeIes({
    farField: { thetaDeg: [0, 90, 180], relativeIntensity: [1, 0.5, 0] },
    lumens: 10,
    rays: 1000,
    seed: 1,
    issueDate: '2026-12-03',
    name: 'Phenyl silicone (n ≈ 1.53) — Ø 5 mm, 2 × 2 µm², θ ≤ 80°, ± 2 %, “quoted”, é, 日本',
    opening: { shape: 'point', widthMm: 0, lengthMm: 0, heightMm: 0 },
    smoothing: 'Zone mean over ≥ 0.05 sr; ' + 'word '.repeat(60)
  });
  const lines = text.split('\r\n');
  const header = lines.slice(0, lines.indexOf('TILT=NONE'));

  it('spells ≈, —, ×, µ, ², θ, ≤, °, ±, quotes and accents in ASCII, and marks what has no spelling with ?', () => {
    for (const l of header) expect(l).toMatch(/^[\x20-\x7e]*$/);
    expect(header.find((l) => l.startsWith('[LUMINAIRE]'))).toBe(
      '[LUMINAIRE] Phenyl silicone (n ~ 1.53) - dia. 5 mm, 2 x 2 um2, theta <= 80 deg, +/- 2 %, "quoted", e, ??'
    );
  });

  it('continues a long keyword on [MORE] lines within 132 characters', () => {
    const at = header.findIndex((l) => l.startsWith('[_SMOOTHING]'));
    expect(at).toBeGreaterThan(0);
    expect(header[at + 1].startsWith('[MORE] ')).toBe(true);
    for (const l of header) expect(l.length).toBeLessThanOrEqual(132);
    expect(parseIes(text).keywords._SMOOTHING.startsWith('Zone mean over >= 0.05 sr;')).toBe(true);
  });
});
