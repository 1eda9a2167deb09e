import { describe, expect, it } from 'vitest';
import { CHUNK_SIZE, chunkPlan, raysInChunk } from '../../../src/lib/trace/chunk-plan';

describe('chunkPlan(rays)', () => {
  it.each([1, 16383, 16384, 16385, 1_000_000])('covers exactly %i rays in chunks of 16384', (rays) => {
    const plan = chunkPlan(rays);
    expect(plan.chunkSize).toBe(CHUNK_SIZE);
    expect(plan.chunkCount).toBe(Math.ceil(rays / CHUNK_SIZE));
    let sum = 0;
    for (let i = 0; i < plan.chunkCount; i++) {
      const n = raysInChunk(plan, i);
      expect(n).toBeGreaterThan(0);
      if (i < plan.chunkCount - 1) expect(n).toBe(CHUNK_SIZE);
      sum += n;
    }
    expect(sum).toBe(rays);
    expect(raysInChunk(plan, plan.chunkCount)).toBe(0);
  });
});
