import { describe, expect, it } from 'vitest';
import { isAbort } from '../../../src/lib/runs/abort';
import { RunQueue } from '../../../src/lib/runs/run-queue';

/** A job the test finishes by hand. */
function manualJob<T>() {
  let finish!: (value: T) => void;
  let fail!: (error: unknown) => void;
  let started = false;
  const job = () => {
    started = true;
    return new Promise<T>((resolve, reject) => ((finish = resolve), (fail = reject)));
  };
  return { job, finish: (v: T) => finish(v), fail: (e: unknown) => fail(e), started: () => started };
}

const tick = () => new Promise((r) => setTimeout(r, 0));

describe('RunQueue', () => {
  it('runs one job at a time, in the order queued', async () => {
    const q = new RunQueue();
    const a = manualJob<string>();
    const b = manualJob<string>();
    const pa = q.run(a.job, new AbortController().signal);
    const pb = q.run(b.job, new AbortController().signal);
    await tick();
    expect(a.started()).toBe(true);
    expect(b.started()).toBe(false);
    expect(q.waiting).toBe(1);
    a.finish('a');
    expect(await pa).toBe('a');
    await tick();
    expect(b.started()).toBe(true);
    b.finish('b');
    expect(await pb).toBe('b');
  });

  it('rejects a waiting job with an AbortError at once when its signal fires, and never starts it', async () => {
    const q = new RunQueue();
    const a = manualJob<number>();
    const b = manualJob<number>();
    const c = manualJob<number>();
    const ctl = new AbortController();
    const pa = q.run(a.job, new AbortController().signal);
    const pb = q.run(b.job, ctl.signal);
    const pc = q.run(c.job, new AbortController().signal);
    ctl.abort();
    await expect(pb).rejects.toSatisfy(isAbort);
    a.finish(1);
    await pa;
    await tick();
    expect(b.started()).toBe(false);
    expect(c.started()).toBe(true);
    c.finish(3);
    expect(await pc).toBe(3);
  });

  it('passes a failure on to its caller and goes on with the next job', async () => {
    const q = new RunQueue();
    const a = manualJob<number>();
    const pa = q.run(a.job, new AbortController().signal);
    const pb = q.run(async () => 2, new AbortController().signal);
    await tick();
    a.fail(new RangeError('encapsulant.n must be ≥ 1'));
    await expect(pa).rejects.toThrow(RangeError);
    expect(await pb).toBe(2);
  });

  it('hands the job its signal, so a running job can stop', async () => {
    const q = new RunQueue();
    const ctl = new AbortController();
    let seen: AbortSignal | null = null;
    await q.run(async (signal) => void (seen = signal), ctl.signal);
    expect(seen).toBe(ctl.signal);
  });
});
