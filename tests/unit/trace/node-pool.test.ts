import { describe, expect, it } from 'vitest';
import { traceParallel } from '../../../src/lib/trace/node/node-pool';
import { traceSync } from '../../../src/lib/trace/trace';
import { domePackage } from './fixtures';

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
