/**
 * A LatestRun as reactive Svelte state: what a page's component reads (status, progress, error, the
 * last result and the keys saying what it is for) and the two things it does (start, cancel).
 */
import { LatestRun, type RunStatus, type RunView, type RunWork } from './latest-run';

export class RunState<R> {
  status: RunStatus = $state('idle');
  progress = $state(0);
  error: string | null = $state(null);
  result: R | null = $state.raw(null);
  resultKey: string | null = $state(null);
  startedKey: string | null = $state(null);

  readonly #run = new LatestRun<R>((v) => this.#mirror(v));

  get running(): boolean {
    return this.status === 'running';
  }

  /** Starts `work` for `key`, cancelling the run in flight (see LatestRun.start). */
  start(key: string, work: RunWork<R>): Promise<void> {
    return this.#run.start(key, work);
  }

  cancel(): void {
    this.#run.cancel();
  }

  #mirror(v: Readonly<RunView<R>>): void {
    this.status = v.status;
    this.progress = v.progress;
    this.error = v.error;
    this.result = v.result;
    this.resultKey = v.resultKey;
    this.startedKey = v.startedKey;
  }
}
