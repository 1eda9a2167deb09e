/**
 * The layer stack the user builds on the /stack page: what it holds, its limits, and its checks.
 * Pure. The stack lives beside the scenario (its own `stack=` link parameter and storage key):
 * the chip and the exit medium come from the scenario, the layers from here.
 */
import { z } from 'zod';
import { findMaterial, userMaterialField } from '$lib/materials';
import type { Material } from '$lib/materials/types';
import type { IndexProfile } from '$lib/optics';
import { rangeMessage, type NumberLimit } from '$lib/scenario/limits';

/** Version 2 added `userMaterials`; a version-1 stack is read as version 2 carrying none. */
export const STACK_VERSION = 2;
/** Most user materials one stack carries (one per layer at most). */
const MAX_CARRIED = 200;

/** Every limit of the stack page; messages quote these numbers. */
export const STACK_LIMITS = {
  /** Real part of a typed layer index (metals go below 1). */
  indexN: { min: 0.01, max: 10, unit: '' },
  /** Extinction coefficient of a typed layer index. */
  indexK: { min: 0, max: 50, unit: '' },
  /** Index at either end of a graded-index section. */
  gradedN: { min: 1, max: 6, unit: '' },
  /** Thickness of a thin film (coherent mode), nm: up to 100 µm. */
  thinNm: { min: 0, max: 100_000, unit: 'nm' },
  /** Thickness of a thick layer (incoherent mode), µm: up to 10 mm. */
  thickUm: { min: 0, max: 10_000, unit: 'µm' },
  /** Sublayers of one graded-index section. */
  sublayers: { min: 1, max: 200, unit: 'sublayers', integer: true },
  /** Layers after graded sections are expanded into their sublayers. */
  totalLayers: { min: 0, max: 200, unit: 'layers', integer: true }
} as const satisfies Record<string, NumberLimit>;

/** Largest thickness of any layer in nm (the thick-mode limit). */
const MAX_NM = STACK_LIMITS.thickUm.max * 1000;

export type StackMode = 'thin' | 'thick';
export type ExitChoice = 'encapsulant' | 'outside';
export type LayerMedium = { kind: 'material'; id: string } | { kind: 'index'; n: number; k: number };

export interface LayerItem {
  kind: 'layer';
  medium: LayerMedium;
  thicknessNm: number;
}

export interface GradedItem {
  kind: 'graded';
  /** Index on the chip side and on the exit side. */
  fromN: number;
  toN: number;
  thicknessNm: number;
  profile: IndexProfile;
  sublayers: number;
}

export type StackItem = LayerItem | GradedItem;

export interface StackDoc {
  version: typeof STACK_VERSION;
  /** 'thin': coherent thin films (interference); 'thick': incoherent thick layers (intensities add). */
  mode: StackMode;
  /** Where the light goes after the stack: the scenario's encapsulant or its outside medium. */
  exit: ExitChoice;
  /** Layers from the chip outwards. */
  items: StackItem[];
  /**
   * The user's own materials the layers use, in full, so that a link works in a browser that does not
   * have them (see {@link carryUserMaterials}).
   */
  userMaterials: Material[];
}

export const PROFILES: readonly IndexProfile[] = ['linear', 'quintic', 'exponential'];

/** The stack a first visit starts with: one 100 nm SiO2 film, thin-film mode, into the encapsulant. */
export function defaultStack(): StackDoc {
  return {
    version: STACK_VERSION,
    mode: 'thin',
    exit: 'encapsulant',
    items: [{ kind: 'layer', medium: { kind: 'material', id: 'sio2' }, thicknessNm: 100 }],
    userMaterials: []
  };
}

/**
 * The stack with `userMaterials` set to the definitions of exactly the non-library materials its layers
 * use, taken from `lookup` (the user's own list) or else from what the stack already carries; ids found
 * in neither stay unresolved (the page says the material is missing).
 */
export function carryUserMaterials(doc: StackDoc, lookup: (id: string) => Material | undefined): StackDoc {
  const carried = new Map(doc.userMaterials.map((m) => [m.id, m]));
  const out = new Map<string, Material>();
  for (const it of doc.items) {
    if (it.kind !== 'layer' || it.medium.kind !== 'material' || out.has(it.medium.id)) continue;
    const id = it.medium.id;
    if (findMaterial(id)?.id === id) continue;
    const m = lookup(id) ?? carried.get(id);
    if (m) out.set(id, m);
  }
  return { ...doc, userMaterials: [...out.values()] };
}

function num(field: string, limit: NumberLimit) {
  const message = rangeMessage(field, limit);
  const base = z.number({ error: message }).min(limit.min, { error: message }).max(limit.max, { error: message });
  return limit.integer ? base.int({ error: message }) : base;
}

const thickness = num('Thickness', { min: 0, max: MAX_NM, unit: 'nm' });

const mediumSchema = z.discriminatedUnion(
  'kind',
  [
    z.strictObject({ kind: z.literal('material'), id: z.string().regex(/^[a-z0-9][a-z0-9-]{0,39}$/, { error: 'Layer material must be a material id.' }) }),
    z.strictObject({ kind: z.literal('index'), n: num('Layer index n', STACK_LIMITS.indexN), k: num('Layer extinction k', STACK_LIMITS.indexK) })
  ],
  { error: 'A layer is a library material or a typed index.' }
);

const itemSchema = z.discriminatedUnion(
  'kind',
  [
    z.strictObject({ kind: z.literal('layer'), medium: mediumSchema, thicknessNm: thickness }),
    z.strictObject({
      kind: z.literal('graded'),
      fromN: num('Graded index from', STACK_LIMITS.gradedN),
      toN: num('Graded index to', STACK_LIMITS.gradedN),
      thicknessNm: thickness,
      profile: z.enum(PROFILES as [IndexProfile, ...IndexProfile[]], { error: `Profile must be one of: ${PROFILES.join(', ')}.` }),
      sublayers: num('Number of sublayers', STACK_LIMITS.sublayers)
    })
  ],
  { error: 'A stack item is a layer or a graded-index section.' }
);

const docSchema = z
  .strictObject({
    version: z.union([z.literal(1), z.literal(STACK_VERSION)], { error: `Stack version must be 1 or ${STACK_VERSION}.` }),
    mode: z.enum(['thin', 'thick'], { error: "Mode must be 'thin' or 'thick'." }),
    exit: z.enum(['encapsulant', 'outside'], { error: "Exit medium must be 'encapsulant' or 'outside'." }),
    items: z.array(itemSchema, { error: 'Items must be a list of layers.' }),
    userMaterials: z
      .array(userMaterialField('User material in the stack'), { error: 'User materials must be a list of materials.' })
      .max(MAX_CARRIED, { error: `A stack carries at most ${MAX_CARRIED} user materials.` })
      .optional()
  })
  .transform((d): StackDoc => ({ ...d, version: STACK_VERSION, userMaterials: d.userMaterials ?? [] }));

/** Number of layers the stack is computed with: one per layer, `sublayers` per graded section. */
export function expandedCount(items: readonly StackItem[]): number {
  let n = 0;
  for (const it of items) n += it.kind === 'graded' ? it.sublayers : 1;
  return n;
}

/** Message for a stack that would exceed the layer limit, or null. */
export function layerCountProblem(items: readonly StackItem[]): string | null {
  const count = expandedCount(items);
  const max = STACK_LIMITS.totalLayers.max;
  return count > max
    ? `The stack would have ${count} layers (graded sections count each sublayer); at most ${max} are allowed.`
    : null;
}

/** Message when a layer is too thick for thin-film mode, or null. */
export function thinModeProblem(items: readonly StackItem[]): string | null {
  const max = STACK_LIMITS.thinNm.max;
  const i = items.findIndex((it) => it.thicknessNm > max);
  if (i < 0) return null;
  return `Item ${i + 1} is ${items[i].thicknessNm / 1000} µm thick; thin-film mode takes layers between 0 and ${max} nm (100 µm). Make it thinner or use thick-layer mode.`;
}

export type StackCheck = { ok: true; doc: StackDoc } | { ok: false; message: string };

/**
 * Validates a stack (from a link, storage or an edit). Messages name the field and allowed range.
 * Beyond the schema: at most 200 layers after expansion; in thin-film mode no layer over 100 µm.
 */
export function checkStack(input: unknown): StackCheck {
  const r = docSchema.safeParse(input);
  if (!r.success) {
    const issue = r.error.issues[0];
    const at = issue.path[0] === 'items' && typeof issue.path[1] === 'number' ? `Item ${issue.path[1] + 1}: ` : '';
    return { ok: false, message: at + issue.message };
  }
  const doc = r.data;
  const count = layerCountProblem(doc.items);
  if (count) return { ok: false, message: count };
  if (doc.mode === 'thin') {
    const thin = thinModeProblem(doc.items);
    if (thin) return { ok: false, message: thin };
  }
  return { ok: true, doc };
}

/** nm → µm for display, rounded to 12 significant digits so a typed value reads back unchanged. */
export function nmToUm(nm: number): number {
  return Number((nm / 1000).toPrecision(12));
}

/** µm → nm, rounded to 12 significant digits (see {@link nmToUm}). */
export function umToNm(um: number): number {
  return Number((um * 1000).toPrecision(12));
}
