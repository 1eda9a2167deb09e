/**
 * The "add a material" form, read into a user material. Pure: field texts in, a validated Material
 * or field-level messages out. The library's `validateUserMaterial` does the physical checks (no pole
 * inside the range, finite n > 0 and k ≥ 0 everywhere in it); this file names the form's fields.
 */
import { MATERIAL_CATEGORIES, MATERIAL_LIMITS, parseNkTable, validateUserMaterial } from '../materials/index';
import type { Dispersion, Material, MaterialCategory } from '../materials/types';

/** Dispersion models the form offers. */
export type FormModel = 'sellmeier' | 'sellmeier-glass' | 'cauchy' | 'table';

/** One Sellmeier term as typed: B (dimensionless) and C (µm for the resonance form, µm² for the glass form). */
export interface TermText {
  B: string;
  C: string;
}

/** Everything the form holds, as typed. */
export interface UserMaterialForm {
  name: string;
  category: MaterialCategory;
  model: FormModel;
  terms: TermText[];
  cauchyA: string;
  cauchyB: string;
  cauchyC: string;
  /** Constant extinction coefficient for formula models ('' = 0). */
  k: string;
  /** Pasted n,k table (table model). */
  table: string;
  /** Validity range, nm ('' for a table = the table's span). */
  rangeMinNm: string;
  rangeMaxNm: string;
  /** Where the numbers come from ('' = "entered by the user"). */
  source: string;
}

/** Form field names that messages attach to. `terms.2.C` names one coefficient. */
export type FormField = string;

export type FormResult = { ok: true; material: Material; notes: string[] } | { ok: false; errors: Map<FormField, string> };

export const MAX_TERMS = MATERIAL_LIMITS.formulaTerms.max;
const W = MATERIAL_LIMITS.wavelengthNm;
const K = MATERIAL_LIMITS.k;

/** A fresh form: a three-term resonance-form Sellmeier, layer category, no values yet. */
export function emptyForm(): UserMaterialForm {
  return {
    name: '',
    category: 'layer',
    model: 'sellmeier',
    terms: [
      { B: '', C: '' },
      { B: '', C: '' },
      { B: '', C: '' }
    ],
    cauchyA: '',
    cauchyB: '',
    cauchyC: '',
    k: '',
    table: '',
    rangeMinNm: '',
    rangeMaxNm: '',
    source: ''
  };
}

/** Reads "1.5", "-0,3", "1e-3"; '' and anything else is null. */
function num(text: string): number | null {
  const t = text.trim().replace(',', '.');
  if (!/^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i.test(t)) return null;
  const x = Number(t);
  return Number.isFinite(x) ? x : null;
}

/** A material id made from the name, not used by the library or `takenIds`: "user-my-oxide", "user-my-oxide-2". */
export function userMaterialId(name: string, takenIds: ReadonlySet<string>): string {
  const slug =
    name
      .normalize('NFKD')
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-+|-+$/g, '')
      .slice(0, 28) || 'material';
  const base = `user-${slug}`.replace(/-+$/, '');
  if (!takenIds.has(base)) return base;
  for (let i = 2; ; i++) {
    const id = `${base}-${i}`;
    if (!takenIds.has(id)) return id;
  }
}

/** Maps a validator path ("dispersion.terms.1.C", "validRangeNm.max") to a form field and its label. */
function fieldOf(path: string, model: FormModel): [FormField, string] {
  if (path.startsWith('name')) return ['name', 'Name'];
  if (path.startsWith('category')) return ['category', 'Category'];
  if (path.startsWith('validRangeNm.min')) return ['rangeMinNm', 'Valid from'];
  if (path.startsWith('validRangeNm')) return ['rangeMaxNm', 'The valid range'];
  if (path.startsWith('source')) return ['source', 'Source'];
  const term = /^dispersion\.terms\.(\d+)\.(B|C)/.exec(path);
  if (term) return [`terms.${term[1]}.${term[2]}`, `${term[2]}${Number(term[1]) + 1}`];
  if (path.startsWith('dispersion.k')) return ['k', 'Extinction k'];
  if (model === 'cauchy' && /^dispersion\.[ABC]$/.test(path)) return [`cauchy${path.slice(-1)}`, path.slice(-1)];
  if (model === 'table') return ['table', 'The table'];
  return ['model', 'The formula'];
}

/**
 * Reads the form into a validated user material with a fresh id (see {@link userMaterialId}).
 * Messages name the field and the allowed range: "C₂ (µm²) must be a number ≥ 0." Blank Sellmeier rows
 * are skipped; at least one term is needed.
 * @param takenIds ids already in use (the user's other materials); library ids are refused by the validator
 */
export function readUserMaterialForm(form: UserMaterialForm, takenIds: ReadonlySet<string>): FormResult {
  const errors = new Map<FormField, string>();
  const notes: string[] = [];
  const name = form.name.trim();
  if (name.length < 1 || name.length > 120) errors.set('name', 'Name must be 1 to 120 characters.');
  if (!MATERIAL_CATEGORIES.includes(form.category)) errors.set('category', `Category must be one of: ${MATERIAL_CATEGORIES.join(', ')}.`);

  let k = 0;
  if (form.model !== 'table' && form.k.trim() !== '') {
    const x = num(form.k);
    if (x === null || x < K.min || x > K.max) errors.set('k', `Extinction k must be a number between ${K.min} and ${K.max}.`);
    else k = x;
  }

  let dispersion: Dispersion | null = null;
  const cUnit = form.model === 'sellmeier' ? 'µm' : 'µm²';
  if (form.model === 'sellmeier' || form.model === 'sellmeier-glass') {
    const terms: { B: number; C: number }[] = [];
    form.terms.forEach((t, i) => {
      if (t.B.trim() === '' && t.C.trim() === '') return;
      const B = num(t.B);
      const C = num(t.C);
      if (B === null) errors.set(`terms.${i}.B`, `B${i + 1} must be a number.`);
      if (C === null || C < 0) errors.set(`terms.${i}.C`, `C${i + 1} (${cUnit}) must be a number ≥ 0.`);
      if (B !== null && C !== null && C >= 0) terms.push({ B, C });
    });
    if (terms.length === 0 && ![...errors.keys()].some((f) => f.startsWith('terms.'))) {
      errors.set('terms.0.B', `Give at least one Sellmeier term (B1 and C1); up to ${MAX_TERMS} are allowed.`);
    }
    dispersion = { model: form.model, terms, ...(k > 0 ? { k } : {}) };
  } else if (form.model === 'cauchy') {
    const A = num(form.cauchyA);
    const B = form.cauchyB.trim() === '' ? 0 : num(form.cauchyB);
    const C = form.cauchyC.trim() === '' ? 0 : num(form.cauchyC);
    if (A === null || A <= 0) errors.set('cauchyA', 'A must be a number > 0.');
    if (B === null) errors.set('cauchyB', 'B (µm²) must be a number (blank = 0).');
    if (C === null) errors.set('cauchyC', 'C (µm⁴) must be a number (blank = 0).');
    dispersion = { model: 'cauchy', A: A ?? 1, B: B ?? 0, C: C ?? 0, ...(k > 0 ? { k } : {}) };
  } else {
    const t = parseNkTable(form.table);
    if (!t.ok) {
      const first = t.errors[0];
      const more = t.errors.length > 1 ? ` (and ${t.errors.length - 1} more)` : '';
      errors.set('table', `Table${first.line > 0 ? `, line ${first.line}` : ''}: ${first.message}${more}.`);
    } else {
      notes.push(...t.notes);
      dispersion = { model: 'table', rows: t.rows };
    }
  }

  // Validity range: required for formulas; a table defaults to its span.
  let range: { min: number; max: number } | undefined;
  const minText = form.rangeMinNm.trim();
  const maxText = form.rangeMaxNm.trim();
  if (form.model !== 'table' || minText !== '' || maxText !== '') {
    const min = num(minText);
    const max = num(maxText);
    const rangeMsg = `must be a wavelength between ${W.min} and ${W.max} nm`;
    if (min === null || min < W.min || min > W.max) errors.set('rangeMinNm', `Valid from ${rangeMsg}.`);
    if (max === null || max < W.min || max > W.max) errors.set('rangeMaxNm', `Valid to ${rangeMsg}.`);
    else if (min !== null && !(max > min)) errors.set('rangeMaxNm', `Valid to must be more than valid from (${min} nm) and at most ${W.max} nm.`);
    if (min !== null && max !== null) range = { min, max };
  }
  if (form.source.length > 2000) errors.set('source', 'Source must be at most 2000 characters.');
  if (errors.size > 0 || !dispersion) return { ok: false, errors };

  const candidate = {
    id: userMaterialId(name, takenIds),
    name,
    aliases: [],
    category: form.category,
    dispersion,
    ...(range ? { validRangeNm: range } : {}),
    source: form.source.trim() || 'entered by the user',
    provenance: 'user supplied'
  };
  const v = validateUserMaterial(candidate);
  if (!v.ok) {
    for (const e of v.errors) {
      const [field, label] = fieldOf(e.path, form.model);
      // The validator writes "<path> <message>"; say it with the form's own label instead.
      const bare = e.path !== '' && e.message.startsWith(`${e.path} `) ? e.message.slice(e.path.length + 1) : e.message;
      if (!errors.has(field)) errors.set(field, sentence(e.path === '' ? bare : `${label} ${bare}`));
    }
    return { ok: false, errors };
  }
  return { ok: true, material: v.material, notes };
}

/** Capital first letter and a full stop. */
function sentence(text: string): string {
  const t = text.charAt(0).toUpperCase() + text.slice(1);
  return /[.!?]$/.test(t) ? t : `${t}.`;
}
