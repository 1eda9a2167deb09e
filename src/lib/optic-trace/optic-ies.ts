/**
 * The IES LM-63 file of a traced optic's beam: the same writer as the package's (export/ies.ts), the far
 * field averaged over zones of at least 0.002 sr (a 0–1.5° cap at the axis) — fine enough for a beam of a
 * few degrees, where the package's 0.05 sr zones would flatten the peak — the smoothing stated in the file,
 * the luminous opening the optic's exit disc.
 */
import { smoothFarField } from '../export/far-field-smoothing';
import { writeIes } from '../export/ies';
import type { OpticResults } from './optic-results';

/** Smallest zone averaged for a beam's IES file, sr. */
export const BEAM_MIN_ZONE_SR = 0.002;

export interface OpticIesInput {
  results: OpticResults;
  exitDiameterMm: number;
  /** Flux the file carries, lm. */
  lumens: number;
  seed: number;
  issueDate: string;
  name: string;
}

/** LM-63 text of an optic's beam. @throws RangeError naming the field for bad input or an empty far field */
export function opticIes(input: OpticIesInput): string {
  const farField = smoothFarField(input.results.farField.cdPerKlm, BEAM_MIN_ZONE_SR);
  return writeIes({
    farField,
    lumens: input.lumens,
    rays: input.results.rays,
    seed: input.seed,
    issueDate: input.issueDate,
    name: input.name,
    opening: { shape: 'disc', widthMm: input.exitDiameterMm, lengthMm: input.exitDiameterMm, heightMm: 0 },
    stepDeg: 1,
    smoothing: farField.note
  });
}
