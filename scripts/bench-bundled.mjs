/**
 * The tracer as the browser runs it: bundles the tracer with Rolldown, as Vite builds the page (one file, imports resolved to
 * plain bindings, as Vite does for the page's worker) and times it on one thread and on all cores,
 * side by side with the same bundle of an older commit's tracer, in one process, the order alternating
 * round by round (ABBA), so the machine's load falls on both alike. Prints rays/s, events/s, rays per CPU second (one thread:
 * steadier than the wall clock on a shared machine) and young-generation garbage collections per
 * million rays (nothing allocated per ray gives about one: the per-chunk scene compile).
 *
 *   node scripts/bench-bundled.mjs                          # 1,000,000 rays per run, 3 rounds, vs 39aaaae
 *   node scripts/bench-bundled.mjs --rays 500000 --rounds 5 --old <commit>|none
 *   node scripts/bench-bundled.mjs --only dome --one-thread  # packages whose name holds 'dome', one thread
 *
 * The older tracer is taken from git (`git archive <commit> src/lib`, with that commit's data/ and this tree's
 * node_modules for a newer commit's imports); the flip chip and the cup rows are timed for the current tracer
 * alone (the default 39aaaae does not know them).
 */
import { execSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { availableParallelism, cpus, tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { PerformanceObserver, constants as perfConstants } from 'node:perf_hooks';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { Worker, isMainThread, parentPort, workerData } from 'node:worker_threads';
import { BUNDLER, bundleTracer } from './bundle-tracer.mjs';

const CHUNK_RAYS = 16384;

/** The packages timed (those of scripts/bench.ts but the phosphor cup); `old` marks those the older tracer knows. */
function packages(flipChip) {
  const chip = { widthMm: 1, lengthMm: 1, heightMm: 0.15, n: 2.45, absorptionPerMm: 0.5, emitterZMm: 0.1, emission: 'plane' };
  const dome = { shape: 'dome', radiusMm: 2.5, heightMm: 2.5, n: 1.41, absorptionPerMm: 0.001 };
  const base = { kind: 'reflectance', reflectance: 0.92 };
  return [
    {
      name: 'bare chip',
      old: true,
      pkg: { chip, base, encapsulant: { shape: 'none', radiusMm: 1, heightMm: 1, n: 1, absorptionPerMm: 0 }, outsideN: 1, polarization: 'average' }
    },
    { name: 'hemispherical dome', old: true, pkg: { chip, base, encapsulant: dome, outsideN: 1, polarization: 'average' } },
    {
      name: 'cylinder',
      old: true,
      pkg: { chip, base, encapsulant: { shape: 'cylinder', radiusMm: 2.5, heightMm: 1, n: 1.41, absorptionPerMm: 0.001 }, outsideN: 1, polarization: 'average' }
    },
    { name: 'dome, pol. tracked', old: true, pkg: { chip, base, encapsulant: dome, outsideN: 1, polarization: 'track' } },
    { name: 'flip chip, dome', old: false, pkg: { chip: flipChip, base, encapsulant: dome, outsideN: 1, polarization: 'average' } },
    {
      name: 'mid-power cup',
      old: false,
      pkg: {
        chip: flipChip,
        base: { kind: 'reflectance', reflectance: 0.95 },
        encapsulant: { shape: 'none', radiusMm: 1.5, heightMm: 1, n: 1.41, absorptionPerMm: 0.001 },
        outsideN: 1,
        polarization: 'average',
        body: { kind: 'cup', floorRadiusMm: 1.3, topRadiusMm: 1.5, depthMm: 0.8, wallFinish: 'diffuse', wallReflectance: 0.93, fill: 'flat' }
      }
    }
  ];
}

/**
 * Traces chunks [first, first + count) of a run and returns [launched, escaped, events]: as the tracer's
 * own runs do, on one scene compiled for the run where the bundle has the scene model, else package by chunk.
 */
function traceChunks(lib, pkg, first, count, rays, seed) {
  const tally = lib.createTally();
  const scene = lib.compileScene ? lib.compileScene(lib.packageScene(pkg)) : null;
  for (let i = first; i < first + count; i++) {
    const n = Math.min(CHUNK_RAYS, rays - i * CHUNK_RAYS);
    if (scene) lib.traceSceneChunk(scene, i, n, seed, tally);
    else lib.traceChunk(pkg, i, n, seed, tally);
  }
  return [tally.launched, tally.escaped, tally.events];
}

function readArgs(argv) {
  const get = (name, fallback) => {
    const i = argv.indexOf(name);
    return i < 0 ? fallback : argv[i + 1];
  };
  const rays = Number(get('--rays', 1_000_000));
  const rounds = Number(get('--rounds', 3));
  const old = get('--old', '39aaaae');
  const only = get('--only', '');
  const oneThread = argv.includes('--one-thread');
  if (!Number.isInteger(rays) || rays < CHUNK_RAYS || rays > 1e8) throw new RangeError('--rays must be an integer in [16384, 1e8]');
  if (!Number.isInteger(rounds) || rounds < 1 || rounds > 50) throw new RangeError('--rounds must be an integer in [1, 50]');
  if (!/^(none|[0-9a-f]{4,40})$/.test(old)) throw new RangeError('--old must be a commit hash or none');
  return { rays, rounds, old, only, oneThread };
}

/** Bundles the tracer of the tree at `root` into dir/name.mjs (bundle-tracer.mjs); returns its file URL. */
async function bundle(root, dir, name) {
  const outfile = join(dir, `${name}.mjs`);
  await bundleTracer(root, outfile);
  return pathToFileURL(outfile).href;
}

/** Young-generation collections (scavenges) seen so far in this thread. */
let scavenges = 0;
new PerformanceObserver((list) => {
  for (const entry of list.getEntries()) if (entry.detail?.kind === perfConstants.NODE_PERFORMANCE_GC_MINOR) scavenges++;
}).observe({ entryTypes: ['gc'] });

/** A warmed pool of worker threads running one bundle; run() splits the chunk plan between them. */
function startPool(bundleUrl, threads) {
  const workers = Array.from({ length: threads }, () => new Worker(fileURLToPath(import.meta.url), { workerData: { bundle: bundleUrl } }));
  const ask = (w, msg) =>
    new Promise((res, rej) => {
      w.once('error', rej);
      w.once('message', (reply) => {
        w.off('error', rej);
        res(reply);
      });
      w.postMessage(msg);
    });
  return {
    async run(pkg, rays, seed) {
      const chunks = Math.ceil(rays / CHUNK_RAYS);
      const per = Math.ceil(chunks / threads);
      const parts = await Promise.all(
        workers.map((w, k) => ask(w, { pkg, first: k * per, count: Math.max(0, Math.min(per, chunks - k * per)), rays, seed }))
      );
      return parts.reduce((a, p) => [a[0] + p[0], a[1] + p[1], a[2] + p[2]], [0, 0, 0]);
    },
    close: () => Promise.all(workers.map((w) => w.terminate()))
  };
}

async function timeOne(run, rays) {
  const gc0 = scavenges;
  const cpu0 = process.cpuUsage();
  const t0 = performance.now();
  const [launched, escaped, events] = await run();
  const seconds = (performance.now() - t0) / 1000;
  const cpu = process.cpuUsage(cpu0);
  // let the observer see the collections of this run
  await new Promise((r) => setTimeout(r, 0));
  if (launched !== rays) throw new Error(`launched ${launched} of ${rays} rays`);
  return { raysPerS: rays / seconds, raysPerCpuS: (rays * 1e6) / (cpu.user + cpu.system), eventsPerS: events / seconds, extraction: escaped / rays, gcPerMrays: ((scavenges - gc0) * 1e6) / rays };
}

const median = (xs) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const m = (x) => (x / 1e6).toFixed(2).padStart(7);

async function main() {
  const { rays, rounds, old, only, oneThread } = readArgs(process.argv.slice(2));
  const repo = resolve(fileURLToPath(import.meta.url), '../..');
  const dir = mkdtempSync(join(tmpdir(), 'outcouple-bench-'));
  try {
    const builds = [{ label: 'current', url: await bundle(repo, dir, 'current') }];
    if (old !== 'none') {
      const oldRoot = join(dir, 'old');
      execSync(`mkdir -p "${oldRoot}" && git -C "${repo}" archive ${old} src/lib | tar -x -C "${oldRoot}"`);
      // a newer commit's tracer also imports its data files and packages
      execSync(`(git -C "${repo}" archive ${old} data 2>/dev/null | tar -x -C "${oldRoot}") || true; ln -s "${join(repo, 'node_modules')}" "${join(oldRoot, 'node_modules')}"`);
      builds.push({ label: old, url: await bundle(oldRoot, dir, 'old') });
    }
    const libs = await Promise.all(builds.map((b) => import(b.url)));
    const current = libs[0];
    const threads = availableParallelism();
    console.log(`Bundled tracer (${BUNDLER}): ${rays.toLocaleString('en')} rays per run, ${rounds} rounds, ${threads} threads`);
    console.log(`CPU: ${cpus()[0]?.model ?? 'unknown'}; Node ${process.version}; medians over rounds\n`);
    console.log('package              tracer   threads  Mrays/s  Mevents/s  Mrays/CPU-s  scavenges/Mray  extraction');
    const pools = builds.map((b) => startPool(b.url, threads));
    for (const { name, old: oldKnows, pkg } of packages(current.flipChipOnSapphire())) {
      if (!name.includes(only)) continue;
      const which = builds.map((b, i) => i).filter((i) => i === 0 || oldKnows);
      // Warm-up: let the engine optimise each bundle's loop, here and in the threads
      for (const i of which) {
        traceChunks(libs[i], pkg, 0, 12, 12 * CHUNK_RAYS, 99);
        if (!oneThread) await pools[i].run(pkg, 8 * threads * CHUNK_RAYS, 99);
      }
      for (const t of [1, threads]) {
        const results = which.map(() => []);
        for (let r = 0; r < rounds; r++) {
          // Order alternating round by round (ABBA): whichever runs first in a round gains a few per cent
          const order = r % 2 === 0 ? [...which.entries()] : [...which.entries()].reverse();
          for (const [k, i] of order) {
            const chunks = Math.ceil(rays / CHUNK_RAYS);
            const run = t === 1 ? async () => traceChunks(libs[i], pkg, 0, chunks, rays, 1) : () => pools[i].run(pkg, rays, 1);
            results[k].push(await timeOne(run, rays));
          }
        }
        for (const [k, i] of which.entries()) {
          const rs = results[k];
          const gc = t === 1 ? median(rs.map((x) => x.gcPerMrays)).toFixed(1).padStart(14) : '             -';
          const perCpu = t === 1 ? m(median(rs.map((x) => x.raysPerCpuS))).padStart(11) : '          -';
          console.log(
            `${name.padEnd(20)} ${builds[i].label.padEnd(8)} ${String(t).padStart(7)}  ${m(median(rs.map((x) => x.raysPerS)))}  ` +
              `${m(median(rs.map((x) => x.eventsPerS))).padStart(9)}  ${perCpu}  ${gc}  ${rs[0].extraction.toFixed(4)}`
          );
        }
        if (which.length > 1) {
          const ratio = (key) => (median(results[0].map((x) => x[key])) / median(results[1].map((x) => x[key]))).toFixed(2);
          const cpuRatio = t === 1 ? `, per CPU second ${ratio('raysPerCpuS')}×` : '';
          console.log(`${''.padEnd(20)} current/${builds[1].label}: wall clock ${ratio('raysPerS')}×${cpuRatio}`);
        }
        if (t === threads || oneThread) break;
      }
    }
    await Promise.all(pools.map((p) => p.close()));
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

if (!isMainThread) {
  const lib = await import(workerData.bundle);
  parentPort.on('message', ({ pkg, first, count, rays, seed }) => {
    parentPort.postMessage(traceChunks(lib, pkg, first, count, rays, seed));
  });
} else {
  await main();
}
