/**
 * Scattering by particles, pure and synchronous:
 * - `mieEfficiencies(mRe, mIm, x)` → { qExt, qSca, qAbs, qBack, g } of one sphere (BHMIE);
 * - `particleCloud(input)` → { musPerMm, muaPerMm, g, volumeFraction, numberPerMm3 } of a dispersed powder,
 *   single size or log-normal by volume (d50, σg), from weight fraction and densities;
 * - `sampleHenyeyGreenstein(g, u)` / `henyeyGreensteinDensity(g, μ)` for the tracer's scattering events.
 */
export { mieEfficiencies, MIE_LIMITS, type MieEfficiencies } from './mie';
export {
  particleCloud, volumeFraction, PARTICLE_CLOUD_LIMITS, type ParticleCloudInput, type ParticleCloudCoefficients, type ParticleSize
} from './particle-cloud';
export { sampleHenyeyGreenstein, henyeyGreensteinDensity } from './henyey-greenstein';
