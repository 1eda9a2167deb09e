/**
 * Speed of a white package: the bench's mid-power cup with a yellow garnet dispersed in its fill at
 * 16.8 wt% (≈ 5000 K), and the same cup from the scenario preset (its media's dispersion included):
 * rays/s and events/s on one thread and on all cores, then the rays a colour needs for σ(CCT) ≤ 20 K
 * (σ from the trace's 8 batch means, averaged over seeds) and the time that takes at the measured rates.
 *
 *   npx tsx scripts/white-speed.ts
 */
import { cpus } from 'node:os';
import { flipChipOnSapphire } from '../src/lib/trace/chip-presets';
import { createNodeTracePool, defaultThreads } from '../src/lib/trace/node/node-pool';
import type { TracePackage } from '../src/lib/trace/package-spec';
import { phosphorSummary } from '../src/lib/trace/phosphor-summary';
import { traceSync } from '../src/lib/trace/trace';
import { libraryPhosphor, withPhosphor } from '../src/lib/trace/white-light';
import { packagePresets } from '../src/lib/scenario/presets';
import { toWhitePackage } from '../src/lib/scenario';

const yellow = { kind: 'particles' as const, phosphor: libraryPhosphor('garnet-yellow'), weightPercent: 16.8, diameterUm: 12 };
const benchCup: TracePackage = withPhosphor(
  {
    chip: flipChipOnSapphire(),
    base: { kind: 'reflectance', reflectance: 0.95 },
    encapsulant: { shape: 'none', radiusMm: 1.5, heightMm: 1, n: 1.41, absorptionPerMm: 0.001 },
    outsideN: 1,
    polarization: 'average',
    body: { kind: 'cup', floorRadiusMm: 1.3, topRadiusMm: 1.5, depthMm: 0.8, wallFinish: 'diffuse', wallReflectance: 0.93, fill: 'flat' }
  },
  yellow,
  [[450, 1]]
);
const preset = packagePresets().find((p) => p.id === 'mid-power-cup')!.scenario;
const presetCup = toWhitePackage(preset, undefined, yellow);

async function main(): Promise<void> {
  const threads = defaultThreads();
  console.log(`${cpus()[0]?.model ?? 'cpu'}; ${threads} threads; Node ${process.version}`);
  const pool = createNodeTracePool(threads);
  const rates: Record<string, [number, number]> = {};
  for (const [name, pkg] of [['bench cup, phosphor 5000 K', benchCup], ['preset cup + dispersion', presetCup]] as const) {
    traceSync(pkg, { rays: 50_000, seed: 99, maxEvents: 10000 });
    await pool.run(pkg, { rays: 50_000 * threads, seed: 99, maxEvents: 10000 });
    const rays = 300_000;
    const cpu0 = process.cpuUsage();
    let t0 = performance.now();
    const tally = traceSync(pkg, { rays, seed: 1, maxEvents: 10000 });
    const one = (performance.now() - t0) / 1000;
    const cpu = process.cpuUsage(cpu0);
    t0 = performance.now();
    await pool.run(pkg, { rays, seed: 1, maxEvents: 10000 });
    const all = (performance.now() - t0) / 1000;
    const w = phosphorSummary(tally)!;
    rates[name] = [rays / one, rays / all];
    console.log(
      `${name}: 1 thread ${(rays / one / 1e3).toFixed(0)} krays/s (${((tally.events / one) / 1e6).toFixed(2)} Mevents/s, ` +
        `${(rays / ((cpu.user + cpu.system) / 1e6) / 1e3).toFixed(0)} krays/CPU-s), ${threads} threads ${(rays / all / 1e3).toFixed(0)} krays/s; ` +
        `${(tally.events / rays).toFixed(1)} events/ray, ${w.scatterEventsPerRay.toFixed(1)} scatter events/ray, CCT ${w.color?.cctK?.toFixed(0)} K`
    );
  }
  await pool.close();
  // σ(CCT) against rays: the batch σ, averaged over seeds (it is itself noisy with 8 batches)
  console.log('\nrays     mean σ(CCT) over the seeds');
  let needed = 0;
  for (const rays of [10000, 40000, 160000, 320000]) {
    const sigmas: number[] = [];
    for (let seed = 1; seed <= (rays > 100000 ? 3 : 6); seed++) sigmas.push(phosphorSummary(traceSync(benchCup, { rays, seed, maxEvents: 10000 }))!.color!.sigma.cctK!);
    const mean = sigmas.reduce((a, b) => a + b, 0) / sigmas.length;
    console.log(`${String(rays).padEnd(8)} ${mean.toFixed(1)} K`);
    if (!needed && mean <= 20) needed = rays;
    // σ ∝ 1/√rays: the rays for 20 K from this row
    console.log(`         → about ${Math.round((rays * (mean / 20) ** 2) / 1000)}k rays for 20 K`);
  }
  if (needed) {
    const [one, all] = rates['bench cup, phosphor 5000 K'];
    console.log(`\nσ(CCT) ≤ 20 K at about ${needed} rays: ${(needed / one).toFixed(2)} s on one thread, ${(needed / all).toFixed(2)} s on ${threads} threads (Node; add the page's overhead)`);
  }
}

main();
