/**
 * The page's layer stack in the running app: kept in the link (`stack=` parameter, next to the
 * scenario's `s=`) and in localStorage, so a reload or a copied link reopens the same stack.
 * Only this file touches the URL and storage for the stack.
 */
import { browser } from '$app/environment';
import { replaceState } from '$app/navigation';
import { page } from '$app/state';
import { loadSaved } from '$lib/scenario/saved-item';
import { userMaterials } from '$lib/materials-user';
import { carryUserMaterials, checkStack, defaultStack, type StackDoc } from './stack-doc';
import { decodeStackParam, encodeStackParam, STACK_PARAM } from './stack-url';

/** localStorage key; the number is the stack version written under it. */
export const STACK_KEY = 'outcouple.stack.v2';
/** The key version 1 wrote: read (and lifted) when the current one is empty, never written. */
const OLDER_STACK_KEY = 'outcouple.stack.v1';

const userLookup = (id: string) => userMaterials.list.find((m) => m.id === id);

export class StackStore {
  /** The current, always valid stack. Replace it through `set`. */
  doc: StackDoc = $state.raw(defaultStack());
  /** Why a link's stack was not used, until dismissed. */
  linkMessage: string | null = $state(null);
  /** Set when the browser refuses storage. */
  storageMessage: string | null = $state(null);
  /** Set when the saved stack could not be read (it is set aside, see loadSaved), until dismissed. */
  loadMessage: string | null = $state(null);
  readonly param: string = $derived(encodeStackParam(this.doc));

  #started = false;

  /** Reads the link (which wins), else storage, else keeps the current stack; writes both. Returns the cleanup. */
  start(): () => void {
    if (!browser || this.#started) return () => {};
    this.#started = true;
    const fromUrl = new URL(window.location.href).searchParams.get(STACK_PARAM);
    const saved = this.#load();
    const fallback = saved ?? this.doc;
    if (fromUrl) {
      const d = decodeStackParam(fromUrl, fallback);
      this.doc = d.doc;
      this.linkMessage = d.message;
    } else {
      this.doc = fallback;
    }
    // A stack saved before stacks carried user materials gets their definitions now
    this.doc = carryUserMaterials(this.doc, userLookup);
    this.#save();
    this.writeUrl();
    return () => {
      this.#started = false;
    };
  }

  /**
   * Makes `next` the stack if it is valid (saved and put in the link), carrying the definitions of the
   * user materials its layers use. Returns null, or the message naming the problem.
   */
  set(next: StackDoc): string | null {
    const r = checkStack(carryUserMaterials(next, userLookup));
    if (!r.ok) return r.message;
    this.doc = r.doc;
    this.#save();
    this.writeUrl();
    return null;
  }

  /** Puts the stack into the current link, keeping the other parameters. */
  writeUrl(): void {
    if (!browser || !this.#started) return;
    const url = new URL(window.location.href);
    if (url.searchParams.get(STACK_PARAM) === this.param) return;
    url.searchParams.set(STACK_PARAM, this.param);
    try {
      replaceState(url, page.state);
    } catch {
      // Router not ready yet: the plain history API does the same.
      history.replaceState(history.state, '', url);
    }
  }

  #storage(): Storage | null {
    try {
      const s = window.localStorage;
      const probe = `${STACK_KEY}.probe`;
      s.setItem(probe, '1');
      s.removeItem(probe);
      return s;
    } catch {
      this.storageMessage = "Cannot save in this browser: the stack is kept only in this tab's link.";
      return null;
    }
  }

  /** The saved stack (current key, else version 1's); one that cannot be read is set aside and reported. */
  #load(): StackDoc | null {
    const s = this.#storage();
    if (!s) return null;
    const read = (raw: unknown) => {
      const r = checkStack(raw);
      return r.ok ? { ok: true as const, value: r.doc } : r;
    };
    const loaded = loadSaved(s, [STACK_KEY, OLDER_STACK_KEY], read, 'layer stack', 'the starting stack');
    this.loadMessage = loaded.message;
    return loaded.value;
  }

  #save(): void {
    if (!this.#started) return;
    const s = this.#storage();
    if (!s) return;
    try {
      s.setItem(STACK_KEY, JSON.stringify(this.doc));
      this.storageMessage = null;
    } catch {
      this.storageMessage = "Cannot save in this browser: the stack is kept only in this tab's link.";
    }
  }
}

/** The page's one stack store (module-level, so the stack survives leaving and re-entering the page). */
export const stackStore = new StackStore();
