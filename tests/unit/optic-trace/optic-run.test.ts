import { describe, expect, it } from 'vitest';
import { runOptic } from '../../../src/lib/optic-trace/optic-run';
import { demoScenario, designWavelengthNm, resolveScenario, toWhitePackage } from '../../../src/lib/scenario';

describe('runOptic over a white package (the scenario with a phosphor)', () => {
  const scenario = { ...demoScenario(), phosphor: { id: 'garnet-yellow', region: 'encapsulant' as const, weightPercent: 10, diameterUm: 12, quantumYield: 0.9 } };
  const pkg = toWhitePackage(scenario, resolveScenario(scenario));
  const { results, tally, prepared } = runOptic({
    design: { type: 'reflector', exitDiameterMm: 20, heightMm: 12, gapMm: 0.2, reflectance: 0.92 },
    source: { kind: 'package', pkg, wavelengthNm: designWavelengthNm(scenario.emission), scenario: scenario.name },
    rays: 16_384,
    seed: 2
  });

  it('traces the white light (rays carry wavelengths through the phosphor) and says so in the source label', () => {
    expect(pkg.phosphor).toBeDefined();
    expect(tally.spectral).toBeDefined();
    expect(prepared.footprint.label).toMatch(/white: its phosphor converts part of the chip light/);
  });

  it('closes the ledger and gives finite results', () => {
    const sum = Object.values(results.ledger).reduce((a, b) => a + b, 0);
    expect(sum).toBeCloseTo(1, 12);
    for (const v of [results.efficiency, results.efficiencyInBeam, results.beamAngleDeg, results.fieldAngleDeg, results.peakCdPerKlm]) {
      expect(Number.isFinite(v)).toBe(true);
    }
    expect(results.ledger.out).toBeGreaterThan(0);
  });
});
