/** Variants of the demo scenario for the variant tests: methyl (A) and phenyl (B) silicone domes. */
import { demoScenario } from '../../../src/lib/scenario/defaults';
import type { Scenario } from '../../../src/lib/scenario/schema';
import type { VariantsDoc } from '../../../src/lib/variants/variants-doc';
import type { VariantResult, VariantTrace } from '../../../src/lib/variants/variant-result';

export function phenylScenario(): Scenario {
  const s = demoScenario();
  s.encapsulant.medium = { kind: 'material', id: 'silicone-phenyl' };
  return s;
}

export function twoVariants(): VariantsDoc {
  return { version: 1, variants: [{ name: 'A', scenario: demoScenario() }, { name: 'B', scenario: phenylScenario() }] };
}

/** A made-up trace result with the given extraction (ledger closes: the rest absorbed in the chip). */
export function fakeTrace(extraction: number, rays: number): VariantTrace {
  const bins = Array.from({ length: 180 }, (_, i) => ({ thetaDeg: i + 0.5, relativeIntensity: i < 90 ? Math.cos(((i + 0.5) * Math.PI) / 180) : 0 }));
  return {
    rays,
    extraction,
    stderr: Math.sqrt((extraction * (1 - extraction)) / rays),
    ledger: { escaped: extraction, chip: 1 - extraction, encapsulant: 0, base: 0, lost: 0 },
    escapedBelowHorizon: 0,
    farField: { beamAngleDeg: 120, onAxisVsLambertian: 1, bins }
  };
}

export function fakeResult(extraction: number, bare: number | null, rays = 250_000): VariantResult {
  return { seed: 1, package: fakeTrace(extraction, rays), bareChip: bare === null ? null : fakeTrace(bare, rays) };
}
