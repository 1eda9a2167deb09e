import { describe, expect, it } from 'vitest';
import { DEFAULT_FORM, inFieldTerms, prepareAll } from '../../../src/routes/beam/beam-work';
import { demoScenario, resolveScenario, toTracePackage } from '../../../src/lib/scenario';

const scenario = demoScenario();
const ctx = { pkg: toTracePackage(scenario, resolveScenario(scenario)), wavelengthNm: 450, scenario: scenario.name, rayFile: null };

describe('beam page work', () => {
  it('designs the three default optics over the idealised source', () => {
    const all = prepareAll(DEFAULT_FORM, ctx);
    for (const k of ['reflector', 'lens', 'tir'] as const) expect(typeof all[k]).not.toBe('string');
  });

  it("a TIR collimator that cuts into the package's dome is refused naming the gap and the gap it needs", () => {
    const all = prepareAll({ ...DEFAULT_FORM, source: 'package', heightMm: 12, gapMm: 0.2 }, ctx);
    expect(all.tir).toMatch(/^(Gap: the optic meets the package's encapsulant; raise the gap to at least \d|Height)/);
  });

  it('names fields as the page labels them', () => {
    expect(inFieldTerms('heightMm must be … (got 12)')).toBe('Height must be … (got 12)');
  });
});
