/**
 * Is a stated extraction, gain or coating claim physically possible for the package it names?
 *
 * Verdicts and their thresholds (bounds from {@link claimBounds}; v is the claimed value):
 *
 * extraction (fraction of generated light that leaves):
 *   planar chip   v ≤ ideal dome (single pass, Σ faces)                 → consistent
 *                 ideal dome < v ≤ recycling limit                        → optimistic: only photon recycling of
 *                                                                           Fresnel-reflected light with very low
 *                                                                           absorption gets there
 *                 v > recycling limit                                     → impossible: light outside the escape
 *                                                                           cones of a planar cuboid never leaves
 *   textured, thin-film   v ≤ best reported light extraction (~80 %)    → consistent (scattering feeds trapped
 *                                                                           light back into the cones)
 *                         v > ~80 %                                      → optimistic (beyond the best we cite)
 *   unknown       v ≤ ideal dome → consistent; above it → optimistic, naming what it would take (texturing,
 *                 thin-film chip with a mirror, photon recycling). Never impossible: the structure could scatter.
 *   If a trace of the package is given, a claim that is otherwise consistent but lies more than k = 3
 *   standard errors above the traced extraction becomes optimistic.
 *
 * gain (encapsulated output over bare output):
 *   planar chip   v ≤ closed-form dome gain                              → consistent
 *                 closed form < v ≤ gain limit                            → optimistic (recycling in the dome case only)
 *                 v > gain limit                                          → impossible
 *     The gain limit is ≈ 1.18 × the closed form for GaN under silicone: a claim 10 % above the closed form is
 *     still optimistic, not impossible.
 *   other chips   v ≤ closed form → consistent; above → optimistic (a textured or thin-film chip already
 *                 extracts more bare and usually gains less; its angular spread is not bounded by our model).
 *
 * coating (relative increase from a flat layer, 0.4 = +40 %), any structure:
 *   v ≤ ideal single quarter-wave layer over the cone                    → consistent
 *   quarter-wave < v ≤ flat-coating limit (η_geo/η_F − 1)                → optimistic (graded-index or multilayer
 *                                                                           antireflection over the whole cone)
 *   v > flat-coating limit                                               → impossible: a flat layer cannot widen
 *                                                                           the escape cone
 *
 * Comparisons allow 1e-9 of slack so a claim exactly at a bound takes the kinder verdict.
 */
import type { ChipFaces } from '../optics/index';
import { BEST_REPORTED_EXTRACTION, REPORTED_FIGURES, type ReportedFigure } from './best-reported';
import { claimBounds, type ClaimBoundSet } from './claim-bounds';
import { CLAIM_DEFAULTS, claimCoreLimit } from './claim-input';
import { LIMITS } from '../scenario/limits';
import { fmtPercentPlain, fmtPlain } from '../format/format';

export type ClaimKind = 'extraction' | 'gain' | 'coating';
export type ChipStructure = 'planar' | 'textured' | 'thin-film' | 'unknown';
export type Verdict = 'consistent' | 'optimistic' | 'impossible';

export const CLAIM_KINDS: readonly ClaimKind[] = ['extraction', 'gain', 'coating'];
export const CHIP_STRUCTURES: readonly ChipStructure[] = ['planar', 'textured', 'thin-film', 'unknown'];

/** Standard errors a claim may sit above a traced extraction before it is called optimistic. */
export const TRACE_K = 3;

export interface Claim {
  kind: ClaimKind;
  /**
   * extraction: fraction in (0, 1]; gain: factor in (0, 100]; coating: relative change in (−1, 100]
   * (0.4 means "+40 %", −0.05 a 5 % decrease). See claim-input.ts for the stated (percent) form.
   */
  value: number;
  /** Chip index, LIMITS.indexN ([1, 6]). */
  nChip: number;
  structure: ChipStructure;
  /** Encapsulant index, [1, 6]; omit (or null) for a bare chip. Required for a gain claim. */
  nEnc?: number | null;
  /** Outside index, LIMITS.indexN; default 1 (air). */
  nOut?: number;
  /** Emitting faces of the chip: 1, 5 or 6; default CLAIM_DEFAULTS.faces (5: top and sides, on a base). */
  faces?: ChipFaces;
  /** A trace of this package, if one was run: extraction and its standard error. */
  trace?: { extraction: number; stderr: number } | null;
}

/** One number behind a verdict. */
export interface ClaimNumber {
  id: string;
  label: string;
  value: number;
  unit: 'fraction' | 'factor' | 'relative increase' | 'degrees' | 'index';
}

export interface ClaimResult {
  verdict: Verdict;
  /** One sentence saying why, with the numbers. */
  reason: string;
  /** What it would take, for an optimistic (or impossible) verdict; empty when consistent. */
  requires: string[];
  /** The numbers the verdict rests on: the claim first, then the bounds. */
  numbers: ClaimNumber[];
  /** Published figures quoted as context (tag `from memory`). */
  references: ReportedFigure[];
  /** Caveats of the model (overlapping cones, assumptions). */
  notes: string[];
  bounds: ClaimBoundSet;
}

const SLACK = 1e-9;

function pct(x: number): string {
  return fmtPercentPlain(x, 3);
}

function signed(x: number): string {
  return x < 0 ? `−${pct(-x)}` : `+${pct(x)}`;
}

function times(x: number): string {
  return `${fmtPlain(x, 3)}×`;
}

function idx(n: number): string {
  return fmtPlain(n, 4);
}

function requireIn(field: string, value: unknown, min: number, max: number, openMin = false): number {
  const ok = typeof value === 'number' && (openMin ? value > min : value >= min) && value <= max;
  if (!ok) throw new RangeError(`${field} must be a number in ${openMin ? '(' : '['}${min}, ${max}] (got ${String(value)})`);
  return value as number;
}

const REQUIRES_EXTRACTION = [
  'surface texturing or a shaped chip that scatters trapped light back into the escape cones',
  'a thin-film chip on a high-reflectance mirror',
  'photon recycling: very low absorption in the chip, contacts and mirror, so reflected light gets many tries'
];

/**
 * Checks a claim against the physical bounds of the package it names.
 * @returns verdict, a one-sentence reason, what it would take, and the numbers behind it
 * @throws RangeError naming the field and its allowed range (LIMITS.indexN, claimCoreLimit)
 * @example checkClaim({ kind: 'gain', value: 2.5, nChip: 2.45, nEnc: 1.5, structure: 'planar' }).verdict // 'consistent'
 */
export function checkClaim(claim: Claim): ClaimResult {
  if (!claim || typeof claim !== 'object') throw new RangeError('claim must be an object');
  if (!CLAIM_KINDS.includes(claim.kind)) throw new RangeError(`kind must be one of ${CLAIM_KINDS.join(', ')} (got ${String(claim.kind)})`);
  if (!CHIP_STRUCTURES.includes(claim.structure)) {
    throw new RangeError(`structure must be one of ${CHIP_STRUCTURES.join(', ')} (got ${String(claim.structure)})`);
  }
  const lim = claimCoreLimit(claim.kind);
  const v =
    claim.kind === 'extraction'
      ? requireIn('value (extraction fraction)', claim.value, lim.min, lim.max, true)
      : claim.kind === 'gain'
        ? requireIn('value (gain factor)', claim.value, lim.min, lim.max, true)
        : requireIn('value (relative change, 0.4 = +40 %)', claim.value, lim.min, lim.max, true);
  const N = LIMITS.indexN;
  const nChip = requireIn('nChip', claim.nChip, N.min, N.max);
  const nOut = claim.nOut === undefined ? 1 : requireIn('nOut', claim.nOut, N.min, N.max);
  const nEnc = claim.nEnc === undefined || claim.nEnc === null ? null : requireIn('nEnc', claim.nEnc, N.min, N.max);
  const faces = claim.faces ?? CLAIM_DEFAULTS.faces;
  if (faces !== 1 && faces !== 5 && faces !== 6) throw new RangeError(`faces must be 1, 5 or 6 (got ${String(faces)})`);
  if (claim.kind === 'gain' && (nEnc === null || nEnc === nOut)) {
    throw new RangeError(`nEnc must be given for a gain claim: the encapsulant index in [${N.min}, ${N.max}], other than the outside index`);
  }
  const trace = claim.trace ?? null;
  if (trace) {
    requireIn('trace.extraction', trace.extraction, 0, 1);
    requireIn('trace.stderr', trace.stderr, 0, 1);
  }

  const b = claimBounds({ nChip, nEnc, nOut, faces });
  const where = b.encapsulated ? `under an ideal dome of index ${idx(b.nExit)} in a medium of index ${idx(nOut)}` : `bare in a medium of index ${idx(nOut)}`;
  const chip = `a ${claim.structure === 'unknown' ? '' : `${claim.structure} `}chip of index ${idx(nChip)}`;
  const notes: string[] = [];
  if (b.conesOverlap) notes.push('The escape cones of neighbouring faces overlap (critical angle above 45°): the face sums overestimate, and the recycling limit counts each direction once.');
  if (b.encapsulated) notes.push('The dome is taken as ideal: large against the chip (no total reflection at its surface) and absorbing nothing.');
  notes.push(`Isotropic emission inside the chip; ${faces} emitting face${faces === 1 ? '' : 's'}${faces === 1 ? ' with a reflecting bottom' : ''}.`);

  const numbers: ClaimNumber[] = [];
  const add = (id: string, label: string, value: number, unit: ClaimNumber['unit']) => numbers.push({ id, label, value, unit });
  const geometryNumbers = () => {
    add('critical-angle', `Critical angle, chip → ${b.encapsulated ? 'encapsulant' : 'outside'}`, (b.criticalAngleRad * 180) / Math.PI, 'degrees');
    add('escape-cone-face', `Escape cone, one face, Fresnel-weighted (chip → ${b.encapsulated ? 'encapsulant' : 'outside'})`, b.exitFace.fresnel, 'fraction');
    if (b.encapsulated) add('escape-cone-bare-face', 'Escape cone, one face, bare chip → outside', b.bareFace.fresnel, 'fraction');
    add('bare-cuboid', `Bare chip, ${faces} face${faces === 1 ? '' : 's'}, single pass`, b.bareCuboid, 'fraction');
  };

  let verdict: Verdict = 'consistent';
  let reason = '';
  let requires: string[] = [];
  let references: ReportedFigure[] = [];

  if (claim.kind === 'extraction') {
    add('claim', 'Claimed extraction', v, 'fraction');
    geometryNumbers();
    add('ideal-dome', b.encapsulated ? `Ideal dome, ${faces} faces, single pass` : `Bare chip, ${faces} faces, single pass`, b.idealDome, 'fraction');
    add('recycling-limit', 'Planar-chip limit with lossless recycling (light inside any escape cone)', b.recyclingLimit, 'fraction');
    add('best-reported', 'Best reported light extraction (thin-film flip-chip GaN, from memory)', BEST_REPORTED_EXTRACTION.value, 'fraction');

    if (claim.structure === 'planar') {
      if (v > b.recyclingLimit + SLACK) {
        verdict = 'impossible';
        reason = `${pct(v)} is more than ${chip} ${where} can ever extract: light outside its escape cones stays trapped, so even with lossless recycling at most ${pct(b.recyclingLimit)} leaves (single pass: ${pct(b.idealDome)}).`;
        requires = REQUIRES_EXTRACTION.slice(0, 2);
        references = [...REPORTED_FIGURES];
      } else if (v > b.idealDome + SLACK) {
        verdict = 'optimistic';
        reason = `${pct(v)} is above the ideal single-pass bound of ${pct(b.idealDome)} for ${chip} ${where}; only recycling of Fresnel-reflected light with almost no absorption gets there (at most ${pct(b.recyclingLimit)}).`;
        requires = [REQUIRES_EXTRACTION[2]];
        references = [...REPORTED_FIGURES];
      } else {
        reason = `${pct(v)} is within the ideal single-pass bound of ${pct(b.idealDome)} for ${chip} ${where}.`;
      }
    } else if (claim.structure === 'textured' || claim.structure === 'thin-film') {
      if (v > BEST_REPORTED_EXTRACTION.value + SLACK) {
        verdict = 'optimistic';
        reason = `${pct(v)} is above the best light extraction we cite, about ${pct(BEST_REPORTED_EXTRACTION.value)} for a ${BEST_REPORTED_EXTRACTION.device} (${BEST_REPORTED_EXTRACTION.source}, from memory).`;
        requires = REQUIRES_EXTRACTION.slice();
        references = [...REPORTED_FIGURES];
      } else if (v > b.recyclingLimit + SLACK) {
        reason = `${pct(v)} is beyond any planar chip (${pct(b.recyclingLimit)}), which a ${claim.structure} chip can reach by scattering trapped light back into the escape cones; it is within the best reported ${pct(BEST_REPORTED_EXTRACTION.value)}.`;
        references = [...REPORTED_FIGURES];
      } else {
        reason = `${pct(v)} is within what even a planar chip of index ${idx(nChip)} ${where} can reach (${pct(b.recyclingLimit)} with recycling, ${pct(b.idealDome)} in one pass).`;
      }
    } else {
      if (v > b.idealDome + SLACK) {
        verdict = 'optimistic';
        const beyond = v > BEST_REPORTED_EXTRACTION.value + SLACK ? `, and above the best reported ${pct(BEST_REPORTED_EXTRACTION.value)}` : '';
        reason = `${pct(v)} is above the ideal single-pass bound of ${pct(b.idealDome)} for a planar chip of index ${idx(nChip)} ${where}${v > b.recyclingLimit + SLACK ? ` and above its recycling limit of ${pct(b.recyclingLimit)}` : ''}${beyond}: possible only with what the claim does not state.`;
        requires = v > b.recyclingLimit + SLACK ? REQUIRES_EXTRACTION.slice() : [REQUIRES_EXTRACTION[2], ...REQUIRES_EXTRACTION.slice(0, 2)];
        references = [...REPORTED_FIGURES];
      } else {
        reason = `${pct(v)} is within the ideal single-pass bound of ${pct(b.idealDome)} even for a planar chip of index ${idx(nChip)} ${where}.`;
      }
    }

    if (trace) {
      add('trace-extraction', 'Traced extraction of this package', trace.extraction, 'fraction');
      add('trace-stderr', 'Its standard error', trace.stderr, 'fraction');
      const ceiling = trace.extraction + TRACE_K * trace.stderr;
      if (verdict === 'consistent' && v > ceiling + SLACK) {
        verdict = 'optimistic';
        reason = `${pct(v)} is more than ${TRACE_K} standard errors above the trace of this package (${pct(trace.extraction)} ± ${pct(trace.stderr)}), though within the ideal bounds.`;
        requires = ['less absorption in the chip, base or encapsulant than the traced package has', ...REQUIRES_EXTRACTION.slice(0, 1)];
      }
    }
  } else if (claim.kind === 'gain') {
    add('claim', 'Claimed gain', v, 'factor');
    geometryNumbers();
    add('dome-surface', 'Dome surface transmission at normal incidence', b.domeSurfaceTransmission, 'fraction');
    add('closed-form-gain', 'Closed-form dome gain (ideal large dome, single pass)', b.closedFormGain, 'factor');
    add('gain-limit', 'Gain limit for a planar chip (lossless recycling in the dome only)', b.gainLimit, 'factor');
    const enc = `an encapsulant of index ${idx(b.nExit)}`;
    if (v < 1) {
      // Below 1 the "gain" is a loss: an absorbing or badly matched encapsulant can always do that.
      reason = `A ${times(v)} "gain" is a loss of ${pct(1 - v)}: an encapsulant that absorbs, or a package that traps more light, can lower the output, so the claim is possible; an ideal dome of ${enc} would give ${times(b.closedFormGain)}.`;
    } else if (claim.structure === 'planar') {
      if (v > b.gainLimit + SLACK && !b.bareConesOverlap) {
        verdict = 'impossible';
        reason = `A ${times(v)} gain is more than ${enc} can give ${chip}: even if every ray inside the encapsulated escape cones left and the bare chip lost all its Fresnel reflections, the gain would be ${times(b.gainLimit)} (closed form ${times(b.closedFormGain)}).`;
        requires = ['a different chip: texturing or shaping changes how much light the bare chip traps'];
        references = [...REPORTED_FIGURES];
      } else if (v > b.closedFormGain + SLACK) {
        verdict = 'optimistic';
        reason = `A ${times(v)} gain is above the closed-form dome gain of ${times(b.closedFormGain)} for ${chip} under ${enc}; only photon recycling that helps the encapsulated chip far more than the bare one approaches the limit of ${times(b.gainLimit)}.`;
        requires = [REQUIRES_EXTRACTION[2], 'a bare reference chip that loses its reflected light (absorbing substrate or contacts)'];
      } else {
        reason = `A ${times(v)} gain is within the closed-form dome gain of ${times(b.closedFormGain)} for ${chip} under ${enc}.`;
      }
    } else if (v > b.closedFormGain + SLACK) {
      verdict = 'optimistic';
      reason = `A ${times(v)} gain is above the closed-form dome gain of ${times(b.closedFormGain)} for a planar chip of index ${idx(nChip)} under ${enc}; a ${claim.structure === 'unknown' ? 'textured or thin-film' : claim.structure} chip already extracts more bare and usually gains less.`;
      requires = ['a bare reference chip that traps an unusually large share of its light'];
    } else {
      reason = `A ${times(v)} gain is within the closed-form dome gain of ${times(b.closedFormGain)} for a planar chip of index ${idx(nChip)} under ${enc}.`;
    }
  } else {
    add('claim', 'Claimed increase from a flat coating', v, 'relative increase');
    geometryNumbers();
    add('geometric-cone', 'Escape cone, one face, geometric (no Fresnel loss)', b.exitFace.geometric, 'fraction');
    add('quarter-wave-index', 'Ideal single-layer index √(n_chip · n_exit)', b.quarterWaveIndex, 'index');
    add('quarter-wave', 'Increase from one ideal quarter-wave layer, over the cone', b.quarterWaveCoating, 'relative increase');
    add('coating-limit', 'Largest increase any flat coating can give (all Fresnel loss removed)', b.coatingLimit, 'relative increase');
    const into = b.encapsulated ? `the encapsulant (index ${idx(b.nExit)})` : `the outside medium (index ${idx(b.nExit)})`;
    if (v < 0) {
      // A decrease, whatever it is called: judged as a loss, which any layer that reflects or absorbs more can cause.
      numbers[0] = { id: 'claim', label: 'Claimed decrease from a flat coating', value: v, unit: 'relative increase' };
      reason = `This is a decrease of ${pct(-v)}, not an increase: a flat layer that reflects or absorbs more light than it saves can lower extraction by any amount, so the claim is possible — and it is a loss (an ideal quarter-wave layer would give +${pct(b.quarterWaveCoating)}).`;
    } else if (v > b.coatingLimit + SLACK) {
      verdict = 'impossible';
      reason = `A flat coating cannot widen the escape cone into ${into}, since n·sin θ is conserved through parallel layers; at best it removes the Fresnel loss inside the cone, +${pct(b.coatingLimit)}, not ${signed(v)}.`;
      requires = ['a non-planar surface (texture, micro-lenses or a shaped chip) — which is no longer a flat coating'];
    } else if (v > b.quarterWaveCoating + SLACK) {
      verdict = 'optimistic';
      reason = `${signed(v)} is more than an ideal single quarter-wave layer gives over the escape cone (+${pct(b.quarterWaveCoating)}); it needs an antireflection that works over the whole cone, up to the flat-coating limit of +${pct(b.coatingLimit)}.`;
      requires = ['a graded-index or multilayer antireflection coating designed over the whole escape cone and the emission band'];
    } else {
      reason = `${signed(v)} is within what one ideal quarter-wave antireflection layer gives over the escape cone (+${pct(b.quarterWaveCoating)}).`;
    }
  }

  return { verdict, reason, requires, numbers, references, notes, bounds: b };
}
