/**
 * Encapsulant ranking against things outside the ranking code:
 * - closed-form dome gains for a planar face, GaN (2.5) under 1.41 / 1.50 / 1.53: ≈ 2.26 / 2.60 / 2.73
 *   (computed values; Schubert, Light-Emitting Diodes, 2nd ed., ch. 5,
 *   "a factor of about 2–3", from memory);
 * - the ordering of library encapsulants for a GaN chip follows their index (η_dome rises with n over
 *   1.4–1.6: a larger escape cone outweighs the slightly larger dome-surface reflection);
 * - a Monte Carlo trace of the demo package with each of the top candidates agrees with that ordering
 *   within k = 3 standard errors of each difference.
 */
import { describe, it, expect } from 'vitest';
import { rankEncapsulants } from '../../src/lib/decisions/rank-encapsulants';
import { findMaterial } from '../../src/lib/materials/index';
import { demoScenario, toTracePackage } from '../../src/lib/scenario/index';
import { traceSync } from '../../src/lib/trace/trace';
import { summarize } from '../../src/lib/trace/summary';
import { assertInDelta } from '../support/assert';
import { rankInput } from '../support/fixtures';

const K = 3;

function ganRanking(nChip?: number) {
  return rankEncapsulants(
    rankInput({ chip: nChip === undefined ? { material: findMaterial('gan')! } : { n: nChip }, current: { label: 'typed', n: 1.41, materialId: null } })
  );
}

describe('closed-form ranking (computed values, dome: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5; sine rule, Born & Wolf §4.2.3)', () => {
  it('reproduces the dome gains 2.26 / 2.60 / 2.73 of GaN (n 2.5) under 1.41 / 1.50 / 1.53 (tolerance 0.005: 3-figure table)', () => {
    const r = rankEncapsulants(rankInput({ chip: { n: 2.5 }, candidates: [], current: { label: 'typed', n: 1.41, materialId: null } }));
    expect(r.rows).toEqual([]);
    assertInDelta(r.current.etaDome / r.etaBare, 2.26, 0.005);
    for (const [n, g] of [[1.5, 2.6], [1.53, 2.73]]) {
      const s = rankEncapsulants(rankInput({ chip: { n: 2.5 }, candidates: [], current: { label: 't', n, materialId: null } }));
      assertInDelta(s.current.etaDome / s.etaBare, g, 0.005, `n_enc = ${n}`);
    }
  });

  it('orders the library encapsulants and optics for a GaN chip by their index, highest first', () => {
    const r = ganRanking();
    expect(r.rows.length).toBeGreaterThanOrEqual(5);
    for (let i = 1; i < r.rows.length; i++) expect(r.rows[i].nEnc).toBeLessThan(r.rows[i - 1].nEnc);
    // the demo's decision: phenyl silicone (≈1.53) above methyl silicone (≈1.41)
    const pos = (id: string) => r.rows.findIndex((x) => x.id === id);
    expect(pos('silicone-phenyl')).toBeLessThan(pos('silicone-methyl'));
  });

  it('the no-TIR radius is r·n_enc/n_out: 0.997 mm for a 1 × 1 mm chip under 1.41 (dome: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5; sine rule, Born & Wolf §4.2.3; 1e-3 mm)', () => {
    const r = ganRanking(2.45);
    const methyl = r.rows.find((x) => x.id === 'silicone-methyl')!;
    assertInDelta(methyl.minRadiusNoTirMm, (Math.SQRT2 / 2) * methyl.nEnc, 1e-12);
    assertInDelta((Math.SQRT2 / 2) * 1.41, 0.997, 1e-3);
    expect(methyl.meetsNoTir).toBe(true); // the demo dome is 2.5 mm
  });
});

describe('trace ranking agrees with the closed form (Monte Carlo, k = 3)', () => {
  it('the top three candidates traced in the demo package keep the closed-form order within 3 σ of each difference', () => {
    const top = ganRanking().rows.slice(0, 3);
    const pkg = toTracePackage(demoScenario());
    const traced = top.map((row, i) => {
      // independent seeds, so the difference of two runs has variance σ1² + σ2²
      const s = summarize(traceSync({ ...pkg, encapsulant: { ...pkg.encapsulant, n: row.nEnc } }, { rays: 40_000, seed: 101 + i }));
      return { id: row.id, extraction: s.extraction, stderr: s.stderr };
    });
    for (let i = 1; i < traced.length; i++) {
      const diff = traced[i - 1].extraction - traced[i].extraction;
      const sigma = Math.hypot(traced[i - 1].stderr, traced[i].stderr);
      expect(diff, `${traced[i - 1].id} vs ${traced[i].id}`).toBeGreaterThan(-K * sigma);
    }
  });

  it('a clearly separated pair (n 1.58 vs 1.41) is resolved by the trace in the closed-form direction', () => {
    const pkg = toTracePackage(demoScenario());
    const run = (n: number, seed: number) => summarize(traceSync({ ...pkg, encapsulant: { ...pkg.encapsulant, n } }, { rays: 40_000, seed }));
    const hi = run(1.58, 7);
    const lo = run(1.41, 8);
    expect(hi.extraction - lo.extraction).toBeGreaterThan(K * Math.hypot(hi.stderr, lo.stderr));
  });
});
