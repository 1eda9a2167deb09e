import { describe, expect, it } from 'vitest';
import { designOptic, profileCsv } from '../../../src/lib/optic-design';

describe('profileCsv(design)', () => {
  const design = designOptic({ type: 'lens', exitDiameterMm: 4, heightMm: 6, n: 1.5, toleranceMm: 0.05 });
  const text = profileCsv(design);
  const rows = text.split('\n').filter((l) => l !== '' && !l.startsWith('#'));

  it('writes the header r_mm,z_mm,surface and one row per profile point, in boundary order', () => {
    expect(rows[0]).toBe('r_mm,z_mm,surface');
    const points = design.surfaces.reduce((sum, s) => sum + s.r.length, 0);
    expect(rows.length - 1).toBe(points);
    expect(rows[1]).toBe(`0.000000,${design.surfaces[0].z[0].toFixed(6)},entry`);
    expect(rows[rows.length - 1]).toBe('0.000000,6.000000,exit');
    expect(new Set(rows.slice(1).map((r) => r.split(',')[2]))).toEqual(new Set(['entry', 'edge', 'exit']));
  });

  it('reads back to the profile within the 1 nm of its six decimals', () => {
    const back = rows.slice(1).map((r) => r.split(',').slice(0, 2).map(Number));
    let k = 0;
    for (const s of design.surfaces) {
      for (let i = 0; i < s.r.length; i++, k++) {
        expect(Math.abs(back[k][0] - s.r[i])).toBeLessThanOrEqual(5e-7);
        expect(Math.abs(back[k][1] - s.z[i])).toBeLessThanOrEqual(5e-7);
      }
    }
  });

  it('says what the file is in # comment lines and ends with a newline', () => {
    expect(text.startsWith('# meridian profile of a aspheric lens')).toBe(true);
    expect(text.endsWith('\n')).toBe(true);
    expect(text).not.toMatch(/NaN|Infinity|e[-+]\d/);
  });
});
