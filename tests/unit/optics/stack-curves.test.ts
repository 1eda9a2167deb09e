import { describe, it, expect } from 'vitest';
import { rtVsAngle, rVsWavelength } from '../../../src/lib/optics/stack-curves';
import { thinFilm } from '../../../src/lib/optics/thin-film';
import { incoherentStack } from '../../../src/lib/optics/incoherent-stack';
import { normalReflectance } from '../../../src/lib/optics/fresnel';
import { assertInDelta, EPS } from '../../support/assert';

const film = [{ n: 1.38, k: 0, thicknessNm: 100 }];

describe('rtVsAngle(nIn, layers, nOut, wavelengthNm, mode, points)', () => {
  it('samples 0° to 90° and matches thinFilm point by point', () => {
    const c = rtVsAngle(1.52, film, 1, 550, 'coherent', 7);
    expect(c.x).toEqual([0, 15, 30, 45, 60, 75, 90]);
    for (let i = 0; i < 6; i++) {
      const r = thinFilm(1.52, film, 1, 550, (c.x[i] * Math.PI) / 180);
      expect(c.R[i]).toBe(r.R);
      expect(c.T[i]).toBe(r.T);
      expect(c.A[i]).toBe(r.A);
    }
  });
  it('uses the incoherent model when asked', () => {
    const c = rtVsAngle(2.5, [{ n: 1.5, k: 0, thicknessNm: 1e6 }], 1, 450, 'incoherent', 3);
    expect(c.T[0]).toBe(incoherentStack(2.5, [{ n: 1.5, k: 0, thicknessNm: 1e6 }], 1, 450, 0).T);
  });
  it('is zero in T beyond the critical angle and finite everywhere', () => {
    const c = rtVsAngle(2.5, film, 1, 450, 'coherent', 91);
    c.x.forEach((deg, i) => {
      expect(Number.isFinite(c.R[i])).toBe(true);
      if (deg > 23.6) expect(c.T[i]).toBe(0);
    });
  });
  it('rejects bad points and mode', () => {
    expect(() => rtVsAngle(1.5, film, 1, 550, 'coherent', 1)).toThrow(/points/);
    expect(() => rtVsAngle(1.5, film, 1, 550, 'x' as 'coherent')).toThrow(/mode/);
  });
});

describe('rVsWavelength(nIn, layers, nOut, thetaInDeg, fromNm, toNm, mode, points)', () => {
  it('shows a half-wave layer vanishing at its design wavelength (R = bare there, 1e-14)', () => {
    const c = rVsWavelength(1, [{ n: 2, k: 0, thicknessNm: 125 }], 1.5, 0, 400, 600, 'coherent', 201);
    const i = c.x.indexOf(500);
    expect(i).toBe(100);
    assertInDelta(c.R[i], normalReflectance(1, 0, 1.5, 0), 1e-14);
    // …and a high-index half-wave layer reflects more away from its design wavelength
    expect(c.R[0]).toBeGreaterThan(c.R[i]);
  });
  it('accepts layers as a function of wavelength (dispersion)', () => {
    const c = rVsWavelength(1, (w) => [{ n: 1.3 + w / 1e4, k: 0, thicknessNm: 100 }], 1.5, 10, 400, 500, 'coherent', 3);
    const r = thinFilm(1, [{ n: 1.3 + 450 / 1e4, k: 0, thicknessNm: 100 }], 1.5, 450, (10 * Math.PI) / 180);
    assertInDelta(c.R[1], r.R, 4 * EPS);
  });
  it('rejects a reversed range, an angle above 90° and bad layers from the function', () => {
    expect(() => rVsWavelength(1, film, 1.5, 0, 600, 400)).toThrow(/toNm/);
    expect(() => rVsWavelength(1, film, 1.5, 95, 400, 600)).toThrow(/thetaInDeg/);
    expect(() => rVsWavelength(1, () => [{ n: NaN, k: 0, thicknessNm: 1 }], 1.5, 0, 400, 600)).toThrow(/layers\[0\]\.n/);
  });
});
