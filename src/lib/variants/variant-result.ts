/**
 * What a variant's background trace leaves behind: the package trace and the bare chip on the same
 * base, reduced to the numbers the comparison shows and exports. Pure; the zod schema lets a
 * comparison file's results be read back (the command line prints them).
 */
import { z } from 'zod';
import type { TraceSummary } from '../trace/summary';

const fraction = z.number().min(0).max(1);

export const variantTraceSchema = z
  .object({
    rays: z.number().int().min(1),
    extraction: fraction,
    stderr: z.number().min(0).max(1),
    ledger: z.object({ escaped: fraction, chip: fraction, encapsulant: fraction, base: fraction, lost: fraction }),
    escapedBelowHorizon: fraction,
    farField: z.object({
      beamAngleDeg: z.number().min(0).max(360).nullable(),
      onAxisVsLambertian: z.number().min(0).nullable(),
      bins: z.array(z.object({ thetaDeg: z.number().min(0).max(180), relativeIntensity: z.number().min(0) })).max(3600)
    })
  });

export const variantResultSchema = z.object({
  /** Seed of both traces. */
  seed: z.number().int().min(0),
  package: variantTraceSchema,
  /** null when the variant has no encapsulant (the package is the bare chip). */
  bareChip: variantTraceSchema.nullable()
});

export type VariantTrace = z.infer<typeof variantTraceSchema>;
export type VariantResult = z.infer<typeof variantResultSchema>;

/** The part of a trace summary a variant keeps. */
export function variantTrace(s: TraceSummary): VariantTrace {
  return {
    rays: s.rays,
    extraction: s.extraction,
    stderr: s.stderr,
    ledger: { ...s.ledger },
    escapedBelowHorizon: s.escapedBelowHorizon,
    farField: {
      beamAngleDeg: s.farField.beamAngleDeg,
      onAxisVsLambertian: s.farField.onAxisVsLambertian,
      bins: s.farField.bins.map((b) => ({ thetaDeg: b.thetaDeg, relativeIntensity: b.relativeIntensity }))
    }
  };
}
