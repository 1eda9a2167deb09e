/**
 * Allowed ranges at the public edge of the material library. Every RangeError and field error the
 * library writes quotes these numbers, so a message always names the range the check uses.
 */
export const MATERIAL_LIMITS = {
  /** Wavelength accepted by `indexAt` and `resolveIndex`, nm: vacuum UV edge to the mid infrared. */
  wavelengthNm: { min: 100, max: 20000 },
  /** Real part of a typed index ("2.4+0.01i"); metals go below 1, so only > 0 is required. */
  typedN: { min: 0, max: 10 },
  /** Extinction coefficient of a typed index or a table row. */
  k: { min: 0, max: 50 },
  /** Rows of a pasted or stored n,k table. */
  tableRows: { min: 2, max: 5000 },
  /** Terms of a Sellmeier or pole-sum formula. */
  formulaTerms: { min: 1, max: 8 },
  /** Points at which a user material is evaluated across its range before it is accepted. */
  samplePoints: 50
} as const;
