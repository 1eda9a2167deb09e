/**
 * Every numeric limit of a scenario, in one place. The schema, the URL decoder, the scenario panel
 * and the command line all read their allowed ranges from here, so an error message always names
 * the same range the check uses.
 */

/** An allowed closed range for one kind of number, with the unit shown beside it. */
export interface NumberLimit {
  readonly min: number;
  readonly max: number;
  /** Unit written after the number ('' for plain numbers). */
  readonly unit: string;
  /** Whole numbers only. */
  readonly integer?: boolean;
}

export const LIMITS = {
  /** Emission or design wavelength: near UV to short-wave infrared, where LED materials have data. */
  wavelengthNm: { min: 200, max: 2500, unit: 'nm' },
  /** Full width at half maximum of a Gaussian emission band. */
  fwhmNm: { min: 1, max: 500, unit: 'nm' },
  /** Relative weight of one row of a tabulated spectrum. */
  spectrumWeight: { min: 0, max: 1e12, unit: '' },
  /** Number of rows of a tabulated spectrum. */
  spectrumRows: { min: 2, max: 2000, unit: 'rows', integer: true },
  /** Any length of the package: chip sides, chip height, dome radius, encapsulant height. */
  sizeMm: { min: 0.001, max: 1000, unit: 'mm' },
  /** Height of the emitting plane above the chip's bottom face (upper bound is the chip height, a fit rule). */
  emitterZMm: { min: 0, max: 1000, unit: 'mm' },
  /** Bulk absorption coefficient (Beer–Lambert, I = I0·exp(−α·d)); 1000/mm loses 1/e in 1 µm. */
  absorptionPerMm: { min: 0, max: 1000, unit: '1/mm' },
  /** Power reflectance of the base under the chip. */
  reflectance: { min: 0, max: 1, unit: '' },
  /**
   * Real index of a package medium (chip, encapsulant, outside) — typed or taken from a material at the
   * design wavelength: air up to the densest semiconductors. Every computation of a package takes this range.
   */
  indexN: { min: 1, max: 6, unit: '' },
  /** Extinction coefficient of a typed refractive index of a package medium. */
  indexK: { min: 0, max: 10, unit: '' },
  /** Rays launched by a package trace (fewer than 1000 gives a standard error above 1.5 %, too coarse to show). */
  rays: { min: 1_000, max: 20_000_000, unit: 'rays', integer: true },
  /** Seed of the trace's random number generator (unsigned 32-bit). */
  seed: { min: 0, max: 4_294_967_295, unit: '', integer: true },
  /** Surface events after which a traced ray is counted lost. */
  maxEvents: { min: 1, max: 1_000_000, unit: 'events', integer: true },
  /** Length of the scenario's name, in characters. */
  nameLength: { min: 1, max: 120, unit: 'characters', integer: true },

  /** Wavelength at which a material of the library (or the user's) may be evaluated: vacuum UV to mid infrared. */
  materialWavelengthNm: { min: 100, max: 20000, unit: 'nm' },
  /** Real part of any material's or layer's index; metals go below 1, so only > 0 is required (min is exclusive). */
  materialN: { min: 0, max: 10, unit: '' },
  /** Extinction coefficient of any material or layer (metals reach about 15 in the infrared). */
  materialK: { min: 0, max: 50, unit: '' },
  /** Fraction of the light leaving a textured chip face in a Lambertian direction instead of the specular one. */
  scatteredFraction: { min: 0, max: 1, unit: '' },
  /** Layers of a layered chip, bottom to top. */
  chipLayers: { min: 1, max: 16, unit: 'layers', integer: true },
  /** Rows of a pasted or stored n,k table. */
  nkTableRows: { min: 2, max: 5000, unit: 'rows', integer: true },
  /** Terms of a Sellmeier or pole-sum formula. */
  formulaTerms: { min: 1, max: 8, unit: 'terms', integer: true },

  /** A claimed extraction, percent of the light generated in the chip (0 is no claim: the minimum is exclusive). */
  claimExtractionPercent: { min: 0, max: 100, unit: '%' },
  /** A claimed gain of an encapsulant over the bare chip, a factor (minimum exclusive). */
  claimGain: { min: 0, max: 100, unit: '×' },
  /** A claimed change of extraction from a flat coating, percent (−100 % is all light lost: minimum exclusive). */
  claimCoatingPercent: { min: -100, max: 10000, unit: '%' },
  /** Phosphor weight in the phosphor–host mixture (independent scattering is a dilute-cloud model; above ~60 wt% it fails). */
  phosphorWeightPercent: { min: 0, max: 60, unit: 'wt%' },
  /** Phosphor particle diameter (d50): the Mie evaluation's supported range. */
  phosphorDiameterUm: { min: 0.05, max: 50, unit: 'µm' },
  /** Phosphor layer thickness (conformal, remote, floor layers). */
  phosphorThicknessMm: { min: 0.005, max: 10, unit: 'mm' },
  /** Quantum yield: re-emitted photons per absorbed photon. */
  quantumYield: { min: 0, max: 1, unit: '' },
  /** Target correlated colour temperature of a load search. */
  targetCctK: { min: 2000, max: 10000, unit: 'K' },
  /** Target Duv of a two-phosphor load search (CCT and Duv are defined within ±0.05 of the Planckian locus). */
  targetDuv: { min: -0.02, max: 0.02, unit: '' },
  /** Peak and FWHM of a Gaussian phosphor emission given on the command line (FWHM down to 0.1 nm for line-like tests). */
  phosphorEmissionFwhmNm: { min: 0.1, max: 500, unit: 'nm' },

  /** Beam optics: an optic's exit diameter and its height above the source plane. */
  opticSizeMm: { min: 0.5, max: 1000, unit: 'mm' },
  /** Beam optics: clearance between the source plane and the optic. */
  opticGapMm: { min: 0, max: 100, unit: 'mm' },
  /** Beam optics: the full beam angle asked of an optic. */
  targetBeamDeg: { min: 0.1, max: 180, unit: '°' },
  /** Beam optics: side (or diameter) of an idealised flat Lambertian source. */
  lambertianSourceMm: { min: 0.01, max: 100, unit: 'mm' },
  /** Beam optics: rays traced per optic from the command line (the page offers a few fixed counts). */
  opticRays: { min: 1_000, max: 100_000_000, unit: 'rays', integer: true }
} as const satisfies Record<string, NumberLimit>;

export type LimitName = keyof typeof LIMITS;

/** "between 0.001 and 1000 mm" — the allowed range written out for a message. */
export function rangeText(limit: NumberLimit): string {
  const unit = limit.unit === '' ? '' : ` ${limit.unit}`;
  return `between ${limit.min} and ${limit.max}${unit}`;
}

/** "Chip width must be between 0.001 and 1000 mm." */
export function rangeMessage(field: string, limit: NumberLimit): string {
  const whole = limit.integer ? 'a whole number ' : '';
  return `${field} must be ${whole}${rangeText(limit)}.`;
}

/**
 * Checks one number against a limit and returns the message to show, or null when it is allowed.
 * NaN, ±Infinity and non-numbers are rejected with the same range message.
 */
export function checkNumber(field: string, limit: NumberLimit, value: unknown): string | null {
  if (typeof value !== 'number' || !Number.isFinite(value)) return rangeMessage(field, limit);
  if (value < limit.min || value > limit.max) return rangeMessage(field, limit);
  if (limit.integer && !Number.isInteger(value)) return rangeMessage(field, limit);
  return null;
}

/** Identifier of a material in the library: lower case letters, digits and dashes. */
export const MATERIAL_ID_PATTERN = /^[a-z0-9][a-z0-9-]{0,39}$/;
