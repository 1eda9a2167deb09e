/**
 * Finished traces kept across reloads: a small store of summaries named by traceKey (package + rays +
 * seed), most recent first, at most `maxEntries`. The browser passes localStorage; without storage
 * (private mode, Node) it keeps them in memory only. A stored text it cannot read is dropped, never
 * shown. Pure: the storage is handed in.
 */
import type { TracePackage } from '../trace/package-spec';
import type { TraceSummary } from '../trace/summary';
import type { Tracer } from './tracer';
import { traceKey } from './trace-key';

/** The part of the Web Storage API the cache uses. */
export interface TextStore {
  getItem(key: string): string | null;
  setItem(key: string, value: string): void;
  removeItem(key: string): void;
}

/** Storage key of the browser's trace cache. */
export const TRACE_CACHE_KEY = 'outcouple.traces.v1';

interface Entry {
  key: string;
  summary: TraceSummary;
}

/** A stored summary is used only if its main numbers are sound (a hand-edited store cannot put NaN on screen). */
function soundSummary(s: unknown): s is TraceSummary {
  const x = s as TraceSummary;
  return (
    typeof x === 'object' && x !== null &&
    Number.isInteger(x.rays) && x.rays > 0 &&
    Number.isFinite(x.extraction) && x.extraction >= 0 && x.extraction <= 1 &&
    Number.isFinite(x.stderr) && x.stderr >= 0 &&
    typeof x.ledger === 'object' && x.ledger !== null &&
    typeof x.farField === 'object' && x.farField !== null && Array.isArray(x.farField.bins)
  );
}

export class TraceCache {
  #entries: Entry[] = [];
  readonly #store: TextStore | null;
  readonly #maxEntries: number;

  /** @param store where to keep the entries across reloads, or null for memory only; @param maxEntries ≥ 1 */
  constructor(store: TextStore | null, maxEntries = 24) {
    this.#store = store;
    this.#maxEntries = Math.max(1, Math.floor(maxEntries));
    this.#entries = this.#read();
  }

  get size(): number {
    return this.#entries.length;
  }

  /** The summary of exactly this trace, if kept. */
  get(pkg: TracePackage, rays: number, seed: number): TraceSummary | null {
    const key = traceKey(pkg, rays, seed);
    const i = this.#entries.findIndex((e) => e.key === key);
    if (i < 0) return null;
    const [entry] = this.#entries.splice(i, 1);
    this.#entries.unshift(entry); // most recently used first
    return entry.summary;
  }

  /** Keeps a finished trace (the oldest entry goes when full). */
  put(pkg: TracePackage, rays: number, seed: number, summary: TraceSummary): void {
    const key = traceKey(pkg, rays, seed);
    this.#entries = [{ key, summary }, ...this.#entries.filter((e) => e.key !== key)].slice(0, this.#maxEntries);
    this.#write();
  }

  #read(): Entry[] {
    if (!this.#store) return [];
    try {
      const text = this.#store.getItem(TRACE_CACHE_KEY);
      if (text === null) return [];
      const list: unknown = JSON.parse(text);
      if (!Array.isArray(list)) throw new Error('not a list');
      return list.filter((e): e is Entry => typeof e?.key === 'string' && soundSummary(e.summary)).slice(0, this.#maxEntries);
    } catch {
      this.#forget();
      return [];
    }
  }

  #write(): void {
    if (!this.#store) return;
    // A full storage quota: drop the oldest entries until it fits (or keep them in memory only).
    for (let n = this.#entries.length; n > 0; n--) {
      try {
        this.#store.setItem(TRACE_CACHE_KEY, JSON.stringify(this.#entries.slice(0, n)));
        return;
      } catch {
        // try again with fewer entries
      }
    }
  }

  #forget(): void {
    try {
      this.#store?.removeItem(TRACE_CACHE_KEY);
    } catch {
      // storage refused: memory only
    }
  }
}

/** A tracer that answers from the cache when it can and keeps what it traces. */
export function cachedTracer(tracer: Tracer, cache: TraceCache): Tracer {
  return async (pkg, options) => {
    const hit = cache.get(pkg, options.rays, options.seed);
    if (hit) {
      options.onProgress?.(1);
      return { summary: hit, seconds: 0, workers: 0, cached: true };
    }
    const outcome = await tracer(pkg, options);
    cache.put(pkg, options.rays, options.seed, outcome.summary);
    return outcome;
  };
}
