/**
 * The claim page's fields, as plain data: what the user typed (percent for extraction and coating,
 * a factor for gain), where each index comes from (the scenario or typed), and their link parameters, so
 * a copied link reopens the same claim. Pure.
 */
import {
  CHIP_STRUCTURES,
  CLAIM_DEFAULTS,
  CLAIM_EXAMPLE,
  CLAIM_KINDS,
  CLAIM_VALUE_LIMIT,
  claimCoreValue,
  type ChipStructure,
  type Claim,
  type ClaimKind
} from '$lib/decisions';
import { LIMITS } from '$lib/scenario/limits';

export type IndexChoice = 'scenario' | 'typed';
export type EncChoice = 'scenario' | 'none' | 'typed';

export interface ClaimForm {
  kind: ClaimKind;
  /** As shown: percent for extraction and coating (85 = 85 %, 40 = +40 %), a factor for gain (3.5). */
  shown: number;
  structure: ChipStructure;
  faces: 1 | 5 | 6;
  chip: IndexChoice;
  chipN: number;
  enc: EncChoice;
  encN: number;
  out: IndexChoice;
  outN: number;
}

/** The scenario's indices the form falls back on. */
export interface ScenarioIndices {
  nChip: number;
  /** null when the scenario has no encapsulant. */
  nEnc: number | null;
  nOut: number;
}

/** Limits of the stated value per kind, with its unit (the one limits table's). */
export const SHOWN_LIMITS = CLAIM_VALUE_LIMIT;

/** Every typed index (chip, encapsulant, outside) takes the package index range. */
export const INDEX_LIMIT = LIMITS.indexN;

/** A typical claim of each kind, used when the kind changes. */
export const EXAMPLE_VALUE = CLAIM_EXAMPLE;

export function defaultForm(s: ScenarioIndices): ClaimForm {
  return {
    kind: CLAIM_DEFAULTS.kind,
    shown: EXAMPLE_VALUE[CLAIM_DEFAULTS.kind],
    structure: CLAIM_DEFAULTS.structure,
    faces: CLAIM_DEFAULTS.faces,
    chip: 'scenario',
    chipN: round(s.nChip),
    enc: s.nEnc === null ? 'none' : 'scenario',
    encN: round(s.nEnc ?? 1.41),
    out: 'scenario',
    outN: round(s.nOut)
  };
}

function round(x: number): number {
  return Number(x.toPrecision(4));
}

/** The claim the form describes, with the scenario's indices where the form says "scenario". */
export function formToClaim(form: ClaimForm, s: ScenarioIndices): Claim {
  const nEnc = form.enc === 'none' ? null : form.enc === 'typed' ? form.encN : s.nEnc;
  return {
    kind: form.kind,
    value: claimCoreValue(form.kind, form.shown),
    structure: form.structure,
    faces: form.faces,
    nChip: form.chip === 'typed' ? form.chipN : s.nChip,
    nEnc,
    nOut: form.out === 'typed' ? form.outN : s.nOut
  };
}

/** Link parameters of the form (null drops a parameter that only repeats the scenario). */
export function formToParams(form: ClaimForm): Record<string, string | null> {
  return {
    kind: form.kind,
    value: String(form.shown),
    structure: form.structure,
    faces: String(form.faces),
    chip: form.chip === 'typed' ? String(form.chipN) : null,
    enc: form.enc === 'typed' ? String(form.encN) : form.enc === 'none' ? 'none' : null,
    out: form.out === 'typed' ? String(form.outN) : null
  };
}

function num(text: string | null, min: number, max: number): number | null {
  if (text === null || text.trim() === '') return null;
  const x = Number(text);
  return Number.isFinite(x) && x >= min && x <= max ? x : null;
}

/** A form from link parameters; anything missing or out of range falls back to the default. */
export function formFromParams(get: (name: string) => string | null, s: ScenarioIndices): ClaimForm {
  const form = defaultForm(s);
  const kind = get('kind');
  if (kind && (CLAIM_KINDS as readonly string[]).includes(kind)) {
    form.kind = kind as ClaimKind;
    form.shown = EXAMPLE_VALUE[form.kind];
  }
  const lim = SHOWN_LIMITS[form.kind];
  form.shown = num(get('value'), lim.min, lim.max) ?? form.shown;
  const structure = get('structure');
  if (structure && (CHIP_STRUCTURES as readonly string[]).includes(structure)) form.structure = structure as ChipStructure;
  const faces = get('faces');
  if (faces === '1' || faces === '5' || faces === '6') form.faces = Number(faces) as 1 | 5 | 6;
  const chip = num(get('chip'), INDEX_LIMIT.min, INDEX_LIMIT.max);
  if (chip !== null) Object.assign(form, { chip: 'typed', chipN: chip });
  const enc = get('enc');
  if (enc === 'none') form.enc = 'none';
  else {
    const n = num(enc, INDEX_LIMIT.min, INDEX_LIMIT.max);
    if (n !== null) Object.assign(form, { enc: 'typed', encN: n });
  }
  const out = num(get('out'), INDEX_LIMIT.min, INDEX_LIMIT.max);
  if (out !== null) Object.assign(form, { out: 'typed', outN: out });
  return form;
}
