/**
 * The traced package figures every page leads with: the package's extraction ± σ, the bare chip on the
 * same base (the companion that turns it into a gain) and that gain ± σ — two traces run one after the
 * other through any Tracer. Pure.
 */
import { bareChip } from '../sweeps/vary-package';
import type { TracePackage } from '../trace/package-spec';
import { throwIfAborted } from './abort';
import type { TraceOutcome, Tracer } from './tracer';
import { traceGain } from './trace-gain';
import { packageKey } from './trace-key';

/** The bare-chip companion trace uses at most this many rays (its σ then stays well below the package's). */
export const BARE_MAX_RAYS = 2_000_000;

/** Rays of the bare-chip trace that goes with a package run of `rays`. */
export function bareRays(rays: number): number {
  return Math.min(rays, BARE_MAX_RAYS);
}

export interface PackageTrace {
  /** Which package was traced (packageKey: geometry, media and polarisation; not rays or seed). */
  packageKey: string;
  pkg: TracePackage;
  rays: number;
  seed: number;
  /** The package as specified. */
  dome: TraceOutcome;
  /** The bare chip on the same base; null when the package has no encapsulant (then `dome` is the bare chip). */
  bare: TraceOutcome | null;
  /** η_package / η_bare ± σ; null without a bare trace or with no bare light. */
  gain: { gain: number; stderr: number } | null;
}

/**
 * Traces `pkg` with `rays` rays, then (when it has an encapsulant) the bare chip with bareRays(rays),
 * both from `seed`. Progress runs over both traces in proportion to their rays.
 */
export async function tracePackage(
  tracer: Tracer,
  pkg: TracePackage,
  options: { rays: number; seed: number; signal?: AbortSignal; onProgress?: (fraction: number) => void }
): Promise<PackageTrace> {
  const { rays, seed, signal, onProgress } = options;
  const hasEncapsulant = pkg.encapsulant.shape !== 'none';
  const nBare = hasEncapsulant ? bareRays(rays) : 0;
  const total = rays + nBare;
  const dome = await tracer(pkg, { rays, seed, signal, onProgress: (f) => onProgress?.((f * rays) / total) });
  throwIfAborted(signal);
  const bare = hasEncapsulant
    ? await tracer(bareChip(pkg), { rays: nBare, seed, signal, onProgress: (f) => onProgress?.((rays + f * nBare) / total) })
    : null;
  throwIfAborted(signal);
  const gain = bare ? traceGain(dome.summary.extraction, dome.summary.stderr, bare.summary.extraction, bare.summary.stderr) : null;
  return { packageKey: packageKey(pkg), pkg, rays, seed, dome, bare, gain };
}
