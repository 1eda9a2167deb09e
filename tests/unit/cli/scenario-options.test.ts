import { describe, expect, it } from 'vitest';
import { joinNegativeValues } from '../../../src/cli/options';
import { optionForPath, SCENARIO_OPTIONS, scenarioFromOptions } from '../../../src/cli/scenario-options';
import { demoScenario } from '../../../src/lib/scenario/defaults';

describe('joinNegativeValues(argv, options)', () => {
  it('reads a negative number after an option that takes a value as its value', () => {
    const options = { value: { type: 'string' as const }, json: { type: 'boolean' as const } };
    expect(joinNegativeValues(['--value', '-5', '--json'], options)).toEqual(['--value=-5', '--json']);
    expect(joinNegativeValues(['--value', '-.5'], options)).toEqual(['--value=-.5']);
    expect(joinNegativeValues(['--value', '--json'], options)).toEqual(['--value', '--json']);
    expect(joinNegativeValues(['--json', '-5'], options)).toEqual(['--json', '-5']);
  });
});

describe('scenarioFromOptions(values)', () => {
  it('with no options is the demo scenario', () => {
    expect(scenarioFromOptions({}).scenario).toEqual(demoScenario());
  });

  it('each option sets its field; the schema checks the result', () => {
    const { scenario } = scenarioFromOptions({ 'enc-material': 'silicone-phenyl', radius: '3', 'n-out': '1.33', wavelength: '460' });
    expect(scenario.encapsulant.medium).toEqual({ kind: 'material', id: 'silicone-phenyl' });
    expect(scenario.encapsulant.radiusMm).toBe(3);
    expect(scenario.outside).toEqual({ kind: 'index', n: 1.33, k: 0 });
    expect(scenario.emission).toEqual({ kind: 'single', wavelengthNm: 460 });
  });

  it("names the option behind the schema's first issue, with the schema's own message", () => {
    expect(() => scenarioFromOptions({ radius: 'abc' })).toThrow(/^--radius: Encapsulant radius must be between 0\.001 and 1000 mm\.$/);
    expect(() => scenarioFromOptions({ 'n-enc': '1.5+0.01i' })).toThrow(/--n-enc: give the encapsulant's index n alone/);
    expect(() => scenarioFromOptions({ 'chip-material': 'unobtainium' })).toThrow(/^--chip-material: Chip material 'unobtainium' is not in the material library\.$/);
  });

  it('maps every scenario path to an option, falling back to --scenario for a file', () => {
    const given = (name: string) => name === 'chip';
    expect(optionForPath('encapsulant.radiusMm', given, false)).toBe('--chip');
    expect(optionForPath('chip.medium.id', () => false, true)).toBe('--scenario');
    for (const name of Object.keys(SCENARIO_OPTIONS)) expect(name).toMatch(/^[a-z-]+$/);
  });
});
