/**
 * One line of jobs: each job starts when the one queued before it has settled, so background runs
 * (a page's main trace, its sweeps, the candidates of a ranking) never fight over the same cores and
 * each job's speed is its own. Pure: the jobs bring their own engine.
 */
import { abortError } from './abort';

/** A job: it receives the signal and should stop (rejecting with an AbortError) when it fires. */
export type Job<T> = (signal: AbortSignal) => Promise<T>;

export class RunQueue {
  /** Settles when the last queued job has settled (never rejects). */
  #tail: Promise<void> = Promise.resolve();
  #waiting = 0;

  /** Jobs queued and not yet started. */
  get waiting(): number {
    return this.#waiting;
  }

  /**
   * Runs `job` after every job queued before it. A signal that fires while the job waits rejects at
   * once with an AbortError and the job never starts; once started, stopping is the job's business.
   */
  run<T>(job: Job<T>, signal: AbortSignal): Promise<T> {
    this.#waiting++;
    return new Promise<T>((resolve, reject) => {
      let started = false;
      const onAbortWaiting = () => {
        if (!started) reject(abortError());
      };
      signal.addEventListener('abort', onAbortWaiting, { once: true });
      this.#tail = this.#tail.then(async () => {
        started = true;
        this.#waiting--;
        signal.removeEventListener('abort', onAbortWaiting);
        if (signal.aborted) return reject(abortError());
        try {
          resolve(await job(signal));
        } catch (error) {
          reject(error);
        }
      });
    });
  }
}
