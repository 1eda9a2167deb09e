/**
 * The scenario: one LED package description shared by every page, the URL and the command line.
 * Version 4: the package body (flat base or reflector cup, the encapsulant filling it flat, with a dome
 * or not at all), the base's finish (specular or diffuse), and the chip's structure (a single box or
 * layers, its own bottom mirror, a textured top face).
 * Version 3: the encapsulant's absorption is one input, `absorptionPerMm`; its typed index is n only (k is
 * derived from the absorption, see `encapsulantK`). Version 2 added media that carry a user's own
 * material in full, so a link is self-contained.
 * Older versions are lifted by `migrateScenario` before they reach this schema.
 */
import { z } from 'zod';
import { findMaterial, indexAt, userMaterialField } from '../materials/index';
import type { Material } from '../materials/types';
import { validateUserPhosphor } from '../phosphors/user-phosphor';
import { findPhosphor } from '../phosphors/index';
import { designWavelengthNm } from './resolve';
import { LIMITS, MATERIAL_ID_PATTERN, type NumberLimit, rangeMessage } from './limits';
import { packageFitProblems, phosphorFitProblems } from './package-fit';

export const SCENARIO_VERSION = 4;

/** A number field with a range message that names the field (zod rejects NaN and ±Infinity). */
function num(field: string, limit: NumberLimit) {
  const message = rangeMessage(field, limit);
  const base = z.number({ error: message }).min(limit.min, { error: message }).max(limit.max, { error: message });
  return limit.integer ? base.int({ error: message }) : base;
}

function materialId(field: string) {
  return z
    .string({ error: `${field} must be a material id from the library.` })
    .regex(MATERIAL_ID_PATTERN, { error: `${field} must be a material id from the library.` });
}

/**
 * Messages for an object's own problems — not an object, or fields it does not have — naming it
 * (zod's defaults name neither the object nor where it sits).
 */
function objectMessages(field: string) {
  return {
    error: (issue: z.core.$ZodRawIssue) => {
      if (issue.code !== 'unrecognized_keys') return `${field} must be an object with named fields.`;
      const keys = issue.keys.slice(0, 3).map((k) => `"${k.slice(0, 40)}"`).join(', ');
      const more = issue.keys.length > 3 ? ` and ${issue.keys.length - 3} more` : '';
      return `${field} has unknown field${issue.keys.length > 1 ? 's' : ''} ${keys}${more}.`;
    }
  };
}

function libraryOrUser(field: string) {
  const own = objectMessages(field.endsWith('medium') ? field : `${field} medium`);
  return [
    z.object({ kind: z.literal('material'), id: materialId(`${field} material`) }, own).strict(),
    z.object({ kind: z.literal('user'), material: userMaterialField(`${field} user material`) }, own).strict()
  ] as const;
}

const mediumError = (field: string) => ({ error: `${field} must be a library material, a typed index or a user material.` });

/**
 * A medium: a library material (indices taken at the scenario wavelength), a typed index n + ik, or
 * one of the user's own materials, carried in full.
 */
function medium(field: string) {
  const own = objectMessages(field.endsWith('medium') ? field : `${field} medium`);
  const typed = z
    .object({ kind: z.literal('index'), n: num(`${field} index n`, LIMITS.indexN), k: num(`${field} extinction k`, LIMITS.indexK) }, own)
    .strict();
  return z.discriminatedUnion('kind', [...libraryOrUser(field), typed], mediumError(field));
}

/** The encapsulant's medium: as any medium, but a typed index is n alone — its loss is the encapsulant's absorption per mm. */
function encapsulantMedium(field: string) {
  const typed = z.object({ kind: z.literal('index'), n: num(`${field} index n`, LIMITS.indexN) }, objectMessages(`${field} medium`)).strict();
  return z.discriminatedUnion('kind', [...libraryOrUser(field), typed], mediumError(field));
}

const emissionSchema = z.discriminatedUnion(
  'kind',
  [
    z.object({ kind: z.literal('single'), wavelengthNm: num('Wavelength', LIMITS.wavelengthNm) }, objectMessages('Emission')).strict(),
    z
      .object(
        {
          kind: z.literal('gaussian'),
          peakNm: num('Peak wavelength', LIMITS.wavelengthNm),
          fwhmNm: num('Spectral width (FWHM)', LIMITS.fwhmNm)
        },
        objectMessages('Emission')
      )
      .strict(),
    z
      .object({
        kind: z.literal('table'),
        rows: z
          .array(z.tuple([num('Spectrum wavelength', LIMITS.wavelengthNm), num('Spectrum weight', LIMITS.spectrumWeight)]), {
            error: 'Spectrum rows must be a list of [wavelength nm, weight] pairs.'
          })
          .min(LIMITS.spectrumRows.min, { error: rangeMessage('Number of spectrum rows', LIMITS.spectrumRows) })
          .max(LIMITS.spectrumRows.max, { error: rangeMessage('Number of spectrum rows', LIMITS.spectrumRows) })
      }, objectMessages('Emission'))
      .strict()
  ],
  { error: 'Emission must be a single wavelength, a Gaussian band or a table.' }
);

const mirrorSchema = (field: string) =>
  z.discriminatedUnion(
    'kind',
    [
      z.object({ kind: z.literal('reflectance'), reflectance: num(`${field} reflectance`, LIMITS.reflectance) }, objectMessages(field)).strict(),
      z.object({ kind: z.literal('metal'), id: materialId(`${field} metal`) }, objectMessages(field)).strict()
    ],
    { error: `${field} must be a reflectance or a metal from the library.` }
  );

const finishSchema = (field: string) => z.enum(['specular', 'diffuse'], { error: `${field} must be 'specular' or 'diffuse'.` });

/** One layer of a layered chip: its medium (n alone when typed: its loss is the absorption per mm). */
const chipLayerSchema = (i: number) =>
  z
    .object(
      {
        name: z
          .string({ error: `Chip layer ${i + 1} name must be text.` })
          .trim()
          .min(1, { error: `Chip layer ${i + 1} name must be 1 to 40 characters.` })
          .max(40, { error: `Chip layer ${i + 1} name must be 1 to 40 characters.` }),
        medium: encapsulantMedium(`Chip layer ${i + 1}`),
        thicknessMm: num(`Chip layer ${i + 1} thickness`, LIMITS.sizeMm),
        absorptionPerMm: num(`Chip layer ${i + 1} absorption`, LIMITS.absorptionPerMm)
      },
      objectMessages(`Chip layer ${i + 1}`)
    )
    .strict();

const chipLayersSchema = z
  .array(z.unknown(), { error: 'Chip layers must be a list of layers, bottom to top.' })
  .min(LIMITS.chipLayers.min, { error: rangeMessage('Number of chip layers', LIMITS.chipLayers) })
  .max(LIMITS.chipLayers.max, { error: rangeMessage('Number of chip layers', LIMITS.chipLayers) })
  .transform((layers, ctx) => {
    const out: z.infer<ReturnType<typeof chipLayerSchema>>[] = [];
    layers.forEach((layer, i) => {
      const r = chipLayerSchema(i).safeParse(layer);
      if (r.success) out.push(r.data);
      else for (const issue of r.error.issues) ctx.addIssue({ code: 'custom', path: [i, ...issue.path], message: issue.message });
    });
    return out;
  });

const chipSchema = z
  .object({
    medium: medium('Chip'),
    widthMm: num('Chip width', LIMITS.sizeMm),
    lengthMm: num('Chip length', LIMITS.sizeMm),
    heightMm: num('Chip height', LIMITS.sizeMm),
    emitterZMm: num('Emitter height', LIMITS.emitterZMm),
    absorptionPerMm: num('Chip absorption', LIMITS.absorptionPerMm),
    emission: z.enum(['plane', 'volume'], { error: "Chip emission must be 'plane' or 'volume'." }),
    /** Textured top face: the fraction s of the light crossing or reflected there that leaves in a Lambertian direction. */
    topTexture: num('Textured top fraction', LIMITS.scatteredFraction),
    /** Layers bottom to top (absent: one box of the chip's medium, height and absorption); heightMm is then their total. */
    layers: chipLayersSchema.optional(),
    /** The emitting layer, counted from 0 at the bottom (with layers). */
    emitLayer: z.number({ error: 'Emitting layer must be a layer number.' }).int({ error: 'Emitting layer must be a whole layer number.' }).optional(),
    /** The chip's own bottom mirror (absent: the chip stands on the base and that reflects). */
    mirror: mirrorSchema('Chip mirror').optional()
  }, objectMessages('Chip'))
  .strict();

const baseSchema = mirrorSchema('Base');

/**
 * The body the chip stands in: an endless flat base, or a reflector cup (floor radius at the base, wall a
 * cone frustum to the top radius at the cup's depth; the floor is the base).
 */
const bodySchema = z.discriminatedUnion(
  'kind',
  [
    z.object({ kind: z.literal('flat') }, objectMessages('Body')).strict(),
    z
      .object(
        {
          kind: z.literal('cup'),
          floorRadiusMm: num('Cup floor radius', LIMITS.sizeMm),
          topRadiusMm: num('Cup top radius', LIMITS.sizeMm),
          depthMm: num('Cup depth', LIMITS.sizeMm),
          wallFinish: finishSchema('Cup wall finish'),
          wallReflectance: num('Cup wall reflectance', LIMITS.reflectance)
        },
        objectMessages('Body')
      )
      .strict()
  ],
  { error: "Body must be 'flat' or a cup." }
);

const encapsulantSchema = z
  .object({
    medium: encapsulantMedium('Encapsulant'),
    /**
     * Flat body: none, dome, cylinder or box (a square block, radiusMm its half side). Cup: 'flat' fills it to the
     * rim, 'dome' adds a dome on the rim plane, 'none' leaves it empty.
     */
    shape: z.enum(['none', 'dome', 'cylinder', 'box', 'flat'], { error: "Encapsulant shape must be 'none', 'dome', 'cylinder', 'box' or 'flat'." }),
    radiusMm: num('Encapsulant radius', LIMITS.sizeMm),
    heightMm: num('Encapsulant height', LIMITS.sizeMm),
    absorptionPerMm: num('Encapsulant absorption', LIMITS.absorptionPerMm)
  }, objectMessages('Encapsulant'))
  .strict();

/** Phosphor regions: dispersed in the whole encapsulant, or a layer of it (trace/body-phosphor.ts). */
export const SCENARIO_PHOSPHOR_REGIONS = ['encapsulant', 'conformal', 'remote', 'floor'] as const;

/** A user phosphor carried in full (like a user material), checked by validateUserPhosphor. */
const userPhosphorField = (where: string) =>
  z.unknown().transform((raw, ctx) => {
    const r = validateUserPhosphor(raw);
    if (r.ok) return r.phosphor;
    ctx.addIssue({ code: 'custom', path: [r.field], message: `${where}: ${r.message}.` });
    return z.NEVER;
  });

const phosphorIdField = z.string({ error: 'Phosphor must be a library phosphor id.' }).regex(MATERIAL_ID_PATTERN, { error: 'Phosphor must be a library phosphor id (lower-case letters, digits, dashes).' });

/** A second phosphor mixed into the same region (a red beside a yellow or green one). */
const redPhosphorSchema = z
  .object({
    id: phosphorIdField,
    weightPercent: num('Red phosphor load', LIMITS.phosphorWeightPercent),
    diameterUm: num('Red phosphor particle diameter', LIMITS.phosphorDiameterUm),
    quantumYield: num('Red phosphor quantum yield', LIMITS.quantumYield),
    /** The user phosphor named by `id`, carried in full. */
    user: userPhosphorField('Red user phosphor').optional()
  }, objectMessages('Red phosphor'))
  .strict();

/**
 * An optional phosphor (version 4): a library phosphor in a region at a load; optionally a user phosphor
 * carried in full (`user`, its id equal to `id`) and a red phosphor mixed in (`red`). `thicknessMm`
 * (added within version 4, optional, so earlier version-4 files read unchanged) is the layer's
 * thickness, needed for the layer regions and kept but not used for 'encapsulant'.
 */
const phosphorSchema = z
  .object({
    id: phosphorIdField,
    region: z.enum(SCENARIO_PHOSPHOR_REGIONS, { error: `Phosphor region must be one of: ${SCENARIO_PHOSPHOR_REGIONS.join(', ')}.` }),
    weightPercent: num('Phosphor load', LIMITS.phosphorWeightPercent),
    diameterUm: num('Phosphor particle diameter', LIMITS.phosphorDiameterUm),
    quantumYield: num('Quantum yield', LIMITS.quantumYield),
    thicknessMm: num('Phosphor layer thickness', LIMITS.phosphorThicknessMm).optional(),
    user: userPhosphorField('User phosphor').optional(),
    red: redPhosphorSchema.optional()
  }, objectMessages('Phosphor'))
  .strict();

const traceSchema = z
  .object({
    rays: num('Rays', LIMITS.rays),
    seed: num('Seed', LIMITS.seed),
    polarization: z.enum(['average', 'track'], { error: "Polarisation must be 'average' or 'track'." })
  }, objectMessages('Trace settings'))
  .strict();

const nameSchema = z
  .string({ error: 'Name must be text.' })
  .trim()
  .min(LIMITS.nameLength.min, { error: rangeMessage('Name length', LIMITS.nameLength) })
  .max(LIMITS.nameLength.max, { error: rangeMessage('Name length', LIMITS.nameLength) });

const objectSchema = z
  .object({
    version: z.literal(SCENARIO_VERSION, { error: `Scenario version must be ${SCENARIO_VERSION}.` }),
    name: nameSchema,
    emission: emissionSchema,
    chip: chipSchema,
    base: baseSchema,
    baseFinish: finishSchema('Base finish'),
    body: bodySchema,
    encapsulant: encapsulantSchema,
    outside: medium('Outside medium'),
    trace: traceSchema,
    phosphor: phosphorSchema.optional()
  }, objectMessages('Scenario'))
  .strict();

type ObjectScenario = z.infer<typeof objectSchema>;
type Ctx = z.RefinementCtx<ObjectScenario>;
type MediumSpecIn = ObjectScenario['outside'] | ObjectScenario['encapsulant']['medium'];

function checkMaterial(ctx: Ctx, path: (string | number)[], field: string, id: string, wantMetal: boolean): void {
  if (!MATERIAL_ID_PATTERN.test(id)) return; // already reported by the field's own check
  const m = findMaterial(id);
  if (!m || m.id !== id) {
    ctx.addIssue({ code: 'custom', path, message: `${field} '${id}' is not in the material library.` });
  } else if (wantMetal !== (m.category === 'metal')) {
    const what = wantMetal ? 'a metal' : 'a non-metal (dielectric or semiconductor)';
    ctx.addIssue({ code: 'custom', path, message: `${field} must be ${what}; '${id}' is not.` });
  }
}

/** A user material must not be a metal where a transparent medium is needed. */
function checkUserMaterial(ctx: Ctx, path: (string | number)[], field: string, m: { id: string; category: string }): void {
  if (m.category === 'metal') {
    ctx.addIssue({ code: 'custom', path, message: `${field} must be a non-metal (dielectric or semiconductor); user material '${m.id}' is a metal.` });
  }
}

/**
 * A material must give an index at the design wavelength: a formula with a pole between that wavelength
 * and its data range cannot (the library's RangeError says why), and the scenario is refused there.
 */
function checkIndexExists(ctx: Ctx, path: (string | number)[], field: string, m: Material | undefined, wavelengthNm: number): void {
  if (!m) return;
  try {
    indexAt(m, wavelengthNm);
  } catch (error) {
    const why = error instanceof Error ? error.message : String(error);
    ctx.addIssue({ code: 'custom', path, message: `${field}: ${why.replace(/\.?$/, '.')}` });
  }
}

/** The fewest significant digits (from 4) at which x still shows outside [min, max]. */
function outsideDigits(x: number, min: number, max: number): string {
  for (let digits = 4; digits < 17; digits++) {
    const shown = Number(x.toPrecision(digits));
    if (shown < min || shown > max) return String(shown);
  }
  return String(x);
}

/**
 * A material's real index at the design wavelength must lie in the range every package computation
 * takes (a typed index is held there by its own field check); a formula far outside its data range can
 * leave it (a Sellmeier fit near its pole).
 */
function checkIndexInRange(ctx: Ctx, path: (string | number)[], field: string, m: Material | undefined, wavelengthNm: number): void {
  if (!m) return;
  let n: number;
  try {
    n = indexAt(m, wavelengthNm).n;
  } catch {
    return; // reported by checkIndexExists
  }
  const L = LIMITS.indexN;
  if (!(n >= L.min && n <= L.max)) {
    ctx.addIssue({
      code: 'custom',
      path,
      // enough digits that the value shown is itself out of range (0.99999 must not print as 1)
      message: `${field} index n must be between ${L.min} and ${L.max}; ${m.name} gives ${outsideDigits(n, L.min, L.max)} at ${wavelengthNm} nm.`
    });
  }
}

/** Checks that span more than one field: materials exist, the emitter is inside the chip, the chip fits. */
/** A phosphor id names a library phosphor, or the user phosphor carried beside it. */
function checkPhosphorId(ctx: Ctx, path: string[], field: string, p: { id: string; user?: { id: string } }): void {
  if (p.user) {
    if (p.user.id !== p.id) ctx.addIssue({ code: 'custom', path: [...path, 'id'], message: `${field} '${p.id}' must be the id of the user phosphor carried with it ('${p.user.id}').` });
  } else if (MATERIAL_ID_PATTERN.test(p.id) && !findPhosphor(p.id)) {
    ctx.addIssue({ code: 'custom', path: [...path, 'id'], message: `${field} '${p.id}' is not in the phosphor library.` });
  }
}

function crossChecks(s: ObjectScenario, ctx: Ctx): void {
  if (s.chip.medium.kind === 'material') checkMaterial(ctx, ['chip', 'medium', 'id'], 'Chip material', s.chip.medium.id, false);
  if (s.encapsulant.medium.kind === 'material')
    checkMaterial(ctx, ['encapsulant', 'medium', 'id'], 'Encapsulant material', s.encapsulant.medium.id, false);
  if (s.outside.kind === 'material') checkMaterial(ctx, ['outside', 'id'], 'Outside medium material', s.outside.id, false);
  if (s.chip.medium.kind === 'user') checkUserMaterial(ctx, ['chip', 'medium', 'material'], 'Chip material', s.chip.medium.material);
  if (s.encapsulant.medium.kind === 'user')
    checkUserMaterial(ctx, ['encapsulant', 'medium', 'material'], 'Encapsulant material', s.encapsulant.medium.material);
  if (s.outside.kind === 'user') checkUserMaterial(ctx, ['outside', 'material'], 'Outside medium material', s.outside.material);
  if (s.phosphor) {
    checkPhosphorId(ctx, ['phosphor'], 'Phosphor', s.phosphor);
    if (s.phosphor.red) checkPhosphorId(ctx, ['phosphor', 'red'], 'Red phosphor', s.phosphor.red);
  }

  const wl = designWavelengthNm(s.emission);
  // A library id that is not in the library was reported above; here it has no material to check.
  const materialOf = (spec: MediumSpecIn) => (spec.kind === 'user' ? spec.material : spec.kind === 'material' ? findMaterial(spec.id) : undefined);
  checkIndexExists(ctx, ['chip', 'medium'], 'Chip material', materialOf(s.chip.medium), wl);
  checkIndexExists(ctx, ['encapsulant', 'medium'], 'Encapsulant material', materialOf(s.encapsulant.medium), wl);
  checkIndexExists(ctx, ['outside'], 'Outside medium material', materialOf(s.outside), wl);
  checkIndexInRange(ctx, ['chip', 'medium'], 'Chip', materialOf(s.chip.medium), wl);
  if (s.encapsulant.shape !== 'none') checkIndexInRange(ctx, ['encapsulant', 'medium'], 'Encapsulant', materialOf(s.encapsulant.medium), wl);
  checkIndexInRange(ctx, ['outside'], 'Outside medium', materialOf(s.outside), wl);
  if (s.base.kind === 'metal') checkIndexExists(ctx, ['base', 'id'], 'Base metal', findMaterial(s.base.id), wl);
  if (s.base.kind === 'metal') checkMaterial(ctx, ['base', 'id'], 'Base metal', s.base.id, true);
  const mirror = s.chip.mirror;
  if (mirror?.kind === 'metal') {
    checkMaterial(ctx, ['chip', 'mirror', 'id'], 'Chip mirror metal', mirror.id, true);
    checkIndexExists(ctx, ['chip', 'mirror', 'id'], 'Chip mirror metal', findMaterial(mirror.id), wl);
  }
  (s.chip.layers ?? []).forEach((layer, i) => {
    const path = ['chip', 'layers', i, 'medium'];
    const field = `Chip layer ${i + 1}`;
    // a layer's name is its ledger bin: unique, and not a medium the package already names
    const taken = ['outside', 'encapsulant'].includes(layer.name) || s.chip.layers!.findIndex((l) => l.name === layer.name) !== i;
    if (taken) ctx.addIssue({ code: 'custom', path: ['chip', 'layers', i, 'name'], message: `${field} name must differ from the other layers' and from 'outside' and 'encapsulant'.` });
    if (layer.medium.kind === 'material') checkMaterial(ctx, [...path, 'id'], `${field} material`, layer.medium.id, false);
    if (layer.medium.kind === 'user') checkUserMaterial(ctx, [...path, 'material'], `${field} material`, layer.medium.material);
    checkIndexExists(ctx, path, `${field} material`, materialOf(layer.medium), wl);
    checkIndexInRange(ctx, path, field, materialOf(layer.medium), wl);
  });

  for (const problem of packageFitProblems(s.chip, s.encapsulant, s.body, { kind: s.base.kind, finish: s.baseFinish })) {
    ctx.addIssue({ code: 'custom', path: problem.path.split('.'), message: problem.message });
  }
  // a package without encapsulant keeps its phosphor block for later (the tracer and the page say it needs one)
  if (s.phosphor && s.encapsulant.shape !== 'none') {
    for (const problem of phosphorFitProblems(s.chip, s.encapsulant, s.body, s.phosphor)) {
      ctx.addIssue({ code: 'custom', path: problem.path.split('.'), message: problem.message });
    }
  }

  if (s.emission.kind === 'table') {
    const rows = s.emission.rows;
    let total = 0;
    for (let i = 0; i < rows.length; i++) {
      total += rows[i][1];
      if (i > 0 && rows[i][0] <= rows[i - 1][0]) {
        ctx.addIssue({
          code: 'custom',
          path: ['emission', 'rows', i, 0],
          message: `Spectrum wavelengths must increase from row to row (row ${i + 1} does not).`
        });
        break;
      }
    }
    if (!(total > 0)) {
      ctx.addIssue({ code: 'custom', path: ['emission', 'rows'], message: 'Spectrum weights must not all be zero.' });
    }
  }
}

/** The scenario schema (current version), including the checks that span fields. */
export const scenarioSchema = objectSchema.superRefine(crossChecks);

export type Scenario = z.infer<typeof scenarioSchema>;
export type MediumSpec = Scenario['outside'];
/** The encapsulant's medium: a typed index there is n alone. */
export type EncapsulantMediumSpec = Scenario['encapsulant']['medium'];
/** Any medium of a scenario. */
export type AnyMediumSpec = MediumSpec | EncapsulantMediumSpec;
export type EmissionSpec = Scenario['emission'];
export type BaseSpec = Scenario['base'];
export type EncapsulantShape = Scenario['encapsulant']['shape'];
export type BodySpec = Scenario['body'];
export type ChipLayerSpec = NonNullable<Scenario['chip']['layers']>[number];
export type MirrorSpec = Scenario['base'];

/** One problem found in a scenario: a dotted path ('chip.widthMm') and a message naming field and range. */
export interface ScenarioIssue {
  path: string;
  message: string;
}

export type ParseResult = { ok: true; scenario: Scenario } | { ok: false; issues: ScenarioIssue[] };

/** Validates a scenario of the current version. Never throws; every issue names its field and allowed range. */
export function parseScenario(input: unknown): ParseResult {
  const r = scenarioSchema.safeParse(input);
  if (r.success) return { ok: true, scenario: r.data };
  return {
    ok: false,
    issues: r.error.issues.map((i) => ({ path: i.path.map(String).join('.'), message: i.message }))
  };
}

/** Validates a scenario of the current version and throws a RangeError with the first issue (for the command line). */
export function assertScenario(input: unknown): Scenario {
  const r = parseScenario(input);
  if (!r.ok) throw new RangeError(r.issues[0].message);
  return r.scenario;
}
