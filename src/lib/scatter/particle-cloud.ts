/**
 * Scattering and absorption coefficients of a cloud of spheres dispersed in a host (independent
 * scattering, valid for dilute clouds — volume fractions up to roughly 10 %, common practice).
 * - Relative index m = (n_p + i·k_p)/n_host and size parameter x = π·d·n_host/λ0 (the wavelength in the host).
 * - Volume fraction from weight fraction w: φ = (w/ρp)/(w/ρp + (1 − w)/ρh).
 * - Number density of one size: N = φ/V, V = πd³/6; μs = N·Csca, μa = N·Cabs, C = Q·πd²/4.
 * - A log-normal size distribution is taken by volume (mass): d50 is the mass-median diameter and σg the
 *   geometric standard deviation, as laser-diffraction sizing reports powders (ISO 13320, common practice);
 *   μ = φ·∫q3(d)·C(d)/V(d) dd, g = ∫q3·Csca·g/V dd / ∫q3·Csca/V dd, by a 71-node rule in ln d over ±3.5 ln σg.
 * @see C. F. Bohren, D. R. Huffman, Absorption and Scattering of Light by Small Particles (Wiley, 1983), §3.4
 *   (cross sections of a collection of independent particles)
 */
import { mieEfficiencies } from './mie';

/** Allowed inputs at the public edge. */
export const PARTICLE_CLOUD_LIMITS = {
  wavelengthNm: { min: 200, max: 2500 },
  diameterUm: { min: 0.05, max: 50 },
  spread: { min: 1, max: 2 },
  particleN: { min: 1, max: 4 },
  particleK: { min: 0, max: 1 },
  hostN: { min: 1, max: 2.5 },
  /** Weight fraction of particles in the mixture, [0, 1). */
  weightFraction: { min: 0, max: 0.95 },
  densityGPerCm3: { min: 0.5, max: 25 }
} as const;

export type ParticleSize = { kind: 'single'; diameterUm: number } | { kind: 'lognormal'; d50Um: number; spread: number };

export interface ParticleCloudInput {
  /** Vacuum wavelength, nm. */
  wavelengthNm: number;
  particleN: number;
  particleK: number;
  hostN: number;
  size: ParticleSize;
  /** Particle mass / mixture mass, [0, 0.95]. */
  weightFraction: number;
  particleDensityGPerCm3: number;
  hostDensityGPerCm3: number;
}

export interface ParticleCloudCoefficients {
  /** Scattering and absorption coefficients of the mixture, 1/mm. */
  musPerMm: number;
  muaPerMm: number;
  /** Henyey–Greenstein asymmetry to use: the scattering-weighted mean cosine. */
  g: number;
  /** Particle volume / mixture volume. */
  volumeFraction: number;
  /** Particles per mm³ (for a distribution: total number). */
  numberPerMm3: number;
}

const NODES = 71;
const HALF_SPAN = 3.5;

function check(name: string, value: number, range: { min: number; max: number }, unit = ''): void {
  if (typeof value !== 'number' || !(value >= range.min && value <= range.max)) {
    throw new RangeError(`${name} must be a number from ${range.min} to ${range.max}${unit} (got ${String(value)})`);
  }
}

/** Volume fraction of particles from their weight fraction and the two densities: φ = (w/ρp)/(w/ρp + (1 − w)/ρh). */
export function volumeFraction(weightFraction: number, particleDensity: number, hostDensity: number): number {
  const vp = weightFraction / particleDensity;
  return vp / (vp + (1 - weightFraction) / hostDensity);
}

/**
 * μs, μa (1/mm) and g of a particle cloud.
 * @throws RangeError naming the input outside PARTICLE_CLOUD_LIMITS
 */
export function particleCloud(input: ParticleCloudInput): ParticleCloudCoefficients {
  const L = PARTICLE_CLOUD_LIMITS;
  check('wavelengthNm', input.wavelengthNm, L.wavelengthNm, ' nm');
  check('particleN', input.particleN, L.particleN);
  check('particleK', input.particleK, L.particleK);
  check('hostN', input.hostN, L.hostN);
  check('weightFraction', input.weightFraction, L.weightFraction);
  check('particleDensityGPerCm3', input.particleDensityGPerCm3, L.densityGPerCm3, ' g/cm³');
  check('hostDensityGPerCm3', input.hostDensityGPerCm3, L.densityGPerCm3, ' g/cm³');
  const size = input.size;
  if (size.kind === 'single') check('diameterUm', size.diameterUm, L.diameterUm, ' µm');
  else {
    check('d50Um', size.d50Um, L.diameterUm, ' µm');
    check('spread', size.spread, L.spread);
  }

  const phi = volumeFraction(input.weightFraction, input.particleDensityGPerCm3, input.hostDensityGPerCm3);
  const mRe = input.particleN / input.hostN;
  const mIm = input.particleK / input.hostN;
  const lambdaUm = input.wavelengthNm * 1e-3;
  // Per particle of diameter d (µm): C/V in 1/mm (C in mm², V in mm³), and its g
  const perVolume = (dUm: number): [number, number, number] => {
    const q = mieEfficiencies(mRe, mIm, (Math.PI * dUm * input.hostN) / lambdaUm);
    const dMm = dUm * 1e-3;
    const areaOverVolume = (Math.PI * dMm * dMm) / 4 / ((Math.PI * dMm ** 3) / 6); // = 1.5/d
    return [q.qSca * areaOverVolume, q.qAbs * areaOverVolume, q.g];
  };

  if (size.kind === 'single') {
    const [s, a, g] = perVolume(size.diameterUm);
    return { musPerMm: phi * s, muaPerMm: phi * a, g, volumeFraction: phi, numberPerMm3: phi / ((Math.PI * (size.diameterUm * 1e-3) ** 3) / 6) };
  }
  // Log-normal by volume: ln d ~ Normal(ln d50, ln σg); equal steps in t = (ln d − ln d50)/ln σg
  const s = Math.log(size.spread);
  const nodes = s === 0 ? 1 : NODES;
  let wSum = 0, mus = 0, mua = 0, gs = 0, number = 0;
  for (let i = 0; i < nodes; i++) {
    const t = nodes === 1 ? 0 : -HALF_SPAN + (2 * HALF_SPAN * i) / (nodes - 1);
    const w = Math.exp(-0.5 * t * t);
    const d = size.d50Um * Math.exp(s * t);
    const [sv, av, g] = perVolume(d);
    wSum += w;
    mus += w * sv;
    mua += w * av;
    gs += w * sv * g;
    number += w / ((Math.PI * (d * 1e-3) ** 3) / 6);
  }
  return { musPerMm: (phi * mus) / wSum, muaPerMm: (phi * mua) / wSum, g: mus > 0 ? gs / mus : 0, volumeFraction: phi, numberPerMm3: (phi * number) / wSum };
}
