/**
 * The cancel-and-restart rule every page's background work follows, in one place: starting a run
 * cancels the one in flight; only the latest run may change the state; a cancel or a failure keeps the
 * last finished result on screen. Pure: the Svelte wrapper (run-state.svelte.ts) mirrors this state.
 */
import { isAbort } from './abort';

export type RunStatus = 'idle' | 'running' | 'done' | 'cancelled' | 'error';

/** What a run's work receives: the signal to honour and a way to report. */
export interface RunContext<R> {
  signal: AbortSignal;
  /** Fraction done, [0, 1] (clamped). */
  progress(fraction: number): void;
  /** A partial result to show before the run ends (e.g. the points of a sweep so far). */
  publish(partial: R): void;
}

export type RunWork<R> = (ctx: RunContext<R>) => Promise<R>;

/** The state a page shows. */
export interface RunView<R> {
  status: RunStatus;
  /** Fraction of the current run done, [0, 1]. */
  progress: number;
  /** Message of the last failure (status 'error'). */
  error: string | null;
  /** The last finished (or published) result; kept through a cancel or a failure. */
  result: R | null;
  /** Key of the run that produced `result`. */
  resultKey: string | null;
  /** Key of the latest run started (running, finished, cancelled or failed). */
  startedKey: string | null;
}

export class LatestRun<R> {
  #view: RunView<R> = { status: 'idle', progress: 0, error: null, result: null, resultKey: null, startedKey: null };
  #ctl: AbortController | null = null;
  readonly #onChange: (view: Readonly<RunView<R>>) => void;

  /** @param onChange called with the new state after every change */
  constructor(onChange: (view: Readonly<RunView<R>>) => void = () => {}) {
    this.#onChange = onChange;
  }

  get view(): Readonly<RunView<R>> {
    return this.#view;
  }

  get running(): boolean {
    return this.#view.status === 'running';
  }

  /**
   * Starts `work` under `key` (what the run is for, e.g. a hash of its inputs), cancelling the run in
   * flight. Resolves when this run has settled; never rejects (a failure is the 'error' status).
   */
  async start(key: string, work: RunWork<R>): Promise<void> {
    this.#ctl?.abort();
    const ctl = new AbortController();
    this.#ctl = ctl;
    const mine = () => this.#ctl === ctl;
    this.#set({ status: 'running', progress: 0, error: null, startedKey: key });
    try {
      const result = await work({
        signal: ctl.signal,
        progress: (f) => {
          if (mine()) this.#set({ progress: Math.min(1, Math.max(0, Number.isFinite(f) ? f : 0)) });
        },
        publish: (partial) => {
          if (mine()) this.#set({ result: partial, resultKey: key });
        }
      });
      if (!mine()) return;
      if (ctl.signal.aborted) this.#set({ status: 'cancelled' });
      else this.#set({ status: 'done', progress: 1, result, resultKey: key });
    } catch (error) {
      if (!mine()) return;
      if (isAbort(error) || ctl.signal.aborted) this.#set({ status: 'cancelled' });
      else this.#set({ status: 'error', error: error instanceof Error ? error.message : String(error) });
    } finally {
      if (mine()) this.#ctl = null;
    }
  }

  /** Stops the run in flight (its status becomes 'cancelled'); the last result stays. */
  cancel(): void {
    this.#ctl?.abort();
  }

  #set(patch: Partial<RunView<R>>): void {
    this.#view = { ...this.#view, ...patch };
    this.#onChange(this.#view);
  }
}
