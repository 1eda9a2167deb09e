/**
 * The user-materials file: what "Export" writes and "Import" reads, and what localStorage keeps.
 * Pure. A file is JSON `{ format: "outcouple-user-materials", version: 1, materials: [...] }`; a bare
 * array of materials or a single material object is read too. Every entry is checked with the
 * library's `validateUserMaterial`; one bad entry rejects the whole file, so nothing half-imports.
 */
import { validateUserMaterial } from '../materials/index';
import type { Material } from '../materials/types';

export const USER_MATERIALS_FORMAT = 'outcouple-user-materials';
export const USER_MATERIALS_VERSION = 1;
/** Largest file accepted, bytes (2 MiB). */
export const MAX_FILE_BYTES = 2 * 1024 * 1024;
/** Most user materials kept. */
export const MAX_USER_MATERIALS = 200;

/** The JSON text of a user-materials file. */
export function encodeUserMaterials(materials: readonly Material[]): string {
  return JSON.stringify({ format: USER_MATERIALS_FORMAT, version: USER_MATERIALS_VERSION, materials }, null, 2);
}

export type ReadFileResult = { ok: true; materials: Material[] } | { ok: false; message: string };

/**
 * Reads and validates the materials in a user-materials file. Never throws.
 * Messages say what is wrong and where: "Material 2 (My oxide): dispersion.terms.0.C must be ≥ 0."
 */
export function readUserMaterialsFile(text: string): ReadFileResult {
  if (typeof text !== 'string') return { ok: false, message: 'The file could not be read as text.' };
  if (text.length > MAX_FILE_BYTES) {
    return { ok: false, message: `The file is larger than ${MAX_FILE_BYTES / 1024 / 1024} MB; user-material files must be at most 2 MB.` };
  }
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch {
    return { ok: false, message: 'The file is not valid JSON: expected an Outcouple user-materials file (.json).' };
  }
  let list: unknown;
  if (Array.isArray(raw)) list = raw;
  else if (raw !== null && typeof raw === 'object' && 'materials' in raw) {
    const f = raw as { format?: unknown; version?: unknown; materials: unknown };
    if (f.format !== undefined && f.format !== USER_MATERIALS_FORMAT) {
      return { ok: false, message: `The file's format is "${String(f.format)}"; expected "${USER_MATERIALS_FORMAT}".` };
    }
    if (typeof f.version === 'number' && f.version > USER_MATERIALS_VERSION) {
      return {
        ok: false,
        message: `The file was written by a newer version of Outcouple (version ${f.version}); this one reads version ${USER_MATERIALS_VERSION}.`
      };
    }
    list = f.materials;
  } else if (raw !== null && typeof raw === 'object') list = [raw];
  if (!Array.isArray(list)) return { ok: false, message: 'The file holds no list of materials ("materials": [...]).' };
  if (list.length === 0) return { ok: false, message: 'The file holds no materials.' };
  if (list.length > MAX_USER_MATERIALS) {
    return { ok: false, message: `The file holds ${list.length} materials; at most ${MAX_USER_MATERIALS} are allowed.` };
  }
  const out: Material[] = [];
  for (let i = 0; i < list.length; i++) {
    const v = validateUserMaterial(list[i]);
    if (!v.ok) {
      const name = (list[i] as { name?: unknown } | null)?.name;
      const label = typeof name === 'string' && name.trim() !== '' ? ` (${name.trim().slice(0, 60)})` : '';
      return { ok: false, message: `Material ${i + 1}${label}: ${v.errors[0].message}.`.replace(/\.\.$/, '.') };
    }
    out.push({ ...v.material, provenance: 'user supplied' });
  }
  return { ok: true, materials: out };
}

/** Result of {@link mergeUserMaterials}. */
export interface MergeResult {
  materials: Material[];
  added: number;
  /** Entries identical to one already kept. */
  unchanged: number;
  /** Entries whose id was taken by a different material and were given a new id. */
  renamed: number;
}

/**
 * Adds `incoming` to `existing` without losing anything: an identical entry is skipped; an entry whose
 * id is taken by a different material gets a new id ("-2", "-3", …). Existing entries are never changed.
 * The caller checks the total against {@link MAX_USER_MATERIALS}.
 */
export function mergeUserMaterials(existing: readonly Material[], incoming: readonly Material[]): MergeResult {
  const materials = existing.slice();
  const ids = new Set(materials.map((m) => m.id));
  let added = 0;
  let unchanged = 0;
  let renamed = 0;
  for (const m of incoming) {
    const same = materials.find((e) => e.id === m.id);
    if (same && JSON.stringify(same) === JSON.stringify(m)) {
      unchanged++;
      continue;
    }
    let id = m.id;
    if (ids.has(id)) {
      const base = id.slice(0, 36);
      for (let i = 2; ids.has(id); i++) id = `${base}-${i}`;
      renamed++;
    }
    ids.add(id);
    materials.push({ ...m, id });
    added++;
  }
  return { materials, added, unchanged, renamed };
}
