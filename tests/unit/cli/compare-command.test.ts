import { describe, expect, it } from 'vitest';
import { demoScenario, toTracePackage } from '../../../src/lib/scenario';
import { summarize } from '../../../src/lib/trace/summary';
import { traceSync } from '../../../src/lib/trace/trace';
import { runCli, runJson } from './run-cli';

describe('outcouple compare', () => {
  // 20 000 rays per candidate: σ ≈ 0.35 % on ≈ 40 %, so the 7-point gap between the silicones is ≈ 15σ and a 2σ
  // test of the order is meaningful (k = 2, the page's separation rule).
  const out = runJson(['compare', '--rays', '20000', '--threads', '1']);

  it("ranks the demo's encapsulants by the trace, highest first, encapsulants only by default", () => {
    const ranking = out.ranking as { id: string; extraction: number; stderr: number; rank: number; category: string }[];
    expect(ranking.map((r) => r.rank)).toEqual(ranking.map((_, i) => i + 1));
    for (let i = 1; i < ranking.length; i++) expect(ranking[i].extraction).toBeLessThanOrEqual(ranking[i - 1].extraction);
    expect(ranking.every((r) => r.category === 'encapsulant')).toBe(true);
    // A higher encapsulant index widens the chip's escape cone (Snell: sin θc = n_enc/n_chip; E. F. Schubert,
    // Light-Emitting Diodes, 2nd ed., ch. 5): phenyl silicone (≈1.53) beats methyl silicone (≈1.41) by more than 2σ.
    const phenyl = ranking.find((r) => r.id === 'silicone-phenyl')!;
    const methyl = ranking.find((r) => r.id === 'silicone-methyl')!;
    expect(phenyl.extraction - methyl.extraction).toBeGreaterThan(2 * Math.hypot(phenyl.stderr, methyl.stderr));
  });

  it("traces the current encapsulant exactly as the page traces the scenario (same package, rays and seed)", () => {
    const current = out.ranking.find((r: { isCurrent: boolean }) => r.isCurrent);
    const page = summarize(traceSync(toTracePackage(demoScenario()), { rays: 20000, seed: 1 }));
    expect(current.seed).toBe(1);
    expect(current.extraction).toBe(page.extraction);
    expect(current.overCurrent).toEqual({ gain: 1, stderr: 0 });
  });

  it('puts the ideal one-face reference beside the trace, several times lower (side faces and the base recycle light)', () => {
    for (const r of out.ranking) expect(r.extraction).toBeGreaterThan(2 * r.idealOneFace);
  });

  it('adds the optic materials on request, and refuses a bad ray count naming the option', () => {
    const withOptics = runJson(['compare', '--rays', '1000', '--threads', '1', '--optics']);
    expect(withOptics.ranking.some((r: { id: string }) => r.id === 'polycarbonate')).toBe(true);
    const bad = runCli(['compare', '--rays', '5']);
    expect(bad.code).toBe(2);
    expect(bad.stderr).toMatch(/--rays/);
  });
});
