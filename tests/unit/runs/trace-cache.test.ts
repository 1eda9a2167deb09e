import { describe, expect, it } from 'vitest';
import { TRACE_CACHE_KEY, TraceCache, cachedTracer, type TextStore } from '../../../src/lib/runs/trace-cache';
import type { Tracer } from '../../../src/lib/runs/tracer';
import { packageKey, traceKey, canonicalJson, fnv1a64 } from '../../../src/lib/runs/trace-key';
import { summarize } from '../../../src/lib/trace/summary';
import { traceSync } from '../../../src/lib/trace/trace';
import { domePackage } from '../../support/fixtures';

/** An in-memory Web Storage stand-in; `quota` refuses texts longer than it. */
function memoryStore(quota = Infinity): TextStore & { data: Map<string, string> } {
  const data = new Map<string, string>();
  return {
    data,
    getItem: (k) => data.get(k) ?? null,
    setItem: (k, v) => {
      if (v.length > quota) throw new Error('QuotaExceededError');
      data.set(k, v);
    },
    removeItem: (k) => void data.delete(k)
  };
}

const pkg = domePackage();
const summary = summarize(traceSync(pkg, { rays: 2000, seed: 1 }));

describe('trace keys', () => {
  it('canonicalJson sorts keys, so key order does not change a key', () => {
    expect(canonicalJson({ b: 1, a: { d: [1, { f: 2, e: 3 }], c: null } })).toBe('{"a":{"c":null,"d":[1,{"e":3,"f":2}]},"b":1}');
    const reordered = { polarization: pkg.polarization, outsideN: pkg.outsideN, encapsulant: pkg.encapsulant, base: pkg.base, chip: pkg.chip };
    expect(packageKey(reordered)).toBe(packageKey(pkg));
  });

  it('fnv1a64 gives 16 hex digits; FNV-1a 32 of "a" is e40c292c (published test vector, FNV draft)', () => {
    expect(fnv1a64('a')).toMatch(/^e40c292c[0-9a-f]{8}$/);
    expect(fnv1a64('')).toMatch(/^811c9dc5/);
  });

  it('a ray count or seed changes the trace key, never the package key; a changed index changes both', () => {
    expect(traceKey(pkg, 1000, 1)).not.toBe(traceKey(pkg, 2000, 1));
    expect(traceKey(pkg, 1000, 1)).not.toBe(traceKey(pkg, 1000, 2));
    const other = { ...pkg, encapsulant: { ...pkg.encapsulant, n: 1.53 } };
    expect(packageKey(other)).not.toBe(packageKey(pkg));
    expect(traceKey(other, 1000, 1)).not.toBe(traceKey(pkg, 1000, 1));
  });
});

describe('TraceCache', () => {
  it('keeps a summary across instances on the same storage (a reload), exactly as traced', () => {
    const store = memoryStore();
    new TraceCache(store).put(pkg, 2000, 1, summary);
    const again = new TraceCache(store);
    expect(again.get(pkg, 2000, 1)).toEqual(summary);
    expect(again.get(pkg, 2000, 2)).toBeNull();
  });

  it('keeps at most maxEntries, dropping the least recently used', () => {
    const c = new TraceCache(memoryStore(), 2);
    c.put(pkg, 1000, 1, summary);
    c.put(pkg, 1000, 2, summary);
    c.get(pkg, 1000, 1); // 1 is now the most recent
    c.put(pkg, 1000, 3, summary);
    expect(c.size).toBe(2);
    expect(c.get(pkg, 1000, 2)).toBeNull();
    expect(c.get(pkg, 1000, 1)).not.toBeNull();
  });

  it('drops a damaged or tampered store instead of showing it (never NaN on screen)', () => {
    const store = memoryStore();
    store.setItem(TRACE_CACHE_KEY, '{not json');
    expect(new TraceCache(store).size).toBe(0);
    expect(store.getItem(TRACE_CACHE_KEY)).toBeNull();
    store.setItem(TRACE_CACHE_KEY, JSON.stringify([{ key: traceKey(pkg, 2000, 1), summary: { ...summary, extraction: 'NaN' } }]));
    expect(new TraceCache(store).get(pkg, 2000, 1)).toBeNull();
  });

  it('works without storage, and keeps fewer entries when the quota is full', () => {
    const mem = new TraceCache(null);
    mem.put(pkg, 2000, 1, summary);
    expect(mem.get(pkg, 2000, 1)).toEqual(summary);
    const one = JSON.stringify([{ key: traceKey(pkg, 2000, 1), summary }]).length;
    const store = memoryStore(one + 100);
    const small = new TraceCache(store);
    small.put(pkg, 2000, 1, summary);
    small.put(pkg, 2000, 2, summary);
    expect(JSON.parse(store.getItem(TRACE_CACHE_KEY)!).length).toBe(1);
  });
});

describe('cachedTracer(tracer, cache)', () => {
  it('traces once, then answers the same package, rays and seed from the cache', async () => {
    let runs = 0;
    const engine: Tracer = async (p, o) => {
      runs++;
      return { summary: summarize(traceSync(p, { rays: o.rays, seed: o.seed })), seconds: 0.01, workers: 1, cached: false };
    };
    const tracer = cachedTracer(engine, new TraceCache(null));
    const first = await tracer(pkg, { rays: 2000, seed: 1 });
    let progress = 0;
    const second = await tracer(pkg, { rays: 2000, seed: 1, onProgress: (f) => (progress = f) });
    expect(runs).toBe(1);
    expect(first.cached).toBe(false);
    expect(second.cached).toBe(true);
    expect(second.summary).toEqual(first.summary);
    expect(progress).toBe(1);
    await tracer(pkg, { rays: 3000, seed: 1 });
    expect(runs).toBe(2);
  });
});
