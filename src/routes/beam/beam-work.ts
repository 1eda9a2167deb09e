/**
 * The page's inputs as optic runs, and the background work that traces the three optics side by side
 * in chunks (the page yields between chunks, so it stays responsive; the run model cancels a stale run).
 */
import { chunkPlan, raysInChunk } from '$lib/trace/chunk-plan';
import { createTally } from '$lib/trace/tally';
import { traceSceneChunk } from '$lib/trace/trace-chunk';
import type { TracePackage } from '$lib/trace/package-spec';
import { prepareOptic, preparedResults, type OpticResults, type OpticRunInput, type OpticSource, type PreparedOptic, type RayList } from '$lib/optic-trace';
import { throwIfAborted } from '$lib/runs';

export type OpticKind = 'reflector' | 'lens' | 'tir';
export const OPTIC_KINDS: readonly OpticKind[] = ['reflector', 'lens', 'tir'];
export const OPTIC_LABEL: Record<OpticKind, string> = { reflector: 'Metal reflector', lens: 'Lens', tir: 'TIR collimator' };

export interface BeamForm {
  picked: OpticKind;
  exitDiameterMm: number;
  heightMm: number;
  material: string;
  reflectance: number;
  gapMm: number;
  source: 'package' | 'lambertian' | 'rays';
  sourceWidthMm: number;
  targetBeamDeg: number | null;
  rays: number;
}

export const DEFAULT_FORM: BeamForm = {
  picked: 'tir',
  exitDiameterMm: 20,
  heightMm: 12,
  material: 'pmma',
  reflectance: 0.92,
  gapMm: 0.2,
  source: 'lambertian',
  sourceWidthMm: 1,
  targetBeamDeg: null,
  rays: 250_000
};

export interface BeamContext {
  pkg: TracePackage;
  wavelengthNm: number;
  scenario: string;
  rayFile: RayList | null;
}

export function opticSource(form: BeamForm, ctx: BeamContext): OpticSource {
  if (form.source === 'package') return { kind: 'package', pkg: ctx.pkg, wavelengthNm: ctx.wavelengthNm, scenario: ctx.scenario };
  if (form.source === 'rays' && ctx.rayFile) return { kind: 'rays', list: ctx.rayFile };
  return { kind: 'lambertian', shape: 'rect', widthMm: form.sourceWidthMm };
}

export function runInput(form: BeamForm, ctx: BeamContext, type: OpticKind): OpticRunInput {
  return {
    design: {
      type,
      exitDiameterMm: form.exitDiameterMm,
      heightMm: form.heightMm,
      gapMm: form.gapMm,
      material: form.material,
      reflectance: form.reflectance,
      targetBeamDeg: form.targetBeamDeg ?? undefined
    },
    source: opticSource(form, ctx),
    wavelengthNm: ctx.wavelengthNm,
    rays: form.rays,
    seed: 1
  };
}

/** The core's field names as the page's labels, so a refusal names the field the user sees. */
const FIELD_LABEL: [RegExp, string][] = [
  [/\bexitDiameterMm\b/g, 'Exit diameter'],
  [/\bheightMm\b/g, 'Height'],
  [/\bgapMm\b/g, 'Gap'],
  [/\btargetBeamDeg\b/g, 'Target beam'],
  [/\breflectance\b/g, 'Reflector reflectance'],
  [/, or give a smaller splitAngleDeg/g, '']
];

export function inFieldTerms(message: string): string {
  let m = message;
  for (const [pattern, label] of FIELD_LABEL) m = m.replace(pattern, label);
  return m;
}

/** Designs the three optics: each prepared, or the one-line reason it cannot be designed. */
export function prepareAll(form: BeamForm, ctx: BeamContext): Record<OpticKind, PreparedOptic | string> {
  const out = {} as Record<OpticKind, PreparedOptic | string>;
  for (const type of OPTIC_KINDS) {
    try {
      out[type] = prepareOptic(runInput(form, ctx, type));
    } catch (e) {
      out[type] = inFieldTerms(e instanceof Error ? e.message : String(e));
    }
  }
  return out;
}

export type BeamOutcome = Record<OpticKind, { results: OpticResults } | { error: string }>;

/**
 * Traces the three optics, chunk by chunk, yielding to the page between chunks.
 * @param pause lets the page breathe (a macrotask), between chunks
 */
export async function traceAll(
  prepared: Record<OpticKind, PreparedOptic | string>,
  rays: number,
  signal: AbortSignal,
  progress: (fraction: number) => void,
  pause: () => Promise<void>
): Promise<BeamOutcome> {
  const out = {} as BeamOutcome;
  const plan = chunkPlan(rays);
  let done = 0;
  for (const type of OPTIC_KINDS) {
    const p = prepared[type];
    if (typeof p === 'string') {
      out[type] = { error: p };
      done += plan.chunkCount;
      continue;
    }
    const tally = createTally();
    for (let i = 0; i < plan.chunkCount; i++) {
      throwIfAborted(signal);
      traceSceneChunk(p.compiled, i, raysInChunk(plan, i), 1, tally);
      done++;
      progress(done / (3 * plan.chunkCount));
      await pause();
    }
    out[type] = { results: preparedResults(p, tally) };
  }
  return out;
}
