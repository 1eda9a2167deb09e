import { describe, expect, it } from 'vitest';
import { loadSaved, type ReadSaved } from '../../../src/lib/scenario/saved-item';

/** A Map-backed Storage; `refuseWrites` imitates a full or locked store. */
function memoryStorage(items: Record<string, string>, refuseWrites = false): Storage {
  const m = new Map(Object.entries(items));
  return {
    get length() {
      return m.size;
    },
    clear: () => m.clear(),
    getItem: (k: string) => m.get(k) ?? null,
    key: (i: number) => [...m.keys()][i] ?? null,
    removeItem: (k: string) => void m.delete(k),
    setItem: (k: string, v: string) => {
      if (refuseWrites) throw new Error('QuotaExceededError');
      m.set(k, v);
    }
  };
}

const readCount = (raw: unknown): ReadSaved<number> =>
  typeof raw === 'object' && raw !== null && typeof (raw as { n?: unknown }).n === 'number'
    ? { ok: true, value: (raw as { n: number }).n }
    : { ok: false, message: 'Count must be a number.' };

describe('loadSaved', () => {
  it('reads the current key first, then older keys', () => {
    expect(loadSaved(memoryStorage({ 'k.v2': '{"n":2}', 'k.v1': '{"n":1}' }), ['k.v2', 'k.v1'], readCount, 'count', 'zero')).toEqual({ value: 2, message: null });
    expect(loadSaved(memoryStorage({ 'k.v1': '{"n":1}' }), ['k.v2', 'k.v1'], readCount, 'count', 'zero')).toEqual({ value: 1, message: null });
    expect(loadSaved(memoryStorage({}), ['k.v2', 'k.v1'], readCount, 'count', 'zero')).toEqual({ value: null, message: null });
  });

  it('copies an unreadable current entry aside, untouched, and says where', () => {
    const s = memoryStorage({ 'k.v2': '{"n":"two"}' });
    const r = loadSaved(s, ['k.v2', 'k.v1'], readCount, 'count', 'zero');
    expect(r.value).toBeNull();
    expect(r.message).toBe('Your saved count could not be read (Count must be a number); it is kept untouched in this browser\'s storage under "k.v2.unreadable". Showing zero.');
    expect(s.getItem('k.v2.unreadable')).toBe('{"n":"two"}');
  });

  it('leaves an unreadable older entry where it is, and names it', () => {
    const s = memoryStorage({ 'k.v1': 'not json' });
    const r = loadSaved(s, ['k.v2', 'k.v1'], readCount, 'count', 'zero');
    expect(r.message).toMatch(/\(it is not valid JSON\); it is kept untouched in this browser's storage under "k\.v1"/);
    expect(s.getItem('k.v2.unreadable')).toBeNull();
  });

  it('says so when the browser refuses to keep the copy', () => {
    const r = loadSaved(memoryStorage({ 'k.v2': '[]' }, true), ['k.v2'], readCount, 'count', 'zero');
    expect(r.message).toBe('Your saved count could not be read (Count must be a number), and the browser refused to keep a copy. Showing zero.');
  });
});
