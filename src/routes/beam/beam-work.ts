/**
 * The page's inputs as optic runs, and the background work that traces the three optics side by side:
 * one run of a SceneTracer (on the page the worker pool behind the page-wide queue, so the page stays
 * responsive; the run model cancels a stale run).
 */
import type { TracePackage } from '$lib/trace/package-spec';
import { checkOpticRun, prepareOptic, preparedResults, type OpticResults, type OpticRunInput, type OpticSource, type PreparedOptic, type RayList } from '$lib/optic-trace';
import type { SceneTracer } from '$lib/runs';

/** The page's seed: a fixed one, so the same inputs give the same table. */
export const BEAM_SEED = 1;

export type OpticKind = 'reflector' | 'lens' | 'tir';
export const OPTIC_KINDS: readonly OpticKind[] = ['reflector', 'lens', 'tir'];
export const OPTIC_LABEL: Record<OpticKind, string> = { reflector: 'Metal reflector', lens: 'Lens', tir: 'TIR collimator' };

/** The page's ray counts per optic (the three optics are traced together: three times this many rays). */
export const RAY_CHOICES = [100_000, 250_000, 1_000_000, 2_000_000] as const;

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
    seed: BEAM_SEED
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

/** The page's fields a design refusal can name (inFieldTerms's labels). */
export const BEAM_FIELDS = ['Exit diameter', 'Height', 'Gap', 'Target beam', 'Reflector reflectance'] as const;
export type BeamField = (typeof BEAM_FIELDS)[number];

/**
 * Where each optic that cannot be designed says why: its one-line reason beside the field it names
 * ("TIR collimator: Height: … fits heights in (7.24, 11.5) mm"), the others traced as usual.
 */
export function fieldNotes(prepared: Record<OpticKind, PreparedOptic | string>): Partial<Record<BeamField, string>> {
  const notes: Partial<Record<BeamField, string>> = {};
  for (const k of OPTIC_KINDS) {
    const p = prepared[k];
    if (typeof p !== 'string') continue;
    const field = BEAM_FIELDS.find((f) => p.startsWith(f));
    if (field) notes[field] = [notes[field], `${OPTIC_LABEL[k]}: ${p}`].filter(Boolean).join(' ');
  }
  return notes;
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

export interface BeamOutcome {
  optics: Record<OpticKind, { results: OpticResults } | { error: string }>;
  /** Rays per optic. */
  rays: number;
  /** Wall time of the trace (all optics), seconds, and the worker threads it ran on. */
  seconds: number;
  workers: number;
}

/**
 * Traces the optics that could be designed, all in one run of `tracer` (on the page: the worker pool,
 * through the page-wide queue), and evaluates each; an optic that could not be designed keeps its reason.
 */
export async function traceAll(
  prepared: Record<OpticKind, PreparedOptic | string>,
  rays: number,
  tracer: SceneTracer,
  run: { signal?: AbortSignal; progress?: (fraction: number) => void }
): Promise<BeamOutcome> {
  checkOpticRun(rays, BEAM_SEED);
  const traced = OPTIC_KINDS.filter((k) => typeof prepared[k] !== 'string');
  const scenes = traced.map((k) => (prepared[k] as PreparedOptic).compiled);
  const { tallies, seconds, workers } = await tracer(scenes, { rays, seed: BEAM_SEED, signal: run.signal, onProgress: run.progress });
  const optics = {} as BeamOutcome['optics'];
  for (const k of OPTIC_KINDS) {
    const p = prepared[k];
    optics[k] = typeof p === 'string' ? { error: p } : { results: preparedResults(p, tallies[traced.indexOf(k)]) };
  }
  return { optics, rays, seconds, workers };
}
