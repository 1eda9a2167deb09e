/**
 * Encapsulant candidates ranked for one package by the closed-form dome estimate: a point-like chip
 * face under a large hemispherical dome,
 *   η_dome = η_F(nChip → nEnc) · (1 − R_normal(nEnc → nOut)),  gain = η_dome / η_F(nChip → nOut),
 * with the no-TIR dome radius r·nEnc/nOut (r = chip half-diagonal) — see optics/dome-estimate.ts
 * (Schubert, Light-Emitting Diodes, 2nd ed., ch. 5; Born & Wolf §4.2.3 for the aplanatic radius).
 * Optionally weighted over an emission spectrum, by radiant power and by luminous flux (CIE V(λ)).
 */
import { domeEstimate } from '../optics/index';
import { indexAt } from '../materials/dispersion';
import type { Material, MaterialCategory, MaterialNote, Provenance } from '../materials/types';
import { weightedAverage, type Spectrum } from '../photometry/index';
import { bandInterpolant } from '../photometry/band-interpolant';
import { encapsulantNotes } from './encapsulant-notes';
import { LIMITS } from '../scenario/limits';

/** Where an index comes from: a fixed number (typed) or a material's dispersion. */
export type IndexSource = { n: number } | { material: Material };

/** A candidate and whether it came from the library or the user's own materials. */
export interface Candidate {
  material: Material;
  source: 'library' | 'user';
}

export type RankOrder = 'design' | 'radiometric' | 'luminous';

export interface RankInput {
  chip: IndexSource;
  outside: IndexSource;
  /** Chip footprint, mm, (0, 1000]. */
  chipWidthMm: number;
  chipLengthMm: number;
  /** The scenario's dome radius, mm, (0, 1000]. */
  radiusMm: number;
  /** Design wavelength, nm, [200, 2500]. */
  wavelengthNm: number;
  candidates: readonly Candidate[];
  /** The scenario's current encapsulant: its label, index at the design wavelength, and library id if any. */
  current: { label: string; n: number; materialId: string | null };
  /** Emission spectrum for weighted figures; omit for the design wavelength only. */
  spectrum?: Spectrum | null;
  /** Which figure orders the rows (default 'design'). */
  order?: RankOrder;
}

export interface EncapsulantRow {
  rank: number;
  id: string;
  name: string;
  category: MaterialCategory;
  source: 'library' | 'user';
  provenance: Provenance;
  /** Index at the design wavelength (real part; absorption is not part of the closed form). */
  nEnc: number;
  kEnc: number;
  inRange: boolean;
  warning: string | null;
  etaDome: number;
  /** Over the bare chip. */
  gain: number;
  /** Over the scenario's current encapsulant. */
  gainOverCurrent: number;
  minRadiusNoTirMm: number;
  /** The scenario's dome radius is at least the no-TIR radius. */
  meetsNoTir: boolean;
  /** Spectrally weighted η_dome (null without a spectrum; luminous null when V(λ) = 0 over the band). */
  radiometric: number | null;
  luminous: number | null;
  maxServiceTempC: number | null;
  notes: MaterialNote[];
  isCurrent: boolean;
}

export interface EncapsulantRanking {
  wavelengthNm: number;
  nChip: number;
  nOut: number;
  /** η_F of the bare chip face at the design wavelength. */
  etaBare: number;
  current: { label: string; n: number; etaDome: number; minRadiusNoTirMm: number };
  radiusMm: number;
  halfDiagonalMm: number;
  order: RankOrder;
  rows: EncapsulantRow[];
  /** Candidates that could not be evaluated (e.g. a formula with no index at this wavelength). */
  skipped: { id: string; name: string; reason: string }[];
  /** Warnings about the chip or outside medium (out-of-range wavelengths). */
  warnings: string[];
}

const SIZE_MAX_MM = LIMITS.sizeMm.max;
const N = LIMITS.indexN;
const W = LIMITS.wavelengthNm;

function positive(field: string, value: unknown, max: number): number {
  if (typeof value !== 'number' || !(value > 0 && value <= max)) {
    throw new RangeError(`${field} must be a number in (0, ${max}] (got ${String(value)})`);
  }
  return value;
}

function indexOf(source: IndexSource, wavelengthNm: number, warnings: string[] | null, field: string): number {
  if ('material' in source) {
    const v = indexAt(source.material, wavelengthNm);
    if (v.warning && warnings && !warnings.includes(v.warning)) warnings.push(v.warning);
    return v.n;
  }
  if (typeof source.n !== 'number' || !(source.n >= N.min && source.n <= N.max)) {
    throw new RangeError(`${field} index must be a number in [${N.min}, ${N.max}] (got ${String(source.n)})`);
  }
  return source.n;
}

/**
 * Ranks encapsulant candidates for a package by closed-form dome extraction (see file header).
 * Candidates whose index cannot be evaluated are listed in `skipped` with the reason, never dropped
 * silently. Ties keep the candidates' order.
 * @throws RangeError naming the field for bad sizes, wavelength or typed indices
 */
export function rankEncapsulants(input: RankInput): EncapsulantRanking {
  if (!input || typeof input !== 'object') throw new RangeError('rankEncapsulants needs an input object');
  const w = positive('chipWidthMm', input.chipWidthMm, SIZE_MAX_MM);
  const l = positive('chipLengthMm', input.chipLengthMm, SIZE_MAX_MM);
  const radiusMm = positive('radiusMm', input.radiusMm, SIZE_MAX_MM);
  const lambda = input.wavelengthNm;
  if (typeof lambda !== 'number' || !(lambda >= W.min && lambda <= W.max)) {
    throw new RangeError(`wavelengthNm must be a number in [${W.min}, ${W.max}] nm (got ${String(lambda)})`);
  }
  const order = input.order ?? 'design';
  if (order !== 'design' && order !== 'radiometric' && order !== 'luminous') {
    throw new RangeError(`order must be 'design', 'radiometric' or 'luminous' (got ${String(order)})`);
  }
  if (!Array.isArray(input.candidates)) throw new RangeError('candidates must be a list of materials');
  const cur = input.current;
  if (!cur || typeof cur.n !== 'number' || !(cur.n >= N.min && cur.n <= N.max)) {
    throw new RangeError(`current encapsulant index must be a number in [${N.min}, ${N.max}] (got ${String(cur?.n)})`);
  }

  const warnings: string[] = [];
  const nChip = indexOf(input.chip, lambda, warnings, 'Chip');
  const nOut = indexOf(input.outside, lambda, warnings, 'Outside medium');
  const dome = (nC: number, nE: number, nO: number) =>
    domeEstimate({ nChip: nC, nEnc: nE, nOut: nO, chipWidthMm: w, chipLengthMm: l, radiusMm });
  const currentDome = dome(nChip, cur.n, nOut);
  const spectrum = input.spectrum ?? null;

  const rows: EncapsulantRow[] = [];
  const skipped: EncapsulantRanking['skipped'] = [];
  for (const { material, source } of input.candidates) {
    try {
      const at = indexAt(material, lambda);
      const d = dome(nChip, at.n, nOut);
      let radiometric: number | null = null;
      let luminous: number | null = null;
      if (spectrum) {
        // η_dome(λ) with every index at λ; warnings of the band are the design-wavelength ones plus the chip's
        const f = bandInterpolant(spectrum, (nm) =>
          dome(indexOf(input.chip, nm, null, 'Chip'), indexAt(material, nm).n, indexOf(input.outside, nm, null, 'Outside medium')).etaDome
        );
        radiometric = weightedAverage(spectrum, f, 'radiometric').value;
        try {
          luminous = weightedAverage(spectrum, f, 'luminous').value;
        } catch {
          luminous = null; // V(λ) = 0 over the whole band: no luminous figure
        }
      }
      rows.push({
        rank: 0,
        id: material.id,
        name: material.name,
        category: material.category,
        source,
        provenance: material.provenance,
        nEnc: at.n,
        kEnc: at.k,
        inRange: at.inRange,
        warning: at.warning ?? null,
        etaDome: d.etaDome,
        gain: d.gain,
        gainOverCurrent: d.etaDome / currentDome.etaDome,
        minRadiusNoTirMm: d.minRadiusNoTirMm,
        meetsNoTir: d.noTir,
        radiometric,
        luminous,
        maxServiceTempC: material.maxServiceTempC ?? null,
        notes: encapsulantNotes(material, source),
        isCurrent: cur.materialId !== null && cur.materialId === material.id
      });
    } catch (error) {
      skipped.push({ id: material.id, name: material.name, reason: error instanceof Error ? error.message : String(error) });
    }
  }

  // Order: the chosen figure, highest first; the sort is stable, so ties keep the candidates' order
  const key = (r: EncapsulantRow) => (order === 'radiometric' ? r.radiometric : order === 'luminous' ? r.luminous : null) ?? r.etaDome;
  rows.sort((a, b) => key(b) - key(a));
  rows.forEach((r, i) => (r.rank = i + 1));

  return {
    wavelengthNm: lambda,
    nChip,
    nOut,
    etaBare: currentDome.etaBare,
    current: { label: cur.label, n: cur.n, etaDome: currentDome.etaDome, minRadiusNoTirMm: currentDome.minRadiusNoTirMm },
    radiusMm,
    halfDiagonalMm: currentDome.halfDiagonalMm,
    order,
    rows,
    skipped,
    warnings
  };
}

/**
 * The candidates of a ranking: the library's encapsulants (potting materials: silicones, epoxy), the
 * library's optic materials (lens plastics and glasses, which nobody pots a chip in) only when asked
 * for, then the user's own materials of any category but metal.
 */
export function encapsulantCandidates(
  library: readonly Material[],
  userMaterials: readonly Material[] = [],
  options: { optics?: boolean } = {}
): Candidate[] {
  const fit = (m: Material) => m.category === 'encapsulant' || (options.optics === true && m.category === 'optic');
  return [
    ...library.filter(fit).map((material) => ({ material, source: 'library' as const })),
    ...userMaterials.filter((m) => m.category !== 'metal').map((material) => ({ material, source: 'user' as const }))
  ];
}
