import { SCENARIO_VERSION, type Scenario } from './schema';

/**
 * The demo scenario, our own invented case: a 1 × 1 × 0.15 mm blue GaN chip emitting at 450 nm on a
 * silver-plated base (reflectance 0.92), under a hemispherical dome of radius 2.5 mm. The open
 * question is which silicone to fill the dome with: a methyl silicone (n ≈ 1.41, the default here) or a
 * phenyl silicone (n ≈ 1.53, `DEMO_ALTERNATIVE_ENCAPSULANT`).
 */
export const DEMO_SCENARIO: Scenario = deepFreeze({
  version: SCENARIO_VERSION,
  name: 'Demo: blue 1 mm chip, silicone choice',
  emission: { kind: 'single', wavelengthNm: 450 },
  chip: {
    medium: { kind: 'material', id: 'gan' },
    widthMm: 1,
    lengthMm: 1,
    heightMm: 0.15,
    emitterZMm: 0.14,
    absorptionPerMm: 0.5,
    emission: 'plane',
    topTexture: 0
  },
  base: { kind: 'reflectance', reflectance: 0.92 },
  baseFinish: 'specular',
  body: { kind: 'flat' },
  encapsulant: {
    medium: { kind: 'material', id: 'silicone-methyl' },
    shape: 'dome',
    radiusMm: 2.5,
    heightMm: 2.5,
    absorptionPerMm: 0.001
  },
  outside: { kind: 'material', id: 'air' },
  trace: { rays: 250_000, seed: 1, polarization: 'average' }
});

/** The second silicone of the demo's decision (n ≈ 1.53). */
export const DEMO_ALTERNATIVE_ENCAPSULANT = 'silicone-phenyl';

/** A fresh, mutable deep copy of the demo scenario. */
export function demoScenario(): Scenario {
  return structuredClone(DEMO_SCENARIO) as Scenario;
}

function deepFreeze<T>(value: T): T {
  if (value !== null && typeof value === 'object') {
    for (const v of Object.values(value)) deepFreeze(v);
    Object.freeze(value);
  }
  return value;
}
