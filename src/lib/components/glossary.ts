/**
 * The terms and abbreviations the pages use, each with its expansion and a one-line meaning for a
 * tooltip. One table, so every page explains a term the same way. Pure.
 */

export interface GlossaryEntry {
  /** What the page prints after first use: "TIR", "ηF", "closed form". */
  short: string;
  /** Written out in full on first use: "total internal reflection". Equal to `short` for plain words. */
  long: string;
  /** One sentence for the tooltip. */
  meaning: string;
}

export const GLOSSARY = {
  tir: {
    short: 'TIR',
    long: 'total internal reflection',
    meaning: 'Light meeting a surface beyond the critical angle is reflected completely; none of it passes.'
  },
  criticalAngle: {
    short: 'θc',
    long: 'critical angle',
    meaning: 'The angle of incidence beyond which light cannot leave a denser medium: sin θc = n_out / n_in (Snell).'
  },
  etaF: {
    short: 'ηF',
    long: 'Fresnel-weighted escape fraction',
    meaning: 'The share of light from a point inside the chip that leaves through one flat face, after the partial reflection at that face.'
  },
  r0: {
    short: 'R₀',
    long: 'reflectance at normal incidence',
    meaning: 'The share of light reflected by a surface it meets square on: ((n₁ − n₂)/(n₁ + n₂))².'
  },
  closedForm: {
    short: 'closed form',
    long: 'closed form',
    meaning: 'A formula worked out directly, here for a point-like chip at the centre of a large dome and its top face only — an ideal reference, not the package.'
  },
  trace: {
    short: 'trace',
    long: 'Monte Carlo ray trace',
    meaning: 'Random rays followed through the whole package (every chip face, the base, the encapsulant) until each escapes or is absorbed.'
  },
  halfDiagonal: {
    short: 'half-diagonal',
    long: 'half-diagonal',
    meaning: "Half the chip's diagonal, from its centre to a corner: r = ½√(width² + length²)."
  },
  noTirRadius: {
    short: 'no-TIR radius',
    long: 'no-TIR radius',
    meaning: 'The smallest dome radius at which no ray from the chip meets the dome beyond its critical angle: half-diagonal × encapsulant index ÷ outside index.'
  },
  overCurrent: {
    short: 'over current',
    long: 'over the current encapsulant',
    meaning: "Compared with the scenario's present encapsulant (or the bare chip when it has none): 1.10 × means 10 % more light."
  },
  fwhm: {
    short: 'FWHM',
    long: 'full width at half maximum',
    meaning: 'The width of a peak measured between the two points where it falls to half its height.'
  },
  cct: {
    short: 'CCT',
    long: 'correlated colour temperature',
    meaning: 'The temperature of the black body whose colour is closest to that of the light, in kelvin.'
  },
  sigma: {
    short: 'σ',
    long: 'standard error',
    meaning: 'The spread of a Monte Carlo estimate: about two in three repeated traces land within ±1σ of the true value.'
  },
  lambertian: {
    short: 'Lambertian',
    long: 'Lambertian',
    meaning: 'An emitter whose intensity falls as cos θ from its normal, like a flat diffuse surface; its beam angle is 120°.'
  },
  escapeCone: {
    short: 'escape cone',
    long: 'escape cone',
    meaning: 'The cone of directions, half-angle θc around a face’s normal, in which light from inside can leave through that face.'
  },
  singlePass: {
    short: 'single pass',
    long: 'single pass',
    meaning: 'Counting only light that leaves the first time it meets a surface; light reflected back gets no second chance.'
  },
  recycling: {
    short: 'recycling',
    long: 'recycling',
    meaning: 'Light reflected back into the chip or off the base that changes direction and gets another chance to escape.'
  },
  sPolarised: {
    short: 's-polarised',
    long: 's-polarised',
    meaning: 'Light whose electric field is perpendicular to the plane of incidence (s for the German senkrecht, perpendicular).'
  },
  pPolarised: {
    short: 'p-polarised',
    long: 'p-polarised',
    meaning: 'Light whose electric field lies in the plane of incidence (p for parallel); it passes a surface unreflected at Brewster’s angle.'
  },
  quarterWave: {
    short: 'quarter-wave layer',
    long: 'quarter-wave layer',
    meaning: 'A layer a quarter of the wavelength thick, measured inside it; with the index √(n₁·n₂) its two reflections cancel at normal incidence.'
  },
  ies: {
    short: 'IES',
    long: 'IES LM-63 photometric file',
    meaning: 'The open text format (IES LM-63) that lighting tools read for a luminaire’s candela distribution.'
  }
} as const satisfies Record<string, GlossaryEntry>;

export type GlossaryKey = keyof typeof GLOSSARY;

/** The text of a term: "total internal reflection (TIR)" on first use, "TIR" after; a plain word either way. */
export function termText(key: GlossaryKey, first: boolean): string {
  const e: GlossaryEntry = GLOSSARY[key];
  if (!first || e.long === e.short) return e.short;
  return `${e.long} (${e.short})`;
}
