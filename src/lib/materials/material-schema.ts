/**
 * The schema every material entry must pass — the shipped library at load time and user materials
 * at the edge. Messages name the allowed range; the field is named by the issue's path.
 */
import { z } from 'zod';
import { dispersionValue, type NkSlot } from './dispersion-value';
import { MATERIAL_LIMITS } from './limits';
import { polesNm } from './poles';
import { MATERIAL_CATEGORIES, PROVENANCES, type Material } from './types';

const W = MATERIAL_LIMITS.wavelengthNm;
const K = MATERIAL_LIMITS.k;
const ROWS = MATERIAL_LIMITS.tableRows;
const TERMS = MATERIAL_LIMITS.formulaTerms;

/** Same pattern as scenario material ids: lower case letters, digits and dashes, 1–40 characters. */
export const MATERIAL_ID_RE = /^[a-z0-9][a-z0-9-]{0,39}$/;

const num = (range: string) => z.number({ error: `must be a finite number${range}` });
const kField = num(` in [${K.min}, ${K.max}]`).min(K.min, { error: `must be in [${K.min}, ${K.max}]` }).max(K.max, {
  error: `must be in [${K.min}, ${K.max}]`
});

const termError = { error: 'must be a {B, C} term of two numbers' };
const sellmeierTerm = z.strictObject(
  {
    B: num(''),
    C: num(' ≥ 0').min(0, { error: 'must be ≥ 0' })
  },
  termError
);
const poleTerm = z.strictObject({ B: num(''), C: num('') }, termError);
const termsOf = <T extends z.ZodType>(term: T) =>
  z
    .array(term, { error: 'must be a list of {B, C} terms' })
    .min(TERMS.min, { error: `must hold ${TERMS.min} to ${TERMS.max} terms` })
    .max(TERMS.max, { error: `must hold ${TERMS.min} to ${TERMS.max} terms` });

const nkRow = z.tuple(
  [
    num(` in [${W.min}, ${W.max}] nm`).min(W.min, { error: `wavelength must be in [${W.min}, ${W.max}] nm` }).max(W.max, {
      error: `wavelength must be in [${W.min}, ${W.max}] nm`
    }),
    num(' > 0').gt(0, { error: 'n must be > 0' }),
    num(` in [${K.min}, ${K.max}]`).min(K.min, { error: `k must be in [${K.min}, ${K.max}]` }).max(K.max, {
      error: `k must be in [${K.min}, ${K.max}]`
    })
  ],
  { error: 'each row must be [wavelength_nm, n, k]' }
);

const dispersionSchema = z.discriminatedUnion(
  'model',
  [
    z.strictObject({
      model: z.literal('sellmeier'),
      a0: num('').optional(),
      terms: termsOf(sellmeierTerm),
      d: num('').optional(),
      k: kField.optional()
    }),
    z.strictObject({
      model: z.literal('sellmeier-glass'),
      a0: num('').optional(),
      terms: termsOf(sellmeierTerm),
      d: num('').optional(),
      k: kField.optional()
    }),
    z.strictObject({ model: z.literal('cauchy'), A: num(''), B: num(''), C: num(''), k: kField.optional() }),
    z.strictObject({
      model: z.literal('formula'),
      form: z.literal('pole-sum', { error: 'must be "pole-sum" (n² = a0 + Σ B/(λ² − C))' }),
      a0: num(''),
      terms: termsOf(poleTerm),
      k: kField.optional()
    }),
    z.strictObject({
      model: z.literal('table'),
      rows: z
        .array(nkRow, { error: 'must be a list of [wavelength_nm, n, k] rows' })
        .min(ROWS.min, { error: `must hold ${ROWS.min} to ${ROWS.max} rows` })
        .max(ROWS.max, { error: `must hold ${ROWS.min} to ${ROWS.max} rows` })
    })
  ],
  { error: 'must name a model: sellmeier, sellmeier-glass, cauchy, formula or table' }
);

const rangeSchema = z.strictObject(
  {
    min: num(` in [${W.min}, ${W.max}] nm`).min(W.min, { error: `must be in [${W.min}, ${W.max}] nm` }).max(W.max, {
      error: `must be in [${W.min}, ${W.max}] nm`
    }),
    max: num(` in [${W.min}, ${W.max}] nm`).min(W.min, { error: `must be in [${W.min}, ${W.max}] nm` }).max(W.max, {
      error: `must be in [${W.min}, ${W.max}] nm`
    })
  },
  { error: `must be { min, max }, wavelengths in nm within [${W.min}, ${W.max}]` }
);

const noteSchema = z.strictObject(
  {
    text: z.string({ error: 'must be text' }).min(1, { error: 'must not be empty' }).max(2000, { error: 'must be at most 2000 characters' }),
    tag: z.enum(PROVENANCES, { error: `must be one of: ${PROVENANCES.join(', ')}` })
  },
  { error: 'must be a note { text, tag }' }
);

const scratch: NkSlot = { n: 0, k: 0 };

/** Zod schema of one material entry (see `Material`), with the cross-field checks. */
export const materialSchema: z.ZodType<Material> = z
  .strictObject({
    id: z.string({ error: 'must be text' }).regex(MATERIAL_ID_RE, {
      error: 'must be 1–40 lower-case letters, digits or dashes, starting with a letter or digit'
    }),
    name: z.string({ error: 'must be text' }).trim().min(1, { error: 'must be 1–120 characters' }).max(120, {
      error: 'must be 1–120 characters'
    }),
    aliases: z
      .array(z.string({ error: 'must be text' }).trim().min(1, { error: 'must not be empty' }).max(60, { error: 'must be at most 60 characters' }), {
        error: 'must be a list of names'
      })
      .max(20, { error: 'must hold at most 20 aliases' }),
    category: z.enum(MATERIAL_CATEGORIES, { error: `must be one of: ${MATERIAL_CATEGORIES.join(', ')}` }),
    dispersion: dispersionSchema,
    validRangeNm: rangeSchema,
    source: z.string({ error: 'must be text' }).trim().min(1, { error: 'must name where the data come from' }).max(2000, {
      error: 'must be at most 2000 characters'
    }),
    provenance: z.enum(PROVENANCES, { error: `must be one of: ${PROVENANCES.join(', ')}` }),
    notes: z.array(noteSchema, { error: 'must be a list of notes { text, tag }' }).max(20, { error: 'must hold at most 20 notes' }).optional(),
    maxServiceTempC: num(' in [-50, 1000] °C').min(-50, { error: 'must be in [-50, 1000] °C' }).max(1000, {
      error: 'must be in [-50, 1000] °C'
    }).optional()
  })
  .superRefine((m, ctx) => {
    const { min, max } = m.validRangeNm;
    // Range or table rows out of their limits are already reported by their own checks; stop here
    if (!(min >= W.min && max <= W.max)) return;
    if (!(min < max)) {
      ctx.addIssue({ code: 'custom', path: ['validRangeNm', 'max'], message: `must be greater than validRangeNm.min (${min} nm)` });
      return;
    }
    const d = m.dispersion;
    if (d.model === 'table') {
      if (d.rows.length < ROWS.min || d.rows.length > ROWS.max) return;
      for (let i = 1; i < d.rows.length; i++) {
        if (!(d.rows[i][0] > d.rows[i - 1][0])) {
          ctx.addIssue({
            code: 'custom',
            path: ['dispersion', 'rows', i, 0],
            message: `wavelengths must ascend strictly (${d.rows[i][0]} nm follows ${d.rows[i - 1][0]} nm)`
          });
          return;
        }
      }
      const first = d.rows[0][0];
      const last = d.rows[d.rows.length - 1][0];
      if (min < first || max > last) {
        ctx.addIssue({
          code: 'custom',
          path: ['validRangeNm'],
          message: `must lie within the table's wavelengths, ${first}–${last} nm`
        });
        return;
      }
    }
    // No pole of the formula may fall inside the validity range
    for (const pole of polesNm(d)) {
      if (pole >= min && pole <= max) {
        ctx.addIssue({
          code: 'custom',
          path: ['dispersion', 'terms'],
          message: `has a pole at ${Math.round(pole * 10) / 10} nm inside validRangeNm ${min}–${max} nm; a formula must stay finite over its range`
        });
        return;
      }
    }
    // Every wavelength in the range must give a physical index (metals may have n < 1, never n ≤ 0)
    const count = MATERIAL_LIMITS.samplePoints;
    for (let i = 0; i < count; i++) {
      const wavelengthNm = min + ((max - min) * i) / (count - 1);
      dispersionValue(d, wavelengthNm, scratch);
      if (!(scratch.n > 0 && scratch.n < Infinity && scratch.k >= 0 && scratch.k < Infinity)) {
        ctx.addIssue({
          code: 'custom',
          path: ['dispersion'],
          message: `gives no physical index at ${Math.round(wavelengthNm * 10) / 10} nm (needs finite n > 0 and k ≥ 0 over all of validRangeNm ${min}–${max} nm)`
        });
        return;
      }
    }
  });
