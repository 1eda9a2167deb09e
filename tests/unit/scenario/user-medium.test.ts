import { describe, expect, it } from 'vitest';
import { demoScenario } from '../../../src/lib/scenario/defaults';
import { readScenario } from '../../../src/lib/scenario/read-scenario';
import { resolveScenario, toTracePackage } from '../../../src/lib/scenario/resolve';
import { parseScenario, type Scenario } from '../../../src/lib/scenario/schema';
import { decodeScenarioParam, encodeScenarioParam } from '../../../src/lib/scenario/url';
import { spectralSummary } from '../../../src/lib/decisions/spectral-summary';
import { assertInDelta } from '../../support/assert';

/** A user's own silicone as a Cauchy formula: n = 1.5 + 0.004/λ², λ in µm (n = 1.516 at 500 nm). */
const MY_SILICONE = {
  id: 'my-silicone',
  name: 'My silicone',
  category: 'encapsulant',
  dispersion: { model: 'cauchy', A: 1.5, B: 0.004, C: 0 },
  validRangeNm: { min: 400, max: 800 }
};

function withUserEncapsulant(material: unknown = MY_SILICONE, wavelengthNm = 500): Record<string, unknown> {
  const s = demoScenario() as unknown as Record<string, unknown> & Scenario;
  s.emission = { kind: 'single', wavelengthNm };
  (s.encapsulant as { medium: unknown }).medium = { kind: 'user', material };
  return s;
}

function firstMessage(input: unknown): string {
  const r = parseScenario(input);
  return r.ok ? '' : r.issues[0].message;
}

describe('a scenario carrying a user material', () => {
  it('is valid, and resolves to the formula value with the material marked as the user’s', () => {
    const r = parseScenario(withUserEncapsulant());
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const resolved = resolveScenario(r.scenario);
    // Cauchy n = A + B/λ² at λ = 0.5 µm: 1.5 + 0.004/0.25 (exact arithmetic)
    assertInDelta(resolved.encapsulant.n, 1.516, 1e-12);
    expect(resolved.encapsulant.label).toBe('My silicone (user)');
    expect(resolved.encapsulant.user).toBe(true);
    expect(resolved.encapsulant.materialId).toBe('my-silicone');
    expect(toTracePackage(r.scenario, resolved).encapsulant.n).toBe(resolved.encapsulant.n);
  });

  it('fills the same defaults an imported user-material file gets', () => {
    const r = parseScenario(withUserEncapsulant());
    if (!r.ok) throw new Error('expected a valid scenario');
    const m = r.scenario.encapsulant.medium;
    expect(m.kind === 'user' && m.material.provenance).toBe('user supplied');
    expect(m.kind === 'user' && m.material.aliases).toEqual([]);
  });

  it('travels in a link and comes back exactly', () => {
    const r = parseScenario(withUserEncapsulant());
    if (!r.ok) throw new Error('expected a valid scenario');
    const d = decodeScenarioParam(encodeScenarioParam(r.scenario));
    expect(d.message).toBeNull();
    expect(d.scenario).toEqual(r.scenario);
  });

  it('is weighted across a spectrum with its own dispersion', () => {
    const r = parseScenario({ ...withUserEncapsulant(), emission: { kind: 'gaussian', peakNm: 500, fwhmNm: 20 } });
    if (!r.ok) throw new Error('expected a valid scenario');
    const summary = spectralSummary(r.scenario);
    expect(summary.dome.radiometric).toBeGreaterThan(summary.bare.radiometric);
    expect(summary.warnings.join(" ")).not.toMatch(/Encapsulant/); // 470–530 nm lies inside its 400–800 nm range
  });

  it('rejects a user material whose id belongs to the library, naming the part', () => {
    expect(firstMessage(withUserEncapsulant({ ...MY_SILICONE, id: 'air' }))).toMatch(
      /^Encapsulant user material: id "air" belongs to a library material/
    );
  });

  it('rejects a broken formula with the library’s own message for the field', () => {
    const bad = { ...MY_SILICONE, dispersion: { model: 'cauchy', A: 'x', B: 0, C: 0 } };
    expect(firstMessage(withUserEncapsulant(bad))).toMatch(/^Encapsulant user material: dispersion\.A must be a finite number/);
  });

  it('rejects a user metal where a transparent medium is needed', () => {
    const metal = { ...MY_SILICONE, id: 'my-mirror', category: 'metal', dispersion: { model: 'cauchy', A: 0.5, B: 0, C: 0, k: 4 } };
    expect(firstMessage(withUserEncapsulant(metal))).toBe(
      "Encapsulant material must be a non-metal (dielectric or semiconductor); user material 'my-mirror' is a metal."
    );
  });

  it('is accepted in a scenario marked version 1 (read as version 2)', () => {
    const v1 = { ...withUserEncapsulant(), version: 1 };
    const r = readScenario(v1);
    expect(r.ok && r.migratedFrom).toBe(1);
  });
});

describe('a material with no index at the scenario wavelength', () => {
  // GaAs's formula (the library's Skauli et al. entry) has a pole at 874.6 nm, below its 970 nm data range.
  it('is refused where it is chosen, with the library’s reason, instead of failing later', () => {
    const s = demoScenario() as unknown as Record<string, unknown> & Scenario;
    s.chip.medium = { kind: 'material', id: 'gaas' };
    expect(firstMessage(s)).toMatch(/^Chip material: GaAs \(transparent region\): its dispersion formula has a pole at 874\.6 nm/);
    s.emission = { kind: 'single', wavelengthNm: 1000 };
    expect(parseScenario(s).ok).toBe(true);
  });
});
