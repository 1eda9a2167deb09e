/**
 * The shared scenario of the running app — the one place that touches the URL and localStorage.
 * Remembered across reloads (versioned localStorage key), mirrored into the link with `replaceState`,
 * and followed from other tabs through the `storage` event. Pure code lives beside it; this file only
 * wires that code to the browser.
 */
import { browser } from '$app/environment';
import { replaceState } from '$app/navigation';
import { page } from '$app/state';
import { DEMO_SCENARIO, demoScenario } from './defaults';
import { loadSaved } from './saved-item';
import { readScenario } from './read-scenario';
import { resolveScenario, type ResolvedScenario } from './resolve';
import { parseScenario, type ParseResult, type Scenario } from './schema';
import { decodeScenarioParam, encodeScenarioParam, SCENARIO_PARAM } from './url';

/** localStorage key; the number is the scenario version written under it. */
export const STORAGE_KEY = 'outcouple.scenario.v4';
/** Keys older versions wrote, newest first: read (and migrated) when the current key is empty, never written. */
export const OLDER_STORAGE_KEYS = ['outcouple.scenario.v3', 'outcouple.scenario.v2', 'outcouple.scenario.v1'];

export const STORAGE_UNAVAILABLE =
  "Cannot save in this browser: the scenario is kept only in this tab's link.";

export class ScenarioStore {
  /** The current, always valid scenario. Replace it through `set`, never mutate it. */
  scenario: Scenario = $state.raw(DEMO_SCENARIO);
  /** Why a link's scenario was not used (damaged, invalid, newer), until dismissed. */
  linkMessage: string | null = $state(null);
  /** Set when the browser refuses storage; the app keeps working without it. */
  storageMessage: string | null = $state(null);
  /** Set when the saved scenario could not be read (it is set aside, see loadSaved), until dismissed. */
  loadMessage: string | null = $state(null);

  /** The value of the `s` query parameter for the current scenario. */
  readonly param: string = $derived(encodeScenarioParam(this.scenario));
  /** "s=1.…" — append to internal links so they keep the scenario. */
  readonly query: string = $derived(`${SCENARIO_PARAM}=${this.param}`);
  /** Indices at the design wavelength, with library warnings. */
  readonly resolved: ResolvedScenario = $derived(resolveScenario(this.scenario));

  #started = false;

  /**
   * Starts the browser side once the app is mounted: reads the link (which wins), else the saved
   * scenario, else the demo; writes the link; follows other tabs. Returns the cleanup.
   */
  start(): () => void {
    if (!browser || this.#started) return () => {};
    this.#started = true;
    const fromUrl = new URL(window.location.href).searchParams.get(SCENARIO_PARAM);
    if (fromUrl) {
      this.#adopt(fromUrl);
    } else {
      const saved = this.#load();
      if (saved) this.scenario = saved;
    }
    this.#save();
    this.writeUrl();
    const onStorage = (e: StorageEvent) => this.#onStorage(e);
    window.addEventListener('storage', onStorage);
    return () => {
      window.removeEventListener('storage', onStorage);
      this.#started = false;
    };
  }

  /** Validates and, if valid, makes `next` the scenario (saved and put in the link). Never throws. */
  set(next: Scenario): ParseResult {
    const r = parseScenario(next);
    if (r.ok) {
      this.scenario = r.scenario;
      this.#save();
      this.writeUrl();
    }
    return r;
  }

  /** Builds a candidate from a copy of the scenario, then `set`s it. */
  update(edit: (draft: Scenario) => void): ParseResult {
    const draft = structuredClone($state.snapshot(this.scenario)) as Scenario;
    edit(draft);
    return this.set(draft);
  }

  /** Back to the demo scenario. */
  reset(): void {
    this.linkMessage = null;
    this.set(demoScenario());
  }

  /** After an in-app navigation: adopt a different scenario carried by the new link, or write ours into it. */
  followUrl(url: URL): void {
    if (!this.#started) return;
    const param = url.searchParams.get(SCENARIO_PARAM);
    if (param && param !== this.param) {
      this.#adopt(param);
      this.#save();
    }
    this.writeUrl();
  }

  /** Puts the scenario into the current link (other query parameters are kept). */
  writeUrl(): void {
    if (!browser || !this.#started) return;
    const url = new URL(window.location.href);
    if (url.searchParams.get(SCENARIO_PARAM) === this.param) return;
    url.searchParams.set(SCENARIO_PARAM, this.param);
    replaceUrl(url);
  }

  /**
   * A page's own view settings in the link (e.g. `into=outside` on the escape-cone page), beside the
   * scenario, so a copied link reopens the same view. null removes a parameter. Browser only.
   */
  setPageParams(params: Record<string, string | null>): void {
    if (!browser) return;
    const url = new URL(window.location.href);
    for (const [name, value] of Object.entries(params)) {
      if (name === SCENARIO_PARAM) continue;
      if (value === null) url.searchParams.delete(name);
      else url.searchParams.set(name, value);
    }
    if (url.href !== window.location.href) replaceUrl(url);
  }

  /** A page's view setting from the current link (null on the server or when absent). */
  pageParam(name: string): string | null {
    if (!browser) return null;
    return new URL(window.location.href).searchParams.get(name);
  }

  #adopt(param: string): void {
    const d = decodeScenarioParam(param);
    this.scenario = d.scenario;
    this.linkMessage = d.message;
  }

  #storage(): Storage | null {
    try {
      const s = window.localStorage;
      const probe = `${STORAGE_KEY}.probe`;
      s.setItem(probe, '1');
      s.removeItem(probe);
      return s;
    } catch {
      this.storageMessage = STORAGE_UNAVAILABLE;
      return null;
    }
  }

  /** The saved scenario (current key, else an older one, migrated); one that cannot be read is set aside and reported. */
  #load(): Scenario | null {
    const s = this.#storage();
    if (!s) return null;
    const read = (raw: unknown) => {
      const r = readScenario(raw);
      return r.ok ? { ok: true as const, value: r.scenario } : r;
    };
    const loaded = loadSaved(s, [STORAGE_KEY, ...OLDER_STORAGE_KEYS], read, 'scenario', 'the demo scenario');
    this.loadMessage = loaded.message;
    return loaded.value;
  }

  #save(): void {
    if (!browser || !this.#started) return;
    const s = this.#storage();
    if (!s) return;
    try {
      s.setItem(STORAGE_KEY, JSON.stringify(this.scenario));
      this.storageMessage = null;
    } catch {
      this.storageMessage = STORAGE_UNAVAILABLE;
    }
  }

  #onStorage(e: StorageEvent): void {
    if (e.key !== STORAGE_KEY || !e.newValue) return;
    try {
      const r = readScenario(JSON.parse(e.newValue));
      if (r.ok && JSON.stringify(r.scenario) !== JSON.stringify(this.scenario)) {
        this.scenario = r.scenario;
        this.writeUrl();
      }
    } catch {
      // Another tab wrote something unreadable; keep ours.
    }
  }
}

function replaceUrl(url: URL): void {
  try {
    replaceState(url, page.state);
  } catch {
    // The router is not ready yet (very early in start-up): fall back to the plain history API.
    history.replaceState(history.state, '', url);
  }
}

/** The app's one scenario store. */
export const scenarioStore = new ScenarioStore();
