import { describe, expect, it } from 'vitest';
import { chunkPlan, raysInChunk } from '../../../src/lib/trace/chunk-plan';
import { createTally } from '../../../src/lib/trace/tally';
import { traceSync } from '../../../src/lib/trace/trace';
import { traceChunk } from '../../../src/lib/trace/trace-chunk';
import { demoScenario } from '../../../src/lib/scenario/defaults';
import { resolveScenario, toTracePackage, withDispersion } from '../../../src/lib/scenario';
import { withPhosphor } from '../../../src/lib/trace/white-light';
import { domePackage } from '../../support/fixtures';

describe('traceSync(pkg, options, onProgress)', () => {
  it('is the chunk plan traced in order: the same tally as tracing each chunk by hand', () => {
    const rays = 40_000;
    const byHand = createTally();
    const plan = chunkPlan(rays);
    for (let i = 0; i < plan.chunkCount; i++) traceChunk(domePackage(), i, raysInChunk(plan, i), 9, byHand);
    expect(traceSync(domePackage(), { rays, seed: 9 })).toEqual(byHand);
  });

  it('compiles the scene once for the run: a phosphor package with per-ray dispersion traces as on a fresh compile per chunk', () => {
    // the run's scene is rewritten at each ray's wavelength (indices) and re-emission; no state may carry over
    const base = demoScenario();
    const phosphor = { kind: 'table' as const, coefficients: [[300, 2, 0.5, 0.3], [800, 2, 0.5, 0.3]] as [number, number, number, number][], emission: [[560, 1], [600, 1]] as [number, number][], quantumYield: 0.9 };
    const pkg = withPhosphor(withDispersion(toTracePackage(base), base, resolveScenario(base)), phosphor, [[450, 1], [460, 1]]);
    const rays = 20_000;
    const byHand = createTally();
    const plan = chunkPlan(rays);
    for (let i = 0; i < plan.chunkCount; i++) traceChunk(pkg, i, raysInChunk(plan, i), 5, byHand);
    const once = traceSync(pkg, { rays, seed: 5 });
    expect(once.parts['phosphor:encapsulant']).toBeGreaterThan(0);
    expect(once).toEqual(byHand);
  });

  it('reports progress after each chunk, ending at the total', () => {
    const seen: number[] = [];
    traceSync(domePackage(), { rays: 40_000, seed: 1 }, (done, total) => {
      expect(total).toBe(40_000);
      seen.push(done);
    });
    expect(seen).toEqual([16384, 32768, 40000]);
  });

  it('rejects bad input with a RangeError before tracing', () => {
    expect(() => traceSync(domePackage(), { rays: 0, seed: 1 })).toThrow(/rays must be an integer/);
    expect(() => traceSync({ ...domePackage(), outsideN: 0 }, { rays: 10, seed: 1 })).toThrow(/outsideN must be/);
  });

  it('changes the result with the seed', () => {
    expect(traceSync(domePackage(), { rays: 2000, seed: 1 })).not.toEqual(traceSync(domePackage(), { rays: 2000, seed: 2 }));
  });
});
