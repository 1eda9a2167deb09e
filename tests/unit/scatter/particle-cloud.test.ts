import { describe, expect, it } from 'vitest';
import { mieEfficiencies, particleCloud, volumeFraction, type ParticleCloudInput } from '../../../src/lib/scatter';
import { expectClose } from '../../support/assert';

const base: ParticleCloudInput = {
  wavelengthNm: 450, particleN: 1.85, particleK: 5e-4, hostN: 1.41, size: { kind: 'single', diameterUm: 12 },
  weightFraction: 0.1, particleDensityGPerCm3: 4.55, hostDensityGPerCm3: 1.1
};

describe('particleCloud', () => {
  it('volumeFraction(w, ρp, ρh) = (w/ρp)/(w/ρp + (1 − w)/ρh): equal densities give φ = w', () => {
    expect(volumeFraction(0.3, 2, 2)).toBeCloseTo(0.3, 14);
    expect(volumeFraction(0, 4.55, 1.1)).toBe(0);
    expect(volumeFraction(0.5, 4, 1)).toBeCloseTo(0.125 / 0.625, 14);
  });

  it('single size: μs = N·Csca with N = φ/(πd³/6), using the relative index and the wavelength in the host', () => {
    const c = particleCloud(base);
    const q = mieEfficiencies(1.85 / 1.41, 5e-4 / 1.41, (Math.PI * 12 * 1.41) / 0.45);
    const phi = volumeFraction(0.1, 4.55, 1.1);
    const dMm = 0.012;
    const n = phi / ((Math.PI * dMm ** 3) / 6);
    expectClose(c.numberPerMm3, n, { rel: 1e-12 });
    expectClose(c.musPerMm, (n * q.qSca * Math.PI * dMm ** 2) / 4, { rel: 1e-12 });
    expectClose(c.muaPerMm, (n * q.qAbs * Math.PI * dMm ** 2) / 4, { rel: 1e-12 });
    expect(c.g).toBe(q.g);
  });

  it('a log-normal distribution with σg = 1 is the single size', () => {
    const single = particleCloud(base);
    const narrow = particleCloud({ ...base, size: { kind: 'lognormal', d50Um: 12, spread: 1 } });
    expect(narrow.musPerMm).toBeCloseTo(single.musPerMm, 12);
    expect(narrow.g).toBeCloseTo(single.g, 12);
  });

  it('a wider distribution holds more small particles per unit volume, so scatters more per gram', () => {
    // by volume, E[1/d] = e^(s²/2)/d50 grows with s = ln σg: more cross-section area per particle volume
    const a = particleCloud({ ...base, size: { kind: 'lognormal', d50Um: 12, spread: 1.2 } });
    const b = particleCloud({ ...base, size: { kind: 'lognormal', d50Um: 12, spread: 1.8 } });
    expect(b.musPerMm).toBeGreaterThan(a.musPerMm);
    expect(b.numberPerMm3).toBeGreaterThan(a.numberPerMm3);
  });

  it('names the field and range of a bad input', () => {
    expect(() => particleCloud({ ...base, hostN: 0.5 })).toThrow(/hostN must be a number from 1 to 2.5/);
    expect(() => particleCloud({ ...base, size: { kind: 'lognormal', d50Um: 12, spread: 3 } })).toThrow(/spread must be a number from 1 to 2/);
    expect(() => particleCloud({ ...base, wavelengthNm: 100 })).toThrow(/wavelengthNm must be a number from 200 to 2500 nm/);
  });
});
