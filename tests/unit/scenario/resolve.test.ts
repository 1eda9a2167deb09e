import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO, demoScenario } from '../../../src/lib/scenario/defaults';
import { designWavelengthNm, resolveMedium, resolveScenario, toTracePackage } from '../../../src/lib/scenario/resolve';
import { validateTracePackage } from '../../../src/lib/trace/package-spec';
import { assertInDelta } from '../../support/assert';

describe('designWavelengthNm', () => {
  it('is the single wavelength, the Gaussian peak, or the strongest table row (first on ties)', () => {
    expect(designWavelengthNm({ kind: 'single', wavelengthNm: 455 })).toBe(455);
    expect(designWavelengthNm({ kind: 'gaussian', peakNm: 530, fwhmNm: 30 })).toBe(530);
    expect(designWavelengthNm({ kind: 'table', rows: [[440, 0.2], [450, 1], [460, 1], [470, 0.1]] })).toBe(450);
  });
});

describe('resolveScenario', () => {
  it('GaN at 450 nm: n = 2.4869 from the Barker & Ilegems (Phys. Rev. B 7, 743, 1973) formula', () => {
    // Check value computed from the published formula (Barker & Ilegems, Phys. Rev. B 7, 743 (1973)). Tolerance 5e-4: the
    // library may round its coefficients; sources spread ±0.05, so this only pins the formula used.
    const r = resolveScenario(DEMO_SCENARIO);
    expect(r.wavelengthNm).toBe(450);
    assertInDelta(r.chip.n, 2.4869, 5e-4, 'GaN n(450 nm)');
    expect(r.chip.k).toBe(0);
    expect(r.chip.materialId).toBe('gan');
  });

  it('methyl silicone ≈ 1.41 and air = 1 (common practice; loose tolerance 0.02 for the silicone)', () => {
    const r = resolveScenario(DEMO_SCENARIO);
    assertInDelta(r.encapsulant.n, 1.41, 0.02, 'methyl silicone');
    assertInDelta(r.outside.n, 1, 1e-3, 'air');
    expect(r.base).toEqual({ kind: 'reflectance', reflectance: 0.92 });
    expect(r.warnings).toEqual([]);
  });

  it('a metal base resolves to n + ik with n < 1 (silver near 450 nm, common practice)', () => {
    const s = demoScenario();
    s.base = { kind: 'metal', id: 'ag' };
    const r = resolveScenario(s);
    expect(r.base.kind).toBe('metal');
    if (r.base.kind === 'metal') {
      expect(r.base.n).toBeLessThan(1);
      expect(r.base.k).toBeGreaterThan(1);
    }
  });

  it('a typed index is passed through exactly', () => {
    expect(resolveMedium({ kind: 'index', n: 1.53, k: 0.001 }, 450)).toEqual({
      n: 1.53,
      k: 0.001,
      label: 'typed index',
      materialId: null,
      material: null,
      user: false,
      inRange: true,
      warning: null
    });
  });

  it('an unknown material id throws a RangeError naming the field', () => {
    expect(() => resolveMedium({ kind: 'material', id: 'nope' }, 450, 'Chip')).toThrow(
      new RangeError("Chip material 'nope' is not in the material library.")
    );
  });

  it('collects the library warning when the wavelength is outside a material’s range', () => {
    // Methyl silicone data cover 400–800 nm in the library; 2400 nm is outside, GaN and air are inside.
    const s = demoScenario();
    s.emission = { kind: 'single', wavelengthNm: 2400 };
    const r = resolveScenario(s);
    expect(r.encapsulant.inRange).toBe(false);
    expect(r.chip.inRange).toBe(true);
    expect(r.warnings).toHaveLength(1);
    expect(r.warnings[0]).toMatch(/^Encapsulant: ./);
    // With no encapsulant fitted its warning is not raised.
    s.encapsulant.shape = 'none';
    expect(resolveScenario(s).warnings).toEqual([]);
  });
});

describe('toTracePackage', () => {
  it('gives a package the tracer accepts, for every encapsulant shape and base kind', () => {
    const shapes = ['none', 'dome', 'cylinder'] as const;
    for (const shape of shapes) {
      for (const base of [{ kind: 'reflectance', reflectance: 0.5 } as const, { kind: 'metal', id: 'al' } as const]) {
        const s = demoScenario();
        s.encapsulant.shape = shape;
        s.base = base;
        const p = toTracePackage(s);
        expect(() => validateTracePackage(p)).not.toThrow();
        expect(p.encapsulant.shape).toBe(shape);
        expect(p.base.kind).toBe(base.kind);
      }
    }
  });

  it('copies sizes, absorption and emission, and takes the indices at the design wavelength', () => {
    const p = toTracePackage(DEMO_SCENARIO);
    const r = resolveScenario(DEMO_SCENARIO);
    expect(p.chip).toEqual({ widthMm: 1, lengthMm: 1, heightMm: 0.15, n: r.chip.n, absorptionPerMm: 0.5, emitterZMm: 0.14, emission: 'plane' });
    expect(p.encapsulant).toEqual({ shape: 'dome', radiusMm: 2.5, heightMm: 2.5, n: r.encapsulant.n, absorptionPerMm: 0.001 });
    expect(p.outsideN).toBe(r.outside.n);
    expect(p.polarization).toBe('average');
  });
});
