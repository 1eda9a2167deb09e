import { describe, expect, it } from 'vitest';
import { demoScenario } from '../../../src/lib/scenario/defaults';
import { toTracePackage } from '../../../src/lib/scenario';
import { libraryPhosphor, traceWhite } from '../../../src/lib/trace/white-light';
import { libraryOptics, type ParticleOptics } from '../../../src/lib/white/particle-optics';
import { withMixture } from '../../../src/lib/white/phosphor-mix';
import { loadCost, loadsForTarget, TARGET_SEARCH } from '../../../src/lib/white/target-loads';

const pkg = toTracePackage(demoScenario());
const optics = (id: string) => libraryOptics(libraryPhosphor(id));
const yellow = optics('garnet-yellow');
const green = optics('garnet-green');
const red = optics('nitride-red');

/** Every evaluation traces the same rays with the same seed (common random numbers). */
const evaluator = (kinds: ParticleOptics[], rays: number, seed: number) => async (loads: readonly number[]) =>
  traceWhite(withMixture(pkg, loads.map((w, i) => ({ optics: kinds[i], weightPercent: w, diameterUm: 12 })), [[450, 1]]), rays, seed).summary;

describe('loads for a target colour', () => {
  it('yellow + red: reaches 4000 K on the Planckian locus (Duv 0) within the tolerances, and an independent seed at those loads agrees within k = 3 σ', async () => {
    const rays = 10000;
    const found = await loadsForTarget(evaluator([yellow, red], rays, 7), { cctK: 4000, duv: 0 }, ['yellow', 'red']);
    expect(found.converged).toBe(true);
    const c = found.summary.color!;
    expect(Math.abs(c.cctK! - 4000)).toBeLessThanOrEqual(Math.max(TARGET_SEARCH.toleranceK, c.sigma.cctK!));
    expect(Math.abs(c.duv!)).toBeLessThanOrEqual(Math.max(TARGET_SEARCH.toleranceDuv, c.sigma.duv!));
    expect(found.loads[1]).toBeGreaterThan(0);
    // Common random numbers: the same loads and seed give the very same colour
    const again = await evaluator([yellow, red], rays, 7)(found.loads);
    expect(again.color).toEqual(found.summary.color);
    // A fresh seed: the found loads reach the target within the Monte Carlo noise (k = 3)
    const fresh = (await evaluator([yellow, red], rays, 1234)(found.loads)).color!;
    const k = 3;
    expect(Math.abs(fresh.cctK! - 4000)).toBeLessThan(k * Math.hypot(fresh.sigma.cctK!, c.sigma.cctK!) + TARGET_SEARCH.toleranceK);
    expect(Math.abs(fresh.duv!)).toBeLessThan(k * Math.hypot(fresh.sigma.duv!, c.sigma.duv!) + TARGET_SEARCH.toleranceDuv);
  });

  it('one phosphor: the yellow load for 5000 K; a higher target needs less phosphor (CCT falls with load, common practice)', async () => {
    const ev = evaluator([yellow], 6000, 3);
    const at5000 = await loadsForTarget(ev, { cctK: 5000 }, ['yellow']);
    const at6500 = await loadsForTarget(ev, { cctK: 6500 }, ['yellow']);
    expect(at5000.converged && at6500.converged).toBe(true);
    for (const [f, T] of [[at5000, 5000], [at6500, 6500]] as const) {
      const c = f.summary.color!;
      expect(Math.abs(c.cctK! - T)).toBeLessThanOrEqual(Math.max(TARGET_SEARCH.toleranceK, c.sigma.cctK!));
    }
    expect(at6500.loads[0]).toBeLessThan(at5000.loads[0]);
    expect(at5000.trials.length).toBeLessThanOrEqual(TARGET_SEARCH.maxEvaluations);
  });

  it('names why a target is out of reach: a green garnet alone never meets the 4000 K isotherm near the locus', async () => {
    await expect(loadsForTarget(evaluator([green], 2000, 3), { cctK: 4000 }, ['green garnet'])).rejects.toThrow(/out of reach for green garnet alone: its light does not come within 0.05 of the Planckian locus/);
  });

  it('names why a target is out of reach: a Duv above what the yellow gives alone (red only lowers Duv)', async () => {
    await expect(loadsForTarget(evaluator([yellow, red], 3000, 3), { cctK: 4000, duv: 0.045 }, ['yellow', 'red'])).rejects.toThrow(/target Duv 0.045 is out of reach: yellow alone gives Duv .* already below it/);
  });

  it('the cost of a load: photons and watts lost against the clear package, lumens per watt of chip light = LER × energy efficiency', async () => {
    const s = await evaluator([yellow], 3000, 3)([10]);
    const cost = loadCost(s, 0.5);
    expect(cost.photonCost).toBeCloseTo(1 - s.photonEfficiency / 0.5, 12);
    expect(cost.energyCost).toBeGreaterThan(cost.photonCost); // the Stokes loss adds to the photons lost
    expect(cost.lumensPerWattOfChip).toBeCloseTo(s.color!.lerLmPerW * s.energyEfficiency, 9);
  });
});
