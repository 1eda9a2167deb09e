/**
 * The user's own phosphors in the running app, kept in localStorage under a versioned key. Entries that
 * cannot be read are set aside under USER_PHOSPHORS_ASIDE_KEY (appended, never overwritten) before the
 * readable ones are saved again, so nothing is lost; `loadMessage` says so. When the browser refuses
 * storage the phosphors still work for this visit and `storageMessage` says they will not be kept.
 */
import { browser } from '$app/environment';
import type { UserPhosphor } from './user-phosphor';
import { encodeUserPhosphors, MAX_USER_PHOSPHORS, readUserPhosphors } from './user-phosphors-doc';

export const USER_PHOSPHORS_KEY = 'outcouple.user-phosphors.v1';
export const USER_PHOSPHORS_ASIDE_KEY = 'outcouple.user-phosphors.unreadable';

class UserPhosphorStore {
  list: readonly UserPhosphor[] = $state.raw([]);
  storageMessage: string | null = $state(null);
  loadMessage: string | null = $state(null);
  #loaded = false;
  /** Set when unreadable entries could not be set aside: then nothing is written over them. */
  #frozen = false;

  /** Reads the stored phosphors once (the first page that needs them). */
  load(): void {
    if (!browser || this.#loaded) return;
    this.#loaded = true;
    let text: string | null = null;
    try {
      text = window.localStorage.getItem(USER_PHOSPHORS_KEY);
    } catch {
      this.storageMessage = 'Cannot save in this browser: your phosphors work for this visit only.';
      return;
    }
    const r = readUserPhosphors(text);
    this.list = r.phosphors;
    if (r.unreadable.length) {
      try {
        const aside = JSON.parse(window.localStorage.getItem(USER_PHOSPHORS_ASIDE_KEY) ?? '[]');
        const kept = Array.isArray(aside) ? aside : [aside];
        window.localStorage.setItem(USER_PHOSPHORS_ASIDE_KEY, JSON.stringify([...kept, ...r.unreadable]));
        this.loadMessage = `${r.unreadable.length} saved phosphor entr${r.unreadable.length === 1 ? 'y' : 'ies'} could not be read (${r.unreadable[0].reason}); kept aside in browser storage under '${USER_PHOSPHORS_ASIDE_KEY}'.`;
        this.#save();
      } catch {
        this.#frozen = true;
        this.loadMessage = `Your saved phosphors could not be read (${r.unreadable[0].reason}); they are left in storage untouched, and phosphors you add now are kept for this visit only.`;
      }
    }
  }

  find(id: string): UserPhosphor | undefined {
    return this.list.find((p) => p.id === id);
  }

  /** Adds (or replaces by id) a validated phosphor; a message when the limit is reached. */
  put(p: UserPhosphor): string | null {
    const others = this.list.filter((x) => x.id !== p.id);
    if (others.length >= MAX_USER_PHOSPHORS) return `You can keep at most ${MAX_USER_PHOSPHORS} phosphors; delete one first.`;
    this.list = [...others, p];
    this.#save();
    return null;
  }

  remove(id: string): void {
    this.list = this.list.filter((p) => p.id !== id);
    this.#save();
  }

  #save(): void {
    if (!browser || this.#frozen) return;
    try {
      window.localStorage.setItem(USER_PHOSPHORS_KEY, encodeUserPhosphors(this.list));
      this.storageMessage = null;
    } catch {
      this.storageMessage = 'Cannot save in this browser: your phosphors work for this visit only.';
    }
  }
}

export const userPhosphors = new UserPhosphorStore();
