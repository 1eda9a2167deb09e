/**
 * Reference checks of the material library against values outside the project.
 * Tags: published (source named), computed from published formula
 * (the source's formula worked in double precision by hand, not by this code), common practice,
 * from memory (recalled, loose tolerance).
 */
import { describe, expect, it } from 'vitest';
import { findMaterial, indexAt, polesNm } from '../../src/lib/materials';

function n(id: string, wavelengthNm: number): number {
  const m = findMaterial(id);
  if (!m) throw new Error(`no material ${id}`);
  return indexAt(m, wavelengthNm).n;
}
function expectWithin(actual: number, expected: number, tolerance: number): void {
  expect(Math.abs(actual - expected), `${actual} vs ${expected} ± ${tolerance}`).toBeLessThanOrEqual(tolerance);
}
/** Normal-incidence reflectance from a lossless medium n0 onto N = n + ik: ((n − n0)² + k²)/((n + n0)² + k²). */
function reflectance(id: string, wavelengthNm: number, n0: number): number {
  const r = indexAt(findMaterial(id)!, wavelengthNm);
  return ((r.n - n0) ** 2 + r.k ** 2) / ((r.n + n0) ** 2 + r.k ** 2);
}

describe('dielectrics with published formulas', () => {
  it('fused silica n(587.6 nm) = 1.45846', () => {
    // published: I. H. Malitson, JOSA 55, 1205 (1965). Tolerance 1e-5: the value is given to 5 decimals.
    expectWithin(n('fused-silica', 587.6), 1.45846, 1e-5);
  });

  it('soda-lime glass n(587.6 nm) = 1.52338 and n(632.8 nm) = 1.52163', () => {
    // computed from published formula: M. Rubin, Sol. Energy Mater. 12, 275 (1985), clear window glass,
    // n = 1.5130 − 0.003169λ² + 0.003962/λ². Tolerance 1e-5: the library interpolates the formula's
    // values at 10 nm rows (error ≈ h²n''/8 ≈ 2e-6) and rounds them to 6 decimals.
    expectWithin(n('soda-lime-glass', 587.6), 1.52338, 1e-5);
    expectWithin(n('soda-lime-glass', 632.8), 1.52163, 1e-5);
  });

  it('sapphire ordinary n(632.8 nm) = 1.76590', () => {
    // computed from published formula: Malitson & Dodge, JOSA 62, 1405 (1972). Tolerance 1e-5 (5 decimals).
    expectWithin(n('sapphire-o', 632.8), 1.7659, 1e-5);
  });

  it('sapphire birefringence n_o − n_e at 632.8 nm ≈ 0.008', () => {
    // from memory: sapphire is negative uniaxial with |Δn| ≈ 0.008 in the visible. Loose tolerance 0.001.
    expectWithin(n('sapphire-o', 632.8) - n('sapphire-e', 632.8), 0.008, 0.001);
  });

  it('GaN ordinary n(450 nm) = 2.4869', () => {
    // computed from published formula: Barker & Ilegems, Phys. Rev. B 7, 743 (1973). Tolerance 1e-4 (4 decimals).
    expectWithin(n('gan', 450), 2.4869, 1e-4);
  });

  it('TiO2 rutile ordinary n(550 nm) = 2.64794', () => {
    // computed from published formula: J. R. DeVore, JOSA 41, 416 (1951). Tolerance 1e-5.
    expectWithin(n('tio2-rutile', 550), 2.64794, 1e-5);
  });

  it('Si3N4 n(550 nm) = 2.05230', () => {
    // computed from published formula: K. Luke et al., Opt. Lett. 40, 4823 (2015). Tolerance 1e-5.
    expectWithin(n('si3n4', 550), 2.0523, 1e-5);
  });

  it('PMMA nD = 1.491 and polycarbonate nD = 1.585 at 587.6 nm', () => {
    // published (measured): N. Sultanova et al., Acta Phys. Pol. A 116, 585 (2009). Tolerance 1e-3:
    // three published decimals plus the fit's residual against the measurement.
    expectWithin(n('pmma', 587.6), 1.491, 1e-3);
    expectWithin(n('polycarbonate', 587.6), 1.585, 1e-3);
  });

  it('MgF2 is about 1.38 in the visible', () => {
    // common practice: evaporated MgF2 AR layers are quoted as n ≈ 1.38. Tolerance 0.005.
    expectWithin(n('mgf2', 550), 1.38, 0.005);
  });
});

describe('encapsulants (common practice ranges)', () => {
  it('methyl silicone ≈ 1.41 at 589 nm', () => {
    // common practice: methyl silicone encapsulants ≈ 1.41. Tolerance 0.01 spans typical products.
    expectWithin(n('silicone-methyl', 589.3), 1.41, 0.01);
  });

  it('phenyl silicone ≈ 1.53 at 589 nm, within 1.50–1.56 across 450–650 nm', () => {
    // common practice: phenyl silicones ≈ 1.53 (1.50–1.56). Tolerance 0.01 at 589 nm.
    expectWithin(n('silicone-phenyl', 589.3), 1.53, 0.01);
    for (const w of [450, 550, 650]) {
      expect(n('silicone-phenyl', w)).toBeGreaterThanOrEqual(1.5);
      expect(n('silicone-phenyl', w)).toBeLessThanOrEqual(1.56);
    }
  });

  it('epoxy lies within 1.50–1.57 across 400–800 nm', () => {
    // common practice: clear optical epoxies 1.50–1.57.
    for (let w = 400; w <= 800; w += 50) {
      expect(n('epoxy', w)).toBeGreaterThanOrEqual(1.5);
      expect(n('epoxy', w)).toBeLessThanOrEqual(1.57);
    }
  });
});

describe('semiconductors, recalled values (from memory, loose tolerances) and published traps', () => {
  it('GaAs n(1000 nm) ≈ 3.50', () => {
    // from memory: GaAs just below the gap, n ≈ 3.50. Tolerance 0.03.
    expectWithin(n('gaas', 1000), 3.5, 0.03);
  });

  it('GaAs (Skauli 2003 form) has its pole at 874.6 nm', () => {
    // published trap: the Skauli et al. 2003 GaAs formula has a pole at 874.6 nm. Tolerance 0.05 nm (4 digits).
    const pole = polesNm(findMaterial('gaas')!.dispersion).find((p) => p > 800 && p < 900);
    expectWithin(pole ?? 0, 874.6, 0.05);
  });

  it('ZnO n_o(633 nm) ≈ 1.99', () => {
    // from memory, tolerance 0.03 (recalled to about two decimals).
    expectWithin(n('zno', 633), 1.99, 0.03);
  });

  it('the chip semiconductors are all above 2.3 where they emit or are transparent', () => {
    // common practice: LED chip materials are high-index (GaN-based ≈ 2.4–2.6, phosphides and arsenides ≈ 3.1–3.6).
    const at: [string, number][] = [['gan', 450], ['gap', 620], ['gaas', 1000], ['sic-4h', 460]];
    for (const [id, w] of at) expect(n(id, w), id).toBeGreaterThan(2.3);
  });
});

describe('metals', () => {
  it('Ag at 550 nm: n = 0.04382, k = 3.6101; R into air 0.9876 and into 1.5: 0.9829', () => {
    // published n, k: K. M. McPeak et al., ACS Photonics 2, 326 (2015), their 550 nm row; R computed (Born & Wolf, Principles of Optics, §14.2) as
    // ((n − n0)² + k²)/((n + n0)² + k²). Tolerance: half a unit in the last quoted digit.
    const r = indexAt(findMaterial('ag')!, 550);
    expectWithin(r.n, 0.04382, 5e-6);
    expectWithin(r.k, 3.6101, 5e-5);
    // Tolerance 1e-4: R is quoted to 4 decimals.
    expectWithin(reflectance('ag', 550, 1), 0.9876, 1e-4);
    expectWithin(reflectance('ag', 550, 1.5), 0.9829, 1e-4);
  });

  it('Al at 450 nm: n = 0.4892, k = 4.7783; R into air 0.9219', () => {
    // published n, k: McPeak et al. 2015, their 450 nm row; R computed. Tolerances: half a unit in the last digit.
    const r = indexAt(findMaterial('al')!, 450);
    expectWithin(r.n, 0.4892, 5e-5);
    expectWithin(r.k, 4.7783, 5e-5);
    expectWithin(reflectance('al', 450, 1), 0.9219, 1e-4);
  });

  it('reflectance into air agrees with other published data sets of the same metals', () => {
    // other measurement: P. B. Johnson, R. W. Christy, Phys. Rev. B 6, 4370 (1972) give R(Ag, 550 nm) = 0.9831
    // and R(Au, 632.8 nm) = 0.9442; A. D. Rakić, Appl. Opt. 34, 4755 (1995) gives R(Al, 550 nm) = 0.9154.
    // Tolerances are the spread between evaporated-film data sets: 0.01 for Ag, 0.005 for Al, 0.02 for Au.
    expectWithin(reflectance('ag', 550, 1), 0.9831, 0.01);
    expectWithin(reflectance('al', 550, 1), 0.9154, 0.005);
    expectWithin(reflectance('au', 632.8, 1), 0.9442, 0.02);
  });

  it('Ag stays above 0.95 from 450 to 1000 nm; Al dips near 800 nm; Au absorbs blue', () => {
    // common practice: fresh silver reflects > 0.95 in the visible and near infrared; aluminium has an interband
    // absorption near 800 nm (1.5 eV) where R falls to about 0.86; gold reflects < 0.45 at 450 nm and > 0.9 at 700 nm.
    for (let w = 450; w <= 1000; w += 50) expect(reflectance('ag', w, 1), `Ag ${w}`).toBeGreaterThan(0.95);
    let alMin = 1;
    let alMinAt = 0;
    for (let w = 450; w <= 1000; w += 5) {
      const r = reflectance('al', w, 1);
      if (r < alMin) [alMin, alMinAt] = [r, w];
    }
    expectWithin(alMin, 0.86, 0.015);
    expectWithin(alMinAt, 810, 40);
    expect(reflectance('au', 450, 1)).toBeLessThan(0.45);
    expect(reflectance('au', 700, 1)).toBeGreaterThan(0.9);
  });
});

describe('ambient', () => {
  it('air is n = 1 exactly (common practice for extraction estimates)', () => {
    expect(indexAt(findMaterial('air')!, 555)).toEqual({ n: 1, k: 0, inRange: true });
  });
});
