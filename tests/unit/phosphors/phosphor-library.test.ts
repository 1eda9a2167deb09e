import { describe, expect, it } from 'vitest';
import { colorOfSpectrum, colorSpectrum } from '../../../src/lib/color';
import { indexAt } from '../../../src/lib/materials';
import {
  emissionRows, findPhosphor, listPhosphors, particleIndexAt, phosphorSchema, stokesEfficiency
} from '../../../src/lib/phosphors';
import { particleCloud } from '../../../src/lib/scatter';
import { assertInDelta } from '../../support/assert';

function peakAndFwhm(rows: [number, number][]): [number, number] {
  let peak = rows[0];
  for (const r of rows) if (r[1] > peak[1]) peak = r;
  const above = rows.filter((r) => r[1] >= peak[1] / 2);
  return [peak[0], above[above.length - 1][0] - above[0][0]];
}

describe('phosphor library (data/phosphors.json)', () => {
  it('holds a yellow garnet, a green garnet and a red nitride, each passing the schema', () => {
    const ids = listPhosphors().map((p) => p.id);
    expect(ids).toEqual(expect.arrayContaining(['garnet-yellow', 'garnet-green', 'nitride-red']));
    for (const p of listPhosphors()) expect(phosphorSchema.safeParse(p).success).toBe(true);
    expect(findPhosphor(' Garnet-Yellow ')?.formula).toMatch(/Y3Al5O12:Ce/);
    expect(findPhosphor('nope')).toBeUndefined();
  });

  it('gives a finite particle index n > 1, k ≥ 0 from 400 to 800 nm for every phosphor', () => {
    for (const p of listPhosphors()) {
      for (let nm = 400; nm <= 800; nm += 10) {
        const { n, k } = particleIndexAt(p, nm);
        expect(Number.isFinite(n) && n > 1 && n < 3, `${p.id} n at ${nm}`).toBe(true);
        expect(Number.isFinite(k) && k >= 0 && k <= p.absorption.kPeak * (1 + 1e-12), `${p.id} k at ${nm}`).toBe(true);
      }
    }
  });

  it('uses the YAG index of Zelmon et al.: n(632.8 nm) = 1.8295', () => {
    // computed from published formula: D. E. Zelmon, D. L. Small, R. Page, Appl. Opt. 37, 4933 (1998),
    // n² − 1 = 2.282λ²/(λ² − 0.01185) + 3.27644λ²/(λ² − 282.734) at λ = 0.6328 µm gives 1.82947
    assertInDelta(particleIndexAt(findPhosphor('garnet-yellow')!, 632.8).n, 1.82947, 1e-4);
    expect(indexAt(findPhosphor('garnet-yellow')!.particleMaterial, 450).inRange).toBe(true);
  });

  it.each([
    // from memory: YAG:Ce emission peaks near 550–560 nm with a FWHM of 110–125 nm; LuAG:Ce near 515–530 nm;
    // CaAlSiN3:Eu near 645–660 nm with a FWHM of 85–95 nm (commonly quoted ranges for these powders)
    ['garnet-yellow', 545, 565, 105, 130],
    ['garnet-green', 510, 530, 90, 115],
    ['nitride-red', 640, 660, 80, 100]
  ])('%s emits with its peak in [%i, %i] nm and FWHM in [%i, %i] nm', (id, pLo, pHi, wLo, wHi) => {
    const [peak, fwhm] = peakAndFwhm(emissionRows(findPhosphor(id)!, 380, 830, 0.5));
    expect(peak).toBeGreaterThanOrEqual(pLo);
    expect(peak).toBeLessThanOrEqual(pHi);
    expect(fwhm).toBeGreaterThanOrEqual(wLo);
    expect(fwhm).toBeLessThanOrEqual(wHi);
  });

  it('absorbs blue chip light (440–460 nm) far more than its own emission peak', () => {
    for (const p of listPhosphors()) {
      const [peak] = peakAndFwhm(emissionRows(p));
      const blue = particleIndexAt(p, 450).k;
      expect(blue, p.id).toBeGreaterThan(0.5 * p.absorption.kPeak);
      expect(particleIndexAt(p, peak).k, p.id).toBeLessThan(0.6 * blue);
    }
  });

  it('mixing more yellow garnet light into a 450 nm blue band lowers the CCT monotonically', () => {
    const yellow = emissionRows(findPhosphor('garnet-yellow')!);
    // blue chip: Gaussian at 450 nm, FWHM 20 nm (common practice for InGaN blue)
    const blue = yellow.map(([nm]) => Math.exp(-0.5 * ((nm - 450) / (20 / 2.3548)) ** 2));
    let previous = Infinity;
    for (const share of [0.8, 1.2, 1.8, 2.6, 4]) {
      const c = colorOfSpectrum(colorSpectrum(yellow.map(([nm, v], i) => [nm, blue[i] + share * 0.4 * v] as [number, number])));
      expect(c.cctK!).toBeLessThan(previous);
      previous = c.cctK!;
    }
  });

  it('feeds particleCloud: 8 wt % of 15 µm yellow garnet in silicone scatters and absorbs blue, barely absorbs yellow', () => {
    const p = findPhosphor('garnet-yellow')!;
    const at = (nm: number) => {
      const { n, k } = particleIndexAt(p, nm);
      return particleCloud({ wavelengthNm: nm, particleN: n, particleK: k, hostN: 1.41, size: { kind: 'lognormal', d50Um: 15, spread: 1.4 },
        weightFraction: 0.08, particleDensityGPerCm3: p.densityGPerCm3, hostDensityGPerCm3: 1.1 });
    };
    const blue = at(450);
    const yellow = at(580);
    // large-sphere limit (Bohren & Huffman 1983 §4.4.3): Qext → 2, so μs ≈ 2·φ·1.5·E[1/d] with E[1/d] = e^(s²/2)/d50
    // for a log-normal volume distribution (s = ln σg); φ from the weight fraction. Within 15 % (Qabs ≈ 0.1–0.2 at 450 nm)
    const phi = (0.08 / 4.55) / (0.08 / 4.55 + 0.92 / 1.1);
    const estimate = 2 * phi * 1.5 * Math.exp(Math.log(1.4) ** 2 / 2) / 0.015;
    expect(Math.abs(blue.musPerMm / estimate - 1)).toBeLessThan(0.15);
    expect(blue.volumeFraction).toBeCloseTo(phi, 12);
    expect(blue.muaPerMm).toBeGreaterThan(50 * yellow.muaPerMm);
    expect(blue.g).toBeGreaterThan(0.7);
  });

  it('Stokes efficiency is the photon-energy ratio λin/λout', () => {
    expect(stokesEfficiency(450, 560)).toBeCloseTo(450 / 560, 12);
  });
});
