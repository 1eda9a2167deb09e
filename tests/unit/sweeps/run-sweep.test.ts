import { describe, expect, it } from 'vitest';
import { planIndexSweep } from '../../../src/lib/sweeps/plan-index-sweep';
import { planRadiusSweep } from '../../../src/lib/sweeps/plan-radius-sweep';
import { runSweep, type SweepTracer } from '../../../src/lib/sweeps/run-sweep';
import { summarize } from '../../../src/lib/trace/summary';
import { traceSync } from '../../../src/lib/trace/trace';
import { domePackage, pointSourcePackage, ROUND_INDICES } from '../../support/fixtures';

/** The real tracer on this thread, as the sweep runner takes it. */
const syncTracer: SweepTracer = async (pkg, options, onProgress) => {
  const s = summarize(traceSync(pkg, options, (done, total) => onProgress(done / total)));
  return { extraction: s.extraction, stderr: s.stderr };
};

/** A stand-in tracer: extraction = encapsulant index / 10, reports half-way progress first. */
const fakeTracer: SweepTracer = async (pkg, _options, onProgress) => {
  onProgress(0.5);
  return { extraction: pkg.encapsulant.n / 10, stderr: 0.001 };
};

describe('runSweep(plan, trace, options)', () => {
  it('traces every point in order and passes each result on', async () => {
    const plan = planIndexSweep(domePackage(ROUND_INDICES), [1.2, 1.4, 1.6]);
    const seen: number[][] = [];
    const run = await runSweep(plan, fakeTracer, { rays: 10, seed: 1, onPoint: (r) => seen.push(r.map((p) => p.x)) });
    expect(run.cancelled).toBe(false);
    expect(run.results.map((r) => r.x)).toEqual([1.2, 1.4, 1.6]);
    expect(run.results.map((r) => r.extraction)).toEqual([1.2 / 10, 1.4 / 10, 1.6 / 10]);
    expect(run.results.map((r) => r.closedForm)).toEqual(plan.points.map((p) => p.closedForm));
    expect(seen).toEqual([[1.2], [1.2, 1.4], [1.2, 1.4, 1.6]]);
  });

  it('reports whole-sweep progress that never goes back and ends at 1', async () => {
    const plan = planIndexSweep(domePackage(ROUND_INDICES), [1.2, 1.4, 1.6, 1.8]);
    const progress: number[] = [];
    await runSweep(plan, fakeTracer, { rays: 10, seed: 1, onProgress: (f) => progress.push(f) });
    // per point: half-way, then done → (i + 0.5)/4, (i + 1)/4
    expect(progress).toEqual([0.125, 0.25, 0.375, 0.5, 0.625, 0.75, 0.875, 1]);
  });

  it('stops at the next point once the signal fires and keeps the points already done', async () => {
    const plan = planIndexSweep(domePackage(ROUND_INDICES), [1.2, 1.4, 1.6]);
    const ctl = new AbortController();
    const run = await runSweep(plan, fakeTracer, { rays: 10, seed: 1, signal: ctl.signal, onPoint: () => ctl.abort() });
    expect(run.cancelled).toBe(true);
    expect(run.results.map((r) => r.x)).toEqual([1.2]);
  });

  it('treats a rejected trace after a cancel as a cancel, and any other rejection as an error', async () => {
    const plan = planIndexSweep(domePackage(ROUND_INDICES), [1.2, 1.4]);
    const ctl = new AbortController();
    const cancelling: SweepTracer = async () => {
      ctl.abort();
      throw new Error('cancelled by the pool');
    };
    const run = await runSweep(plan, cancelling, { rays: 10, seed: 1, signal: ctl.signal });
    expect(run).toMatchObject({ cancelled: true, results: [] });
    const failing: SweepTracer = async () => {
      throw new Error('worker crashed');
    };
    await expect(runSweep(plan, failing, { rays: 10, seed: 1 })).rejects.toThrow('worker crashed');
  });

  it('rejects a ray count that is not a whole number ≥ 1', async () => {
    const plan = planIndexSweep(domePackage(ROUND_INDICES), [1.5]);
    await expect(runSweep(plan, fakeTracer, { rays: 0, seed: 1 })).rejects.toThrow(RangeError);
    await expect(runSweep(plan, fakeTracer, { rays: 1.5, seed: 1 })).rejects.toThrow(/rays/);
  });

  it('reproduces 0.5·(1 − 0.04) = 0.48 for a point source at the centre of a 1.5 hemisphere on an absorbing base', async () => {
    // An exact result the Monte Carlo must reproduce (closed form: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5). The emitter sits 0.5 µm above the base, 7.1e-4 of R
    // or less, which shifts the value by < 1e-4 — far below σ ≈ 0.0035 at 20 000 rays. k = 4 standard errors.
    const plan = planRadiusSweep(pointSourcePackage(0), [1000, 5000]);
    const run = await runSweep(plan, syncTracer, { rays: 20_000, seed: 7 });
    for (const r of run.results) {
      expect(Math.abs(r.extraction - 0.48)).toBeLessThanOrEqual(4 * r.stderr);
    }
  });

  it('lets every ray out over a perfect, lossless mirror (extraction 1: every ray meets the dome square on, common practice)', async () => {
    // Every ray escapes unless the event cap stops it; reflected rays return to the dome at the same
    // normal incidence, so a ray survives k reflections with probability 0.04^k: none reach the cap.
    const run = await runSweep(planRadiusSweep(pointSourcePackage(1), [1000]), syncTracer, { rays: 5_000, seed: 3 });
    expect(run.results[0].extraction).toBe(1);
  });

  it('shows the trap of a dome below the no-TIR radius: R/r = 1.05 extracts less than R/r = 2', async () => {
    // dome: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5; sine rule, Born & Wolf §4.2.3: below R = r·n_enc/n_out (here R/r = 1.5) rays from the chip's outer parts meet the
    // dome beyond the critical angle. Common random numbers make the two estimates positively
    // correlated, so the independent-error bound √(σ1² + σ2²) is conservative; k = 4.
    const run = await runSweep(planRadiusSweep(domePackage(ROUND_INDICES), [1.05, 2]), syncTracer, { rays: 30_000, seed: 11 });
    const [small, large] = run.results;
    const sigma = Math.hypot(small.stderr, large.stderr);
    expect(large.extraction - small.extraction).toBeGreaterThan(4 * sigma);
  });
});
