import { domeEstimate } from '../optics/index';
import type { TracePackage } from '../trace/package-spec';

/** The closed-form dome estimate for a traced package (its chip, encapsulant and outside indices). */
export type DomeClosedForm = ReturnType<typeof domeEstimate>;

/**
 * The closed-form estimate (point-like chip under a spherical dome) for the indices and sizes of a
 * trace package: nChip = chip.n, nEnc = encapsulant.n, nOut = outsideN, chip footprint and dome
 * radius. The dome's height does not enter: the closed form assumes a hemisphere.
 * Throws the optics core's RangeError for indices or sizes it does not accept.
 */
export function domeClosedForm(pkg: TracePackage): DomeClosedForm {
  return domeEstimate({
    nChip: pkg.chip.n,
    nEnc: pkg.encapsulant.n,
    nOut: pkg.outsideN,
    chipWidthMm: pkg.chip.widthMm,
    chipLengthMm: pkg.chip.lengthMm,
    radiusMm: pkg.encapsulant.radiusMm
  });
}
