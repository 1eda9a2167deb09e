/**
 * The command line under generated argv, run in-process through main(argv) with stdout and stderr
 * captured, for every command (escape, stack, dome, material, claim, trace). Contract (src/cli/main.ts):
 * exit code 0 or 2, never 1 (unexpected failure); on 2 exactly one line on stderr, "outcouple <command>:
 * …", naming what was wrong, no stack trace; on 0 nothing on stderr; never NaN or Infinity in the
 * output (in JSON a non-finite number would print as null, so nulls are allowed only where a field is
 * documented as nullable).
 *
 * Option values mix valid ones with hostile ones (NaN, ±Infinity, negative, huge, empty, 100 000
 * characters, control characters, prototype-pollution words, unknown options). Trace runs are kept
 * tiny: --rays is drawn from 1000–2000 or an invalid value, --threads is always 1 and --max-events
 * small, so thousands of runs finish in seconds. Scenario files and output paths live in a temporary
 * folder made for this file.
 */
import { describe, it, expect, beforeAll, afterAll } from 'vitest';
import fc from 'fast-check';
import { mkdtempSync, rmSync, writeFileSync, mkdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { main } from '../../src/cli/main';
import { demoScenario } from '../../src/lib/scenario/defaults';
import { checkAsync, deeplyNested, prototypePolluted, RUNS } from './support';

/** Cases per command (trace gets fewer: each case traces up to 2000 rays). */
const CASES = Math.round(RUNS.fuzz / 3);
/** Trace runs with only valid options (each traces 1000–2000 rays to the end). */
const VALID_TRACE_CASES = 60;

interface Run {
  code: number;
  stdout: string;
  stderr: string;
}

/** Runs main(argv) with process.stdout/stderr captured. */
async function runMain(argv: string[]): Promise<Run> {
  let stdout = '';
  let stderr = '';
  const out = process.stdout.write;
  const err = process.stderr.write;
  process.stdout.write = ((chunk: string | Uint8Array) => ((stdout += String(chunk)), true)) as typeof process.stdout.write;
  process.stderr.write = ((chunk: string | Uint8Array) => ((stderr += String(chunk)), true)) as typeof process.stderr.write;
  try {
    const code = await main(argv);
    return { code, stdout, stderr };
  } finally {
    process.stdout.write = out;
    process.stderr.write = err;
  }
}

// beamAngleNote: a sentence when the beam angle is not defined, else null; front/behind: a scene surface's media, null on the open side of a mirror or absorber; rOuter: null for the endless base plane (Infinity in JSON)
const NULLABLE = new Set(['criticalAngleDeg', 'radiusMm', 'noTir', 'warning', 'beamAngleDeg', 'beamAngleNote', 'onAxisVsLambertian', 'trappedIn', 'nEnc', 'front', 'behind', 'rOuter']);

function nullsOutsideAllowList(value: unknown, key = '', out: string[] = []): string[] {
  if (value === null && !NULLABLE.has(key)) out.push(key);
  else if (Array.isArray(value)) value.forEach((v) => nullsOutsideAllowList(v, key, out));
  else if (value && typeof value === 'object') for (const [k, v] of Object.entries(value)) nullsOutsideAllowList(v, k, out);
  return out;
}

/** Distinct first words of refusals seen, for the summary line (what the fuzzing reached). */
const refusals = new Set<string>();
/** Exit codes per command, for the summary line: both the refusing and the working side must be reached. */
const outcomes: Record<string, { ok: number; refused: number }> = {};

/** Checks the CLI contract for one run. */
function expectContract(command: string, argv: string[], r: Run): void {
  outcomes[command] ??= { ok: 0, refused: 0 };
  if (r.code === 0) outcomes[command].ok++;
  else outcomes[command].refused++;
  const where = `argv ${JSON.stringify(argv).slice(0, 300)}`;
  expect([0, 2], `${where}: exit ${r.code}, stderr ${r.stderr.slice(0, 300)}`).toContain(r.code);
  expect(r.stderr, where).not.toMatch(/\n\s+at |unexpected failure/);
  if (r.code === 2) {
    expect(r.stderr.endsWith('\n') && r.stderr.indexOf('\n') === r.stderr.length - 1, `${where}: one line on stderr, got ${JSON.stringify(r.stderr.slice(0, 300))}`).toBe(true);
    expect(r.stderr.startsWith(`outcouple ${command}: `), `${where}: ${r.stderr.slice(0, 200)}`).toBe(true);
    expect(r.stderr.length, `${where}: message length`).toBeLessThanOrEqual(400);
    const message = r.stderr.slice(`outcouple ${command}: `.length);
    refusals.add(message.split(/[ :]/)[0]);
    // what was wrong is named: an option, an argument ("<command>: unexpected argument …", unknown
    // option), or the material the user named
    const optionWords = argv.filter((a) => a.startsWith('--')).map((a) => a.slice(2));
    const names =
      /--[a-z]/.test(message) ||
      message.startsWith(`${command}: `) ||
      optionWords.some((w) => w !== '' && message.startsWith(`${w} `)) || // a core message naming the option's value ("value (…) must be")
      /^material: |its dispersion formula|valid range/.test(message) ||
      /no ray escaped/.test(message);
    expect(names, `${where}: the message names no option: ${message.slice(0, 200)}`).toBe(true);
  } else {
    expect(r.stderr, `${where}: nothing on stderr on success`).toBe('');
  }
  expect(r.stdout, `${where}: stdout`).not.toMatch(/\bNaN\b|\bInfinity\b/);
  // --json asks for JSON unless it comes after "--" (then it is a plain word); main shows help for
  // --help or -h anywhere, even after "--"
  const end = argv.includes('--') ? argv.indexOf('--') : argv.length;
  const options = argv.slice(0, end);
  if (r.code === 0 && options.includes('--json') && !argv.includes('--help') && !argv.includes('-h')) {
    const parsed = JSON.parse(r.stdout);
    expect(nullsOutsideAllowList(parsed), `${where}: null numbers`).toEqual([]);
  }
}

// ---------------------------------------------------------------- generators

const LONG = 'x'.repeat(100_000);
const hostileText = fc.constantFrom(
  '', ' ', 'NaN', 'Infinity', '-Infinity', '-1', '0', '-0', '1e308', '1e-320', '1e999', '0x10', '1_000', '١٢', 'null', 'undefined',
  '__proto__', 'constructor', '[object Object]', '\u0000', 'a\nb', '\r', '--json', '-h', LONG, '9'.repeat(400), '2.4+0.01i', '2.4-0.5i',
  '0+0i', 'GaN', 'gan', 'ag', 'sio2', 'air', 'Au', 'x:y', '1:', ':5', '1.5:-3', '1.5:1e9', 'NaN:NaN', '1x1', '1x1x0.15', '0x0', 'axb', '1x1x1x1'
);
const number = (min: number, max: number) => fc.double({ min, max, noNaN: true }).map(String);
const value = (valid: fc.Arbitrary<string>) =>
  fc.oneof({ weight: 8, arbitrary: valid }, { weight: 2, arbitrary: hostileText }, { weight: 1, arbitrary: fc.string({ maxLength: 12 }) });

/** argv for one command: a random subset of its options with values, plus stray words and unknown options. */
function argvFor(spec: Record<string, fc.Arbitrary<string> | null>, extra: fc.Arbitrary<string[]> = fc.constant([])): fc.Arbitrary<string[]> {
  const names = Object.keys(spec);
  const pair: fc.Arbitrary<string[]> = fc.constantFrom(...names).chain((name): fc.Arbitrary<string[]> => {
    const arb = spec[name];
    return arb === null ? fc.constant([`--${name}`]) : arb.map((v) => [`--${name}`, v]);
  });
  const stray: fc.Arbitrary<string[]> = fc.oneof(
    fc.constantFrom<string[]>(['--nope'], ['-x'], ['--'], ['stray'], ['--json=1'], ['--rays'], ['--layer'], ['--__proto__', '1'], ['-'], ['--help']),
    fc.string({ maxLength: 6 }).map((s) => [s])
  );
  const noStray: fc.Arbitrary<string[]> = fc.constant([]);
  return fc
    .tuple(fc.array(pair, { maxLength: 6 }), fc.oneof({ weight: 4, arbitrary: noStray }, { weight: 1, arbitrary: stray }), fc.boolean(), extra)
    .map(([pairs, strays, json, more]) => [...pairs.flat(), ...strays, ...(json ? ['--json'] : []), ...more]);
}

const index = value(fc.oneof(number(1, 4), fc.constantFrom('GaN', 'sapphire-o', 'silicone-phenyl', '2.45', '1.41', '2.4+0.01i')));
const wavelength = value(number(200, 2500));

const escapeArgv = argvFor({ 'n-in': index, in: index, 'n-out': index, out: index, wavelength, faces: value(fc.constantFrom('1', '5', '6', '2')), json: null });
const domeArgv = argvFor({
  'n-chip': index, 'chip-material': index, 'n-enc': index, 'enc-material': index, 'n-out': index,
  chip: value(fc.tuple(number(0.001, 5), number(0.001, 5)).map(([a, b]) => `${a}x${b}`)),
  radius: value(number(0.001, 100)), wavelength, json: null
});
const layer = value(fc.tuple(index, number(0, 500)).map(([i, t]) => `${i}:${t}`));
const stackArgv = argvFor(
  { 'n-in': index, in: index, 'n-out': index, out: index, layer, wavelength, angle: value(number(0, 90)), incoherent: null, extraction: null, json: null },
  fc.array(layer, { maxLength: 4 }).map((ls) => ls.flatMap((l) => ['--layer', l]))
);
// the three options a claim needs come first, so generated ones (later on the line) override them
const claimArgv = argvFor({
  kind: value(fc.constantFrom('extraction', 'gain', 'coating')),
  value: value(fc.oneof(number(0, 1), number(0, 10), number(-1, 2))),
  'n-chip': index, 'chip-material': index, structure: value(fc.constantFrom('planar', 'textured', 'thin-film', 'unknown')),
  'n-enc': index, 'enc-material': index, 'n-out': value(number(1, 3)), faces: value(fc.constantFrom('1', '5', '6')), wavelength, json: null
}).map((argv) => ['--kind', 'extraction', '--value', '0.5', ...(argv.includes('--chip-material') ? [] : ['--n-chip', '2.45']), ...argv]);
const materialArgv = fc
  .tuple(argvFor({ wavelength, list: null, json: null }), fc.array(value(fc.constantFrom('GaN', 'sio2', 'Ag', 'air', 'tio2-rutile', 'gaas')), { maxLength: 2 }))
  .map(([argv, names]) => [...names, ...argv]);

// ---------------------------------------------------------------- trace: files and tiny runs

let dir = '';
let scenarioFiles: string[] = [];

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'outcouple-fuzz-'));
  mkdirSync(join(dir, 'a-folder'));
  const small = { ...demoScenario(), trace: { rays: 1000, seed: 3, polarization: 'average' } };
  const files: Record<string, string> = {
    'valid.json': JSON.stringify(small),
    'v0.json': JSON.stringify({ name: 'old', wavelengthNm: 450, chip: { material: 'gan', widthMm: 1, lengthMm: 1, heightMm: 0.15 }, rays: 1000 }),
    'flat.json': JSON.stringify({ 'n-chip': 2.45, radius: 2.5, rays: 1000 }),
    'flat-bad.json': JSON.stringify({ 'n-chip': 'NaN', radius: -1 }),
    'flat-unknown.json': JSON.stringify({ nope: 1 }),
    'flat-object.json': JSON.stringify({ radius: { a: 1 } }),
    'proto.json': '{"__proto__":{"polluted":true},"radius":2}',
    'wrapped.json': JSON.stringify({ scenario: small }),
    'newer.json': JSON.stringify({ ...small, version: 99 }),
    'invalid.json': JSON.stringify({ ...small, chip: { ...small.chip, widthMm: -1 } }),
    'array.json': '[1,2,3]',
    'null.json': 'null',
    'empty.json': '',
    'garbage.json': '{"version":1,',
    'binary.json': '\u0000\u0001\u00ff\ufffe',
    'deep.json': deeplyNested(100_000, 'array'),
    'deep-object.json': deeplyNested(100_000, 'object'),
    'huge.json': JSON.stringify({ ...small, name: 'n'.repeat(3 * 1024 * 1024) })
  };
  for (const [name, text] of Object.entries(files)) writeFileSync(join(dir, name), text);
  scenarioFiles = [...Object.keys(files).map((f) => join(dir, f)), join(dir, 'missing.json'), join(dir, 'a-folder'), ''];
});

afterAll(() => {
  rmSync(dir, { recursive: true, force: true });
  expect(prototypePolluted(), 'Object.prototype polluted by a fuzz input').toBe(false);
});

const size = fc.tuple(number(0.05, 2), number(0.05, 2), number(0.01, 0.5)).map(([a, b, c]) => `${a}x${b}x${c}`);
function traceArgv(): fc.Arbitrary<string[]> {
  return fc
    .tuple(
      argvFor({
        'n-chip': index, 'chip-material': index, chip: value(size), 'emitter-z': value(number(0, 0.5)),
        emission: value(fc.constantFrom('plane', 'volume')), 'chip-absorption': value(number(0, 100)),
        shape: value(fc.constantFrom('none', 'dome', 'cylinder')), radius: value(number(0.5, 5)), height: value(number(0.2, 5)),
        'n-enc': index, 'enc-material': index, 'enc-absorption': value(number(0, 10)), 'base-reflectance': value(number(0, 1)),
        'base-material': value(fc.constantFrom('ag', 'al', 'au', '0.05+3.6i')), 'n-out': index, wavelength,
        polarization: value(fc.constantFrom('average', 'track')), seed: value(fc.integer({ min: 0, max: 4294967295 }).map(String)),
        lumens: value(number(1e-6, 1e7)), json: null
      }),
      // bounded cost: rays and event cap from small valid values or invalid ones, never large valid ones
      fc.option(fc.oneof(fc.integer({ min: 1000, max: 2000 }).map(String), fc.constantFrom('999', '1e9', '-1', '1000.5', 'NaN', '', '0x3e8')), { nil: undefined }),
      fc.option(fc.oneof(fc.integer({ min: 1, max: 50 }).map(String), fc.constantFrom('0', '1e7', '-3', 'x')), { nil: undefined }),
      fc.option(fc.integer({ min: 0, max: 1000 }), { nil: undefined }),
      fc.option(fc.tuple(fc.constantFrom('ies', 'csv'), fc.constantFrom('out.ies', 'out.csv', 'a-folder', 'no/such/dir/f.ies', '')), { nil: undefined })
    )
    .map(([argv, rays, maxEvents, file, output]) => {
      const out = [...argv, '--threads', '1'];
      out.push('--rays', rays ?? '1000');
      out.push('--max-events', maxEvents ?? '30');
      if (file !== undefined) out.push('--scenario', scenarioFiles[file % scenarioFiles.length]);
      if (output) out.push(`--${output[0]}`, output[1] === '' ? '' : join(dir, output[1]));
      return out;
    });
}

// ---------------------------------------------------------------- the properties

describe('main(argv) under generated argv', () => {
  for (const [command, argv] of [
    ['escape', escapeArgv],
    ['dome', domeArgv],
    ['stack', stackArgv],
    ['material', materialArgv],
    ['claim', claimArgv]
  ] as const) {
    it(`${command}: exits 0 or 2 with one clean line on stderr, never NaN (${CASES} cases)`, async () => {
      await checkAsync(
        `cli ${command}`,
        fc.asyncProperty(argv, async (args) => expectContract(command, [command, ...args], await runMain([command, ...args]))),
        CASES
      );
    });
  }

  it(`trace: the same, with tiny runs, scenario files and output paths (${CASES} cases)`, async () => {
    await checkAsync(
      'cli trace',
      fc.asyncProperty(traceArgv(), async (args) => expectContract('trace', ['trace', ...args], await runMain(['trace', ...args]))),
      CASES
    );
  });

  it(`trace: valid options always run and print finite numbers (${VALID_TRACE_CASES} cases)`, async () => {
    const validTrace = fc
      .record({
        chip: size,
        chipIndex: fc.oneof(number(1, 4).map((n) => ['--n-chip', n]), fc.constantFrom(['--chip-material', 'GaN'], ['--chip-material', 'sapphire-o'])),
        shape: fc.constantFrom('none', 'dome', 'cylinder'),
        radius: number(3, 5),
        height: number(3, 5),
        enc: fc.oneof(number(1, 2).map((n) => ['--n-enc', n]), fc.constantFrom(['--enc-material', 'silicone-phenyl'], ['--enc-material', 'epoxy'])),
        base: fc.oneof(number(0, 1).map((r) => ['--base-reflectance', r]), fc.constantFrom(['--base-material', 'ag'], ['--base-material', 'al'])),
        polarization: fc.constantFrom('average', 'track'),
        rays: fc.integer({ min: 1000, max: 2000 }),
        seed: fc.integer({ min: 0, max: 4294967295 }),
        json: fc.boolean()
      })
      .map((g) => [
        '--chip', g.chip, ...g.chipIndex, '--shape', g.shape, '--radius', g.radius, '--height', g.height, ...g.enc, ...g.base,
        '--polarization', g.polarization, '--rays', String(g.rays), '--seed', String(g.seed), '--threads', '1', '--max-events', '50',
        ...(g.json ? ['--json'] : [])
      ]);
    await checkAsync(
      'cli trace, valid options',
      fc.asyncProperty(validTrace, async (args) => {
        const r = await runMain(['trace', ...args]);
        expect(r.code, r.stderr).toBe(0);
        expectContract('trace', ['trace', ...args], r);
      }),
      VALID_TRACE_CASES
    );
  });

  it(`any first word: a command, help, or one line naming the unknown command (${CASES} cases)`, async () => {
    await checkAsync(
      'cli command word',
      fc.asyncProperty(fc.oneof(fc.string({ maxLength: 20 }), fc.constantFrom('__proto__', 'constructor', 'toString', 'hasOwnProperty', LONG)), async (word) => {
        fc.pre(!['escape', 'stack', 'dome', 'material', 'trace', 'claim', 'color', 'mie', 'variants', 'compare', 'optic', 'phosphor-load', 'phosphor-sweep', 'help', '--help', '-h', ''].includes(word));
        const r = await runMain([word]);
        expect(r.code, `word ${JSON.stringify(word.slice(0, 40))}: ${r.stderr.slice(0, 200)}`).toBe(2);
        expect(r.stderr.startsWith('outcouple: unknown command') && r.stderr.indexOf('\n') === r.stderr.length - 1).toBe(true);
        expect(r.stderr.length).toBeLessThanOrEqual(200);
      }),
      CASES
    );
    console.log(`cli refusals reached (first words): ${[...refusals].sort().join(' ')}`);
    console.log(`cli outcomes: ${Object.entries(outcomes).map(([c, o]) => `${c} ${o.ok} ran, ${o.refused} refused`).join('; ')}`);
    for (const [command, o] of Object.entries(outcomes)) {
      expect(o.ok, `${command}: some generated argv must run`).toBeGreaterThan(CASES / 50);
      expect(o.refused, `${command}: some generated argv must be refused`).toBeGreaterThan(CASES / 50);
    }
  });
});

describe('command line limits', () => {
  it('states the limit on layers, rays and option length', async () => {
    const layers = Array.from({ length: 201 }, () => ['--layer', '1.5:10']).flat();
    const tooMany = await runMain(['stack', '--n-in', '2.45', ...layers]);
    expect(tooMany).toEqual({ code: 2, stdout: '', stderr: 'outcouple stack: --layer: at most 200 layers (got 201)\n' });
    const rays = await runMain(['trace', '--rays', '20000001', '--threads', '1']);
    expect(rays.stderr).toBe('outcouple trace: --rays: Rays must be a whole number between 1000 and 20000000 rays.\n');
    const long = await runMain(['trace', '--ies', 'f'.repeat(201), '--lumens', '1', '--threads', '1']);
    expect(long.stderr).toBe('outcouple trace: --ies is too long (at most 200 characters)\n');
  });

  it('regression: "__proto__", "constructor" and "toString" are unknown commands, not an unexpected failure', async () => {
    // found by fuzzing: commands[name] found Object.prototype's members and main exited 1
    for (const word of ['__proto__', 'constructor', 'toString', 'hasOwnProperty']) {
      const r = await runMain([word, '--json']);
      expect(r.code).toBe(2);
      expect(r.stderr).toMatch(new RegExp(`^outcouple: unknown command '${word}' \\(one of escape, stack, dome, material, trace, claim(, [a-z-]+)*\\)\\n$`));
    }
  });

  it('regression: a denormal chip index is refused, not printed as "NaN %"', async () => {
    // found by fuzzing: "stack --n-in 1e-320" printed Rp, R, T and A as NaN
    const r = await runMain(['stack', '--n-in', '1e-320', '--layer', 'GaN:2.7e-322']);
    expect(r).toEqual({ code: 2, stdout: '', stderr: 'outcouple stack: --n-in must be a finite number ≥ 1e-6 (got 1e-320)\n' });
    const layer = await runMain(['stack', '--n-in', '2.45', '--layer', '1.5:10', '--layer', '1e-300:10']);
    expect(layer.stderr).toBe('outcouple stack: --layer 2 n must be a finite number ≥ 1e-6 (got 1e-300)\n');
  });

  it('regression: a 100 000-character index is quoted in at most 40 characters', async () => {
    // found by fuzzing: the whole text came back inside the one-line message
    const r = await runMain(['escape', '--n-in', LONG]);
    expect(r.code).toBe(2);
    expect(r.stderr).toBe(`outcouple escape: --n-in: index "${'x'.repeat(40)}…" is not a number, a complex index n+ki or a known material (e.g. 1.41, 2.4+0.01i, GaN, sapphire-o)\n`);
  });
});
