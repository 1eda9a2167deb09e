/**
 * What a traced optic delivers, from its tally: efficiency, beam and field angles, peak intensity,
 * the étendue limit and how close the beam comes to it, the loss ledger and the candela distribution.
 *
 * Photometric definitions (IES LM-79 / CIE 121 usage, common practice): intensity I(θ) = dΦ/dΩ, here
 * the flux in each 1° polar zone over its solid angle 2π(cos θ_i − cos θ_i+1) (rotational symmetry,
 * type C); beam angle = full angle where I falls to 50 % of its peak, field angle = to 10 %; cd/klm =
 * intensity per 1000 lm of source flux. Crossings are interpolated linearly between zone centres.
 */
import { etendueLimitHalfAngleRad } from '../optic-design/etendue-limit';
import type { OpticFaceRole } from '../trace/body-optic';
import type { Tally } from '../trace/tally';
import { SOURCE_BOARD } from './optic-scene';

/** Fractions of the launched rays; they sum to 1. */
export interface OpticLedger {
  /** Left through the optic's exit (the reflector's open front). */
  out: number;
  /** Turned back at an entry face (Fresnel reflections, light leaving through an entry face). */
  fresnel: number;
  /** Absorbed by the reflector's metal. */
  metal: number;
  /** Leaked through the side wall (the TIR wall where it fails, a lens's edge). */
  tirLeak: number;
  /** Never passed the optic's exit nor an optic face (left beside or below it). */
  missed: number;
  /** Absorbed in the optic's material. */
  absorbed: number;
  /** Sent back onto the idealised source's plane (a black board). */
  returned: number;
  /** Absorbed in the package (chip, encapsulant, base, cup), before or after meeting the optic. */
  package: number;
  /** Stopped at the event cap or by a geometry error. */
  lost: number;
}

export interface OpticResults {
  /** Flux out of the optic / flux into it (source flux less what missed it). */
  efficiency: number;
  /** Flux within the beam angle / source flux. */
  efficiencyInBeam: number;
  beamAngleDeg: number;
  fieldAngleDeg: number;
  peakCdPerKlm: number;
  /** Narrowest full beam angle any optic of this exit could make from this source, degrees. */
  etendueLimitDeg: number;
  /**
   * How close the beam comes to the étendue limit: √f · sin(limit/2) / sin(beam/2), f the share of the source
   * flux inside the beam angle. A uniform Lambertian source's flux f needs the étendue f·G_s, so this is at most
   * 1 (a perfect optic of this exit size); a half-maximum width narrower than the limit holds less flux.
   */
  etendueRatio: number;
  ledger: OpticLedger;
  /** Per-face escapes and absorptions of the optic and package, fractions of launched rays. */
  parts: Record<string, number>;
  /** Zone centres 0.5…179.5°, and intensity there, cd/klm. */
  farField: { thetaDeg: number[]; cdPerKlm: number[] };
  rays: number;
  /** Source flux as a fraction of launched rays (what leaves the package or the source). */
  sourceFraction: number;
}

/** Solid angle of the polar zone [i°, (i + 1)°], sr: 2π (cos θ_i − cos θ_{i+1}). */
export function zoneSolidAngleSr(i: number): number {
  const d = Math.PI / 180;
  return 2 * Math.PI * (Math.cos(i * d) - Math.cos((i + 1) * d));
}

/** Ledger group of a tally bin, given the optic's face roles. */
function groupOf(name: string, roles: Record<string, OpticFaceRole>): keyof OpticLedger {
  if (name.startsWith('lost:')) return 'lost';
  const colon = name.indexOf(':');
  const kind = name.slice(0, colon);
  const what = name.slice(colon + 1);
  if (kind === 'escaped') {
    const role = roles[what];
    return role === 'exit' ? 'out' : role === 'side' ? 'tirLeak' : role === 'entry' ? 'fresnel' : 'missed';
  }
  if (kind === 'medium') return what === 'optic' ? 'absorbed' : 'package';
  if (what === SOURCE_BOARD) return 'returned';
  return roles[what] === 'mirror' ? 'metal' : 'package';
}

/**
 * The full angle at which I(θ) (zone centres i + 0.5°) first falls below `level` × its peak, walking out
 * from the peak; degrees (360 when it never does).
 */
export function widthAtLevelDeg(intensity: ArrayLike<number>, level: number): number {
  let peak = 0;
  let at = 0;
  for (let i = 0; i < intensity.length; i++) {
    if (intensity[i] > peak) {
      peak = intensity[i];
      at = i;
    }
  }
  if (!(peak > 0)) return 0;
  const threshold = level * peak;
  for (let i = at + 1; i < intensity.length; i++) {
    if (intensity[i] < threshold) {
      const a = intensity[i - 1];
      const b = intensity[i];
      const frac = a === b ? 0 : (a - threshold) / (a - b);
      return 2 * (i - 0.5 + frac);
    }
  }
  return 2 * intensity.length;
}

/**
 * Results of a traced optic.
 * @param roles the optic's face roles (body-optic.ts)
 * @param sourceAreaMm2 the source's emitting area seen from above, mm²
 * @param exitDiameterMm the optic's exit diameter, mm
 */
export function opticResults(tally: Tally, roles: Record<string, OpticFaceRole>, sourceAreaMm2: number, exitDiameterMm: number): OpticResults {
  const n = tally.launched;
  const ledger: OpticLedger = { out: 0, fresnel: 0, metal: 0, tirLeak: 0, missed: 0, absorbed: 0, returned: 0, package: 0, lost: 0 };
  const parts: Record<string, number> = {};
  for (const [name, count] of Object.entries(tally.parts)) {
    ledger[groupOf(name, roles)] += count / n;
    parts[name] = count / n;
  }
  const sourceFraction = 1 - ledger.package - ledger.lost;
  const sourceRays = sourceFraction * n;
  const thetaDeg: number[] = [];
  const cdPerKlm: number[] = [];
  for (let i = 0; i < tally.polarHistogram.length; i++) {
    thetaDeg.push(i + 0.5);
    // I = Φ_zone / Ω_zone per 1000 lm of source flux
    cdPerKlm.push(sourceRays > 0 ? (1000 * tally.polarHistogram[i]) / (sourceRays * zoneSolidAngleSr(i)) : 0);
  }
  const beamAngleDeg = widthAtLevelDeg(cdPerKlm, 0.5);
  const fieldAngleDeg = widthAtLevelDeg(cdPerKlm, 0.1);
  // Flux within the beam's half angle: whole zones, and the part of the last zone by its share of the angle
  const half = beamAngleDeg / 2;
  let inBeam = 0;
  for (let i = 0; i < tally.polarHistogram.length && i < half; i++) inBeam += tally.polarHistogram[i] * Math.min(1, half - i);
  const intoOptic = sourceRays - ledger.missed * n;
  const etendueLimitDeg = (360 / Math.PI) * etendueLimitHalfAngleRad({ sourceAreaMm2, exitDiameterMm });
  return {
    efficiency: intoOptic > 0 ? (ledger.out * n) / intoOptic : 0,
    efficiencyInBeam: sourceRays > 0 ? inBeam / sourceRays : 0,
    beamAngleDeg,
    fieldAngleDeg,
    peakCdPerKlm: Math.max(0, ...cdPerKlm),
    etendueLimitDeg,
    etendueRatio: etendueRatio(etendueLimitDeg, beamAngleDeg, sourceRays > 0 ? inBeam / sourceRays : 0),
    ledger,
    parts,
    farField: { thetaDeg, cdPerKlm },
    rays: n,
    sourceFraction
  };
}

/** √f · sin(limit/2) / sin(beam/2) (see OpticResults.etendueRatio); 0 for no beam. Angles in degrees. */
export function etendueRatio(limitDeg: number, beamDeg: number, fluxFraction: number): number {
  const half = (beamDeg * Math.PI) / 360;
  if (!(half > 0) || !(fluxFraction > 0)) return 0;
  return (Math.sqrt(fluxFraction) * Math.sin((limitDeg * Math.PI) / 360)) / Math.sin(Math.min(half, Math.PI / 2));
}

/**
 * The smallest full cone angle, degrees, holding `fraction` of the source flux in the traced far field
 * (zones summed from the axis, the last one by linear share); 180 when the far field holds less.
 */
export function coneHoldingDeg(tally: Tally, sourceRays: number, fraction: number): number {
  const want = fraction * sourceRays;
  let sum = 0;
  for (let i = 0; i < tally.polarHistogram.length; i++) {
    const c = tally.polarHistogram[i];
    if (sum + c >= want) return 2 * (i + (c > 0 ? (want - sum) / c : 0));
    sum += c;
  }
  return 360;
}
