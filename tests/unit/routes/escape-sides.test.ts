import { describe, expect, it } from 'vitest';
import { demoScenario } from '../../../src/lib/scenario/defaults';
import { resolveScenario } from '../../../src/lib/scenario/resolve';
import { assertScenario } from '../../../src/lib/scenario/schema';
import { sideFromParam, sideToParam, sideValueOr } from '../../../src/routes/escape/sides';

describe('escape-page sides', () => {
  const r = resolveScenario(demoScenario());

  it('a library material with an index at the wavelength is used as is', () => {
    const out = sideValueOr({ kind: 'material', id: 'sapphire-o' }, 'chip', r);
    expect(out.error).toBeNull();
    expect(out.value.label).toBe('Sapphire (ordinary ray)');
  });

  // GaAs's formula (library entry) has a pole at 874.6 nm, between 450 nm and its 970 nm data range.
  it('a library formula with no index at the wavelength gives the fallback part and the reason, never a throw', () => {
    const out = sideValueOr({ kind: 'material', id: 'gaas' }, 'chip', r);
    expect(out.value).toEqual({ n: r.chip.n, label: r.chip.label, warning: r.chip.warning });
    expect(out.error).toMatch(/^GaAs \(transparent region\): its dispersion formula has a pole at 874\.6 nm.*; the scenario chip is used instead\.$/);
  });

  it('the same material is fine at a wavelength beyond the pole', () => {
    const at1000 = resolveScenario(assertScenario({ ...demoScenario(), emission: { kind: 'single', wavelengthNm: 1000 } }));
    expect(sideValueOr({ kind: 'material', id: 'gaas' }, 'chip', at1000).error).toBeNull();
  });

  it('round-trips through the link and ignores what it cannot read', () => {
    for (const side of [{ kind: 'scenario', part: 'outside' }, { kind: 'material', id: 'pmma' }, { kind: 'index', n: 1.7 }] as const) {
      expect(sideFromParam(sideToParam(side), { kind: 'scenario', part: 'chip' })).toEqual(side);
    }
    expect(sideFromParam('mat:ag', { kind: 'scenario', part: 'chip' })).toEqual({ kind: 'scenario', part: 'chip' }); // a metal
    expect(sideFromParam('n:NaN', { kind: 'scenario', part: 'chip' })).toEqual({ kind: 'scenario', part: 'chip' });
  });
});
