import { describe, expect, it } from 'vitest';
import { parseTwoColumnTable, tableAt, validateUserPhosphor, type UserPhosphor } from '../../../src/lib/phosphors/user-phosphor';
import { encodeUserPhosphors, readUserPhosphors, userPhosphorId } from '../../../src/lib/phosphors/user-phosphors-doc';
import { userOptics } from '../../../src/lib/white/particle-optics';

const good: UserPhosphor = {
  id: 'user-amber', name: 'Amber test', absorption: [[400, 0.5], [450, 1], [520, 0]], kPeak: 0.001,
  emission: [[540, 0], [600, 1], [660, 0]], n: 1.8, densityGPerCm3: 4.2, quantumYield: 0.9, d50Um: 12
};

describe('user phosphors', () => {
  it('accepts a valid phosphor', () => {
    const r = validateUserPhosphor(good);
    expect(r.ok).toBe(true);
  });

  it.each([
    ['an unsorted emission row', { emission: [[540, 0], [600, 1], [590, 0.5]] }, 'emission', /Emission row 3: wavelength_nm must be above the previous row's/],
    ['a negative absorption value', { absorption: [[400, 0.5], [450, -1]] }, 'absorption', /Absorption row 2: value must be ≥ 0 \(got -1\)/],
    ['a non-numeric row', { emission: [[540, 0], ['x', 1]] }, 'emission', /Emission row 2: wavelength_nm must be a number/],
    ['a density out of range', { densityGPerCm3: 40 }, 'densityGPerCm3', /Density must be a number from 0.5 to 25 g\/cm³/],
    ['a quantum yield above 1', { quantumYield: 1.2 }, 'quantumYield', /Quantum yield must be a number from 0 to 1/],
    ['an id without the user- prefix', { id: 'amber' }, 'id', /Id must be 'user-'/],
    ['an all-zero emission', { emission: [[540, 0], [600, 0]] }, 'emission', /Emission must have some value above 0/]
  ])('refuses %s, naming the field (and row)', (_, change, field, message) => {
    const r = validateUserPhosphor({ ...good, ...change });
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.field).toBe(field);
    expect(r.message).toMatch(message);
  });

  it('parses a pasted table (header skipped, tabs or commas) and names the line of a bad cell', () => {
    expect(parseTwoColumnTable('Emission', 'wavelength_nm,value\n500\t0\n550;1\n600,0')).toEqual({ ok: true, rows: [[500, 0], [550, 1], [600, 0]] });
    expect(parseTwoColumnTable('Emission', 'wavelength_nm,value\n500,0\n550,abc')).toEqual({ ok: false, message: "Emission line 3: value 'abc' is not a number" });
    expect(parseTwoColumnTable('Emission', '500,0,1')).toMatchObject({ ok: false, message: /line 1 must hold two numbers/ });
  });

  it('absorption index: kPeak at the table peak, linear between rows, zero outside them', () => {
    const o = userOptics(good);
    expect(o.indexAt(450)).toEqual({ n: 1.8, k: 0.001 });
    expect(o.indexAt(425).k).toBeCloseTo(0.00075, 15);
    expect(o.indexAt(600).k).toBe(0);
    expect(tableAt([[1, 2], [3, 4]], 2)).toBe(3);
  });

  it('the stored document round-trips; unreadable data comes back aside with the reason, never dropped', () => {
    expect(readUserPhosphors(encodeUserPhosphors([good]))).toEqual({ phosphors: [good], unreadable: [] });
    const broken = readUserPhosphors('{not json');
    expect(broken.phosphors).toEqual([]);
    expect(broken.unreadable).toEqual([{ raw: '{not json', reason: 'not valid JSON' }]);
    const mixed = readUserPhosphors(JSON.stringify({ format: 'outcouple-user-phosphors', version: 1, phosphors: [good, { ...good, id: 'user-bad', n: 9 }] }));
    expect(mixed.phosphors).toEqual([good]);
    expect(mixed.unreadable[0].reason).toMatch(/Particle index n must be a number from 1 to 4/);
    expect(JSON.parse(mixed.unreadable[0].raw).id).toBe('user-bad');
    const newer = readUserPhosphors(JSON.stringify({ format: 'outcouple-user-phosphors', version: 9, phosphors: [] }));
    expect(newer.unreadable[0].reason).toMatch(/newer version/);
  });

  it('gives a free id from the name', () => {
    expect(userPhosphorId('Amber test!', [])).toBe('user-amber-test');
    expect(userPhosphorId('Amber test', ['user-amber-test'])).toBe('user-amber-test-2');
  });
});
