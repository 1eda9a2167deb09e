import { describe, it, expect } from 'vitest';
import { rankEncapsulants, encapsulantCandidates } from '../../../src/lib/decisions/rank-encapsulants';
import { listMaterials } from '../../../src/lib/materials/index';
import type { Material } from '../../../src/lib/materials/types';
import { gaussianSpectrum, monochromatic } from '../../../src/lib/photometry/index';
import { domeEstimate } from '../../../src/lib/optics/index';
import { assertInDelta, EPS } from '../../support/assert';
import { rankInput as input } from '../../support/fixtures';

const userGlass: Material = {
  id: 'user-high-index',
  name: 'My high-index resin',
  aliases: [],
  category: 'encapsulant',
  dispersion: { model: 'cauchy', A: 1.7, B: 0, C: 0 },
  validRangeNm: { min: 400, max: 700 },
  source: 'typed in',
  provenance: 'user supplied'
};


describe('encapsulantCandidates(library, user)', () => {
  it('takes the library encapsulants (optics only on request) and any non-metal user material', () => {
    const c = encapsulantCandidates(listMaterials(), [userGlass, { ...userGlass, id: 'user-metal', category: 'metal' }]);
    const ids = c.map((x) => x.material.id);
    expect(ids).toContain('silicone-methyl');
    expect(ids).toContain('epoxy');
    expect(ids).not.toContain('pmma');
    expect(ids).not.toContain('polycarbonate');
    const withOptics = encapsulantCandidates(listMaterials(), [], { optics: true }).map((x) => x.material.id);
    expect(withOptics).toContain('pmma');
    expect(withOptics).toContain('polycarbonate');
    expect(withOptics).toContain('silicone-phenyl');
    expect(ids).not.toContain('gan');
    expect(ids).not.toContain('ag');
    expect(ids).toContain('user-high-index');
    expect(ids).not.toContain('user-metal');
    expect(c.find((x) => x.material.id === 'user-high-index')!.source).toBe('user');
  });
});

describe('rankEncapsulants(input)', () => {
  it('gives each row the closed-form numbers of domeEstimate at the design wavelength (exact reuse, 4 ε)', () => {
    const r = rankEncapsulants(input());
    for (const row of r.rows) {
      const d = domeEstimate({ nChip: r.nChip, nEnc: row.nEnc, nOut: 1, chipWidthMm: 1, chipLengthMm: 1, radiusMm: 2.5 });
      assertInDelta(row.etaDome, d.etaDome, 4 * EPS);
      assertInDelta(row.gain, d.gain, 4 * EPS * d.gain);
      assertInDelta(row.minRadiusNoTirMm, d.minRadiusNoTirMm, 4 * EPS * d.minRadiusNoTirMm);
      expect(row.meetsNoTir).toBe(d.noTir);
    }
  });

  it('ranks by η_dome, highest first, with ranks 1..N', () => {
    const r = rankEncapsulants(input());
    r.rows.forEach((row, i) => {
      expect(row.rank).toBe(i + 1);
      if (i > 0) expect(row.etaDome).toBeLessThanOrEqual(r.rows[i - 1].etaDome);
    });
  });

  it('marks the current choice and gives it a gain over current of exactly 1', () => {
    const r = rankEncapsulants(input());
    const cur = r.rows.filter((x) => x.isCurrent);
    expect(cur.map((x) => x.id)).toEqual(['silicone-methyl']);
    expect(cur[0].gainOverCurrent).toBe(1);
  });

  it('uses a typed current index when the current encapsulant is not a library material', () => {
    const r = rankEncapsulants(input({ current: { label: 'typed index', n: 1.5, materialId: null } }));
    expect(r.rows.some((x) => x.isCurrent)).toBe(false);
    for (const row of r.rows) assertInDelta(row.gainOverCurrent, row.etaDome / r.current.etaDome, 4 * EPS);
  });

  it('carries temperature limits and the library notes with their tags', () => {
    const r = rankEncapsulants(input());
    const epoxy = r.rows.find((x) => x.id === 'epoxy')!;
    expect(epoxy.maxServiceTempC).toBe(120);
    expect(epoxy.notes[0].text).toMatch(/120 °C/);
    expect(epoxy.notes.some((n) => /[Yy]ellows/.test(n.text))).toBe(true);
    const pmma = r.rows.find((x) => x.id === 'pmma')!;
    expect(pmma.notes.some((n) => /optical contact/.test(n.text) && n.tag === 'common practice')).toBe(true);
    const silica = r.rows.find((x) => x.id === 'fused-silica')!;
    expect(silica.notes[0].text).toMatch(/No service temperature listed/);
  });

  it('ranks user materials with the library and tags them', () => {
    const r = rankEncapsulants(input({ candidates: encapsulantCandidates(listMaterials(), [userGlass]) }));
    const mine = r.rows.find((x) => x.id === 'user-high-index')!;
    expect(mine.source).toBe('user');
    expect(mine.rank).toBe(1); // n = 1.7 is above every library encapsulant and optic at 450 nm
    expect(mine.notes.some((n) => n.tag === 'user supplied')).toBe(true);
  });

  it('flags an out-of-range wavelength per candidate instead of failing', () => {
    const r = rankEncapsulants(input({ wavelengthNm: 380 }));
    const methyl = r.rows.find((x) => x.id === 'silicone-methyl')!;
    expect(methyl.inRange).toBe(false);
    expect(methyl.warning).toMatch(/valid range/);
  });

  it('lists a candidate whose index cannot be evaluated as skipped, with the reason', () => {
    const broken: Material = { ...userGlass, id: 'user-broken', name: 'Broken', dispersion: { model: 'cauchy', A: -1, B: 0, C: 0 } };
    const r = rankEncapsulants(input({ candidates: encapsulantCandidates([], [broken]) }));
    expect(r.rows).toEqual([]);
    expect(r.skipped[0]).toMatchObject({ id: 'user-broken' });
    expect(r.skipped[0].reason).toMatch(/no physical index/);
  });

  it('a one-sample spectrum gives radiometric = luminous = the design value (16 ε)', () => {
    const r = rankEncapsulants(input({ spectrum: monochromatic(450) }));
    for (const row of r.rows) {
      assertInDelta(row.radiometric!, row.etaDome, 16 * EPS);
      assertInDelta(row.luminous!, row.etaDome, 16 * EPS);
    }
  });

  it('a blue Gaussian band moves the weighted figures only a little from the peak value (< 2 % relative)', () => {
    // dispersion over 450 ± 60 nm changes η_dome smoothly; the average stays near the peak value
    const r = rankEncapsulants(input({ spectrum: gaussianSpectrum(450, 20), order: 'radiometric' }));
    for (const row of r.rows) {
      expect(Math.abs(row.radiometric! / row.etaDome - 1)).toBeLessThan(0.02);
      expect(Math.abs(row.luminous! / row.etaDome - 1)).toBeLessThan(0.02);
    }
    r.rows.forEach((row, i) => i > 0 && expect(row.radiometric!).toBeLessThanOrEqual(r.rows[i - 1].radiometric!));
  });

  it('gives no luminous figure for an infrared band (V(λ) = 0), keeps the radiometric one', () => {
    const r = rankEncapsulants(input({ wavelengthNm: 940, spectrum: monochromatic(940) }));
    expect(r.rows[0].luminous).toBeNull();
    expect(r.rows[0].radiometric).not.toBeNull();
  });

  it('rejects bad sizes, wavelength, order, typed indices and current index, naming the field', () => {
    expect(() => rankEncapsulants(input({ chipWidthMm: 0 }))).toThrow(/chipWidthMm must be a number in \(0, 1000\]/);
    expect(() => rankEncapsulants(input({ radiusMm: NaN }))).toThrow(/radiusMm/);
    expect(() => rankEncapsulants(input({ wavelengthNm: 100 }))).toThrow(/wavelengthNm must be a number in \[200, 2500\] nm/);
    // @ts-expect-error — not an order
    expect(() => rankEncapsulants(input({ order: 'price' }))).toThrow(/order must be/);
    expect(() => rankEncapsulants(input({ chip: { n: 0.5 } }))).toThrow(/Chip index must be a number in \[1, 6\]/);
    expect(() => rankEncapsulants(input({ current: { label: 'x', n: 9, materialId: null } }))).toThrow(/current encapsulant index/);
  });
});
