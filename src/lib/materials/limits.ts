/**
 * The material library's names for its allowed ranges. The numbers live in the one limits table
 * (scenario/limits.ts); every RangeError and field error the library writes quotes them, so a message
 * always names the range the check uses.
 */
import { LIMITS } from '../scenario/limits';

export const MATERIAL_LIMITS = {
  /** Wavelength accepted by `indexAt` and `resolveIndex`, nm. */
  wavelengthNm: LIMITS.materialWavelengthNm,
  /** Real part of a typed index ("2.4+0.01i"), exclusive minimum. */
  typedN: LIMITS.materialN,
  /** Extinction coefficient of a typed index or a table row. */
  k: LIMITS.materialK,
  /** Rows of a pasted or stored n,k table. */
  tableRows: LIMITS.nkTableRows,
  /** Terms of a Sellmeier or pole-sum formula. */
  formulaTerms: LIMITS.formulaTerms,
  /** Points at which a user material is evaluated across its range before it is accepted (not a limit). */
  samplePoints: 50
} as const;
