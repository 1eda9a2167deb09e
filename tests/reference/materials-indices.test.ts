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

  it('borosilicate crown glass nd(587.56 nm) = 1.5168 and n(632.8 nm) = 1.51509', () => {
    // published: SCHOTT optical glass data sheet N-BK7. Tolerances: half a unit in the last published digit.
    expectWithin(n('borosilicate-crown', 587.56), 1.5168, 5e-5);
    expectWithin(n('borosilicate-crown', 632.8), 1.51509, 5e-6);
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

describe('semiconductors recalled values (from memory, loose tolerances)', () => {
  it('GaAs n(1000 nm) ≈ 3.50', () => {
    // from memory: GaAs just below the gap, n ≈ 3.50. Tolerance 0.03.
    expectWithin(n('gaas', 1000), 3.5, 0.03);
  });

  it('GaAs (Skauli 2003 form) has its pole at 874.6 nm', () => {
    // published trap: the Skauli et al. 2003 GaAs formula has a pole at 874.6 nm. Tolerance 0.05 nm (4 digits).
    const pole = polesNm(findMaterial('gaas')!.dispersion).find((p) => p > 800 && p < 900);
    expectWithin(pole ?? 0, 874.6, 0.05);
  });

  it('GaP n(633 nm) ≈ 3.31, 4H-SiC n_o(633 nm) ≈ 2.65, ZnO n_o(633 nm) ≈ 1.99', () => {
    // from memory, tolerance 0.03 each (recalled to about two decimals).
    expectWithin(n('gap', 633), 3.31, 0.03);
    expectWithin(n('sic-4h', 633), 2.65, 0.03);
    expectWithin(n('zno', 633), 1.99, 0.03);
  });

  it('the chip semiconductors are all above 2.3 where they emit or are transparent', () => {
    // common practice: LED chip materials are high-index (GaN-based ≈ 2.4–2.6, phosphides and arsenides ≈ 3.1–3.6).
    const at: [string, number][] = [['gan', 450], ['ingan', 450], ['algainp', 620], ['gap', 620], ['gaas', 1000], ['sic-4h', 460]];
    for (const [id, w] of at) expect(n(id, w), id).toBeGreaterThan(2.3);
  });
});

describe('metals', () => {
  it('Ag at 550 nm: n = 0.04382, k = 3.6101; R into air 0.9876 and into 1.5: 0.9829', () => {
    // published n, k: K. M. McPeak et al., ACS Photonics 2, 326 (2015); R computed from the Fresnel equations (Born & Wolf, Principles of Optics, §14.2).
    const r = indexAt(findMaterial('ag')!, 550);
    expect(r.n).toBe(0.04382);
    expect(r.k).toBe(3.6101);
    // Tolerance 1e-4: R is quoted to 4 decimals.
    expectWithin(reflectance('ag', 550, 1), 0.9876, 1e-4);
    expectWithin(reflectance('ag', 550, 1.5), 0.9829, 1e-4);
  });

  it('Al at 450 nm: n = 0.4892, k = 4.7783; R into air 0.9219', () => {
    // published n, k: McPeak et al. 2015; R computed. Tolerance 1e-4.
    const r = indexAt(findMaterial('al')!, 450);
    expect([r.n, r.k]).toEqual([0.4892, 4.7783]);
    expectWithin(reflectance('al', 450, 1), 0.9219, 1e-4);
  });

  it('recalled metal tables give plausible reflectance into air', () => {
    // common practice: Ag > 0.95 and Al ≈ 0.86–0.93 from 450 to 1000 nm; Au < 0.45 at 450 nm and > 0.9 at 700 nm.
    for (let w = 450; w <= 1000; w += 50) {
      expect(reflectance('ag', w, 1), `Ag ${w}`).toBeGreaterThan(0.95);
      expect(reflectance('al', w, 1), `Al ${w}`).toBeGreaterThan(0.86);
      expect(reflectance('al', w, 1), `Al ${w}`).toBeLessThan(0.95);
    }
    expect(reflectance('au', 450, 1)).toBeLessThan(0.45);
    expect(reflectance('au', 700, 1)).toBeGreaterThan(0.9);
  });
});

describe('ambient', () => {
  it('air is n = 1 exactly (common practice for extraction estimates)', () => {
    expect(indexAt(findMaterial('air')!, 555)).toEqual({ n: 1, k: 0, inRange: true });
  });
});
