/**
 * Reading one saved document (the scenario, the layer stack) from browser storage so that nothing is
 * lost: the current key first, then older versions' keys (read, never written). A saved text that
 * cannot be read is copied to "<current key>.unreadable" before the app writes the key again, and the
 * message says where it is kept.
 */
export type ReadSaved<T> = { ok: true; value: T } | { ok: false; message: string };

export interface LoadedSaved<T> {
  /** The saved document, or null when there is none or it could not be read. */
  value: T | null;
  /** Why a saved text could not be used, for the page to show; null otherwise. */
  message: string | null;
}

/**
 * @param keys the current key, then older keys, newest first
 * @param read parses and validates a saved JSON value (migrating older versions)
 * @param what the document in words, e.g. "scenario"; @param instead what the page shows instead
 */
export function loadSaved<T>(
  storage: Storage,
  keys: readonly string[],
  read: (raw: unknown) => ReadSaved<T>,
  what: string,
  instead: string
): LoadedSaved<T> {
  for (const key of keys) {
    let text: string | null;
    try {
      text = storage.getItem(key);
    } catch {
      return { value: null, message: null };
    }
    if (!text) continue;
    let reason: string;
    try {
      const r = read(JSON.parse(text));
      if (r.ok) return { value: r.value, message: null };
      reason = r.message;
    } catch {
      reason = 'it is not valid JSON.';
    }
    const why = reason.replace(/\.$/, '');
    try {
      const where = key === keys[0] ? `${keys[0]}.unreadable` : key;
      if (key === keys[0]) storage.setItem(where, text);
      return { value: null, message: `Your saved ${what} could not be read (${why}); it is kept untouched in this browser's storage under "${where}". Showing ${instead}.` };
    } catch {
      return { value: null, message: `Your saved ${what} could not be read (${why}), and the browser refused to keep a copy. Showing ${instead}.` };
    }
  }
  return { value: null, message: null };
}
