import { describe, expect, it } from 'vitest';
import {
  colorOfSpectrum, colorSpectrum, cctOhno, daylightSpectrum, parseSpectrumCsv, planckianLocus, spectralLocus, spectralSamples,
  tristimulus, uvFromXy, xyFromUv, xyOf
} from '../../../src/lib/color';
import { assertInDelta } from '../../support/assert';
import { cieFile } from '../../support/cie-files';

describe('colorSpectrum / parseSpectrumCsv', () => {
  it('refuses unsorted, repeated, negative and non-finite rows, naming the row', () => {
    expect(() => colorSpectrum([[400, 1], [400, 1]])).toThrow(/spectrum row 2: wavelength_nm must be above/);
    expect(() => colorSpectrum([[400, 1], [500, -1]])).toThrow(/spectrum row 2: value must be a finite number ≥ 0/);
    expect(() => colorSpectrum([[400, 1], [500, Number.NaN]])).toThrow(/row 2: value/);
    expect(() => colorSpectrum([[50, 1], [500, 1]])).toThrow(/row 1: wavelength_nm must be a number from 100 to 20000/);
    expect(() => colorSpectrum([[400, 0], [500, 0]])).toThrow(/no power between 360 and 830 nm/);
  });

  it('reads CSV with a header, CRLF, comments and blank lines; names file lines in errors', () => {
    const s = parseSpectrumCsv('# comment\r\nwavelength_nm,value\r\n\r\n500,1\r\n510,2\r\n');
    expect(Array.from(s.wavelengthNm)).toEqual([500, 510]);
    expect(() => parseSpectrumCsv('wavelength_nm,value\n500,1\n490,1\n')).toThrow(/^line 3: wavelength_nm must be above/);
    expect(() => parseSpectrumCsv('500,1\n510,\n')).toThrow(/^line 2: value must be a finite number/);
  });
});

describe('spectral integration', () => {
  it('integrates a line narrower than 1 nm through its own samples: its chromaticity is the spectral locus', () => {
    // a 0.1 nm wide triangle at 520.3 nm, between the 1 nm grid nodes
    const s = colorSpectrum([[520.25, 0], [520.3, 1], [520.35, 0]]);
    const c = xyOf(tristimulus(spectralSamples(s)));
    // CIE 1931 observer at 520.3 nm, interpolated linearly from the 1 nm rows (CIE 018:2019)
    const rows = cieFile('CIE_xyz_1931_2deg.csv', 4);
    const [a, b] = [rows.find((r) => r[0] === 520)!, rows.find((r) => r[0] === 521)!];
    const cmf = [1, 2, 3].map((j) => a[j] + 0.3 * (b[j] - a[j]));
    const sum = cmf[0] + cmf[1] + cmf[2];
    assertInDelta(c.x, cmf[0] / sum, 1e-6, 'x');
    assertInDelta(c.y, cmf[1] / sum, 1e-6, 'y');
  });

  it('gives 683 lm/W for light at 555 nm, where V = 1 (definition of Km, BIPM SI brochure)', () => {
    const c = colorOfSpectrum(colorSpectrum([[554.9, 0], [555, 1], [555.1, 0]]));
    assertInDelta(c.lerLmPerW, 683, 0.01);
  });

  it('counts power outside 360–830 nm as radiant watts that give no lumens', () => {
    const visible = colorOfSpectrum(colorSpectrum([[500, 1], [600, 1]]));
    const withIr = colorOfSpectrum(colorSpectrum([[500, 1], [600, 1], [600.0001, 0], [899.9999, 0], [900, 1], [1000, 1]]));
    assertInDelta(withIr.lerLmPerW, visible.lerLmPerW / 2, 1e-3);
  });
});

describe('chromaticity conversions', () => {
  it('xyFromUv inverts uvFromXy', () => {
    for (const [x, y] of [[0.3127, 0.329], [0.44757, 0.40745], [0.2, 0.7]]) {
      const back = xyFromUv(uvFromXy({ x, y }));
      assertInDelta(back.x, x, 1e-14);
      assertInDelta(back.y, y, 1e-14);
    }
  });
});

describe('CIE daylight from S0, S1, S2', () => {
  it('rebuilds the D65 table at 6504 K within 0.05 of 100 at 560 nm (CIE 015:2018 §4.1)', () => {
    // published: CIE 015:2018 — D65 is daylight at 6500·1.4388/1.4380 K; the standard's table rounds M1, M2 to 3 decimals
    const d65 = cieFile('CIE_std_illum_D65.csv', 2);
    const f = daylightSpectrum(6500 * (1.4388 / 1.438));
    const scale = 100 / f(560);
    for (const [nm, value] of d65) if (nm % 5 === 0) assertInDelta(f(nm) * scale, value, 0.05, `${nm} nm`);
  });

  it('refuses a CCT outside 4000–25000 K', () => {
    expect(() => daylightSpectrum(3000)).toThrow(/daylight CCT must be from 4000 to 25000 K/);
  });
});

describe('chromaticity-diagram datasets', () => {
  it('planckianLocus: isotherm ticks are normal to the locus, at Duv ±δ and the tick temperature', () => {
    const locus = planckianLocus({ isothermsK: [2700, 4000, 6500], isothermDuv: 0.01 });
    expect(locus.points).toHaveLength(120);
    expect(locus.points[0].cctK).toBeCloseTo(1000, 6);
    for (const tick of locus.isotherms) {
      const above = cctOhno(uvFromXy(tick.above))!;
      const below = cctOhno(uvFromXy(tick.below))!;
      // a point on the normal through T(locus) has CCT = T to second order in δ (curvature of the locus)
      expect(Math.abs(above.cctK / tick.cctK - 1)).toBeLessThan(2e-3);
      expect(Math.abs(below.cctK / tick.cctK - 1)).toBeLessThan(2e-3);
      assertInDelta(above.duv, 0.01, 2e-5, 'above');
      assertInDelta(below.duv, -0.01, 2e-5, 'below');
    }
    expect(() => planckianLocus({ fromK: 500 })).toThrow(/1000–100000 K/);
  });

  it('spectralLocus: 520 nm lies at the top of the horseshoe, x = 0.0743, y = 0.8338', () => {
    // published: CIE 015:2018 spectral chromaticity coordinates of the 1931 observer at 520 nm (4 decimals)
    const p = spectralLocus(5).find((q) => q.wavelengthNm === 520)!;
    assertInDelta(p.x, 0.0743, 1e-4);
    assertInDelta(p.y, 0.8338, 1e-4);
    expect(() => spectralLocus(0)).toThrow(/stepNm/);
  });
});

describe('edge spectra', () => {
  it('refuses a spectrum that touches 360–830 nm only at a point (no power the observer sees)', () => {
    expect(() => colorSpectrum([[830, 1], [900, 1]])).toThrow(/no power between 360 and 830 nm/);
    expect(() => colorSpectrum([[300, 1], [360, 0]])).toThrow(/no power between 360 and 830 nm/);
    expect(colorOfSpectrum(colorSpectrum([[829, 0], [830, 1], [900, 1]])).x).toBeGreaterThan(0.7);
  });
});
