import { describe, expect, it } from 'vitest';
import { chunkPlan, raysInChunk } from '../../../src/lib/trace/chunk-plan';
import { createTally } from '../../../src/lib/trace/tally';
import { traceSync } from '../../../src/lib/trace/trace';
import { traceChunk } from '../../../src/lib/trace/trace-chunk';
import { domePackage } from '../../support/fixtures';

describe('traceSync(pkg, options, onProgress)', () => {
  it('is the chunk plan traced in order: the same tally as tracing each chunk by hand', () => {
    const rays = 40_000;
    const byHand = createTally();
    const plan = chunkPlan(rays);
    for (let i = 0; i < plan.chunkCount; i++) traceChunk(domePackage(), i, raysInChunk(plan, i), 9, byHand);
    expect(traceSync(domePackage(), { rays, seed: 9 })).toEqual(byHand);
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
