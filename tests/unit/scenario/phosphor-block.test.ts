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
    ['an unknown region', { region: 'sprayed' }, /Phosphor region must be one of: encapsulant, conformal, remote, floor/],
    ['a layer region without its thickness', { region: 'conformal' }, /Phosphor layer thickness is needed for a conformal layer \(between 0.005 and 10 mm\)/],
    ['a layer thicker than the limits table allows', { region: 'remote', thicknessMm: 20 }, /Phosphor layer thickness must be between 0.005 and 10 mm/],
    ['a floor layer under a dome on a flat base', { region: 'floor', thicknessMm: 0.1 }, /Phosphor region 'floor' needs a cup or a cylinder encapsulant/],
    ['a conformal layer too thick for the dome', { region: 'conformal', thicknessMm: 3 }, /Phosphor layer thickness must be from 0.005 mm to below 1.\d+ mm for a conformal layer/]
  ])('refuses %s naming the field and range', (_, change, message) => {
    // (the demo is a dome on a flat base: a floor layer does not fit it at all)
    const r = readScenario({ ...demoScenario(), phosphor: { id: 'garnet-yellow', region: 'encapsulant', weightPercent: 8, diameterUm: 12, quantumYield: 0.9, ...change } });
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(JSON.stringify(r)).toMatch(message);
  });
});

describe('phosphor regions in the scenario', () => {
  it('a conformal layer with its thickness reaches the traced package, with the dispersion of its media', () => {
    const r = readScenario({ ...demoScenario(), phosphor: { id: 'garnet-yellow', region: 'conformal', thicknessMm: 0.08, weightPercent: 30, diameterUm: 12, quantumYield: 0.9 } });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const pkg = toWhitePackage(r.scenario);
    expect(pkg.phosphor).toMatchObject({ region: 'conformal', thicknessMm: 0.08 });
    expect(pkg.dispersion?.chipLayers?.[0]?.length).toBeGreaterThan(10);
  });

  it('a version-4 phosphor block saved before the layer thickness existed still opens', () => {
    const r = readScenario({ ...demoScenario(), phosphor: { id: 'garnet-yellow', region: 'encapsulant', weightPercent: 8, diameterUm: 12, quantumYield: 0.9 } });
    expect(r.ok && r.scenario.phosphor?.thicknessMm).toBe(undefined);
    expect(r.ok).toBe(true);
  });
});

describe('a phosphor layer in a link', () => {
  it('the region and thickness survive the URL encoding', async () => {
    const { encodeScenarioParam, decodeScenarioParam } = await import('../../../src/lib/scenario/url');
    const r = readScenario({ ...demoScenario(), phosphor: { id: 'garnet-yellow', region: 'remote', thicknessMm: 0.25, weightPercent: 20, diameterUm: 12, quantumYield: 0.9 } });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const back = decodeScenarioParam(encodeScenarioParam(r.scenario));
    expect(back.fromLink).toBe(true);
    expect(back.scenario.phosphor).toMatchObject({ region: 'remote', thicknessMm: 0.25 });
  });
});
