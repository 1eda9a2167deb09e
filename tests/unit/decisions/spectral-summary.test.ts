import { describe, it, expect } from 'vitest';
import { spectralSummary } from '../../../src/lib/decisions/spectral-summary';
import { findMaterial, indexAt } from '../../../src/lib/materials/index';
import { domeEstimate, escapeCone } from '../../../src/lib/optics/index';
import { gaussianSpectrum, weightedAverage } from '../../../src/lib/photometry/index';
import { scenarioSpectrum } from '../../../src/lib/photometry/scenario-spectrum';
import { demoScenario } from '../../../src/lib/scenario/defaults';
import type { EmissionSpec, Scenario } from '../../../src/lib/scenario/schema';
import { assertInDelta, EPS } from '../../support/assert';

/** The demo package (GaN chip, methyl-silicone dome of radius 2.5 mm, air) with another emission. */
function withEmission(emission: EmissionSpec): Scenario {
  const s = demoScenario();
  s.emission = emission;
  return s;
}

const gan = findMaterial('gan')!;
const silicone = findMaterial('silicone-methyl')!;
const air = findMaterial('air')!;

/** The three figures computed directly from the optics core at one wavelength (computed). */
function direct(nm: number) {
  const nChip = indexAt(gan, nm).n;
  const nEnc = indexAt(silicone, nm).n;
  const nOut = indexAt(air, nm).n;
  const d = domeEstimate({ nChip, nEnc, nOut, chipWidthMm: 1, chipLengthMm: 1, radiusMm: 2.5 });
  return { bare: d.etaBare, chipToEncapsulant: escapeCone(nChip, nEnc).fresnel, dome: d.etaDome };
}

const KEYS = ['bare', 'chipToEncapsulant', 'dome'] as const;

describe('scenarioSpectrum(emission)', () => {
  it('gives one sample of weight 1 for a single wavelength, and the photometry builders otherwise (computed)', () => {
    const one = scenarioSpectrum({ kind: 'single', wavelengthNm: 450 });
    expect(Array.from(one.wavelengthNm)).toEqual([450]);
    expect(Array.from(one.weight)).toEqual([1]);
    const g = scenarioSpectrum({ kind: 'gaussian', peakNm: 450, fwhmNm: 20 });
    expect(Array.from(g.weight)).toEqual(Array.from(gaussianSpectrum(450, 20).weight));
    const t = scenarioSpectrum({ kind: 'table', rows: [[460, 1], [440, 1], [450, 2]] });
    expect(Array.from(t.wavelengthNm)).toEqual([440, 450, 460]);
  });
});

describe('spectralSummary(scenario)', () => {
  it('returns the single-wavelength values exactly, in both modes, for a single wavelength (computed)', () => {
    const s = spectralSummary(withEmission({ kind: 'single', wavelengthNm: 450 }));
    const at = direct(450);
    expect(s.single).toBe(true);
    expect(s.samples).toBe(1);
    for (const k of KEYS) {
      // exact: one sample of weight 1 has share exactly 1, and the same indices go into the same formula
      expect(s[k].atPeak).toBe(at[k]);
      expect(s[k].radiometric).toBe(at[k]);
      expect(s[k].luminous).toBe(at[k]);
    }
    expect(s.warnings).toEqual([]);
  });

  it('a one-row table is a single wavelength too (computed)', () => {
    const s = spectralSummary(withEmission({ kind: 'table', rows: [[530, 3]] }));
    const at = direct(530);
    expect(s.single).toBe(true);
    for (const k of KEYS) expect(s[k].luminous).toBe(at[k]);
  });

  it('luminous efficacy of monochromatic radiation is Km·V(λ) (published: CIE 015 / ISO 23539 V(λ); BIPM SI brochure Km = 683 lm/W)', () => {
    // V(555) = 1.000, V(450) = 0.038 (CIE 1924 photopic V(λ), published in CIE 015 / ISO 23539). Tolerance: half a unit
    // in the last published digit of V, times Km (683 × 0.0005 = 0.34 lm/W).
    assertInDelta(spectralSummary(withEmission({ kind: 'single', wavelengthNm: 555 })).luminousEfficacyLmPerW, 683, 0.34);
    assertInDelta(spectralSummary(withEmission({ kind: 'single', wavelengthNm: 450 })).luminousEfficacyLmPerW, 683 * 0.038, 0.34);
  });

  it('a narrow Gaussian (FWHM 0.5 nm) at 450 nm agrees with the single-wavelength result within 1e-4 (computed)', () => {
    // Over ±1.5 nm the GaN index moves by ~1e-3 and the figures by ~1e-6; 1e-4 is the brief's bound.
    const s = spectralSummary(withEmission({ kind: 'gaussian', peakNm: 450, fwhmNm: 0.5 }));
    const at = direct(450);
    expect(s.single).toBe(false);
    for (const k of KEYS) {
      expect(s[k].atPeak).toBe(at[k]);
      assertInDelta(s[k].radiometric, at[k], 1e-4, `${k} radiometric`);
      assertInDelta(s[k].luminous!, at[k], 1e-4, `${k} luminous`);
    }
  });

  it('interpolating across a broad band stays within 1e-5 of weighting every sample directly (computed)', () => {
    // 33 nodes over 360–540 nm (step 5.6 nm); linear-interpolation error ≤ h²/8·|f''|. Measured ~2e-6
    // for η_dome; 1e-5 is below the last of the 4 significant digits shown in percent.
    const s = spectralSummary(withEmission({ kind: 'gaussian', peakNm: 450, fwhmNm: 30 }));
    const spectrum = gaussianSpectrum(450, 30);
    for (const k of KEYS) {
      const f = (nm: number) => direct(nm)[k];
      assertInDelta(s[k].radiometric, weightedAverage(spectrum, f, 'radiometric').value, 1e-5, `${k} radiometric`);
      assertInDelta(s[k].luminous!, weightedAverage(spectrum, f, 'luminous').value, 1e-5, `${k} luminous`);
    }
  });

  it('luminous weighting of a broad blue band favours the long-wavelength side, where a GaN chip escapes more (computed; V(λ) published, CIE 1924)', () => {
    // Why: V(λ) rises steeply across a blue band (0.038 at 450 nm, 0.323 at 500 nm: CIE 1924 V(λ), CIE 015), so
    // luminous weights lean to longer λ; GaN has normal dispersion (n falls with λ), so there the
    // escape cone is wider and η_F larger. Hence luminous > radiometric for the bare chip.
    const s = spectralSummary(withEmission({ kind: 'gaussian', peakNm: 450, fwhmNm: 30 }));
    expect(indexAt(gan, 480).n).toBeLessThan(indexAt(gan, 420).n);
    expect(s.bare.luminous!).toBeGreaterThan(s.bare.radiometric);
    expect(s.dome.luminous!).toBeGreaterThan(s.dome.radiometric);
    for (const k of KEYS) {
      for (const v of [s[k].atPeak, s[k].radiometric, s[k].luminous!]) {
        expect(v).toBeGreaterThanOrEqual(0);
        expect(v).toBeLessThanOrEqual(1);
      }
    }
    // the efficacy of the band lies between Km·V at its ends (V rises monotonically over 360–540 nm)
    expect(s.luminousEfficacyLmPerW).toBeGreaterThan(683 * 0.038 * 0.5);
    expect(s.luminousEfficacyLmPerW).toBeLessThan(683 * 0.323);
  });

  it('warns, without throwing, when spectrum samples fall outside a material range (computed)', () => {
    // methyl silicone has data for 400–800 nm; the band reaches down to 360 nm
    const s = spectralSummary(withEmission({ kind: 'gaussian', peakNm: 450, fwhmNm: 30 }));
    expect(s.warnings).toHaveLength(1);
    expect(s.warnings[0]).toMatch(/^Encapsulant: .*400–800 nm/);
    expect(Number.isFinite(s.dome.radiometric)).toBe(true);
  });

  it('gives no luminous figure when V(λ) = 0 over the whole band (computed)', () => {
    // V(λ) is defined (non-zero) over 360–830 nm only (CIE 1924, published); 1500 ± 60 nm is outside
    const s = spectralSummary(withEmission({ kind: 'gaussian', peakNm: 1500, fwhmNm: 20 }));
    expect(s.luminousEfficacyLmPerW).toBe(0);
    for (const k of KEYS) {
      expect(s[k].luminous).toBeNull();
      expect(Number.isFinite(s[k].radiometric)).toBe(true);
    }
  });

  it('throws a RangeError naming the part for a material that is not in the library', () => {
    const s = demoScenario();
    s.chip.medium = { kind: 'material', id: 'no-such-chip' };
    expect(() => spectralSummary(s)).toThrow(RangeError);
    expect(() => spectralSummary(s)).toThrow(/Chip material 'no-such-chip'/);
  });

  it('uses a typed index as typed at every wavelength (computed)', () => {
    const s = demoScenario();
    s.emission = { kind: 'gaussian', peakNm: 450, fwhmNm: 30 };
    s.chip.medium = { kind: 'index', n: 2.5, k: 0 };
    s.encapsulant.medium = { kind: 'index', n: 1.5 };
    const r = spectralSummary(s);
    // escape cone ½∫T sin θ dθ: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5: η_F(2.5 → 1) = 0.03243 (computed); constant indices give the same value in every mode
    assertInDelta(r.bare.atPeak, 0.03243, 5e-6);
    // a sum of 241 shares times one constant: rounding ≤ 241 ulp-sized steps, so 256·ε relative
    const tol = 256 * EPS * r.bare.atPeak;
    assertInDelta(r.bare.radiometric, r.bare.atPeak, tol);
    assertInDelta(r.bare.luminous!, r.bare.atPeak, tol);
    expect(r.warnings).toEqual([]);
  });
});
