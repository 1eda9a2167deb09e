import { describe, expect, it } from 'vitest';
import { abortError } from '../../../src/lib/runs/abort';
import { LatestRun, type RunContext, type RunView } from '../../../src/lib/runs/latest-run';

/** Work that waits until the test settles it, and rejects with an AbortError when cancelled (like a pool). */
function controllable<R>() {
  let settle!: { resolve(r: R): void; reject(e: unknown): void };
  let ctx!: RunContext<R>;
  const work = (c: RunContext<R>) =>
    new Promise<R>((resolve, reject) => {
      ctx = c;
      settle = { resolve, reject };
      c.signal.addEventListener('abort', () => reject(abortError()));
    });
  return { work, settle: () => settle, ctx: () => ctx };
}

describe('LatestRun', () => {
  it('goes idle → running → done with the result, progress clamped to [0, 1], and tells every change', async () => {
    const views: RunView<number>[] = [];
    const run = new LatestRun<number>((v) => views.push({ ...v }));
    expect(run.view.status).toBe('idle');
    const w = controllable<number>();
    const p = run.start('k1', w.work);
    expect(run.view).toMatchObject({ status: 'running', progress: 0, startedKey: 'k1', result: null });
    w.ctx().progress(0.5);
    expect(run.view.progress).toBe(0.5);
    w.ctx().progress(7);
    expect(run.view.progress).toBe(1);
    w.ctx().progress(Number.NaN);
    expect(run.view.progress).toBe(0);
    w.settle().resolve(42);
    await p;
    expect(run.view).toMatchObject({ status: 'done', progress: 1, result: 42, resultKey: 'k1', error: null });
    expect(views.map((v) => v.status)).toContain('running');
    expect(views.at(-1)!.status).toBe('done');
  });

  it('cancels the run in flight when a new one starts: only the latest changes the state', async () => {
    const run = new LatestRun<string>();
    const first = controllable<string>();
    const second = controllable<string>();
    const p1 = run.start('old', first.work);
    const p2 = run.start('new', second.work);
    expect(first.ctx().signal.aborted).toBe(true);
    await p1;
    expect(run.view.status).toBe('running');
    // the old run's late reports are ignored
    first.ctx().progress(0.9);
    first.ctx().publish('stale');
    expect(run.view.progress).toBe(0);
    expect(run.view.result).toBeNull();
    second.settle().resolve('fresh');
    await p2;
    expect(run.view).toMatchObject({ status: 'done', result: 'fresh', resultKey: 'new', startedKey: 'new' });
  });

  it('keeps the last result through a cancel and through a failure', async () => {
    const run = new LatestRun<number>();
    await run.start('a', async () => 1);
    const w = controllable<number>();
    const p = run.start('b', w.work);
    run.cancel();
    await p;
    expect(run.view).toMatchObject({ status: 'cancelled', result: 1, resultKey: 'a', startedKey: 'b' });
    await run.start('c', async () => {
      throw new RangeError('rays must be an integer in [1000, 100000000]');
    });
    expect(run.view).toMatchObject({ status: 'error', error: 'rays must be an integer in [1000, 100000000]', result: 1 });
  });

  it('counts work that ignores the signal and finishes after a cancel as cancelled, not done', async () => {
    const run = new LatestRun<number>();
    let finish!: (n: number) => void;
    const p = run.start('x', () => new Promise<number>((r) => (finish = r)));
    run.cancel();
    finish(5);
    await p;
    expect(run.view.status).toBe('cancelled');
    expect(run.view.result).toBeNull();
  });

  it('shows a published partial result before the run ends', async () => {
    const run = new LatestRun<number[]>();
    const w = controllable<number[]>();
    const p = run.start('sweep', w.work);
    w.ctx().publish([1, 2]);
    expect(run.view).toMatchObject({ status: 'running', result: [1, 2], resultKey: 'sweep' });
    w.settle().resolve([1, 2, 3]);
    await p;
    expect(run.view.result).toEqual([1, 2, 3]);
  });
});
