/**
 * The IES file of a traced package: the trace's far field, zone-averaged so the polar bins carry no
 * extra noise (see far-field-smoothing.ts), scaled to the asked flux, the smoothing stated in the file.
 */
import { smoothFarField, type SmoothedFarField } from './far-field-smoothing';
import { writeIes, type IesWriteInput } from './ies';

export interface TraceIesInput extends Omit<IesWriteInput, 'farField' | 'smoothing' | 'stepDeg'> {
  /** The trace's far field: 180 relative intensities of the 1° bins [i, i + 1]°. */
  binIntensities: ArrayLike<number>;
}

/**
 * LM-63 text of a traced far field at 1° steps (0–180°), zone-averaged, with the smoothing in its
 * [_SMOOTHING] keyword, and the smoothed samples it was written from.
 * @throws RangeError naming the field for bad input (see writeIes and smoothFarField)
 */
export function traceIes(input: TraceIesInput): { text: string; farField: SmoothedFarField } {
  const farField = smoothFarField(input.binIntensities);
  const { binIntensities: _bins, ...rest } = input;
  const text = writeIes({ ...rest, farField, stepDeg: 1, smoothing: farField.note });
  return { text, farField };
}
