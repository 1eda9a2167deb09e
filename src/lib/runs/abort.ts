/** The one error a cancelled run rejects with (name 'AbortError', as the worker pools and fetch use). */

/** A new AbortError. */
export function abortError(): Error {
  return Object.assign(new Error('run cancelled'), { name: 'AbortError' });
}

/** True for the rejection of a cancelled run. */
export function isAbort(error: unknown): boolean {
  return error instanceof Error && error.name === 'AbortError';
}

/** Throws an AbortError when the signal has fired: call between steps of a long run. */
export function throwIfAborted(signal: AbortSignal | undefined): void {
  if (signal?.aborted) throw abortError();
}
