/**
 * The user's own materials in the running app: kept in localStorage under a versioned key, followed
 * from other tabs, merged with the shipped library by `allMaterials()`. When the browser refuses
 * storage the materials still work for this visit and `storageMessage` says they will not be kept.
 */
import { browser } from '$app/environment';
import { listMaterials } from '$lib/materials';
import type { Material } from '$lib/materials/types';
import {
  encodeUserMaterials,
  MAX_USER_MATERIALS,
  mergeUserMaterials,
  readUserMaterialsFile,
  type MergeResult
} from './user-materials-file';

/** localStorage key; the number is the file version written under it. */
export const USER_MATERIALS_KEY = 'outcouple.user-materials.v1';

export const USER_STORAGE_UNAVAILABLE =
  'Cannot save in this browser: your materials work for this visit only. Export them to keep them.';

export type ImportResult = ({ ok: true } & Omit<MergeResult, 'materials'>) | { ok: false; message: string };

export class UserMaterialStore {
  /** The user's materials, in the order they were added. Replace, never mutate. */
  list: readonly Material[] = $state.raw([]);
  /** Set when the browser refuses storage; cleared when a save works again. */
  storageMessage: string | null = $state(null);
  /** Set when the stored materials could not be read (they are left in storage untouched). */
  loadMessage: string | null = $state(null);

  #users = 0;
  #stopListening: (() => void) | null = null;

  /**
   * Reads the stored materials and follows other tabs while at least one part of the page uses them.
   * Returns that part's cleanup; the last cleanup stops following.
   */
  start(): () => void {
    if (!browser) return () => {};
    if (this.#users++ === 0) {
      this.#load();
      const onStorage = (e: StorageEvent) => {
        if (e.key !== USER_MATERIALS_KEY) return;
        const r = e.newValue ? readUserMaterialsFile(e.newValue) : { ok: true as const, materials: [] };
        if (r.ok) this.list = r.materials;
      };
      window.addEventListener('storage', onStorage);
      this.#stopListening = () => window.removeEventListener('storage', onStorage);
    }
    let done = false;
    return () => {
      if (done) return;
      done = true;
      if (--this.#users === 0) {
        this.#stopListening?.();
        this.#stopListening = null;
      }
    };
  }

  /** Whether `id` names one of the user's materials. */
  has(id: string): boolean {
    return this.list.some((m) => m.id === id);
  }

  /** Ids in use by the user's materials. */
  ids(): Set<string> {
    return new Set(this.list.map((m) => m.id));
  }

  /** Adds a validated material. Returns null, or a message when the limit is reached. */
  add(material: Material): string | null {
    if (this.list.length >= MAX_USER_MATERIALS) return `You can keep at most ${MAX_USER_MATERIALS} materials; delete one first.`;
    this.list = mergeUserMaterials(this.list, [material]).materials;
    this.#save();
    return null;
  }

  remove(id: string): void {
    this.list = this.list.filter((m) => m.id !== id);
    this.#save();
  }

  /** The JSON text of all user materials (for "Export"). */
  exportText(): string {
    return encodeUserMaterials(this.list);
  }

  /** Validates a file's text and adds its materials; on any problem nothing changes. */
  importText(text: string): ImportResult {
    const r = readUserMaterialsFile(text);
    if (!r.ok) return r;
    const merged = mergeUserMaterials(this.list, r.materials);
    if (merged.materials.length > MAX_USER_MATERIALS) {
      return {
        ok: false,
        message: `Importing would make ${merged.materials.length} materials; at most ${MAX_USER_MATERIALS} are allowed. Nothing was imported.`
      };
    }
    this.list = merged.materials;
    this.#save();
    return { ok: true, added: merged.added, unchanged: merged.unchanged, renamed: merged.renamed };
  }

  #storage(): Storage | null {
    try {
      const s = window.localStorage;
      const probe = `${USER_MATERIALS_KEY}.probe`;
      s.setItem(probe, '1');
      s.removeItem(probe);
      return s;
    } catch {
      this.storageMessage = USER_STORAGE_UNAVAILABLE;
      return null;
    }
  }

  #load(): void {
    const s = this.#storage();
    if (!s) return;
    let text: string | null = null;
    try {
      text = s.getItem(USER_MATERIALS_KEY);
    } catch {
      this.storageMessage = USER_STORAGE_UNAVAILABLE;
      return;
    }
    if (!text) return;
    const r = readUserMaterialsFile(text);
    if (r.ok) this.list = r.materials;
    else {
      this.loadMessage = `Your saved materials could not be read (${r.message}) They are left in storage untouched; materials you add now are kept for this visit only.`;
    }
  }

  #save(): void {
    if (!browser) return;
    if (this.loadMessage) return; // never overwrite materials we could not read
    const s = this.#storage();
    if (!s) return;
    try {
      if (this.list.length === 0) s.removeItem(USER_MATERIALS_KEY);
      else s.setItem(USER_MATERIALS_KEY, encodeUserMaterials(this.list));
      this.storageMessage = null;
    } catch {
      this.storageMessage = USER_STORAGE_UNAVAILABLE;
    }
  }
}

/** The app's one store of user materials. Call `userMaterials.start()` once in the browser (pages that use it do). */
export const userMaterials = new UserMaterialStore();

/**
 * The shipped library followed by the user's materials (reactive: read inside `$derived` and it
 * updates when the user adds or removes one). User materials carry provenance "user supplied".
 */
export function allMaterials(): Material[] {
  return [...listMaterials(), ...userMaterials.list];
}

/** The library or user material with this id, or undefined. */
export function findAnyMaterial(id: string): Material | undefined {
  return listMaterials().find((m) => m.id === id) ?? userMaterials.list.find((m) => m.id === id);
}

/** Whether this id names a user material (shown with a "user" mark). */
export function isUserMaterial(id: string): boolean {
  return userMaterials.has(id);
}
