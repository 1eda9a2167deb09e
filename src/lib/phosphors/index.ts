/**
 * Phosphor library (pure). The API:
 * - `listPhosphors()`, `findPhosphor(id)` — checked entries of data/phosphors.json (`Phosphor`);
 * - `particleIndexAt(phosphor, λ)` → { n, k } for Mie (`particleCloud` in src/lib/scatter);
 * - `emissionRows(phosphor)` → [λ, power] rows (peak 1) for colour or sampling;
 * - `bandShapeAt`, `bandEmissionAt` — the Gaussian-in-energy band model; `stokesEfficiency(λin, λout)`;
 * - `phosphorSchema` — to check a user phosphor the same way.
 */
export { listPhosphors, findPhosphor, PHOSPHOR_BAND_MODEL } from './library';
export { phosphorSchema, PHOSPHOR_LIMITS, PHOSPHOR_PROVENANCES, type Phosphor, type PhosphorBand } from './phosphor-schema';
export { bandShapeAt, bandEmissionAt, bandsPerEnergy, HC_EV_NM } from './band-model';
export { particleIndexAt, emissionRows, stokesEfficiency } from './phosphor-optics';
