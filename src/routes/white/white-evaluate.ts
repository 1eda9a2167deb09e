/**
 * The page's one way to trace a phosphor mixture in the background: through the shared run queue and
 * trace cache (browserTracer), so the load search and the sweeps share the workers with every other
 * trace and a repeated trial comes from the cache.
 */
import { browserTracer } from '$lib/runs/browser-tracer';
import type { PhosphorSummary } from '$lib/trace/phosphor-summary';
import type { TracePackage } from '$lib/trace/package-spec';
import type { PhosphorPlacement } from '$lib/trace/white-light';
import { withMixture, type MixComponent } from '$lib/white/phosphor-mix';

export async function traceMixture(
  clearPkg: TracePackage,
  mix: readonly MixComponent[],
  chip: [number, number][],
  options: { rays: number; seed: number; signal: AbortSignal; placement?: PhosphorPlacement }
): Promise<PhosphorSummary> {
  const { placement, ...trace } = options;
  const o = await browserTracer(withMixture(clearPkg, mix, chip, placement), trace);
  if (!o.summary.white) throw new Error('the trace carried no colour (no phosphor in the package)');
  return o.summary.white;
}
