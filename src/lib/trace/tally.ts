/**
 * The energy ledger of a trace: integer counts plus the escape histogram over polar angle.
 *
 * A plain object of numbers and one Float64Array, so it survives structured cloning between a worker
 * and the page unchanged. Counts are integers stored in doubles (exact up to 2⁵³), so merging tallies
 * from any number of workers in any order gives the same totals.
 *
 * Ledger identity: launched = escaped + absorbedChip + absorbedEncapsulant + absorbedBase + lost, and
 * also launched = the sum of `parts` (the scene's named bins, see compile-scene.ts). The fixed
 * fields group the named bins: absorbedChip holds every chip layer, absorbedEncapsulant every other
 * medium, absorbedBase every absorbing surface (base, floor, wall, chip mirror).
 */
import { createSpectralTally, mergeSpectralTally, type SpectralTally } from './spectral-tally';

/** Number of polar-angle bins of the escape histogram: 1° wide, covering 0..180°. */
export const POLAR_BINS = 180;

export interface Tally {
  /** Rays started. */
  launched: number;
  /** Rays that refracted into the outside medium (escape is final: they never come back). */
  escaped: number;
  /** Escaped rays heading below the horizon (direction z < 0); a subset of `escaped`. */
  escapedBelowHorizon: number;
  absorbedChip: number;
  absorbedEncapsulant: number;
  absorbedBase: number;
  /** Rays stopped at the event cap, plus rays stopped by a geometry error. */
  lost: number;
  /** Rays stopped because no bounding surface was found where one must exist; a subset of `lost`. */
  geometryErrors: number;
  /** Surface events (intersections) summed over all rays. */
  events: number;
  /** Escapes through the chip's top face (bare chip only). */
  escapedChipTop: number;
  /** Escapes through the chip's four side faces (bare chip only). */
  escapedChipSide: number;
  /** Escapes through the dome surface. */
  escapedDome: number;
  /** Escapes through the cylinder's flat top. */
  escapedCylinderTop: number;
  /** Escapes through the cylinder's vertical wall. */
  escapedCylinderSide: number;
  /** Debug: total internal reflections at the encapsulant's outer surface (dome or cylinder). */
  outerSurfaceTir: number;
  /** Debug: total internal reflections at the chip's faces (from inside the chip). */
  chipFaceTir: number;
  /**
   * The scene's ledger by named bin ('escaped:<surface>', 'medium:<name>', 'surface:<name>',
   * 'lost:event cap', 'lost:geometry error'): a new part adds a bin here, no field anywhere.
   */
  parts: Record<string, number>;
  /** Escaped rays per 1° polar-angle bin: bin i holds θ in [i°, (i+1)°), θ measured from +z. */
  polarHistogram: Float64Array;
  /** Spectral rays' tallies (spectral-tally.ts); present only when the scene holds a phosphor. */
  spectral?: SpectralTally;
}

/** A fresh all-zero tally. */
export function createTally(): Tally {
  return {
    launched: 0,
    escaped: 0,
    escapedBelowHorizon: 0,
    absorbedChip: 0,
    absorbedEncapsulant: 0,
    absorbedBase: 0,
    lost: 0,
    geometryErrors: 0,
    events: 0,
    escapedChipTop: 0,
    escapedChipSide: 0,
    escapedDome: 0,
    escapedCylinderTop: 0,
    escapedCylinderSide: 0,
    outerSurfaceTir: 0,
    chipFaceTir: 0,
    parts: {},
    polarHistogram: new Float64Array(POLAR_BINS)
  };
}

/** Adds every count and histogram bin of `from` into `into`; returns `into`. */
export function mergeTally(into: Tally, from: Tally): Tally {
  into.launched += from.launched;
  into.escaped += from.escaped;
  into.escapedBelowHorizon += from.escapedBelowHorizon;
  into.absorbedChip += from.absorbedChip;
  into.absorbedEncapsulant += from.absorbedEncapsulant;
  into.absorbedBase += from.absorbedBase;
  into.lost += from.lost;
  into.geometryErrors += from.geometryErrors;
  into.events += from.events;
  into.escapedChipTop += from.escapedChipTop;
  into.escapedChipSide += from.escapedChipSide;
  into.escapedDome += from.escapedDome;
  into.escapedCylinderTop += from.escapedCylinderTop;
  into.escapedCylinderSide += from.escapedCylinderSide;
  into.outerSurfaceTir += from.outerSurfaceTir;
  into.chipFaceTir += from.chipFaceTir;
  for (const name in from.parts) into.parts[name] = (into.parts[name] ?? 0) + from.parts[name];
  const bins = into.polarHistogram;
  const add = from.polarHistogram;
  for (let i = 0; i < POLAR_BINS; i++) bins[i] += add[i];
  if (from.spectral) mergeSpectralTally((into.spectral ??= createSpectralTally()), from.spectral);
  return into;
}
