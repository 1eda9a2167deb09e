import { describe, expect, it } from 'vitest';
import { createNodeTracePool, traceParallel } from '../../../src/lib/trace/node/node-pool';
import { traceSync } from '../../../src/lib/trace/trace';
import { domePackage } from '../../support/fixtures';

describe('traceParallel(pkg, options, threads) — Node worker threads', () => {
  // 3 chunks (40 000 rays at 16 384 per chunk), so two threads really share the work
  const options = { rays: 40_000, seed: 2024 };

  it('gives exactly the traceSync ledger with 1 and with 2 threads', async () => {
    const expected = traceSync(domePackage(), options);
    const progress: number[] = [];
    const one = await traceParallel(domePackage(), options, 1, (done) => progress.push(done));
    const two = await traceParallel(domePackage(), options, 2);
    expect(one).toEqual(expected);
    expect(two).toEqual(expected);
    expect(progress.at(-1)).toBe(40_000);
  });

  it('rejects a bad thread count or package with a RangeError', async () => {
    await expect(traceParallel(domePackage(), options, 0)).rejects.toThrow(/threads must be an integer in \[1, 64\]/);
    await expect(traceParallel({ ...domePackage(), outsideN: 0.5 }, options, 1)).rejects.toThrow(RangeError);
  });
});

describe('createNodeTracePool(threads) — a pool kept for several runs', () => {
  it('gives the traceSync ledger run after run, and refuses runs once closed', async () => {
    const pool = createNodeTracePool(2);
    try {
      for (const seed of [1, 2]) {
        const options = { rays: 20_000, seed };
        expect(await pool.run(domePackage(), options)).toEqual(traceSync(domePackage(), options));
      }
    } finally {
      await pool.close();
    }
    await expect(pool.run(domePackage(), { rays: 10, seed: 1 })).rejects.toThrow(/closed/);
  });

  it('rejects a bad thread count with a RangeError naming the range', () => {
    expect(() => createNodeTracePool(65)).toThrow(/threads must be an integer in \[1, 64\]/);
  });
});
