import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { trappedBands } from '../../../src/lib/optics/trapped-bands';
import { assertInDelta, EPS } from '../../support/assert';

const deg = (x: number) => (x * 180) / Math.PI;

describe('trappedBands(nIn, layers, nOut)', () => {
  it('splits a bare chip into an escaping cone and a band trapped in the chip by the outside', () => {
    const b = trappedBands(2.5, [], 1);
    expect(b.length).toBe(2);
    expect(b[0]).toMatchObject({ fate: 'escapes', blockedBy: null, trappedIn: null, fromRad: 0 });
    assertInDelta(b[0].toRad, Math.asin(0.4), EPS);
    expect(b[1]).toMatchObject({ fate: 'trapped', blockedBy: 'outside', trappedIn: 'chip', toRad: Math.PI / 2 });
  });

  it('places each band of a 2.45 | 1.8 | 1.4 | air stack where TIR first happens, with a sentence for each', () => {
    const b = trappedBands(2.45, [{ n: 1.8, k: 0, thicknessNm: 1e4 }, { n: 1.4, k: 0, thicknessNm: 1e4 }], 1);
    expect(b.map((x) => x.trappedIn)).toEqual([null, 1, 0, 'chip']);
    expect(b.map((x) => x.blockedBy)).toEqual([null, 'outside', 1, 0]);
    assertInDelta(b[1].fromDeg, deg(Math.asin(1 / 2.45)), 1e-12);
    assertInDelta(b[2].fromDeg, deg(Math.asin(1.4 / 2.45)), 1e-12);
    assertInDelta(b[3].fromDeg, deg(Math.asin(1.8 / 2.45)), 1e-12);
    expect(b[0].text).toBe('Rays from 0.0° to 24.1° in the chip leave into the outside medium (n 1.00).');
    expect(b[1].text).toMatch(/from 24\.1° to 34\.8° .* reach layer 2 \(n 1\.40\) and are totally reflected at its top face/);
    expect(b[2].text).toMatch(/reach layer 1 \(n 1\.80\)/);
    expect(b[3].text).toMatch(/from 47\.3° to 90\.0° .* never leave the chip/);
  });

  it('lets everything out when the outside is denser than the chip', () => {
    const b = trappedBands(1.5, [], 1.6);
    expect(b).toHaveLength(1);
    expect(b[0]).toMatchObject({ fate: 'escapes', fromDeg: 0, toDeg: 90 });
  });

  it('never gets a band edge from a layer denser than the chip', () => {
    const b = trappedBands(2.5, [{ n: 3, k: 0, thicknessNm: 100 }], 1);
    expect(b).toHaveLength(2);
    expect(b[1].trappedIn).toBe(0); // passes the 3.0 layer, refused by air at its top face
  });

  it('always ends the escaping band at asin(nOut/nIn) and covers 0°–90° without gaps, for any stack', () => {
    const layers = fc.array(fc.record({ n: fc.double({ min: 1, max: 4, noNaN: true }), k: fc.constant(0), thicknessNm: fc.constant(100) }), { maxLength: 6 });
    fc.assert(
      fc.property(fc.double({ min: 1.1, max: 4, noNaN: true }), layers, (nIn, ls) => {
        const b = trappedBands(nIn, ls, 1);
        expect(b[0].fate).toBe('escapes');
        assertInDelta(b[0].toRad, Math.asin(1 / nIn), EPS);
        expect(b[0].fromRad).toBe(0);
        expect(b[b.length - 1].toRad).toBe(Math.PI / 2);
        for (let i = 1; i < b.length; i++) {
          expect(b[i].fromRad).toBe(b[i - 1].toRad);
          expect(b[i].fate).toBe('trapped');
          expect(b[i].blockedBy).not.toBe(b[i - 1].blockedBy);
        }
      })
    );
  });

  it('rejects a bad layer with a RangeError', () => {
    expect(() => trappedBands(2.5, [{ n: -1, k: 0, thicknessNm: 1 }], 1)).toThrow(/layers\[0\]\.n/);
  });
});
