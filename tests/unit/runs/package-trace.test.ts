import { describe, expect, it } from 'vitest';
import { isAbort } from '../../../src/lib/runs/abort';
import { bareRays, tracePackage } from '../../../src/lib/runs/package-trace';
import { packageKey } from '../../../src/lib/runs/trace-key';
import type { Tracer } from '../../../src/lib/runs/tracer';
import { summarize } from '../../../src/lib/trace/summary';
import { traceSync } from '../../../src/lib/trace/trace';
import { domePackage, NO_ENCAPSULANT, withEncapsulant } from '../../support/fixtures';

/** The synchronous tracer as a Tracer, reporting progress in two steps. */
const syncTracer: Tracer = async (pkg, { rays, seed, onProgress }) => {
  onProgress?.(0.5);
  const summary = summarize(traceSync(pkg, { rays, seed }));
  onProgress?.(1);
  return { summary, seconds: 0, workers: 1, cached: false };
};

describe('tracePackage(tracer, pkg, options)', () => {
  it('traces the package and the bare chip on the same base from the same seed, and forms the gain', async () => {
    const pkg = domePackage();
    const fractions: number[] = [];
    const t = await tracePackage(syncTracer, pkg, { rays: 4000, seed: 3, onProgress: (f) => fractions.push(f) });
    expect(t.dome.summary).toEqual(summarize(traceSync(pkg, { rays: 4000, seed: 3 })));
    expect(t.bare!.summary).toEqual(summarize(traceSync(withEncapsulant(pkg, { ...pkg.encapsulant, shape: 'none' }), { rays: 4000, seed: 3 })));
    expect(t.gain!.gain).toBe(t.dome.summary.extraction / t.bare!.summary.extraction);
    expect(t.packageKey).toBe(packageKey(pkg));
    expect(fractions).toEqual([0.25, 0.5, 0.75, 1]); // both traces have 4000 rays: each is half the progress
  });

  it('has no companion trace and no gain for a bare chip (the trace is the bare chip)', async () => {
    const t = await tracePackage(syncTracer, withEncapsulant(domePackage(), NO_ENCAPSULANT), { rays: 2000, seed: 1 });
    expect(t.bare).toBeNull();
    expect(t.gain).toBeNull();
  });

  it('uses at most 2 000 000 rays for the bare chip', () => {
    expect(bareRays(250_000)).toBe(250_000);
    expect(bareRays(10_000_000)).toBe(2_000_000);
  });

  it('stops with an AbortError between the two traces when cancelled', async () => {
    const ctl = new AbortController();
    const cancelling: Tracer = async (pkg, o) => {
      const r = await syncTracer(pkg, o);
      ctl.abort();
      return r;
    };
    await expect(tracePackage(cancelling, domePackage(), { rays: 1000, seed: 1, signal: ctl.signal })).rejects.toSatisfy(isAbort);
  });
});
