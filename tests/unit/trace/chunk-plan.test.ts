import { describe, expect, it } from 'vitest';
import { CHUNK_SIZE, chunkPlan, dealSceneUnits, raysInChunk } from '../../../src/lib/trace/chunk-plan';

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

describe('dealSceneUnits(plan, scenes, w, count)', () => {
  it.each([1, 2, 3, 5, 8])('deals every (scene, chunk) unit of 3 scenes × 7 chunks to exactly one of %i workers', (count) => {
    const plan = chunkPlan(6 * CHUNK_SIZE + 100);
    const seen = new Map<string, number>();
    for (let w = 0; w < count; w++) {
      const units = dealSceneUnits(plan, 3, w, count);
      for (let j = 0; j < units.length; j += 2) {
        const key = `${units[j]},${units[j + 1]}`;
        seen.set(key, (seen.get(key) ?? 0) + 1);
      }
    }
    expect(seen.size).toBe(21);
    expect([...seen.values()].every((n) => n === 1)).toBe(true);
  });

  it('gives a worker beyond the units nothing', () => {
    expect(dealSceneUnits(chunkPlan(10), 1, 3, 4)).toHaveLength(0);
  });
});
