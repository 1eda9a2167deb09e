/**
 * The JS/native ratio: times the project's tracer against an independent single-thread C tracer of the
 * same physics (scripts/native/dome-trace.c), on the benchmark's dome package (and, on request, the bare
 * chip and the cylinder), per CPU second of one thread, so other work on a shared machine weighs little.
 * The JS tracer runs as the command line runs it (TypeScript through tsx) and as the page runs it (one
 * Rolldown bundle, as Vite builds it), each for the current tree and for an older commit (`git archive`, default 39aaaae,
 * the special-cased tracer before the scene model). Each round runs every tracer once, the order
 * alternating round by round (ABBA), each round with its own seed. The results double as a physics
 * cross-check between two independent codes: pooled over the rounds, the extraction and the fractions
 * absorbed in the chip and at the base must agree within 4σ (a WARNING is printed when they do not).
 *
 *   npm run bench:native                                       # dome, 2,000,000 rays per run, 4 rounds
 *   npm run bench:native -- --rays 1000000 --rounds 6 --package all --old <commit>|none
 *
 * Needs gcc (compiled with -O2 -march=x86-64 -std=c99 into a temporary directory).
 */
import { execFileSync, execSync, spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { cpus, tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { tsImport } from 'tsx/esm/api';
import { bundleTracer } from './bundle-tracer.mjs';

const AGREEMENT_SIGMA = 4;
const WARM_UP_RAYS = 200_000;

/** The benchmark's packages (scripts/bench.ts), by the C tracer's names. */
function packageFor(name) {
  const chip = { widthMm: 1, lengthMm: 1, heightMm: 0.15, n: 2.45, absorptionPerMm: 0.5, emitterZMm: 0.1, emission: 'plane' };
  const encapsulant = {
    bare: { shape: 'none', radiusMm: 1, heightMm: 1, n: 1, absorptionPerMm: 0 },
    dome: { shape: 'dome', radiusMm: 2.5, heightMm: 2.5, n: 1.41, absorptionPerMm: 0.001 },
    cylinder: { shape: 'cylinder', radiusMm: 2.5, heightMm: 1, n: 1.41, absorptionPerMm: 0.001 }
  }[name];
  return { chip, base: { kind: 'reflectance', reflectance: 0.92 }, encapsulant, outsideN: 1, polarization: 'average' };
}

function readArgs(argv) {
  const get = (flag, fallback) => {
    const i = argv.indexOf(flag);
    return i < 0 ? fallback : argv[i + 1];
  };
  const rays = Number(get('--rays', 2_000_000));
  const rounds = Number(get('--rounds', 4));
  const old = get('--old', '39aaaae');
  const pkg = get('--package', 'dome');
  if (!Number.isInteger(rays) || rays < 16384 || rays > 1e8) throw new RangeError('--rays must be an integer in [16384, 1e8]');
  if (!Number.isInteger(rounds) || rounds < 1 || rounds > 50) throw new RangeError('--rounds must be an integer in [1, 50]');
  if (!/^(none|[0-9a-f]{4,40})$/.test(old)) throw new RangeError('--old must be a commit hash or none');
  if (!['dome', 'bare', 'cylinder', 'all'].includes(pkg)) throw new RangeError('--package must be one of dome, bare, cylinder, all');
  return { rays, rounds, old, packages: pkg === 'all' ? ['bare', 'dome', 'cylinder'] : [pkg] };
}

/** Compiles the C tracer into dir; exits with a one-line error when gcc is missing or fails. */
function compileNative(repo, dir) {
  if (spawnSync('gcc', ['--version']).error) {
    console.error('bench-native: gcc not found on PATH; the JS/native ratio cannot be measured without it (install gcc).');
    process.exit(1);
  }
  const binary = join(dir, 'dome-trace');
  const cc = spawnSync('gcc', ['-O2', '-march=x86-64', '-std=c99', '-o', binary, join(repo, 'scripts/native/dome-trace.c'), '-lm'], { encoding: 'utf8' });
  if (cc.status !== 0) {
    console.error(`bench-native: gcc failed to compile scripts/native/dome-trace.c: ${cc.stderr.trim().split('\n')[0]}`);
    process.exit(1);
  }
  return binary;
}

/** The tracer of the tree at `root`, bundled as the page's worker gets it (bundle-tracer.mjs), loaded. */
async function bundle(root, outfile) {
  await bundleTracer(root, outfile);
  return import(pathToFileURL(outfile).href);
}

/** A JS tracer as a runner: traces `rays` rays of package `name` with `seed` on this thread. */
function jsRunner(label, lib) {
  return {
    label,
    warm: (name) => lib.traceSync(packageFor(name), { rays: WARM_UP_RAYS, seed: 99 }),
    run(name, rays, seed) {
      const cpu0 = process.cpuUsage();
      const tally = lib.traceSync(packageFor(name), { rays, seed });
      const cpu = process.cpuUsage(cpu0);
      const s = lib.summarize(tally);
      const c = s.counts;
      return { cpuSeconds: (cpu.user + cpu.system) / 1e6, escaped: c.escaped, chip: c.chip, base: c.base, eventsPerRay: s.eventsPerRay };
    }
  };
}

function nativeRunner(binary) {
  return {
    label: 'native C',
    warm: () => {},
    run(name, rays, seed) {
      const out = JSON.parse(execFileSync(binary, [String(rays), String(seed), name], { encoding: 'utf8' }));
      const count = (fraction) => Math.round(fraction * rays);
      return {
        cpuSeconds: out.seconds,
        escaped: count(out.extraction),
        chip: count(out.absorbedChip),
        base: count(out.absorbedBase),
        eventsPerRay: out.eventsPerRay
      };
    }
  };
}

const median = (xs) => {
  const s = [...xs].sort((a, b) => a - b);
  return s.length % 2 ? s[(s.length - 1) / 2] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2;
};
const f2 = (x) => x.toFixed(2);
const range = (xs) => `${f2(Math.min(...xs))}–${f2(Math.max(...xs))}`;
/** Extraction and its binomial standard error √(p(1 − p)/N). */
const proportion = (escaped, n) => {
  const p = escaped / n;
  return { p, se: Math.sqrt((p * (1 - p)) / n) };
};

async function main() {
  const { rays, rounds, old, packages } = readArgs(process.argv.slice(2));
  const repo = resolve(fileURLToPath(import.meta.url), '../..');
  const dir = mkdtempSync(join(tmpdir(), 'outcouple-native-'));
  try {
    const binary = compileNative(repo, dir);
    const runners = [nativeRunner(binary)];
    runners.push(jsRunner('tsx', await tsImport(join(repo, 'src/lib/trace/index.ts'), import.meta.url)));
    runners.push(jsRunner('bundled', await bundle(repo, join(dir, 'current.mjs'))));
    if (old !== 'none') {
      const oldRoot = join(dir, 'old');
      execSync(`mkdir -p "${oldRoot}" && git -C "${repo}" archive ${old} src/lib package.json | tar -x -C "${oldRoot}"`);
      // a newer commit's tracer also imports its data files and packages
      execSync(`(git -C "${repo}" archive ${old} data 2>/dev/null | tar -x -C "${oldRoot}") || true; ln -s "${join(repo, 'node_modules')}" "${join(oldRoot, 'node_modules')}"`);
      runners.push(jsRunner(`tsx ${old}`, await tsImport(join(oldRoot, 'src/lib/trace/index.ts'), import.meta.url)));
      runners.push(jsRunner(`bundled ${old}`, await bundle(oldRoot, join(dir, 'old.mjs'))));
    }
    console.log(`JS/native tracer ratio: ${rays.toLocaleString('en')} rays per run, ${rounds} rounds (seeds 1–${rounds}), one thread, rates per CPU second`);
    console.log(`CPU: ${cpus()[0]?.model ?? 'unknown'}; Node ${process.version}; native: gcc -O2 -march=x86-64\n`);
    const warnings = [];
    for (const name of packages) {
      for (const r of runners) r.warm(name);
      const results = runners.map(() => []);
      console.log(`${name}: round  tracer           Mrays/CPU-s  JS/native  events/ray  extraction ± stderr`);
      for (let round = 0; round < rounds; round++) {
        // ABBA: whichever runs first in a round gains a few per cent
        const order = runners.map((_, i) => i);
        if (round % 2 === 1) order.reverse();
        for (const i of order) results[i][round] = runners[i].run(name, rays, round + 1);
        const nativeRate = rays / results[0][round].cpuSeconds;
        for (const [i, r] of runners.entries()) {
          const x = results[i][round];
          const rate = rays / x.cpuSeconds;
          const { p, se } = proportion(x.escaped, rays);
          console.log(
            `${''.padEnd(name.length)}  ${String(round + 1).padStart(5)}  ${r.label.padEnd(16)} ${f2(rate / 1e6).padStart(11)}  ` +
              `${i === 0 ? '        -' : f2(rate / nativeRate).padStart(9)}  ${x.eventsPerRay.toFixed(2).padStart(10)}  ${p.toFixed(4)} ± ${se.toFixed(4)}`
          );
        }
      }
      console.log(
        `\n${name}, over ${rounds} rounds: tracer  Mrays/CPU-s median (range)  JS/native median (range)  ` +
          'extraction ± stderr, pooled  vs native  absorbed in chip, base: vs native'
      );
      const pooled = (i, key) => proportion(results[i].reduce((a, x) => a + x[key], 0), rays * rounds);
      /** Difference from the native tracer's pooled fraction in standard errors of the difference. */
      const sigmas = (i, key) => {
        const a = pooled(i, key);
        const b = pooled(0, key);
        return a.p === b.p ? 0 : (a.p - b.p) / Math.hypot(a.se, b.se);
      };
      const signed = (x) => `${x >= 0 ? '+' : ''}${x.toFixed(1)}σ`;
      for (const [i, r] of runners.entries()) {
        const rates = results[i].map((x) => rays / x.cpuSeconds / 1e6);
        const ratios = results[i].map((x, k) => results[0][k].cpuSeconds / x.cpuSeconds);
        const { p, se } = pooled(i, 'escaped');
        const ratio = i === 0 ? '-'.padStart(24) : `${f2(median(ratios))} (${range(ratios)})`.padStart(24);
        const checks = ['escaped', 'chip', 'base'].map((key) => [key, sigmas(i, key)]);
        console.log(
          `  ${r.label.padEnd(16)} ${`${f2(median(rates))} (${range(rates)})`.padStart(24)}  ${ratio}  ` +
            `${p.toFixed(5)} ± ${se.toFixed(5)}  ${i === 0 ? '         ' : signed(checks[0][1]).padStart(9)}  ` +
            `${i === 0 ? '' : `${signed(checks[1][1])}, ${signed(checks[2][1])}`}`
        );
        for (const [key, sigma] of checks) {
          if (i > 0 && Math.abs(sigma) > AGREEMENT_SIGMA) {
            warnings.push(
              `WARNING: ${name}, ${r.label}: ${key === 'escaped' ? 'extraction' : `absorbed in ${key}`} differs from the native tracer's by ${signed(sigma)} (> ${AGREEMENT_SIGMA}σ): the physics disagree`
            );
          }
        }
      }
      console.log('');
    }
    for (const w of warnings) console.log(w);
    if (warnings.length === 0) console.log(`Extraction and absorbed fractions agree with the native tracer's within ${AGREEMENT_SIGMA}σ for every tracer and package.`);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

main().catch((error) => {
  console.error(`bench-native: ${error instanceof Error ? error.message : error}`);
  process.exit(1);
});
