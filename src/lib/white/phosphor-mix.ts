/**
 * One or more phosphor powders mixed into the encapsulant at their weight percents: each kind's μs, μa,
 * g by Mie theory (particleCloud) at its own volume fraction in the whole mixture, and the package
 * with that mixture (the tracer credits each absorption to a kind by its share of μa; medium-events.ts).
 *
 * Volume fraction of kind i in a mixture of powders (weight fractions wᵢ, densities ρᵢ) and host
 * (1 − Σw, ρh): φᵢ = (wᵢ/ρᵢ) / (Σⱼ wⱼ/ρⱼ + (1 − Σw)/ρh) (mass balance, common practice). Independent
 * scattering: each kind's coefficients scale with its own φᵢ, so particleCloud's one-powder result
 * at wᵢ is rescaled by φᵢ / φ(wᵢ alone).
 */
import { particleCloud, volumeFraction } from '../scatter/index';
import { SILICONE_DENSITY_G_PER_CM3, type TracePhosphorPart } from '../trace/package-phosphor';
import type { TracePackage } from '../trace/package-spec';
import { withPhosphor, type PhosphorPlacement } from '../trace/white-light';
import type { ParticleOptics } from './particle-optics';

export interface MixComponent {
  optics: ParticleOptics;
  /** Weight percent of this powder in the whole mixture, [0, 60]. */
  weightPercent: number;
  /** Particle diameter (single size), µm. */
  diameterUm: number;
  /** Quantum yield; default the phosphor's. */
  quantumYield?: number;
}

/** Most weight of all powders together, percent (the dilute independent-scattering model's limit). */
export const MAX_TOTAL_WEIGHT_PERCENT = 60;

/**
 * μs, μa, g rows of each kind of a mixture every `stepNm` over fromNm..toNm.
 * @throws RangeError naming the input out of range (a total load above MAX_TOTAL_WEIGHT_PERCENT, or particleCloud's)
 */
export function mixtureParts(components: readonly MixComponent[], hostN: number, hostDensityGPerCm3 = SILICONE_DENSITY_G_PER_CM3, fromNm = 360, toNm = 830, stepNm = 5): TracePhosphorPart[] {
  const total = components.reduce((a, c) => a + c.weightPercent, 0);
  if (!(total <= MAX_TOTAL_WEIGHT_PERCENT)) throw new RangeError(`phosphor loads together must be at most ${MAX_TOTAL_WEIGHT_PERCENT} wt% (got ${total.toFixed(2)} wt%)`);
  const host = (100 - total) / 100 / hostDensityGPerCm3;
  const volumes = components.map((c) => c.weightPercent / 100 / c.optics.densityGPerCm3);
  const all = volumes.reduce((a, v) => a + v, host);
  return components.map((comp, i) => {
    const w = comp.weightPercent / 100;
    const alone = volumeFraction(w, comp.optics.densityGPerCm3, hostDensityGPerCm3);
    const scale = alone > 0 ? volumes[i] / all / alone : 0;
    const coefficients: [number, number, number, number][] = [];
    for (let nm = fromNm; nm <= toNm + 1e-9; nm += stepNm) {
      const { n, k } = comp.optics.indexAt(nm);
      const c = particleCloud({
        wavelengthNm: nm, particleN: n, particleK: k, hostN, size: { kind: 'single', diameterUm: comp.diameterUm },
        weightFraction: w, particleDensityGPerCm3: comp.optics.densityGPerCm3, hostDensityGPerCm3
      });
      coefficients.push([nm, c.musPerMm * scale, c.muaPerMm * scale, c.g]);
    }
    return { coefficients, emission: comp.optics.emission, quantumYield: comp.quantumYield ?? comp.optics.quantumYield };
  });
}

/**
 * The package with its encapsulant holding the mixture (the first kind through withPhosphor's table
 * form, the others mixed with it).
 * @param chipSpectrum the chip's emission rows the spectral rays are drawn from
 * @param layer where the mixture sits: the whole encapsulant (default) or a layer region of a thickness
 */
export function withMixture(pkg: TracePackage, components: readonly MixComponent[], chipSpectrum: [number, number][], layer: PhosphorPlacement = {}): TracePackage {
  if (components.length < 1) throw new RangeError('a phosphor mixture needs at least one phosphor');
  const [first, ...others] = mixtureParts(components, pkg.encapsulant.n);
  const white = withPhosphor(pkg, { kind: 'table', ...first, ...layer }, chipSpectrum);
  return others.length ? { ...white, phosphor: { ...white.phosphor!, mixedWith: others } } : white;
}
