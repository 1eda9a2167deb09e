import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { stackExtraction, type StackMode } from '../../../src/lib/optics/stack-extraction';
import { escapeCone } from '../../../src/lib/optics/escape-cone';
import { assertInDelta } from '../../support/assert';

describe('stackExtraction(nIn, layers, nOut, wavelengthNm, mode)', () => {
  it.each(['coherent', 'incoherent'] as StackMode[])('with no layers equals the bare escape cone (%s; 1e-11)', (mode) => {
    const r = stackExtraction(2.5, [], 1, 450, mode);
    const e = escapeCone(2.5, 1);
    assertInDelta(r.fresnel, e.fresnel, 1e-11);
    assertInDelta(r.fresnelS, e.fresnelS, 1e-11);
    assertInDelta(r.fresnelP, e.fresnelP, 1e-11);
    expect(r.bare.fresnel).toBe(e.fresnel);
    expect(r.mode).toBe(mode);
  });

  it('is unchanged by a layer with the chip index (1e-10)', () => {
    const r = stackExtraction(2.5, [{ n: 2.5, k: 0, thicknessNm: 3e5 }], 1, 450, 'incoherent');
    assertInDelta(r.fresnel, r.bare.fresnel, 1e-10);
  });

  it('reports the escape cone asin(nOut/nIn) whatever the stack', () => {
    const r = stackExtraction(2.45, [{ n: 1.8, k: 0, thicknessNm: 200 }, { n: 1.2, k: 0, thicknessNm: 300 }], 1, 450);
    expect(r.escapeConeRad).toBe(Math.asin(1 / 2.45));
    expect(r.bands[0].toRad).toBe(r.escapeConeRad);
  });

  it('improves on the bare face with an intermediate thick layer (2.5 | 1.5 | air)', () => {
    const r = stackExtraction(2.5, [{ n: 1.5, k: 0, thicknessNm: 1e6 }], 1, 450, 'incoherent');
    expect(r.gainOverBare).toBeGreaterThan(1);
    assertInDelta(r.gainOverBare, r.fresnel / r.bare.fresnel, 1e-15);
  });

  it('improves on the bare face with a quarter-wave √(nIn nOut) coating (coherent)', () => {
    const n1 = Math.sqrt(2.5);
    const r = stackExtraction(2.5, [{ n: n1, k: 0, thicknessNm: 450 / (4 * n1) }], 1, 450);
    expect(r.fresnel).toBeGreaterThan(r.bare.fresnel);
  });

  // The invariant the page must show: a planar stack only changes losses inside the fixed cone.
  it('never beats the geometric cone (1 − cos θe)/2 into the outside, any stack, either mode', () => {
    const layers = fc.array(
      fc.record({
        n: fc.double({ min: 1, max: 3.5, noNaN: true }),
        k: fc.constant(0),
        thicknessNm: fc.double({ min: 0, max: 800, noNaN: true })
      }),
      { maxLength: 3 }
    );
    fc.assert(
      fc.property(layers, fc.constantFrom<StackMode>('coherent', 'incoherent'), (ls, mode) => {
        const r = stackExtraction(2.45, ls, 1, 450, mode);
        expect(r.fresnel).toBeLessThanOrEqual(escapeCone(2.45, 1).geometric + 1e-10);
      }),
      { numRuns: 30 }
    );
  });

  it('rejects an unknown mode and bad layers', () => {
    expect(() => stackExtraction(2.5, [], 1, 450, 'fast' as StackMode)).toThrow(/mode/);
    expect(() => stackExtraction(2.5, [{ n: 1.5, k: NaN, thicknessNm: 1 }], 1, 450)).toThrow(/layers\[0\]\.k/);
  });
});
