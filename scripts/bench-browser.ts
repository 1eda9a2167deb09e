/**
 * The beam optics as the browser traces them: headless Chromium (Playwright, /usr/bin/chromium or
 * CHROMIUM_PATH) against the built site served on E2E_PORT (npm run build; npx vite preview --port …).
 *
 * 1. Pool: the optic scenes compiled here, sent to the site's own trace-worker bundle in fresh workers
 *    (navigator.hardwareConcurrency of them, and one), units dealt as the page's pool deals them; the
 *    time from creating the workers to the last tally: 1 M rays of the TIR collimator over a 1 × 1 mm
 *    Lambertian square, then the three optics × 250 k.
 *    Cold: fresh workers each round; warm: the workers kept between rounds, as the page keeps its scene
 *    workers. CPU seconds are the browser's process tree (/proc), the steadier figure on a shared machine.
 * 2. Page: /beam opened fresh, the three optics × 250 k as the page runs them (design, queue, workers,
 *    results), read from the page's own "traced in … s" line: the first run, and a run after an edit.
 *
 *   npx tsx scripts/bench-browser.ts [--rounds 5]        # E2E_PORT=4393 for another port
 */
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { chromium } from '@playwright/test';
import { prepareOptic } from '../src/lib/optic-trace/optic-run';
import { chunkPlan, dealSceneUnits } from '../src/lib/trace/chunk-plan';
import type { CompiledScene } from '../src/lib/trace/compile-scene';
import { DEFAULT_MAX_EVENTS } from '../src/lib/trace/package-spec';

const port = Number(process.env.E2E_PORT ?? 4173);
const roundsArg = process.argv.indexOf('--rounds');
const rounds = roundsArg > 0 ? Number(process.argv[roundsArg + 1]) : 5;
const base = `http://127.0.0.1:${port}`;
const workerFile = readdirSync('build/_app/immutable/workers').find((f) => f.startsWith('trace-worker'));
if (!workerFile) throw new Error('no trace-worker bundle in build/: run npm run build first');

function scene(type: 'reflector' | 'lens' | 'tir'): CompiledScene {
  return prepareOptic({
    design: { type, exitDiameterMm: 20, heightMm: 12, gapMm: 0.2, material: 'pmma', reflectance: 0.92 },
    source: { kind: 'lambertian', shape: 'rect', widthMm: 1 },
    rays: 1_000_000,
    seed: 1
  }).compiled;
}

/** Typed arrays as tagged plain arrays (page.evaluate carries JSON-like values). */
function plain(value: unknown): unknown {
  if (value instanceof Float64Array || value instanceof Int32Array) return { __typed: value.constructor.name, data: Array.from(value) };
  if (Array.isArray(value)) return value.map(plain);
  if (value && typeof value === 'object') return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, plain(v)]));
  return value;
}

/**
 * CPU seconds used so far by the browser and every process under it (Linux /proc; the workers are
 * threads of the renderer): on a shared machine rays per CPU second is the steadier figure.
 */
function browserCpuSeconds(rootPid: number): number {
  const tick = 100; // USER_HZ on Linux
  const stats = readdirSync('/proc')
    .filter((d) => /^\d+$/.test(d))
    .map((d) => {
      try {
        const f = readFileSync(`/proc/${d}/stat`, 'utf8');
        const rest = f.slice(f.lastIndexOf(')') + 2).split(' ');
        return { pid: Number(d), ppid: Number(rest[1]), cpu: (Number(rest[11]) + Number(rest[12])) / tick };
      } catch {
        return null;
      }
    })
    .filter((x): x is { pid: number; ppid: number; cpu: number } => x !== null);
  const inTree = new Set([rootPid]);
  for (let grew = true; grew; ) {
    grew = false;
    for (const s of stats) if (!inTree.has(s.pid) && inTree.has(s.ppid)) (inTree.add(s.pid), (grew = true));
  }
  return stats.filter((s) => inTree.has(s.pid)).reduce((a, s) => a + s.cpu, 0);
}

interface PoolRun {
  scenes: unknown[];
  rays: number;
  units: number[][];
  worker: string;
  /** Keep the workers between rounds (the first round warms them and is not counted). */
  warm: boolean;
}

async function main() {
  const executablePath = process.env.CHROMIUM_PATH ?? (existsSync('/usr/bin/chromium') ? '/usr/bin/chromium' : undefined);
  const server = await chromium.launchServer({ executablePath, args: ['--no-sandbox', '--disable-gpu'] });
  const rootPid = server.process().pid ?? 0;
  const browser = await chromium.connect(server.wsEndpoint());
  const page = await browser.newPage();
  // tsx keeps function names through a helper the page lacks
  await page.addInitScript({ content: 'globalThis.__name = (f) => f;' });
  await page.goto(`${base}/`);
  const cores = await page.evaluate(() => navigator.hardwareConcurrency);
  console.log(`headless Chromium, navigator.hardwareConcurrency = ${cores}; ${rounds} rounds each`);

  const cases: [string, CompiledScene[], number][] = [
    ['TIR collimator, 1 M rays', [scene('tir')], 1_000_000],
    ['three optics × 250 k rays', [scene('reflector'), scene('lens'), scene('tir')], 250_000]
  ];
  for (const [label, scenes, rays] of cases) {
    for (const [workers, warm] of [[cores, false], [1, false], [cores, true]] as const) {
      const plan = chunkPlan(rays);
      await page.evaluate(() => {
        const g = globalThis as unknown as { kept?: Worker[] };
        g.kept?.forEach((w) => w.terminate());
        g.kept = [];
      });
      const run: PoolRun = {
        warm,
        scenes: scenes.map(plain),
        rays,
        units: Array.from({ length: workers }, (_, w) => Array.from(dealSceneUnits(plan, scenes.length, w, workers))),
        worker: `${base}/_app/immutable/workers/${workerFile}`
      };
      const times: number[] = [];
      const cpus: number[] = [];
      for (let r = warm ? -1 : 0; r < rounds; r++) {
        const cpu0 = browserCpuSeconds(rootPid);
        times.push(
          await page.evaluate(
            async ({ run, maxEvents }) => {
              const revive = (v: unknown): unknown => {
                if (Array.isArray(v)) return v.map(revive);
                if (v && typeof v === 'object') {
                  const o = v as Record<string, unknown>;
                  if (o.__typed) return o.__typed === 'Float64Array' ? Float64Array.from(o.data as number[]) : Int32Array.from(o.data as number[]);
                  return Object.fromEntries(Object.entries(o).map(([k, x]) => [k, revive(x)]));
                }
                return v;
              };
              const scenes = run.scenes.map(revive);
              const t0 = performance.now();
              await Promise.all(
                run.units.map(
                  (units, id) =>
                    new Promise<void>((resolve, reject) => {
                      // warm: the workers of the last round of this case, kept (as the page keeps its scene workers)
                      const kept = (globalThis as unknown as { kept?: Worker[] }).kept ?? [];
                      const w = run.warm && kept[id] ? kept[id] : new Worker(run.worker, { type: 'module' });
                      kept[id] = w;
                      (globalThis as unknown as { kept?: Worker[] }).kept = kept;
                      w.onmessage = (e) => {
                        if (e.data.type === 'scenes-done') (run.warm || w.terminate(), resolve());
                        if (e.data.type === 'error') reject(new Error(e.data.message));
                      };
                      w.postMessage({ type: 'run-scenes', id, scenes, rays: run.rays, seed: 1, maxEvents, units: Int32Array.from(units) });
                    })
                )
              );
              return (performance.now() - t0) / 1000;
            },
            { run, maxEvents: DEFAULT_MAX_EVENTS }
          )
        );
        cpus.push(browserCpuSeconds(rootPid) - cpu0);
        if (r < 0) (times.pop(), cpus.pop()); // the warming round
      }
      const total = rays * scenes.length;
      const lo = Math.min(...times);
      const hi = Math.max(...times);
      console.log(
        `pool  ${label.padEnd(28)} ${workers} worker${workers > 1 ? 's' : ' '}${warm ? ', warm' : ', cold'}  ${lo.toFixed(2)}–${hi.toFixed(2)} s  ` +
          `${(total / hi / 1e6).toFixed(2)}–${(total / lo / 1e6).toFixed(2)} M rays/s  ` +
          `${(total / Math.max(...cpus) / 1e6).toFixed(2)}–${(total / Math.min(...cpus) / 1e6).toFixed(2)} M rays per CPU s`
      );
    }
  }

  const pageTimes: number[] = [];
  const warmTimes: number[] = [];
  for (let r = 0; r < rounds; r++) {
    const fresh = await browser.newPage();
    await fresh.goto(`${base}/beam`);
    const line = fresh.getByText(/traced in [\d.]+ s on \d+ worker/);
    await line.waitFor({ timeout: 60_000 });
    pageTimes.push(Number(/traced in ([\d.]+) s/.exec((await line.textContent()) ?? '')?.[1]));
    // a second run on the kept workers: 100 000 rays, then back to 250 000
    for (const rays of ['100000', '250000']) {
      await fresh.getByLabel('Rays per optic').selectOption(rays);
      await fresh.getByText(/tracing, \d+ %/).waitFor({ timeout: 10_000 }).catch(() => {});
      await line.waitFor({ timeout: 60_000 });
    }
    warmTimes.push(Number(/traced in ([\d.]+) s/.exec((await line.textContent()) ?? '')?.[1]));
    await fresh.close();
  }
  const lo = Math.min(...pageTimes);
  const hi = Math.max(...pageTimes);
  console.log(`page  /beam, three optics × 250 k, first run      ${lo.toFixed(2)}–${hi.toFixed(2)} s  ${(750_000 / hi / 1e6).toFixed(2)}–${(750_000 / lo / 1e6).toFixed(2)} M rays/s`);
  const wlo = Math.min(...warmTimes);
  const whi = Math.max(...warmTimes);
  console.log(`page  /beam, three optics × 250 k, after an edit   ${wlo.toFixed(2)}–${whi.toFixed(2)} s  ${(750_000 / whi / 1e6).toFixed(2)}–${(750_000 / wlo / 1e6).toFixed(2)} M rays/s`);
  await browser.close();
  await server.close();
}

main().catch((e) => {
  console.error(e instanceof Error ? e.message : e);
  process.exit(1);
});
