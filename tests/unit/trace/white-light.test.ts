import { describe, expect, it } from 'vitest';
import { demoScenario } from '../../../src/lib/scenario/defaults';
import { toTracePackage } from '../../../src/lib/scenario';
import { validateTracePackage } from '../../../src/lib/trace/package-spec';
import { libraryPhosphor, traceWhite, withPhosphor, gaussianRows } from '../../../src/lib/trace/white-light';
import { coefficientsFromParticles, SILICONE_DENSITY_G_PER_CM3 } from '../../../src/lib/trace/package-phosphor';

const pkg = toTracePackage(demoScenario());
const yellow = libraryPhosphor('garnet-yellow');
const white = (weightPercent: number, diameterUm = 12) =>
  withPhosphor(pkg, { kind: 'particles', phosphor: yellow, weightPercent, diameterUm }, [[450, 1]]);

describe('white package: bookkeeping and properties', () => {
  it('the ledger closes and the photon fractions add up; energy efficiency ≤ photon efficiency (conversion only lengthens λ; common practice)', () => {
    const rays = 10000;
    const { tally, summary } = traceWhite(white(10), rays, 3);
    const parts = Object.values(tally.parts).reduce((a, b) => a + b, 0);
    expect(parts).toBe(rays);
    expect(tally.parts['phosphor:encapsulant']).toBeGreaterThan(0);
    expect(summary.escapedBlue + summary.escapedConverted).toBeCloseTo(tally.escaped / rays, 12);
    expect(summary.energyEfficiency).toBeLessThanOrEqual(summary.photonEfficiency);
    expect(summary.meanEscapedNm!).toBeGreaterThan(summary.meanChipNm);
    for (const v of [summary.color!.x, summary.color!.y, summary.color!.sigma.x, summary.energyEfficiency, summary.deltaUvPrime!]) expect(Number.isFinite(v)).toBe(true);
  });

  it('CCT falls monotonically as the yellow phosphor load rises, with common random numbers (same seed) (property; common practice)', () => {
    const ccts = [8, 11, 15, 20].map((w) => traceWhite(white(w), 3000, 5).summary.color!.cctK!);
    for (let i = 1; i < ccts.length; i++) expect(ccts[i]).toBeLessThan(ccts[i - 1]);
  });

  it('over random loads and sizes: no NaN anywhere in the summary (property)', () => {
    let seed = 11;
    const rnd = () => ((seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31);
    for (let k = 0; k < 4; k++) {
      const s = traceWhite(white(0.5 + 25 * rnd(), 2 + 20 * rnd()), 600, k + 1).summary;
      const json = JSON.stringify(s);
      expect(json).not.toContain('NaN');
      expect(json).not.toContain('null,"y"');
    }
  });

  it('μs and μa scale linearly with the weight fraction at low load (independent scattering, Bohren & Huffman 1983 §3.4)', () => {
    const at = (w: number) => coefficientsFromParticles({ phosphor: yellow, weightFraction: w, size: { kind: 'single', diameterUm: 12 }, hostN: 1.41, hostDensityGPerCm3: SILICONE_DENSITY_G_PER_CM3 }, 450, 450);
    const [a, b] = [at(0.001)[0], at(0.002)[0]];
    expect(b[1] / a[1]).toBeCloseTo(2, 2);
    expect(b[2] / a[2]).toBeCloseTo(2, 2);
  });

  it('rejects a coefficient table with g outside (−1, 1), naming the field and range', () => {
    const bad = withPhosphor(pkg, { kind: 'table', coefficients: [[450, 1, 1, 1.2]], emission: gaussianRows(560, 100), quantumYield: 0.9 }, [[450, 1]]);
    expect(() => validateTracePackage(bad)).toThrow(/phosphor.coefficients row 1: g must lie in \(−1, 1\)/);
  });
});
