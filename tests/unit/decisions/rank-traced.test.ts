import { describe, expect, it } from 'vitest';
import { candidatePackage, candidateSeed, rankByTrace, traceRanking, TRACE_SEPARATION_K } from '../../../src/lib/decisions/rank-traced';
import { encapsulantCandidates, rankEncapsulants, type EncapsulantRow } from '../../../src/lib/decisions/rank-encapsulants';
import { findMaterial, listMaterials } from '../../../src/lib/materials';
import { indexAt } from '../../../src/lib/materials/dispersion';
import type { Tracer } from '../../../src/lib/runs/tracer';
import { summarize, type TraceSummary } from '../../../src/lib/trace/summary';
import { traceSync } from '../../../src/lib/trace/trace';
import { domePackage, NO_ENCAPSULANT, withEncapsulant } from '../../support/fixtures';

const seen: { n: number; seed: number; rays: number }[] = [];
const syncTracer: Tracer = async (pkg, { rays, seed }) => {
  seen.push({ n: pkg.encapsulant.n, seed, rays });
  return { summary: summarize(traceSync(pkg, { rays, seed })), seconds: 0, workers: 1, cached: false };
};

function demoRanking() {
  return rankEncapsulants({
    chip: { material: findMaterial('gan')! },
    outside: { n: 1 },
    chipWidthMm: 1,
    chipLengthMm: 1,
    radiusMm: 2.5,
    wavelengthNm: 450,
    candidates: encapsulantCandidates(listMaterials()),
    current: { label: 'Methyl silicone', n: indexAt(findMaterial('silicone-methyl')!, 450).n, materialId: 'silicone-methyl' }
  });
}

function fake(id: string, extraction: number, stderr: number, isCurrent = false) {
  return { row: { id, name: id, isCurrent } as EncapsulantRow, seed: 1, summary: { extraction, stderr } as TraceSummary };
}

describe('rankByTrace(traced)', () => {
  it('orders by traced extraction and flags neighbours within 2σ of their difference as not separable', () => {
    expect(TRACE_SEPARATION_K).toBe(2);
    // a − b = 0.01 with σ_d = √2·0.003 = 0.0042: 2.4 σ, separable; b − c = 0.005: 1.2 σ, not
    const r = rankByTrace([fake('c', 0.385, 0.003), fake('a', 0.4, 0.003, true), fake('b', 0.39, 0.003)]);
    expect(r.map((x) => x.row.id)).toEqual(['a', 'b', 'c']);
    expect(r.map((x) => x.rank)).toEqual([1, 2, 3]);
    expect(r.map((x) => x.separableFromNext)).toEqual([true, false, null]);
  });

  it('gives each row its ratio to the current candidate with the propagated σ (Taylor §3.8); the current one is 1 exactly', () => {
    const r = rankByTrace([fake('cur', 0.4, 0.004, true), fake('x', 0.44, 0.0044)]);
    const x = r.find((t) => t.row.id === 'x')!;
    expect(x.overCurrent!.gain).toBeCloseTo(1.1, 12);
    expect(x.overCurrent!.stderr).toBeCloseTo(1.1 * Math.hypot(0.01, 0.01), 12);
    expect(r.find((t) => t.row.isCurrent)!.overCurrent).toEqual({ gain: 1, stderr: 0 });
    expect(rankByTrace([fake('x', 0.4, 0.004)])[0].overCurrent).toBeNull();
  });
});

describe('candidateSeed and candidatePackage', () => {
  it('keeps the scenario seed for the current candidate and gives the others their own, independent of list order', () => {
    expect(candidateSeed(7, 'silicone-methyl', true)).toBe(7);
    const s = candidateSeed(7, 'silicone-phenyl', false);
    expect(s).not.toBe(7);
    expect(candidateSeed(7, 'silicone-phenyl', false)).toBe(s);
    expect(candidateSeed(7, 'epoxy', false)).not.toBe(s);
    expect(candidateSeed(4294967295, 'epoxy', false)).toBeLessThan(4294967296);
  });

  it("puts the candidate's index into the scenario's package, and a hemisphere of its radius where it has none", () => {
    const p = candidatePackage(domePackage(), 1.53);
    expect(p.encapsulant).toEqual({ ...domePackage().encapsulant, n: 1.53 });
    const bare = withEncapsulant(domePackage(), { ...NO_ENCAPSULANT, radiusMm: 2 });
    expect(candidatePackage(bare, 1.5).encapsulant).toMatchObject({ shape: 'dome', radiusMm: 2, heightMm: 2, n: 1.5 });
  });
});

describe('traceRanking(tracer, base, rows, options)', () => {
  it('traces every candidate with the same rays, the current one first, and ranks them by the trace', async () => {
    seen.length = 0;
    const ranking = demoRanking();
    const partial: number[] = [];
    const r = await traceRanking(syncTracer, domePackage(), ranking.rows, { rays: 3000, seed: 1, onTraced: (t) => partial.push(t.length) });
    expect(r.length).toBe(ranking.rows.length);
    expect(partial).toEqual(ranking.rows.map((_, i) => i + 1));
    expect(seen.every((x) => x.rays === 3000)).toBe(true);
    expect(seen[0].seed).toBe(1); // the current encapsulant, with the scenario's seed
    for (let i = 1; i < r.length; i++) expect(r[i].summary.extraction).toBeLessThanOrEqual(r[i - 1].summary.extraction);
    // The traced package extracts far more than the ideal one-face reference: side faces and the base
    // return light the one-face figure leaves out (η_trace > η_closed for every candidate here).
    for (const t of r) expect(t.summary.extraction).toBeGreaterThan(t.row.etaDome);
  });
});
