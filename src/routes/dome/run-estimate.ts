/** How long a trace is likely to take, for the question before a very large run. Pure. */
import { bareRays } from '$lib/runs';

/** Runs above this many rays ask first instead of starting by themselves. */
export const LARGE_RUN_RAYS = 5_000_000;
/** Assumed speed before any run has been timed in this tab: rays per second over all workers. */
export const ASSUMED_RAYS_PER_SECOND = 600_000;

/**
 * Estimated seconds for a run: (rays + bare-chip rays) / speed.
 * @param raysPerSecond a measured speed (> 0), or null to use ASSUMED_RAYS_PER_SECOND
 */
export function estimateSeconds(rays: number, raysPerSecond: number | null): number {
  const speed = raysPerSecond !== null && raysPerSecond > 0 && Number.isFinite(raysPerSecond) ? raysPerSecond : ASSUMED_RAYS_PER_SECOND;
  return (rays + bareRays(rays)) / speed;
}

/** "about 40 s", "about 3 min", "about 1.5 h". */
export function fmtDuration(seconds: number): string {
  if (!Number.isFinite(seconds) || seconds < 0) return 'an unknown time';
  if (seconds < 90) return `about ${Math.max(1, Math.round(seconds))} s`;
  if (seconds < 5400) return `about ${Math.round(seconds / 60)} min`;
  return `about ${(seconds / 3600).toFixed(1)} h`;
}
