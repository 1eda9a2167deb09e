import { resolveScenario, toTracePackage } from '../../../src/lib/scenario/resolve';
import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO, demoScenario } from '../../../src/lib/scenario/defaults';
import { migrateScenario } from '../../../src/lib/scenario/migrate';
import { readScenario } from '../../../src/lib/scenario/read-scenario';

/** A version-0 draft: media as bare ids or numbers, one wavelength, base as a number. */
const V0 = {
  version: 0,
  name: 'Old draft',
  wavelengthNm: 530,
  chip: { material: 2.45, widthMm: 0.5, lengthMm: 0.5, heightMm: 0.1 },
  base: 0.9,
  encapsulant: { material: 'epoxy', shape: 'dome', radiusMm: 1.5 },
  outside: 'air',
  rays: 50_000
};

describe('migrateScenario', () => {
  it('lifts a version-0 draft to the current version, filling what it lacked', () => {
    const r = readScenario(V0);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.migratedFrom).toBe(0);
    const s = r.scenario;
    expect(s.version).toBe(4);
    expect(s.emission).toEqual({ kind: 'single', wavelengthNm: 530 });
    expect(s.chip.medium).toEqual({ kind: 'index', n: 2.45, k: 0 });
    expect(s.chip.emitterZMm).toBe(0.1); // defaults to the top of the chip
    expect(s.base).toEqual({ kind: 'reflectance', reflectance: 0.9 });
    expect(s.encapsulant).toEqual({ medium: { kind: 'material', id: 'epoxy' }, shape: 'dome', radiusMm: 1.5, heightMm: 1.5, absorptionPerMm: 0 });
    expect(s.outside).toEqual({ kind: 'material', id: 'air' });
    expect(s.trace).toEqual({ rays: 50_000, seed: DEMO_SCENARIO.trace.seed, polarization: 'average' });
  });

  it('reads a scenario without a version field as version 0', () => {
    const { version: _v, ...unversioned } = V0;
    const r = readScenario(unversioned);
    expect(r.ok && r.migratedFrom).toBe(0);
  });

  it('a version-0 draft with a bad value fails with the version-1 message for that field', () => {
    const r = readScenario({ ...V0, wavelengthNm: 50 });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toBe('Wavelength must be between 200 and 2500 nm.');
  });

  it('passes the current version (4) through unchanged', () => {
    const s = demoScenario();
    const m = migrateScenario(s);
    expect(m).toEqual({ ok: true, value: s, from: 4 });
    const r = readScenario(s);
    expect(r.ok && r.migratedFrom).toBeNull();
  });

  it('reads a version-1 scenario as the current version with nothing else changed', () => {
    const v1 = { ...demoScenario(), version: 1 };
    const r = readScenario(v1);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.migratedFrom).toBe(1);
    expect(r.scenario).toEqual(demoScenario());
  });

  it('refuses a newer version with a message that names both versions', () => {
    const m = migrateScenario({ ...demoScenario(), version: 5 });
    expect(m.ok).toBe(false);
    if (!m.ok) expect(m.message).toMatch(/newer version of Outcouple \(scenario version 5\); this one reads versions up to 4/);
  });

  it('reads a version-2 scenario with a typed encapsulant index n + ik as n alone: every number it computes is unchanged', () => {
    // Version 2 carried k beside the absorption per mm; the tracer and the closed form used n and the
    // absorption only, so the package the tracer gets is the same before and after.
    const v2 = { ...demoScenario(), version: 2, encapsulant: { ...demoScenario().encapsulant, medium: { kind: 'index', n: 1.53, k: 0.002 } } };
    const r = readScenario(v2);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.migratedFrom).toBe(2);
    expect(r.scenario.encapsulant.medium).toEqual({ kind: 'index', n: 1.53 });
    expect(r.scenario.encapsulant.absorptionPerMm).toBe(demoScenario().encapsulant.absorptionPerMm);
    const before = { ...v2.encapsulant, n: 1.53 };
    expect(toTracePackage(r.scenario).encapsulant).toEqual({ shape: before.shape, radiusMm: before.radiusMm, heightMm: before.heightMm, n: 1.53, absorptionPerMm: before.absorptionPerMm });
    expect(toTracePackage(r.scenario).chip).toEqual(toTracePackage(demoScenario()).chip);
  });

  it('reads a version-2 scenario with a library encapsulant unchanged apart from its version', () => {
    const r = readScenario({ ...demoScenario(), version: 2 });
    expect(r.ok && r.scenario).toEqual(demoScenario());
  });

  it("the encapsulant's typed index takes n alone now; its k is derived from the absorption, k = αλ/4π (Born & Wolf §14.1)", () => {
    const s = { ...demoScenario(), encapsulant: { ...demoScenario().encapsulant, medium: { kind: 'index', n: 1.5, k: 0 } } };
    expect(readScenario(s).ok).toBe(false);
    const typed = { ...demoScenario(), encapsulant: { ...demoScenario().encapsulant, medium: { kind: 'index' as const, n: 1.5 }, absorptionPerMm: 0.5 } };
    const r = readScenario(typed);
    expect(r.ok).toBe(true);
    // α = 0.5 /mm at 450 nm: k = 0.5 · 450e-6 / 4π = 1.7905e-5 (computed)
    if (r.ok) expect(resolveScenario(r.scenario).encapsulant.k).toBeCloseTo(1.7905e-5, 9);
  });

  it('reads a version-3 scenario as the flat body, specular base and flat-topped single-box chip: the traced package is the same', () => {
    const { baseFinish: _f, body: _b, ...v3 } = demoScenario();
    const { topTexture: _t, ...chip } = v3.chip;
    const r = readScenario({ ...v3, version: 3, chip, encapsulant: { ...v3.encapsulant, shape: 'cylinder', heightMm: 1 } });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.migratedFrom).toBe(3);
    expect(r.scenario.body).toEqual({ kind: 'flat' });
    expect(r.scenario.baseFinish).toBe('specular');
    expect(r.scenario.chip.topTexture).toBe(0);
    // The version-3 package had exactly these fields: no body, finish, layers, mirror or texture
    const pkg = toTracePackage(r.scenario);
    expect(Object.keys(pkg).sort()).toEqual(['base', 'chip', 'encapsulant', 'outsideN', 'polarization']);
    expect(Object.keys(pkg.chip).sort()).toEqual(['absorptionPerMm', 'emission', 'emitterZMm', 'heightMm', 'lengthMm', 'n', 'widthMm']);
    expect(pkg.encapsulant.shape).toBe('cylinder');
  });

  it('refuses non-objects and odd versions', () => {
    for (const bad of [null, 3, 'x', [], { version: -1 }, { version: 1.5 }, { version: '1' }]) {
      expect(migrateScenario(bad).ok).toBe(false);
    }
  });
});
