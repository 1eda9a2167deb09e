import { describe, expect, it } from 'vitest';
import { CHIP_EMISSION, emissionAdvice, emissionAt } from '../../../src/lib/scenario/chip-emission';
import { demoScenario } from '../../../src/lib/scenario/defaults';
import { findMaterial } from '../../../src/lib/materials/index';

describe('emissionAdvice(scenario, resolved)', () => {
  it('says nothing for the demo: a GaN chip at 450 nm', () => {
    const s = demoScenario();
    expect(emissionAdvice(s)).toBeNull();
  });

  it('advises a red chip (GaP, which also stands for AlGaInP on its GaP window) left at 450 nm to move to its range (555–700 nm), typical 620 nm', () => {
    const s = demoScenario();
    s.chip.medium = { kind: 'material', id: 'gap' };
    const a = emissionAdvice(s);
    expect(a).toMatchObject({ currentNm: 450, movable: true, range: { minNm: 555, maxNm: 700, typicalNm: 620 } });
    expect(a?.chip).toBe('GaP');
  });

  it('answers for a retired id by the entry that replaced it (a saved "algainp" chip is the GaP entry)', () => {
    const s = demoScenario();
    s.chip.medium = { kind: 'material', id: 'algainp' };
    expect(emissionAdvice(s)).toMatchObject({ chip: 'GaP', range: { typicalNm: 620 } });
  });

  it('says nothing for a typed chip index, and calls a tabulated spectrum not movable', () => {
    const s = demoScenario();
    s.chip.medium = { kind: 'index', n: 3.4, k: 0 };
    expect(emissionAdvice(s)).toBeNull();
    s.chip.medium = { kind: 'material', id: 'algainp' };
    s.emission = { kind: 'table', rows: [[450, 1], [460, 0.5]] };
    expect(emissionAdvice(s)?.movable).toBe(false);
  });

  it('answers for GaAs at 450 nm, where its index formula cannot be evaluated (pole at 874.6 nm)', () => {
    const s = demoScenario();
    s.chip.medium = { kind: 'material', id: 'gaas' };
    expect(emissionAdvice(s)?.range.typicalNm).toBe(940);
  });

  it('names only library materials, each typical wavelength inside its range', () => {
    for (const [id, r] of Object.entries(CHIP_EMISSION)) {
      expect(findMaterial(id), id).toBeTruthy();
      expect(r.typicalNm).toBeGreaterThanOrEqual(r.minNm);
      expect(r.typicalNm).toBeLessThanOrEqual(r.maxNm);
    }
  });
});

describe('emissionAt(emission, nm)', () => {
  it('moves a single wavelength or a Gaussian peak (width kept) and leaves a table alone', () => {
    expect(emissionAt({ kind: 'single', wavelengthNm: 450 }, 620)).toEqual({ kind: 'single', wavelengthNm: 620 });
    expect(emissionAt({ kind: 'gaussian', peakNm: 450, fwhmNm: 20 }, 620)).toEqual({ kind: 'gaussian', peakNm: 620, fwhmNm: 20 });
    const table = { kind: 'table' as const, rows: [[450, 1]] as [number, number][] };
    expect(emissionAt(table, 620)).toBe(table);
  });
});
