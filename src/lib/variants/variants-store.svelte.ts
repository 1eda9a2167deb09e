/**
 * The kept variants of the running app — the one place that keeps them in the browser and the link.
 * Saved under a versioned localStorage key (an unreadable saved set is set aside by loadSaved and the
 * user told); on the variants page the link carries them too (`v`), and a link's variants win over
 * the saved ones, like the scenario's. Followed from other tabs through the `storage` event.
 */
import { browser } from '$app/environment';
import { replaceState } from '$app/navigation';
import { page } from '$app/state';
import { loadSaved } from '$lib/scenario/saved-item';
import type { Scenario } from '$lib/scenario/schema';
import { emptyVariants, readVariants, VARIANTS_STORAGE_KEY, type VariantsDoc } from './variants-doc';
import { keepVariant, removeVariant, renameVariant, type EditResult } from './variants-edit';
import { decodeVariantsParam, encodeVariantsParam, VARIANTS_PARAM } from './variants-url';

export class VariantsStore {
  /** The kept variants. Replace through the edit methods, never mutate. */
  doc: VariantsDoc = $state.raw(emptyVariants());
  /** Why the saved variants could not be read (set aside, see loadSaved), until dismissed. */
  loadMessage: string | null = $state(null);
  /** Why a link's variants were not used, until dismissed. */
  linkMessage: string | null = $state(null);
  /** Set when the browser refuses storage. */
  storageMessage: string | null = $state(null);
  /** The variants a link replaced (the user may bring them back), or null. */
  replaced: VariantsDoc | null = $state.raw(null);

  readonly param: string = $derived(encodeVariantsParam(this.doc));

  #started = false;

  /** Reads the saved variants once the app is mounted; follows other tabs. Returns the cleanup. */
  start(): () => void {
    if (!browser || this.#started) return () => {};
    this.#started = true;
    this.#load();
    const onStorage = (e: StorageEvent) => {
      if (e.key !== VARIANTS_STORAGE_KEY || !e.newValue) return;
      try {
        const r = readVariants(JSON.parse(e.newValue));
        if (r.ok) this.doc = r.value;
      } catch {
        // Another tab wrote something unreadable; keep ours.
      }
    };
    window.addEventListener('storage', onStorage);
    return () => {
      window.removeEventListener('storage', onStorage);
      this.#started = false;
    };
  }

  /** Adopts the variants carried by a link's `v` parameter (they win over the saved ones). */
  adoptLink(url: URL): void {
    const param = url.searchParams.get(VARIANTS_PARAM);
    if (!param || param === this.param) return;
    const d = decodeVariantsParam(param);
    if (d.ok) {
      // The user's own kept variants are never dropped silently: they can be brought back.
      if (this.doc.variants.length > 0) this.replaced = this.doc;
      this.doc = d.doc;
      this.#save();
    } else {
      this.linkMessage = d.message;
    }
  }

  /** Puts the variants into the current link (the variants page calls this; other parameters are kept). */
  writeUrl(): void {
    if (!browser) return;
    const url = new URL(window.location.href);
    if (this.doc.variants.length === 0) url.searchParams.delete(VARIANTS_PARAM);
    else url.searchParams.set(VARIANTS_PARAM, this.param);
    if (url.href === window.location.href) return;
    try {
      replaceState(url, page.state);
    } catch {
      history.replaceState(history.state, '', url);
    }
  }

  /** Brings back the variants a link replaced. */
  restoreReplaced(): void {
    if (!this.replaced) return;
    this.doc = this.replaced;
    this.replaced = null;
    this.#save();
  }

  keep(scenario: Scenario, name?: string): EditResult {
    return this.#apply(keepVariant(this.doc, scenario, name));
  }
  rename(index: number, name: string): EditResult {
    return this.#apply(renameVariant(this.doc, index, name));
  }
  remove(index: number): EditResult {
    return this.#apply(removeVariant(this.doc, index));
  }

  #apply(r: EditResult): EditResult {
    if (r.ok) {
      this.doc = r.doc;
      this.#save();
    }
    return r;
  }

  #storage(): Storage | null {
    try {
      return window.localStorage;
    } catch {
      this.storageMessage = "Cannot save in this browser: the variants are kept only in this tab.";
      return null;
    }
  }

  #load(): void {
    const s = this.#storage();
    if (!s) return;
    const loaded = loadSaved(s, [VARIANTS_STORAGE_KEY], readVariants, 'variants', 'no variants');
    this.loadMessage = loaded.message;
    if (loaded.value) this.doc = loaded.value;
  }

  #save(): void {
    if (!browser) return;
    const s = this.#storage();
    if (!s) return;
    try {
      s.setItem(VARIANTS_STORAGE_KEY, JSON.stringify(this.doc));
      this.storageMessage = null;
    } catch {
      this.storageMessage = "Cannot save in this browser: the variants are kept only in this tab.";
    }
  }
}

/** The app's one set of kept variants. */
export const variantsStore = new VariantsStore();
