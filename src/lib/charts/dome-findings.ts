/**
 * The dome page's findings in words: whether the closed form and the trace disagree beyond their
 * error, and the likely reasons; and what the "lost" share of the ledger means. Pure: numbers in,
 * sentences out, so the rules are tested in Node.
 */
import { fmtIndex, fmtPlain, fmtPoints } from '../format/format';
import type { TracePackage } from '../trace/package-spec';
import type { LedgerFractions } from './dome-ledger-chart';

/** The trace numbers the findings read. */
export interface TraceFacts {
  rays: number;
  extraction: number;
  stderr: number;
  ledger: LedgerFractions;
  /** Total internal reflections at the encapsulant's outer surface (dome or cylinder). */
  outerSurfaceTir: number;
  /** Rays stopped by a geometry error (included in ledger.lost). */
  geometryErrors: number;
}

/** The closed-form numbers the findings read. */
export interface ClosedFormFacts {
  etaDome: number;
  /** True when the dome radius is at least the no-TIR radius. */
  noTir: boolean;
  minRadiusNoTirMm: number;
}

export type GapReasonKey =
  | 'finite-chip'
  | 'chip-absorption'
  | 'base-loss'
  | 'dome-too-small'
  | 'encapsulant-absorption'
  | 'not-hemisphere'
  | 'not-dome'
  | 'lost';

export interface GapReason {
  key: GapReasonKey;
  text: string;
}

export interface GapFinding {
  /** Trace extraction − closed-form extraction (fraction). */
  delta: number;
  /** The trace's standard error (the closed form has none). */
  sigma: number;
  /** |Δ| > k·σ and |Δ| > minAbs. */
  disagree: boolean;
  /** One sentence on the comparison. */
  headline: string;
  /** Likely causes, most likely first; empty when they agree. */
  reasons: GapReason[];
  /** Why a larger dome changes nothing, when the dome is a hemisphere past the no-TIR radius; else null. */
  radiusNote: string | null;
}

/** Disagreement threshold: k standard errors (k = 3) and at least 1 % absolute. */
export const GAP_K = 3;
export const GAP_MIN_ABS = 0.01;
/** A loss bin is named as a cause when it holds at least this share of launched rays. */
export const LOSS_NOTE_MIN = 0.01;
/** The lost share that gets an explanation. */
export const LOST_NOTE_MIN = 0.01;

function pct(x: number): string {
  return `${(x * 100).toFixed(1)} %`;
}

/** A difference of two fractions in percentage points: 0.311 → "31.1 percentage points". */
function points(x: number): string {
  return fmtPoints(x, 3);
}

function mm(x: number): string {
  return `${Number(x.toPrecision(3))} mm`;
}

/**
 * Compares the trace with the closed form. They disagree when |Δ| > 3σ and |Δ| > 1 % (absolute);
 * then the reasons are chosen from the package and the trace's ledger: a finite chip (sides emit,
 * light recycled by the base) when the trace is higher; re-absorption in the chip, base losses,
 * absorption in the encapsulant and lost rays by their share; a dome below the no-TIR radius; a dome
 * that is not a hemisphere, or no dome at all.
 */
export function domeGap(pkg: TracePackage, closed: ClosedFormFacts, trace: TraceFacts): GapFinding {
  const delta = trace.extraction - closed.etaDome;
  const sigma = trace.stderr;
  const disagree = Math.abs(delta) > GAP_K * sigma && Math.abs(delta) > GAP_MIN_ABS;
  const sign = delta >= 0 ? 'higher' : 'lower';
  const headline = !Number.isFinite(delta)
    ? 'No comparison: the trace gave no number.'
    : disagree
      ? `The trace is ${points(Math.abs(delta))} ${sign} than the closed form: more than ${GAP_K} standard errors (${points(GAP_K * sigma)}) and more than ${points(GAP_MIN_ABS)}.`
      : `The trace and the closed form agree within ${GAP_K} standard errors (${points(GAP_K * sigma)}) or ${points(GAP_MIN_ABS)}: they differ by ${points(Math.abs(delta))}.`;
  const note = radiusNote(pkg, closed);
  if (!disagree) return { delta, sigma, disagree, headline, reasons: [], radiusNote: note };

  const reasons: GapReason[] = [];
  const enc = pkg.encapsulant;
  if (delta > 0) {
    reasons.push({
      key: 'finite-chip',
      text:
        "Finite chip, not a point source: the closed form counts only the top face's escape cone into the encapsulant, " +
        'once. The traced chip is a box whose four sides emit too (up to five cones), and light reflected by the base ' +
        'and the chip faces gets further chances to land in a cone.'
    });
  }
  if (enc.shape === 'none') {
    reasons.push({
      key: 'not-dome',
      text: 'There is no encapsulant: the trace is of the bare chip, while the closed-form dome value assumes a dome.'
    });
  } else if (enc.shape === 'cylinder' || enc.shape === 'box') {
    reasons.push({
      key: 'not-dome',
      text:
        `The encapsulant is a ${enc.shape === 'box' ? 'square box' : 'flat-topped cylinder'}, not a dome: its flat faces have their own escape cones and trap the rest ` +
        'by total internal reflection, which the closed form (a spherical dome) does not have.'
    });
  } else {
    if (!closed.noTir) {
      reasons.push({
        key: 'dome-too-small',
        text:
          `The dome (R = ${mm(enc.radiusMm)}) is smaller than the no-TIR radius ${mm(closed.minRadiusNoTirMm)}: light from the ` +
          `chip's outer parts meets the dome beyond its critical angle and is reflected back in` +
          (trace.outerSurfaceTir > 0 ? ` (${trace.outerSurfaceTir} total internal reflections at the dome in this trace).` : '.')
      });
    }
    const shape = enc.heightMm / enc.radiusMm;
    if (Math.abs(shape - 1) > 0.01) {
      reasons.push({
        key: 'not-hemisphere',
        text:
          `The dome is not a hemisphere (h/R = ${Number(shape.toPrecision(3))}): rays from the chip meet the surface obliquely, ` +
          'with more Fresnel reflection and, far from h/R = 1, total internal reflection; the closed form assumes a sphere ' +
          'centred on the chip.'
      });
    }
  }

  const losses: { share: number; reason: GapReason }[] = [];
  const L = trace.ledger;
  if (L.chip >= LOSS_NOTE_MIN) {
    losses.push({
      share: L.chip,
      reason: {
        key: 'chip-absorption',
        text:
          `Re-absorption in the chip: ${pct(L.chip)} of the light is absorbed in the chip (α = ${fmtPlain(pkg.chip.absorptionPerMm)} /mm) ` +
          'while it bounces outside the escape cones; the closed form assumes a single pass without absorption.'
      }
    });
  }
  if (L.base >= LOSS_NOTE_MIN) {
    const what =
      pkg.base.kind === 'reflectance' ? `reflectance ${pkg.base.reflectance}` : `a metal, n + ik = ${fmtIndex(pkg.base.n, pkg.base.k, 3)}`;
    losses.push({
      share: L.base,
      reason: {
        key: 'base-loss',
        text: `Base reflector losses: ${pct(L.base)} of the light is absorbed at the base (${what}) on the way back up; the closed form has no base.`
      }
    });
  }
  if (L.encapsulant >= LOSS_NOTE_MIN && enc.shape !== 'none') {
    losses.push({
      share: L.encapsulant,
      reason: {
        key: 'encapsulant-absorption',
        text: `Absorption in the encapsulant: ${pct(L.encapsulant)} of the light is absorbed on its way through (α = ${fmtPlain(enc.absorptionPerMm)} /mm); the closed form takes the encapsulant as clear.`
      }
    });
  }
  if (L.lost >= LOSS_NOTE_MIN) {
    losses.push({
      share: L.lost,
      reason: {
        key: 'lost',
        text: `${pct(L.lost)} of the rays were still trapped when the trace stopped them (see "Where the light is lost"); they count as not escaped.`
      }
    });
  }
  losses.sort((a, b) => b.share - a.share);
  if (delta < 0) {
    // Losses explain a trace below the closed form: put them first.
    reasons.unshift(...losses.map((l) => l.reason));
  } else {
    reasons.push(...losses.map((l) => l.reason));
  }
  return { delta, sigma, disagree, headline, reasons, radiusNote: note };
}

/**
 * Why a hemispherical dome at or past the no-TIR radius R ≥ r·n_enc/n_out gains nothing from growing:
 * a point at distance ≤ r from the centre meets the sphere at sin θ ≤ r/R (sine rule), so every ray
 * is already inside the critical angle; a larger R only lengthens the path through the encapsulant.
 * Null for other shapes (the sine rule is for a sphere centred on the chip) and below the radius
 * (the findings name that as a cause instead).
 * @see M. Born, E. Wolf, Principles of Optics, §4.2.3 (aplanatic points of a sphere, r = R/n)
 */
export function radiusNote(pkg: TracePackage, closed: ClosedFormFacts): string | null {
  const enc = pkg.encapsulant;
  if (enc.shape !== 'dome' || !closed.noTir || Math.abs(enc.heightMm / enc.radiusMm - 1) > 0.01) return null;
  const absorbs = enc.absorptionPerMm > 0;
  return (
    `The dome's radius (${mm(enc.radiusMm)}) is already past the no-TIR radius (${mm(closed.minRadiusNoTirMm)}: ` +
    "half-diagonal × encapsulant index ÷ outside index). Every ray from the chip already meets the dome inside its " +
    'critical angle, so a larger dome has no trapped light left to free: the extraction is set by the ' +
    'indices, the chip and the base, not by the radius. ' +
    (absorbs
      ? `A larger dome only lengthens the path through the encapsulant, which absorbs (α = ${fmtPlain(enc.absorptionPerMm)} /mm), so it loses a little more light.`
      : 'In this clear encapsulant a larger dome only moves where the few per cent it reflects back land on the base, so the extraction barely changes.')
  );
}

/**
 * Explains the "lost" share when it is at least 1 %: rays still bouncing at the event cap. A lossless
 * chip (no absorption) in a clear encapsulant on a perfect mirror (reflectance 1) traps light outside
 * its escape cones for ever. Returns null below 1 % (and no geometry errors).
 */
export function lostExplanation(pkg: TracePackage, trace: TraceFacts, maxEvents = 1000): string | null {
  const parts: string[] = [];
  const L = trace.ledger.lost;
  if (L >= LOST_NOTE_MIN) {
    const lossless =
      pkg.chip.absorptionPerMm === 0 &&
      pkg.base.kind === 'reflectance' &&
      pkg.base.reflectance === 1 &&
      (pkg.encapsulant.shape === 'none' || pkg.encapsulant.absorptionPerMm === 0);
    if (lossless) {
      parts.push(
        `${pct(L)} of the rays are lost: the chip absorbs nothing and sits on a perfect mirror, so light outside every ` +
          'escape cone is reflected between the chip faces and the mirror for ever — nothing ends it. The trace stops each ' +
          `ray after ${maxEvents} surface events and counts it as lost. A real chip absorbs some light on every pass; give ` +
          'the chip an absorption or the base a reflectance below 1 to see where it would go.'
      );
    } else {
      parts.push(
        `${pct(L)} of the rays were still bouncing after ${maxEvents} surface events and were stopped (counted as lost). ` +
          'They are trapped outside the escape cones with little absorption to end them; in a real package most would ' +
          'end up absorbed in the chip.'
      );
    }
  }
  if (trace.geometryErrors > 0) {
    parts.push(
      `${trace.geometryErrors} rays stopped on a geometry error (no surface found ahead) and are counted as lost; this points to a tracer problem, please report it.`
    );
  }
  return parts.length > 0 ? parts.join(' ') : null;
}
