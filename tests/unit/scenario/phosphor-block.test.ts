import { describe, expect, it } from 'vitest';
import { demoScenario, readScenario, toWhitePackage, SCENARIO_VERSION } from '../../../src/lib/scenario';

const v3 = () => ({ ...demoScenario(), version: 3 });

describe('scenario version 4: the optional phosphor block', () => {
  it('a saved version-3 scenario still opens, as version 4 with a clear encapsulant', () => {
    const r = readScenario(v3());
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(SCENARIO_VERSION).toBe(4);
    expect(r.scenario.version).toBe(4);
    expect(r.migratedFrom).toBe(3);
    expect(r.scenario.phosphor).toBeUndefined();
    expect(toWhitePackage(r.scenario).phosphor).toBeUndefined();
  });

  it('a phosphor block reaches the traced package', () => {
    const r = readScenario({ ...demoScenario(), phosphor: { id: 'garnet-yellow', region: 'encapsulant', weightPercent: 8, diameterUm: 12, quantumYield: 0.9 } });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const pkg = toWhitePackage(r.scenario);
    expect(pkg.phosphor?.quantumYield).toBe(0.9);
    expect(pkg.phosphor?.chipSpectrum).toEqual([[450, 1]]);
  });

  it.each([
    ['a load above 60 wt%', { weightPercent: 120 }, /Phosphor load.*0.*60/],
    ['a negative load', { weightPercent: -1 }, /Phosphor load/],
    ['a diameter above 50 µm', { diameterUm: 80 }, /Phosphor particle diameter.*0\.05.*50/],
    ['a region not traced', { region: 'remote' }, /Phosphor region must be one of: encapsulant/]
  ])('refuses %s naming the field and range', (_, change, message) => {
    const r = readScenario({ ...demoScenario(), phosphor: { id: 'garnet-yellow', region: 'encapsulant', weightPercent: 8, diameterUm: 12, quantumYield: 0.9, ...change } });
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(JSON.stringify(r)).toMatch(message);
  });
});
