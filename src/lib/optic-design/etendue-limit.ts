/**
 * The étendue limit: the narrowest beam any optic with a given exit aperture can make from a given source.
 *
 * Étendue of a bundle through area A within a cone of half-angle θ in a medium of index n, every direction
 * weighted by its projected area (dG = n² cos θ dA dΩ):
 *   G = n² A ∫₀^θ cos θ′ sin θ′ dθ′ ∫₀^2π dφ = π n² A sin² θ
 * (R. Winston, J. C. Miñano, P. Benítez, Nonimaging Optics, Elsevier 2005, ch. 3; W. T. Welford, R. Winston,
 * High Collection Nonimaging Optics, Academic Press 1989, ch. 2 and app. A). A Lambertian source of area A_s
 * emitting into its index n_s fills a cone θ_c with G_s = π n_s² A_s sin² θ_c (θ_c = 90°: the whole hemisphere).
 * No passive optic lowers étendue, so a beam leaving an exit aperture of diameter D into index n_e within the
 * half-angle θ needs π n_e² (π D²/4) sin² θ ≥ G_s:
 *   sin θ ≥ (n_s / n_e) · sin θ_c · √(A_s / (π D²/4))
 * The beam angle here is the full angle 2θ of the cone holding all the collected flux (a top-hat beam meets
 * the bound with equality; a peaked beam's half-maximum width can be narrower than 2θ only by leaving flux
 * outside it).
 */
import { fmt } from './format-for-message';

export interface EtendueInput {
  /** Emitting area of the source, mm² (> 0). */
  sourceAreaMm2: number;
  /** Diameter of the optic's exit aperture, mm (> 0). */
  exitDiameterMm: number;
  /** Index the source emits into; default 1 (the source as seen from air). */
  nSource?: number;
  /** Index the beam leaves into; default 1. */
  nExit?: number;
  /** Half-angle of the cone of source light the optic collects, rad, (0, π/2]; default π/2 (all of it). */
  collectionHalfAngleRad?: number;
}

/** G = π n² A sin² θ, mm²·sr. @param areaMm2 ≥ 0; @param n > 0; @param halfAngleRad in [0, π/2] */
export function etendueMm2Sr(areaMm2: number, n: number, halfAngleRad: number): number {
  const s = Math.sin(halfAngleRad);
  return Math.PI * n * n * areaMm2 * s * s;
}

/** sin θ_min = (n_s/n_e) sin θ_c √(A_s/(πD²/4)); may exceed 1 (the optic is too small to narrow the light at all). */
function sinLimit(e: EtendueInput): number {
  const ns = e.nSource ?? 1;
  const ne = e.nExit ?? 1;
  const sc = Math.sin(e.collectionHalfAngleRad ?? Math.PI / 2);
  const exitArea = (Math.PI * e.exitDiameterMm * e.exitDiameterMm) / 4;
  return (ns / ne) * sc * Math.sqrt(e.sourceAreaMm2 / exitArea);
}

/**
 * The narrowest half-angle θ any optic with this exit aperture can give the collected light, rad; π/2 when even
 * a full hemisphere out of the aperture holds less étendue than the source (an optic smaller than the source).
 * @example etendueLimitHalfAngleRad({ sourceAreaMm2: 1, exitDiameterMm: 20 }) // ≈ 0.05645 (3.24°)
 */
export function etendueLimitHalfAngleRad(e: EtendueInput): number {
  checkEtendueInput(e);
  const s = sinLimit(e);
  return s >= 1 ? Math.PI / 2 : Math.asin(s);
}

/**
 * The smallest exit diameter that can hold a beam of full angle `targetBeamDeg` from this source, mm:
 * D = 2 √(A_s/π) (n_s/n_e) sin θ_c / sin(beam/2).
 * @param targetBeamDeg full beam angle, degrees, (0, 180]
 * @example minExitDiameterMm(60, 20) // ≈ 50.3 ("a 20° beam from a 60 mm² source")
 */
export function minExitDiameterMm(
  sourceAreaMm2: number,
  targetBeamDeg: number,
  nSource = 1,
  nExit = 1,
  collectionHalfAngleRad = Math.PI / 2
): number {
  checkEtendueInput({ sourceAreaMm2, exitDiameterMm: 1, nSource, nExit, collectionHalfAngleRad });
  if (!(targetBeamDeg > 0 && targetBeamDeg <= 180)) throw new RangeError(`targetBeamDeg must be a number in (0, 180] (got ${targetBeamDeg})`);
  const half = (targetBeamDeg * Math.PI) / 360;
  return (2 * Math.sqrt(sourceAreaMm2 / Math.PI) * (nSource / nExit) * Math.sin(collectionHalfAngleRad)) / Math.sin(half);
}

/**
 * Refuses a target beam narrower than the étendue allows, with the one-line message the user sees.
 * @throws RangeError "targetBeamDeg: no optic of this size can make a 3° beam from this source; the limit is 7.4° …"
 */
export function checkTargetBeam(targetBeamDeg: number, e: EtendueInput): void {
  const limitDeg = (360 / Math.PI) * etendueLimitHalfAngleRad(e);
  if (targetBeamDeg < limitDeg) {
    throw new RangeError(
      `targetBeamDeg: no optic of this size can make a ${fmt(targetBeamDeg)}° beam from this source; the limit is ${fmt(limitDeg)}° ` +
        `(exit ${fmt(e.exitDiameterMm)} mm, source ${fmt(e.sourceAreaMm2)} mm²; allowed ${fmt(limitDeg)}–180°, ` +
        `or an exit of at least ${fmt(minExitDiameterMm(e.sourceAreaMm2, targetBeamDeg, e.nSource, e.nExit, e.collectionHalfAngleRad))} mm)`
    );
  }
}

function checkEtendueInput(e: EtendueInput): void {
  const pos = (field: string, v: number | undefined) => {
    if (v !== undefined && !(typeof v === 'number' && v > 0 && v < Infinity)) {
      throw new RangeError(`${field} must be a finite number > 0 (got ${v})`);
    }
  };
  pos('sourceAreaMm2', e.sourceAreaMm2);
  pos('exitDiameterMm', e.exitDiameterMm);
  pos('nSource', e.nSource);
  pos('nExit', e.nExit);
  const c = e.collectionHalfAngleRad;
  if (c !== undefined && !(c > 0 && c <= Math.PI / 2)) {
    throw new RangeError(`collectionHalfAngleRad must be a number in (0, π/2] (got ${c})`);
  }
}
