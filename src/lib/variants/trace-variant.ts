/**
 * How a variant is traced, on the page and the command line alike: the shared package trace
 * (tracePackage — its package and, with an encapsulant, the bare chip on the same base) with the
 * scenario's own rays and seed, through whichever Tracer the caller has (the browser's cached, queued
 * worker pool; the Node pool). The tracer's chunk seeding makes the numbers independent of the thread
 * count, so page and command line agree exactly. Pure.
 */
import { tracePackage, type PackageTrace } from '../runs/package-trace';
import type { Tracer } from '../runs/tracer';
import { packageKey } from '../runs/trace-key';
import { resolveScenario, toTracePackage } from '../scenario/resolve';
import type { Scenario } from '../scenario/schema';
import type { TracePackage } from '../trace/package-spec';
import { variantTrace, type VariantResult } from './variant-result';

/** The package a variant traces and its trace settings (rays: the scenario's unless `rays` is given). */
export function variantRequest(scenario: Scenario, rays = scenario.trace.rays): { pkg: TracePackage; rays: number; seed: number } {
  return { pkg: toTracePackage(scenario, resolveScenario(scenario)), rays, seed: scenario.trace.seed };
}

/** The part of a package trace a variant keeps (and a comparison file carries). */
export function variantResult(trace: PackageTrace): VariantResult {
  return { seed: trace.seed, package: variantTrace(trace.dome.summary), bareChip: trace.bare ? variantTrace(trace.bare.summary) : null };
}

/** Traces a variant's scenario through `tracer`; rejects with an AbortError when `signal` fires. */
export async function traceVariant(
  tracer: Tracer,
  scenario: Scenario,
  options: { rays?: number; signal?: AbortSignal; onProgress?: (fraction: number) => void } = {}
): Promise<VariantResult> {
  const { pkg, rays, seed } = variantRequest(scenario, options.rays);
  return variantResult(await tracePackage(tracer, pkg, { rays, seed, signal: options.signal, onProgress: options.onProgress }));
}

/**
 * The name of the kept variant that is this package (the first one, by packageKey), for the file
 * names and pictures of a page showing it; undefined when none is.
 */
export function keptVariantName(variants: readonly { name: string; scenario: Scenario }[], pkgKey: string): string | undefined {
  return variants.find((v) => packageKey(variantRequest(v.scenario).pkg) === pkgKey)?.name;
}
