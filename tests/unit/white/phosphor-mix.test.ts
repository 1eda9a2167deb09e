import { describe, expect, it } from 'vitest';
import { demoScenario } from '../../../src/lib/scenario/defaults';
import { toTracePackage } from '../../../src/lib/scenario';
import { coefficientsFromParticles, SILICONE_DENSITY_G_PER_CM3 } from '../../../src/lib/trace/package-phosphor';
import { validateTracePackage } from '../../../src/lib/trace/package-spec';
import { libraryPhosphor, traceWhite, withPhosphor } from '../../../src/lib/trace/white-light';
import { libraryOptics } from '../../../src/lib/white/particle-optics';
import { mixtureParts, withMixture } from '../../../src/lib/white/phosphor-mix';

const pkg = toTracePackage(demoScenario());
const yellowP = libraryPhosphor('garnet-yellow');
const yellow = libraryOptics(yellowP);
const red = libraryOptics(libraryPhosphor('nitride-red'));
const chip: [number, number][] = [[450, 1]];

describe('phosphor mixtures', () => {
  it('a mixture in a conformal layer: the layer medium holds both kinds, every ray ends in one bin, no geometry error', () => {
    const mixed = withMixture(pkg, [{ optics: yellow, weightPercent: 10, diameterUm: 12 }, { optics: red, weightPercent: 2, diameterUm: 12 }], chip, { region: 'conformal', thicknessMm: 0.1 });
    expect(mixed.phosphor?.region).toBe('conformal');
    expect(mixed.phosphor?.mixedWith).toHaveLength(1);
    validateTracePackage(mixed);
    const { tally } = traceWhite(mixed, 4000, 3);
    expect(tally.geometryErrors).toBe(0);
    expect(Object.values(tally.parts).reduce((a, b) => a + b, 0)).toBe(4000);
    expect(tally.parts['phosphor:conformal phosphor']).toBeGreaterThan(0);
  });

  it('one powder alone gives exactly the one-phosphor coefficients (the same Mie cloud)', () => {
    const [part] = mixtureParts([{ optics: yellow, weightPercent: 10, diameterUm: 12 }], 1.41);
    const single = coefficientsFromParticles({ phosphor: yellowP, weightFraction: 0.1, size: { kind: 'single', diameterUm: 12 }, hostN: 1.41, hostDensityGPerCm3: SILICONE_DENSITY_G_PER_CM3 });
    expect(part.coefficients).toEqual(single);
  });

  it('each kind scales with its volume fraction in the whole mixture, φi = (wi/ρi)/(Σ wj/ρj + wh/ρh) (mass balance, common practice)', () => {
    const [y1] = mixtureParts([{ optics: yellow, weightPercent: 10, diameterUm: 12 }], 1.41);
    const [y2, r2] = mixtureParts([{ optics: yellow, weightPercent: 10, diameterUm: 12 }, { optics: red, weightPercent: 4, diameterUm: 12 }], 1.41);
    // By hand: yellow 0.10/4.55, red 0.04/3.26, host 0.86/1.1 against yellow alone (host 0.90/1.1)
    const phiMix = 0.1 / 4.55 / (0.1 / 4.55 + 0.04 / 3.26 + 0.86 / 1.1);
    const phiAlone = 0.1 / 4.55 / (0.1 / 4.55 + 0.9 / 1.1);
    const i = y1.coefficients.findIndex((r) => r[0] === 450);
    expect(y2.coefficients[i][1] / y1.coefficients[i][1]).toBeCloseTo(phiMix / phiAlone, 12);
    expect(y2.coefficients[i][3]).toBe(y1.coefficients[i][3]);
    expect(r2.quantumYield).toBe(red.quantumYield);
  });

  it('refuses loads above 60 wt% together, naming the total', () => {
    expect(() => mixtureParts([{ optics: yellow, weightPercent: 40, diameterUm: 12 }, { optics: red, weightPercent: 25, diameterUm: 12 }], 1.41)).toThrow(/at most 60 wt% \(got 65.00 wt%\)/);
  });

  it('a second kind at zero load traces bit for bit like the one phosphor (the mixture draws no extra random number)', () => {
    const one = traceWhite(withPhosphor(pkg, { kind: 'particles', phosphor: yellowP, weightPercent: 10, diameterUm: 12 }, chip), 4000, 9);
    const mix = traceWhite(withMixture(pkg, [{ optics: yellow, weightPercent: 10, diameterUm: 12 }, { optics: red, weightPercent: 0, diameterUm: 12 }], chip), 4000, 9);
    expect(mix.tally.parts).toEqual(one.tally.parts);
    expect(mix.summary.color).toEqual(one.summary.color);
  });

  it('one powder split into two equal kinds traces like the whole (independent scatterers add)', () => {
    const whole = traceWhite(withMixture(pkg, [{ optics: yellow, weightPercent: 10, diameterUm: 12 }], chip), 4000, 4).summary;
    const halves = traceWhite(withMixture(pkg, [{ optics: yellow, weightPercent: 5, diameterUm: 12 }, { optics: yellow, weightPercent: 5, diameterUm: 12 }], chip), 4000, 4).summary;
    expect(halves.photonEfficiency).toBeCloseTo(whole.photonEfficiency, 2);
    expect(halves.color!.x).toBeCloseTo(whole.color!.x, 2);
  });

  it('a red nitride beside a yellow garnet lowers CCT and Duv, and re-absorbs converted light (common practice for warm-white mixes)', () => {
    const rays = 8000;
    const y = traceWhite(withMixture(pkg, [{ optics: yellow, weightPercent: 10, diameterUm: 12 }, { optics: red, weightPercent: 0, diameterUm: 12 }], chip), rays, 21).summary;
    const yr = traceWhite(withMixture(pkg, [{ optics: yellow, weightPercent: 10, diameterUm: 12 }, { optics: red, weightPercent: 1, diameterUm: 12 }], chip), rays, 21).summary;
    const k = 3; // k·σ with σ of the difference from both traces' batch σ
    const sd = (a: number | null, b: number | null) => Math.hypot(a ?? 0, b ?? 0);
    expect(yr.color!.cctK!).toBeLessThan(y.color!.cctK! - k * sd(y.color!.sigma.cctK, yr.color!.sigma.cctK));
    expect(yr.color!.duv!).toBeLessThan(y.color!.duv! - k * sd(y.color!.sigma.duv, yr.color!.sigma.duv));
    expect(yr.conversionsPerRay).toBeGreaterThan(y.conversionsPerRay);
    expect(() => validateTracePackage(withMixture(pkg, [{ optics: yellow, weightPercent: 10, diameterUm: 12 }, { optics: red, weightPercent: 1, diameterUm: 12 }], chip))).not.toThrow();
  });
});
