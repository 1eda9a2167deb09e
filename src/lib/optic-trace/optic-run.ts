/**
 * Designs an optic for its source, builds the scene and traces it on the calling thread: the one path
 * the command line, the page's worker and the tests share. Checks every input once (the designer's
 * checks, plus the source, the mirror, the material, rays and seed), one-line RangeErrors naming the
 * field and range.
 */
import { resolveIndex } from '../materials/resolve-index';
import { designOptic } from '../optic-design/design-optic';
import type { OpticDesignOptions } from '../optic-design/design-options';
import type { OpticDesign } from '../optic-design/optic-design';
import { chunkPlan, raysInChunk } from '../trace/chunk-plan';
import { compileScene, type CompiledScene } from '../trace/compile-scene';
import { validateTracePackage } from '../trace/package-spec';
import type { MirrorSpec } from '../trace/scene';
import { createTally, type Tally } from '../trace/tally';
import { traceSceneChunk } from '../trace/trace-chunk';
import { opticResults, type OpticResults } from './optic-results';
import { opticScene, type OpticScene } from './optic-scene';
import { sourceFootprint, type OpticSource, type SourceFootprint } from './optic-source';

export interface OpticRunInput {
  /** The design (its `source` is set from the traced source). */
  design: Omit<OpticDesignOptions, 'source' | 'wavelengthNm'>;
  source: OpticSource;
  /** A library metal (id, name or alias: al, ag, au) for the reflector instead of `design.reflectance`. */
  metal?: string;
  /** Wavelength of an idealised source, nm; default 550 (the package's own and a ray file's mean otherwise). */
  wavelengthNm?: number;
  rays: number;
  seed: number;
}

export interface PreparedOptic {
  design: OpticDesign;
  optic: OpticScene;
  compiled: CompiledScene;
  footprint: SourceFootprint;
  wavelengthNm: number;
  mirror: MirrorSpec;
  /** The optic's material at the run's wavelength. */
  material: { n: number; absorptionPerMm: number };
}

export const OPTIC_RAY_LIMITS = { min: 1000, max: 1e8 };

/** The run's wavelength: the package's, the ray file's weighted mean, or the idealised source's. */
function runWavelength(input: OpticRunInput): number {
  if (input.source.kind === 'package') return input.source.wavelengthNm;
  if (input.source.kind === 'rays') return input.source.list.wavelengthNm;
  const wl = input.wavelengthNm ?? 550;
  if (!(wl >= 360 && wl <= 830)) throw new RangeError(`wavelengthNm must be a number in [360, 830] (got ${wl})`);
  return wl;
}

/**
 * Designs the optic and builds its compiled scene.
 * @throws RangeError naming the field and range for any input it cannot design or trace
 */
export function prepareOptic(input: OpticRunInput): PreparedOptic {
  if (input.source.kind === 'package') validateTracePackage(input.source.pkg);
  if (input.source.kind === 'lambertian') {
    const { widthMm: w, lengthMm: l } = input.source;
    if (!(w > 0 && w <= 100)) throw new RangeError(`source width must be a number in (0, 100] mm (got ${w})`);
    if (l !== undefined && !(l > 0 && l <= 100)) throw new RangeError(`source length must be a number in (0, 100] mm (got ${l})`);
  }
  const wavelengthNm = runWavelength(input);
  const footprint = sourceFootprint(input.source);
  const design = designOptic({ ...input.design, wavelengthNm, source: footprint.design, sourceEtendueAreaMm2: footprint.areaMm2 });
  let material = { n: 1, absorptionPerMm: 0 };
  if (design.type !== 'reflector') {
    const spec = input.design.material ?? String(input.design.n);
    const idx = resolveIndex(spec, wavelengthNm);
    // α = 4πk/λ (Beer–Lambert from the extinction coefficient; M. Born, E. Wolf, Principles of Optics, §14.1), λ in mm
    material = { n: design.n, absorptionPerMm: (4 * Math.PI * idx.k) / (wavelengthNm * 1e-6) };
  }
  let mirror: MirrorSpec = { kind: 'reflectance', reflectance: design.reflectance ?? 0.92 };
  if (input.metal !== undefined) {
    const m = resolveIndex(input.metal, wavelengthNm);
    if (!(m.k > 0.5)) throw new RangeError(`metal must be a library metal (al, ag, au) with k > 0.5 at ${wavelengthNm} nm (got ${input.metal})`);
    mirror = { kind: 'metal', n: m.n, k: m.k };
  }
  const optic = opticScene(design, input.source, material, mirror);
  return { design, optic, compiled: compileScene(optic.scene), footprint, wavelengthNm, mirror, material };
}

/** Checks rays and seed. @throws RangeError naming the field and range */
export function checkOpticRun(rays: number, seed: number): void {
  if (!(Number.isInteger(rays) && rays >= OPTIC_RAY_LIMITS.min && rays <= OPTIC_RAY_LIMITS.max)) {
    throw new RangeError(`rays must be an integer in [${OPTIC_RAY_LIMITS.min}, ${OPTIC_RAY_LIMITS.max}] (got ${rays})`);
  }
  if (!(Number.isInteger(seed) && seed >= 0 && seed <= 0xffffffff)) throw new RangeError(`seed must be an integer in [0, 4294967295] (got ${seed})`);
}

/** Traces a prepared optic's scene in the fixed chunk plan (any thread gives the same tally). */
export function traceOpticScene(prepared: PreparedOptic, rays: number, seed: number): Tally {
  const plan = chunkPlan(rays);
  const tally = createTally();
  for (let i = 0; i < plan.chunkCount; i++) traceSceneChunk(prepared.compiled, i, raysInChunk(plan, i), seed, tally);
  return tally;
}

/** Results of a prepared and traced optic. */
export function preparedResults(prepared: PreparedOptic, tally: Tally): OpticResults {
  return opticResults(tally, prepared.optic.roles, prepared.footprint.areaMm2, prepared.design.exitDiameterMm);
}

/**
 * Designs, traces and evaluates one optic.
 * @throws RangeError naming the field and range
 */
export function runOptic(input: OpticRunInput): { prepared: PreparedOptic; tally: Tally; results: OpticResults } {
  checkOpticRun(input.rays, input.seed);
  const prepared = prepareOptic(input);
  const tally = traceOpticScene(prepared, input.rays, input.seed);
  return { prepared, tally, results: preparedResults(prepared, tally) };
}
