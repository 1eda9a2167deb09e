/**
 * Zod schema of one phosphor entry of data/phosphors.json (and of a user phosphor given the same way).
 * The particle material is a full material entry, checked by the material library's own schema.
 */
import { z } from 'zod';
import { materialSchema } from '../materials/material-schema';

export const PHOSPHOR_PROVENANCES = ['published', 'computed from published formula', 'common practice', 'from memory', 'typical'] as const;

/** Allowed ranges of the band model and the scalar properties. */
export const PHOSPHOR_LIMITS = {
  peakEv: { min: 1.2, max: 6 },
  fwhmEv: { min: 0.01, max: 2 },
  weight: { min: 0, max: 100 },
  kPeak: { min: 0, max: 1 },
  densityGPerCm3: { min: 0.5, max: 25 },
  quantumYield: { min: 0, max: 1 },
  d50Um: { min: 0.05, max: 50 }
} as const;

const L = PHOSPHOR_LIMITS;
const ranged = (r: { min: number; max: number }, unit = '') =>
  z.number({ error: `must be a number from ${r.min} to ${r.max}${unit}` }).min(r.min, { error: `must be from ${r.min} to ${r.max}${unit}` }).max(r.max, { error: `must be from ${r.min} to ${r.max}${unit}` });
const provenance = z.enum(PHOSPHOR_PROVENANCES, { error: `must be one of: ${PHOSPHOR_PROVENANCES.join(', ')}` });

const bandSchema = z.strictObject({ peakEv: ranged(L.peakEv, ' eV'), fwhmEv: ranged(L.fwhmEv, ' eV'), weight: ranged(L.weight) });
const bandsSchema = z
  .array(bandSchema, { error: 'must be a list of bands { peakEv, fwhmEv, weight }' })
  .min(1, { error: 'must hold at least one band' })
  .max(8, { error: 'must hold at most 8 bands' })
  .refine((bands) => bands.some((b) => b.weight > 0), { error: 'must have a band of weight above 0' });

export const phosphorSchema = z.strictObject({
  id: z.string().regex(/^[a-z0-9][a-z0-9-]{0,39}$/, { error: 'must be 1–40 lower-case letters, digits or dashes' }),
  name: z.string().trim().min(1).max(120),
  formula: z.string().trim().min(1).max(120),
  color: z.enum(['blue', 'green', 'yellow', 'orange', 'red'], { error: 'must be blue, green, yellow, orange or red' }),
  emission: z.strictObject({ bands: bandsSchema, provenance, note: z.string().max(2000) }),
  absorption: z.strictObject({ kPeak: ranged(L.kPeak), bands: bandsSchema, provenance, note: z.string().max(2000) }),
  particleMaterial: materialSchema,
  densityGPerCm3: ranged(L.densityGPerCm3, ' g/cm³'),
  densitySource: z.string().trim().min(1).max(500),
  densityProvenance: provenance,
  quantumYield: ranged(L.quantumYield),
  quantumYieldProvenance: provenance,
  typicalD50Um: ranged(L.d50Um, ' µm')
});

export type Phosphor = z.infer<typeof phosphorSchema>;
export type PhosphorBand = z.infer<typeof bandSchema>;
