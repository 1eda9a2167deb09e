/**
 * Types of the material library. A material is an optical medium with a dispersion model that gives
 * its complex index N = n + ik at a wavelength, a validity range, and the source of its data.
 *
 * Conventions: wavelengths in nanometres at the edge; inside the dispersion formulas λ is in
 * micrometres, as the published coefficients are. k ≥ 0 means absorption (N = n + ik).
 */

/** Where a material sits in an LED package. */
export type MaterialCategory =
  | 'semiconductor'
  | 'substrate'
  | 'encapsulant'
  | 'optic'
  | 'layer'
  | 'metal'
  | 'ambient';

export const MATERIAL_CATEGORIES: readonly MaterialCategory[] = [
  'semiconductor',
  'substrate',
  'encapsulant',
  'optic',
  'layer',
  'metal',
  'ambient'
];

/**
 * How far a value can be trusted:
 * - `published`: taken from the named source;
 * - `computed from published formula`: evaluated from the named source's formula;
 * - `common practice`: a fact of the trade with no single source;
 * - `from memory`: recalled and not verified against the source — treat loosely;
 * - `user supplied`: entered by the user of the workbench (never used by the shipped library).
 */
export type Provenance =
  | 'published'
  | 'computed from published formula'
  | 'common practice'
  | 'from memory'
  | 'user supplied';

export const PROVENANCES: readonly Provenance[] = [
  'published',
  'computed from published formula',
  'common practice',
  'from memory',
  'user supplied'
];

/** One Sellmeier term B·λ²/(λ² − C²) (resonance form) or B·λ²/(λ² − C) (glass form). */
export interface SellmeierTerm {
  B: number;
  C: number;
}

/**
 * Sellmeier, resonance form: n² = a0 + Σ Bᵢλ²/(λ² − Cᵢ²) + d·λ², Cᵢ in µm (a resonance wavelength).
 * a0 defaults to 1 (the usual n² − 1 = Σ … form); d (µm⁻²) defaults to 0.
 */
export interface SellmeierDispersion {
  model: 'sellmeier';
  a0?: number;
  terms: SellmeierTerm[];
  d?: number;
  /** Constant extinction coefficient (default 0). */
  k?: number;
}

/**
 * Sellmeier, glass-catalogue form: n² = a0 + Σ Bᵢλ²/(λ² − Cᵢ) + d·λ², Cᵢ in µm² (not squared again).
 */
export interface SellmeierGlassDispersion {
  model: 'sellmeier-glass';
  a0?: number;
  terms: SellmeierTerm[];
  d?: number;
  k?: number;
}

/** Cauchy: n = A + B/λ² + C/λ⁴, λ in µm (B in µm², C in µm⁴). */
export interface CauchyDispersion {
  model: 'cauchy';
  A: number;
  B: number;
  C: number;
  k?: number;
}

/**
 * A published special form kept in its own coefficients.
 * `pole-sum`: n² = a0 + Σ Bᵢ/(λ² − Cᵢ), Cᵢ in µm² (e.g. DeVore's rutile formula n² = A + B/(λ² − C)).
 */
export interface FormulaDispersion {
  model: 'formula';
  form: 'pole-sum';
  a0: number;
  terms: SellmeierTerm[];
  k?: number;
}

/** One tabulated row: wavelength in nm, n, k. */
export type NkRow = [wavelengthNm: number, n: number, k: number];

/** Tabulated n and k, interpolated linearly in ln λ between rows. Rows ascend in wavelength. */
export interface TableDispersion {
  model: 'table';
  rows: NkRow[];
}

export type Dispersion =
  | SellmeierDispersion
  | SellmeierGlassDispersion
  | CauchyDispersion
  | FormulaDispersion
  | TableDispersion;

export type DispersionModel = Dispersion['model'];

/** A remark attached to a material, with how far it can be trusted. */
export interface MaterialNote {
  text: string;
  tag: Provenance;
}

/** Closed wavelength interval, nm. */
export interface RangeNm {
  min: number;
  max: number;
}

export interface Material {
  /** Short lower-case identifier, e.g. "gan", "silicone-methyl". */
  id: string;
  /** Display name. */
  name: string;
  /** Other names that find it, e.g. "GaN". Matched case-insensitively. */
  aliases: string[];
  category: MaterialCategory;
  dispersion: Dispersion;
  /** Wavelengths where the data or formula is valid, nm. Outside it values carry a warning. */
  validRangeNm: RangeNm;
  /** Full citation, or a plain statement of where the numbers come from. */
  source: string;
  provenance: Provenance;
  notes?: MaterialNote[];
  /** Typical upper limit for continuous service, °C (encapsulants and optics). */
  maxServiceTempC?: number;
}

/** The complex index of a material at one wavelength. */
export interface IndexAt {
  n: number;
  k: number;
  /** True when the wavelength lies inside the material's validity range. */
  inRange: boolean;
  /** Set when the value was extrapolated outside the validity range. */
  warning?: string;
}

/** A refractive index resolved from user text: a number, n+ki, or a material name. */
export interface ResolvedIndex {
  n: number;
  k: number;
  /** Library (or user) material the text named, if it named one. */
  materialId?: string;
  warning?: string;
}

/** One problem found in user input: where it is and what is allowed. */
export interface FieldError {
  /** Dotted path into the input, e.g. "dispersion.terms.0.C" ("" for the whole input). */
  path: string;
  message: string;
}
