/**
 * Turns a tally into the numbers a reader wants: extraction with its standard error, the ledger as
 * fractions and counts (grouped: chip, encapsulant, base, lost; and by the scene's named parts),
 * escapes per surface, and the far field.
 *
 * Far field (rotationally averaged about z): the escape histogram has 180 bins of 1° in polar angle θ.
 * Intensity per solid angle in bin i is N_i / ΔΩ_i with ΔΩ_i = 2π (cos θ_i − cos θ_{i+1}); it is
 * reported relative to a Lambertian emitter of the same escaped flux Φ, whose on-axis intensity is
 * I0 = Φ/π (so a Lambertian reads cos θ).
 * - onAxisVsLambertian: mean intensity over the 0–5° cap over I0 (a Lambertian gives (1 + cos 5°)/2
 *   = 0.9981; the cap keeps the count large enough to be steady).
 * - beamAngleDeg: full width at half maximum (FWHM), at most 180°. Each bin's intensity is smoothed
 *   over ±2 bins (counts over solid angle of the 5° window, clipped at 0° and 180°); from the peak
 *   outward the first crossing below half the peak is interpolated linearly between bin centres; the
 *   full angle is twice that polar angle. When the intensity is still above half its peak at the
 *   horizon (the crossing lies more than half a bin below 90°) the width is not a beam angle of the
 *   upper half space: beamAngleDeg is null and beamAngleNote says so. null, with its reason in
 *   beamAngleNote, also when nothing escaped or the intensity never falls to half.
 * Sources: Lambertian I(θ) = I0 cos θ with Φ = π I0 and FWHM 120° (common practice); solid angle of a
 * polar zone 2π (cos θ1 − cos θ2) (common practice).
 */
import { phosphorSummary, type PhosphorSummary } from './phosphor-summary';
import { POLAR_BINS, type Tally } from './tally';

export interface FarFieldBin {
  /** Bin centre, degrees from +z. */
  thetaDeg: number;
  /** Intensity per solid angle over the Lambertian I0 = Φ/π of the same escaped flux. */
  relativeIntensity: number;
}

/** One named bin of the scene's ledger (see compile-scene.ts for the names). */
export interface LedgerPart {
  /** The bin's full name, e.g. 'escaped:dome', 'medium:chip', 'surface:base', 'lost:event cap'. */
  bin: string;
  /** What happened there: escaped through a surface, absorbed in a medium or at a surface, turned to heat by a phosphor in a medium, or lost. */
  kind: 'escaped' | 'medium' | 'surface' | 'lost' | 'phosphor';
  /** The surface, medium or reason named by the bin. */
  part: string;
  count: number;
  /** count / launched rays. */
  fraction: number;
}

export interface TraceSummary {
  rays: number;
  /** White-light figures (phosphor-summary.ts); present only when the package holds a phosphor. */
  white?: PhosphorSummary;
  /** Escaped / launched. */
  extraction: number;
  /** Binomial standard error of the extraction, √(p(1 − p)/N). */
  stderr: number;
  /** Fractions of launched rays; they sum to 1. */
  ledger: { escaped: number; chip: number; encapsulant: number; base: number; lost: number };
  /** The same as integers; escaped + chip + encapsulant + base + lost = rays exactly. */
  counts: {
    rays: number;
    escaped: number;
    chip: number;
    encapsulant: number;
    base: number;
    lost: number;
    escapedBelowHorizon: number;
  };
  /** Fraction of launched rays that escaped heading below the horizon (included in extraction). */
  escapedBelowHorizon: number;
  /** Mean surface events per ray. */
  eventsPerRay: number;
  /** Fraction of launched rays escaping through each surface. */
  perSurface: { chipTop: number; chipSide: number; dome: number; cylinderTop: number; cylinderSide: number };
  /** Every bin of the scene's ledger, in the scene's order; the counts sum to rays. */
  parts: LedgerPart[];
  /** Fraction of launched rays escaping by surface (the last surface a ray met), keyed by the surface's bin name. */
  escapedBySurface: Record<string, number>;
  /** Rays stopped because the geometry failed (counted in lost); should be 0. */
  geometryErrors: number;
  /** Debug counts of total internal reflections. */
  tir: { outerSurface: number; chipFaces: number };
  /** Set when rays reached the event cap: explains what the lost share means. */
  trappedNote: string | null;
  /** Set when geometry errors occurred. */
  geometryNote: string | null;
  farField: {
    /** Full width at half maximum, degrees, in [0, 180]; null when not defined (see beamAngleNote). */
    beamAngleDeg: number | null;
    /** Why beamAngleDeg is null, as a sentence; null when it is defined. */
    beamAngleNote: string | null;
    onAxisVsLambertian: number | null;
    bins: FarFieldBin[];
  };
}

const RAD = Math.PI / 180;
const ON_AXIS_CAP_DEG = 5;
const SMOOTH_HALF_WIDTH = 2;
/** Half a 1° bin: a half-maximum crossing closer to the horizon than this is read as at the horizon. */
const HORIZON_SLACK_DEG = 0.5;

/** Solid angle of the polar zone [θ1, θ2] in degrees: 2π (cos θ1 − cos θ2), steradians. */
function zoneSolidAngle(theta1Deg: number, theta2Deg: number): number {
  // ΔΩ = 2π (cos θ1 − cos θ2)
  return 2 * Math.PI * (Math.cos(theta1Deg * RAD) - Math.cos(theta2Deg * RAD));
}

function percent(x: number): string {
  return `${(100 * x).toFixed(x < 0.001 ? 3 : 1)} %`;
}

/** The far field of an escape histogram; relative intensities against I0 = escaped/π. */
function farField(histogram: Float64Array, escaped: number): TraceSummary['farField'] {
  const bins: FarFieldBin[] = [];
  if (escaped === 0) {
    for (let i = 0; i < POLAR_BINS; i++) bins.push({ thetaDeg: i + 0.5, relativeIntensity: 0 });
    return { beamAngleDeg: null, beamAngleNote: 'No light escaped, so there is no beam to measure.', onAxisVsLambertian: null, bins };
  }
  const i0 = escaped / Math.PI;
  for (let i = 0; i < POLAR_BINS; i++) {
    bins.push({ thetaDeg: i + 0.5, relativeIntensity: histogram[i] / zoneSolidAngle(i, i + 1) / i0 });
  }

  // On axis: mean intensity over the 0–5° cap
  let capCount = 0;
  for (let i = 0; i < ON_AXIS_CAP_DEG; i++) capCount += histogram[i];
  const onAxisVsLambertian = capCount / zoneSolidAngle(0, ON_AXIS_CAP_DEG) / i0;

  // Smoothed profile: counts over solid angle of a ±2-bin window
  const smooth = new Float64Array(POLAR_BINS);
  let peak = 0;
  let peakBin = 0;
  for (let i = 0; i < POLAR_BINS; i++) {
    const lo = Math.max(0, i - SMOOTH_HALF_WIDTH);
    const hi = Math.min(POLAR_BINS - 1, i + SMOOTH_HALF_WIDTH);
    let n = 0;
    for (let j = lo; j <= hi; j++) n += histogram[j];
    smooth[i] = n / zoneSolidAngle(lo, hi + 1);
    if (smooth[i] > peak) {
      peak = smooth[i];
      peakBin = i;
    }
  }
  let halfMaxDeg: number | null = null;
  const half = peak / 2;
  for (let i = peakBin + 1; i < POLAR_BINS; i++) {
    if (smooth[i] < half) {
      // linear interpolation between bin centres i − 1 + 0.5 and i + 0.5
      const f = (smooth[i - 1] - half) / (smooth[i - 1] - smooth[i]);
      halfMaxDeg = i - 0.5 + f;
      break;
    }
  }
  if (halfMaxDeg === null) {
    return { beamAngleDeg: null, beamAngleNote: 'The intensity never falls to half its peak, so the beam has no half-maximum width.', onAxisVsLambertian, bins };
  }
  if (halfMaxDeg > 90 + HORIZON_SLACK_DEG) {
    const note =
      `Wider than 180°: the intensity is still above half its peak at the horizon and falls to half only ` +
      `${(halfMaxDeg - 90).toFixed(1)}° below it, because light leaves the package heading downwards ` +
      `(out of its sides, close to the base). A mounting board would block that part.`;
    return { beamAngleDeg: null, beamAngleNote: note, onAxisVsLambertian, bins };
  }
  return { beamAngleDeg: Math.min(180, 2 * halfMaxDeg), beamAngleNote: null, onAxisVsLambertian, bins };
}

const PART_KINDS: readonly LedgerPart['kind'][] = ['escaped', 'medium', 'surface', 'lost', 'phosphor'];

/** The named ledger of a tally, with fractions of `launched`. */
/** A ledger bin in words, for tables: "escaped through the dome", "absorbed in GaN", "phosphor heat in …". */
export function ledgerPartLabel(p: Pick<LedgerPart, 'kind' | 'part'>): string {
  switch (p.kind) {
    case 'escaped':
      return `escaped through the ${p.part}`;
    case 'medium':
      return `absorbed in the ${p.part}`;
    case 'surface':
      return `absorbed at the ${p.part}`;
    case 'phosphor':
      return `phosphor heat in the ${p.part}`;
    case 'lost':
      return `lost (${p.part})`;
  }
}

function ledgerParts(parts: Record<string, number>, inv: number): LedgerPart[] {
  return Object.entries(parts).map(([bin, count]) => {
    const colon = bin.indexOf(':');
    const kind = bin.slice(0, colon) as LedgerPart['kind'];
    if (!PART_KINDS.includes(kind)) throw new Error(`tally: unknown ledger bin '${bin}'`);
    return { bin, kind, part: bin.slice(colon + 1), count, fraction: count * inv };
  });
}

/** Summarises a tally (see the file comment for the far-field definitions). */
export function summarize(tally: Tally): TraceSummary {
  const N = tally.launched;
  const inv = N > 0 ? 1 / N : 0;
  const p = tally.escaped * inv;
  const trapped = tally.lost - tally.geometryErrors;
  const white = phosphorSummary(tally);
  return {
    ...(white ? { white } : {}),
    rays: N,
    extraction: p,
    // binomial standard error √(p(1 − p)/N)
    stderr: N > 0 ? Math.sqrt((p * (1 - p)) / N) : 0,
    ledger: {
      escaped: p,
      chip: tally.absorbedChip * inv,
      encapsulant: tally.absorbedEncapsulant * inv,
      base: tally.absorbedBase * inv,
      lost: tally.lost * inv
    },
    counts: {
      rays: N,
      escaped: tally.escaped,
      chip: tally.absorbedChip,
      encapsulant: tally.absorbedEncapsulant,
      base: tally.absorbedBase,
      lost: tally.lost,
      escapedBelowHorizon: tally.escapedBelowHorizon
    },
    escapedBelowHorizon: tally.escapedBelowHorizon * inv,
    eventsPerRay: tally.events * inv,
    perSurface: {
      chipTop: tally.escapedChipTop * inv,
      chipSide: tally.escapedChipSide * inv,
      dome: tally.escapedDome * inv,
      cylinderTop: tally.escapedCylinderTop * inv,
      cylinderSide: tally.escapedCylinderSide * inv
    },
    parts: ledgerParts(tally.parts, inv),
    escapedBySurface: Object.fromEntries(
      Object.entries(tally.parts)
        .filter(([bin]) => bin.startsWith('escaped:'))
        .map(([bin, count]) => [bin.slice('escaped:'.length), count * inv])
    ),
    geometryErrors: tally.geometryErrors,
    tir: { outerSurface: tally.outerSurfaceTir, chipFaces: tally.chipFaceTir },
    trappedNote:
      trapped > 0
        ? `${percent(trapped * inv)} of rays reached the event cap without escaping or being absorbed: they travel ` +
          `outside every escape cone, and nothing (absorption, base loss) ends them. They are counted ` +
          `as lost, not escaped; a real chip would absorb them. Add chip or encapsulant absorption, a base ` +
          `reflectance below 1, or raise the event cap to see where they end.`
        : null,
    geometryNote:
      tally.geometryErrors > 0
        ? `${tally.geometryErrors} rays stopped on a geometry error (no surface found ahead) and are counted as lost.`
        : null,
    farField: farField(tally.polarHistogram, tally.escaped)
  };
}
