/**
 * Benchmark of the Monte Carlo package tracer: three fixed packages (bare chip, hemispherical dome,
 * cylinder), the dome again with polarisation tracked, a flip chip on sapphire under the dome, and a
 * mid-power reflector cup (2.6 mm floor, 3.0 mm top, 0.8 mm deep, white diffuse wall 0.93, silvered
 * floor 0.95, flip chip, flat fill), the same cup with a yellow garnet phosphor dispersed in its fill at
 * 16.8 wt% (12 µm; CCT ≈ 5000 K from a 450 nm chip, found by outcouple's load search), each traced on one thread
 * and on all cores; then the three beam optics (20 mm exit, 12 mm high, PMMA) over a 1 × 1 mm Lambertian source on
 * one thread. Prints rays/s and events/s, rays per CPU
 * second (one thread), and the extraction with its standard error. The all-core runs use a thread pool
 * started and warmed up before timing; its start-up time is printed once.
 *
 *   npm run bench                     # 2,000,000 rays per run
 *   npm run bench -- --rays 500000    # shorter
 *
 * Target: ≥ 2.5 million rays/s on one thread for the dome package. Wall-clock rates depend on what
 * else the machine is doing; the CPU-time rate (rays per CPU second of this process) is steadier.
 */
import { cpus } from 'node:os';
import { flipChipOnSapphire } from '../src/lib/trace/chip-presets';
import { createNodeTracePool, defaultThreads } from '../src/lib/trace/node/node-pool';
import type { TracePackage } from '../src/lib/trace/package-spec';
import { summarize } from '../src/lib/trace/summary';
import { traceSync } from '../src/lib/trace/trace';
import { libraryPhosphor, withPhosphor } from '../src/lib/trace/white-light';
import { prepareOptic, traceOpticScene } from '../src/lib/optic-trace/optic-run';

const TARGET_DOME_RAYS_PER_S = 2.5e6;

function packageWith(encapsulant: TracePackage['encapsulant'], polarization: TracePackage['polarization'] = 'average'): TracePackage {
  return {
    chip: { widthMm: 1, lengthMm: 1, heightMm: 0.15, n: 2.45, absorptionPerMm: 0.5, emitterZMm: 0.1, emission: 'plane' },
    base: { kind: 'reflectance', reflectance: 0.92 },
    encapsulant,
    outsideN: 1,
    polarization
  };
}

const midPowerCup = (): TracePackage => ({
  ...packageWith({ shape: 'none', radiusMm: 1.5, heightMm: 1, n: 1.41, absorptionPerMm: 0.001 }),
  chip: flipChipOnSapphire(),
  base: { kind: 'reflectance', reflectance: 0.95 },
  body: { kind: 'cup', floorRadiusMm: 1.3, topRadiusMm: 1.5, depthMm: 0.8, wallFinish: 'diffuse', wallReflectance: 0.93, fill: 'flat' }
});

const scenarios: { name: string; pkg: TracePackage }[] = [
  { name: 'bare chip', pkg: packageWith({ shape: 'none', radiusMm: 1, heightMm: 1, n: 1, absorptionPerMm: 0 }) },
  {
    name: 'hemispherical dome',
    pkg: packageWith({ shape: 'dome', radiusMm: 2.5, heightMm: 2.5, n: 1.41, absorptionPerMm: 0.001 })
  },
  {
    name: 'cylinder',
    pkg: packageWith({ shape: 'cylinder', radiusMm: 2.5, heightMm: 1, n: 1.41, absorptionPerMm: 0.001 })
  },
  {
    // The same dome with each ray's polarisation state followed through every event (slower, see DEVELOPERS.md)
    name: 'dome, pol. tracked',
    pkg: packageWith({ shape: 'dome', radiusMm: 2.5, heightMm: 2.5, n: 1.41, absorptionPerMm: 0.001 }, 'track')
  },
  {
    name: 'flip chip, dome',
    pkg: { ...packageWith({ shape: 'dome', radiusMm: 2.5, heightMm: 2.5, n: 1.41, absorptionPerMm: 0.001 }), chip: flipChipOnSapphire() }
  },
  { name: 'mid-power cup', pkg: midPowerCup() },
  {
    name: 'cup, phosphor 5000 K',
    pkg: withPhosphor(midPowerCup(), { kind: 'particles', phosphor: libraryPhosphor('garnet-yellow'), weightPercent: 16.8, diameterUm: 12 }, [[450, 1]])
  }
];

function readRays(argv: string[]): number {
  const i = argv.indexOf('--rays');
  if (i < 0) return 2_000_000;
  const rays = Number(argv[i + 1]);
  if (!Number.isInteger(rays) || rays < 16384 || rays > 1e8) {
    throw new RangeError('--rays must be an integer in [16384, 1e8]');
  }
  return rays;
}

function millions(x: number): string {
  return (x / 1e6).toFixed(2).padStart(6);
}

async function main(): Promise<void> {
  const rays = readRays(process.argv.slice(2));
  const threads = defaultThreads();
  console.log(`Outcouple tracer benchmark: ${rays.toLocaleString('en')} rays per run, ${threads} threads available`);
  console.log(`CPU: ${cpus()[0]?.model ?? 'unknown'}; Node ${process.version}\n`);
  console.log(
    'package              threads  Mrays/s  Mevents/s  Mrays/CPU-s  events/ray  extraction ± stderr  ledger ok'
  );
  const s0 = performance.now();
  const pool = createNodeTracePool(threads);
  await pool.run(scenarios[0].pkg, { rays: 1, seed: 1 });
  const startupMs = performance.now() - s0;
  let domeRate = 0;
  for (const { name, pkg } of scenarios) {
    // Warm-up: let the engine optimise the loop before timing, here and in the pool's threads
    traceSync(pkg, { rays: 200_000, seed: 99 });
    await pool.run(pkg, { rays: 100_000 * threads, seed: 99 });
    for (const t of [1, threads]) {
      const cpu0 = process.cpuUsage();
      const t0 = performance.now();
      const tally = t === 1 ? traceSync(pkg, { rays, seed: 1 }) : await pool.run(pkg, { rays, seed: 1 });
      const seconds = (performance.now() - t0) / 1000;
      const cpu = process.cpuUsage(cpu0);
      const cpuSeconds = (cpu.user + cpu.system) / 1e6;
      const s = summarize(tally);
      const c = s.counts;
      const ledgerOk =
        c.escaped + c.chip + c.encapsulant + c.base + c.lost === c.rays && s.parts.reduce((a, p) => a + p.count, 0) === c.rays;
      if (t === 1 && name === 'hemispherical dome') domeRate = rays / seconds;
      console.log(
        `${name.padEnd(20)} ${String(t).padStart(7)}  ${millions(rays / seconds)}  ${millions(tally.events / seconds).padStart(9)}  ` +
          `${t === 1 ? millions(rays / cpuSeconds).padStart(11) : '          -'}  ${s.eventsPerRay.toFixed(2).padStart(10)}  ` +
          `${s.extraction.toFixed(4)} ± ${s.stderr.toFixed(4)}      ${ledgerOk ? 'yes' : 'NO'}`
      );
      if (t === threads) break;
    }
  }
  await pool.close();
  // Beam optics, 20 mm exit, 12 mm high, PMMA, over a 1 × 1 mm Lambertian source, one thread
  console.log('\noptic over a 1 × 1 mm Lambertian source   Mrays/s  Mrays/CPU-s  events/ray  out of the optic');
  for (const type of ['reflector', 'lens', 'tir'] as const) {
    const prepared = prepareOptic({
      design: { type, exitDiameterMm: 20, heightMm: 12, gapMm: 0.2, material: 'pmma' },
      source: { kind: 'lambertian', shape: 'rect', widthMm: 1 },
      rays: rays,
      seed: 1
    });
    traceOpticScene(prepared, 100_000, 99);
    const t0 = performance.now();
    const cpu0 = process.cpuUsage();
    const tally = traceOpticScene(prepared, rays, 1);
    const cpu = process.cpuUsage(cpu0);
    const seconds = (performance.now() - t0) / 1000;
    console.log(
      `optic trace, ${type.padEnd(26)} ${millions(rays / seconds)}  ${millions(rays / ((cpu.user + cpu.system) / 1e6)).padStart(11)}  ${(tally.events / rays).toFixed(2).padStart(10)}  ${(tally.escaped ? Object.entries(tally.parts).filter(([k]) => k.startsWith('escaped:optic exit')).reduce((a, [, v]) => a + v, 0) / rays : 0).toFixed(4)}`
    );
  }
  console.log(`\nThread pool start-up (${threads} threads, not in the timings above): ${startupMs.toFixed(0)} ms`);
  const verdict = domeRate >= TARGET_DOME_RAYS_PER_S ? 'met' : 'NOT met';
  console.log(
    `Dome, one thread: ${millions(domeRate).trim()} million rays/s — target ${TARGET_DOME_RAYS_PER_S / 1e6} million rays/s ${verdict}.`
  );
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
