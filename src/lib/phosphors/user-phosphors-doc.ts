/**
 * The user's phosphors as stored in the browser: a versioned JSON document
 * `{ format: "outcouple-user-phosphors", version: 1, phosphors: [...] }`. Reading never throws and never
 * drops data silently: an entry that fails validation is kept aside (returned in `unreadable`, with the
 * reason) so the store can save it under a separate key instead of losing it.
 */
import { validateUserPhosphor, type UserPhosphor } from './user-phosphor';

export const USER_PHOSPHORS_FORMAT = 'outcouple-user-phosphors';
export const USER_PHOSPHORS_VERSION = 1;
/** Most user phosphors kept. */
export const MAX_USER_PHOSPHORS = 50;

export function encodeUserPhosphors(phosphors: readonly UserPhosphor[]): string {
  return JSON.stringify({ format: USER_PHOSPHORS_FORMAT, version: USER_PHOSPHORS_VERSION, phosphors });
}

export interface ReadUserPhosphors {
  phosphors: UserPhosphor[];
  /** Entries (or the whole text) that could not be read, with why; to be set aside, not lost. */
  unreadable: { raw: string; reason: string }[];
}

export function readUserPhosphors(text: string | null): ReadUserPhosphors {
  if (text === null || text === '') return { phosphors: [], unreadable: [] };
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch {
    return { phosphors: [], unreadable: [{ raw: text, reason: 'not valid JSON' }] };
  }
  const doc = raw as { format?: unknown; version?: unknown; phosphors?: unknown };
  if (raw === null || typeof raw !== 'object' || doc.format !== USER_PHOSPHORS_FORMAT || !Array.isArray(doc.phosphors)) {
    return { phosphors: [], unreadable: [{ raw: text, reason: `not an ${USER_PHOSPHORS_FORMAT} document` }] };
  }
  if (typeof doc.version !== 'number' || doc.version > USER_PHOSPHORS_VERSION) {
    return { phosphors: [], unreadable: [{ raw: text, reason: `written by a newer version (${String(doc.version)}); this one reads version ${USER_PHOSPHORS_VERSION}` }] };
  }
  const out: ReadUserPhosphors = { phosphors: [], unreadable: [] };
  const seen = new Set<string>();
  for (const entry of doc.phosphors) {
    const r = validateUserPhosphor(entry);
    if (r.ok && !seen.has(r.phosphor.id) && out.phosphors.length < MAX_USER_PHOSPHORS) {
      seen.add(r.phosphor.id);
      out.phosphors.push(r.phosphor);
    } else out.unreadable.push({ raw: JSON.stringify(entry), reason: r.ok ? 'a duplicate id or over the limit' : r.message });
  }
  return out;
}

/** A free id 'user-<slug of the name>' (with -2, -3 … when taken). */
export function userPhosphorId(name: string, taken: readonly string[]): string {
  const slug = name.toLowerCase().normalize('NFKD').replace(/[^a-z0-9]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 28) || 'phosphor';
  let id = `user-${slug}`;
  for (let i = 2; taken.includes(id); i++) id = `user-${slug}-${i}`;
  return id;
}
