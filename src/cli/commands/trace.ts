import { readFileSync, statSync, writeFileSync } from 'node:fs';
import { summarize } from '../../lib/trace/summary';
import { traceSync } from '../../lib/trace/trace';
import { defaultThreads, traceParallel, MAX_THREADS } from '../../lib/trace/node/node-pool';
import type { TracePackage } from '../../lib/trace/package-spec';
import { readScenario, resolveScenario, toTracePackage } from '../../lib/scenario';
import { farFieldCsv, packageOpening, traceIes } from '../../lib/export';
import { CliError } from '../cli-error';
import { indexOption } from '../index-option';
import { choiceOption, integerOption, numberOption, parseOptions, sizeOption, stringOption, truncate, type OptionSpec, type ParsedValues } from '../options';
import { emit, percent, type Row } from '../output';

export const summary = 'Monte Carlo ray trace of an LED package: extraction, loss ledger, far field; IES LM-63 export';
export const help = `outcouple trace — Monte Carlo ray trace of a package (units mm, z up, base plane z = 0)

Chip
  --n-chip N | --chip-material M      chip index (1 to 10) or library material (default 2.45)
  --chip WxLxH                        chip size in mm (default 1x1x0.15)
  --emitter-z Z                       emitting plane height in mm, 0 to H (default H/2)
  --emission plane|volume             uniform over the footprint at Z, or in the volume (default plane)
  --chip-absorption A                 bulk absorption, 0 to 1e6 /mm (default 0)
Encapsulant
  --shape none|dome|cylinder          default dome
  --radius R --height H               mm (default 2.5 and 2.5: a hemisphere)
  --n-enc N | --enc-material M        index (1 to 10) or material (default 1.41)
  --enc-absorption A                  0 to 1e6 /mm (default 0)
Base and outside
  --base-reflectance R | --base-material METAL   0 to 1 (default 0.92), or a metal from the library
  --n-out N                           outside index (default 1)
Run
  --wavelength NM                     for library materials, 200 to 2500 nm (default 450)
  --polarization average|track        Fresnel choice per event from (Rs+Rp)/2, or tracked field
  --rays N                            1000 to 100000000 (default 1000000)
  --seed S                            0 to 4294967295 (default 1)
  --threads T                         1 to ${MAX_THREADS} (default: all cores)
  --max-events E                      events before a ray counts as lost, 1 to 1000000 (default 1000)
  --scenario FILE.json                read the package from a file: a scenario saved by the app, or an
                                      object whose keys are these option names; options given here win
Output
  --ies FILE --lumens L               write the far field as an IES LM-63-2019 file scaled to L lm
  --csv FILE                          write the far field as CSV (with --lumens: candela too)
  --json                              print one JSON object

Example: outcouple trace --n-chip 2.45 --chip 1x1x0.15 --emitter-z 0.1 --chip-absorption 0.5 --n-enc 1.41 --enc-absorption 0.001 --shape dome --radius 2.5 --height 2.5 --base-reflectance 0.92 --rays 1000000 --seed 1 --threads 1 --json`;

const stringOptions = ['n-chip', 'chip-material', 'chip', 'emitter-z', 'emission', 'chip-absorption', 'shape', 'radius',
  'height', 'n-enc', 'enc-material', 'enc-absorption', 'base-reflectance', 'base-material', 'n-out', 'wavelength',
  'polarization', 'rays', 'seed', 'threads', 'max-events', 'scenario', 'ies', 'lumens', 'csv'] as const;
const options: OptionSpec = { json: { type: 'boolean' } };
for (const name of stringOptions) options[name] = { type: 'string' };

const MAX_SCENARIO_BYTES = 2 * 1024 * 1024;

/** Reads --scenario: an app scenario (any known version) or a flat object of option names. */
export function readScenarioFile(path: string): { pkg?: TracePackage; values?: ParsedValues; rays?: number; seed?: number; name?: string } {
  let text: string;
  try {
    if (statSync(path).size > MAX_SCENARIO_BYTES) throw new CliError(`--scenario: file is larger than 2 MB (${path.slice(0, 80)})`);
    text = readFileSync(path, 'utf8');
  } catch (error) {
    if (error instanceof CliError) throw error;
    throw new CliError(`--scenario: cannot read '${truncate(path, 80)}'`);
  }
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch {
    throw new CliError('--scenario: the file is not valid JSON');
  }
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) throw new CliError('--scenario: the file must hold one JSON object');
  const object = raw as Record<string, unknown>;
  const candidate = 'version' in object ? object : 'scenario' in object ? object.scenario : null;
  if (candidate) {
    const read = readScenario(candidate);
    if (!read.ok) throw new CliError(`--scenario: ${read.message}`);
    const resolved = resolveScenario(read.scenario);
    return { pkg: toTracePackage(read.scenario, resolved), rays: read.scenario.trace.rays, seed: read.scenario.trace.seed, name: read.scenario.name };
  }
  const values: ParsedValues = {};
  for (const [key, value] of Object.entries(object)) {
    if (!(stringOptions as readonly string[]).includes(key) || key === 'scenario') {
      throw new CliError(`--scenario: unknown field '${truncate(key)}' (fields are the trace option names, e.g. "n-chip", "radius")`);
    }
    if (typeof value !== 'number' && typeof value !== 'string') throw new CliError(`--scenario: field '${key}' must be a number or text`);
    values[key] = String(value);
  }
  return { values };
}

export function packageFromOptions(values: ParsedValues, base?: TracePackage): TracePackage {
  const wavelengthNm = numberOption(values, 'wavelength', 200, 2500, 450);
  const given = (name: string) => values[name] !== undefined;
  const chipIndex = !base || given('n-chip') || given('chip-material') ? indexOption(values, 'n-chip', 'chip-material', wavelengthNm, '2.45').n : base.chip.n;
  const size = sizeOption(values, 'chip', 3, 1e-4, 100, base ? [base.chip.widthMm, base.chip.lengthMm, base.chip.heightMm] : [1, 1, 0.15]);
  const [widthMm, lengthMm] = size;
  const heightMm = size[2] ?? 0.15;
  const emitterZMm = numberOption(values, 'emitter-z', 0, heightMm, base?.chip.emitterZMm ?? heightMm / 2);
  const shape = choiceOption(values, 'shape', ['none', 'dome', 'cylinder'] as const, base?.encapsulant.shape ?? 'dome');
  const encIndex = !base || given('n-enc') || given('enc-material') ? indexOption(values, 'n-enc', 'enc-material', wavelengthNm, '1.41').n : base.encapsulant.n;
  const outsideN = !base || given('n-out') ? indexOption(values, 'n-out', null, wavelengthNm, '1').n : base.outsideN;
  if (given('base-reflectance') && given('base-material')) throw new CliError('give either --base-reflectance or --base-material, not both');
  let baseSpec: TracePackage['base'];
  if (given('base-material')) {
    const metal = indexOption(values, 'base-material', null, wavelengthNm);
    baseSpec = { kind: 'metal', n: metal.n, k: metal.k };
  } else if (!base || given('base-reflectance')) {
    baseSpec = { kind: 'reflectance', reflectance: numberOption(values, 'base-reflectance', 0, 1, 0.92) };
  } else {
    baseSpec = base.base;
  }
  return {
    chip: {
      widthMm, lengthMm, heightMm, n: chipIndex, emitterZMm,
      absorptionPerMm: numberOption(values, 'chip-absorption', 0, 1e6, base?.chip.absorptionPerMm ?? 0),
      emission: choiceOption(values, 'emission', ['plane', 'volume'] as const, base?.chip.emission ?? 'plane')
    },
    base: baseSpec,
    encapsulant: {
      shape,
      radiusMm: numberOption(values, 'radius', 1e-4, 1e4, base?.encapsulant.radiusMm ?? 2.5),
      heightMm: numberOption(values, 'height', 1e-4, 1e4, base?.encapsulant.heightMm ?? 2.5),
      n: encIndex,
      absorptionPerMm: numberOption(values, 'enc-absorption', 0, 1e6, base?.encapsulant.absorptionPerMm ?? 0)
    },
    outsideN,
    polarization: choiceOption(values, 'polarization', ['average', 'track'] as const, base?.polarization ?? 'average')
  };
}

/** Core field paths as the options that set them, so a core RangeError names what the user typed. */
const optionOfField: [RegExp, string][] = [
  [/\bencapsulant\.radiusMm\b/g, '--radius'], [/\bencapsulant\.heightMm\b/g, '--height'], [/\bencapsulant\.n\b/g, '--n-enc'],
  [/\bencapsulant\.absorptionPerMm\b/g, '--enc-absorption'], [/\bchip\.emitterZMm\b/g, '--emitter-z'],
  [/\bchip\.(widthMm|lengthMm|heightMm)\b/g, '--chip'], [/\bchip\.n\b/g, '--n-chip'], [/\bchip\.absorptionPerMm\b/g, '--chip-absorption'],
  [/\bbase\.reflectance\b/g, '--base-reflectance'], [/\bbase\.(n|k)\b/g, '--base-material'], [/\boutsideN\b/g, '--n-out']
];

function inOptionTerms(error: unknown): unknown {
  if (!(error instanceof RangeError)) return error;
  let message = error.message;
  for (const [pattern, option] of optionOfField) message = message.replace(pattern, option);
  return new CliError(message);
}

function writeOutput(path: string, text: string, option: string): void {
  try {
    writeFileSync(path, text);
  } catch {
    throw new CliError(`--${option}: cannot write '${truncate(path, 80)}'`);
  }
}

export async function run(argv: string[]): Promise<void> {
  const parsed = parseOptions(argv, options, 'trace');
  if (parsed.positionals.length) throw new CliError(`trace: unexpected argument '${truncate(parsed.positionals[0])}'`);
  let values = parsed.values;
  let basePkg: TracePackage | undefined;
  let fileRays: number | undefined;
  let fileSeed: number | undefined;
  let name = 'Outcouple trace';
  const scenarioPath = stringOption(values, 'scenario');
  if (scenarioPath) {
    const file = readScenarioFile(scenarioPath);
    if (file.values) values = { ...file.values, ...values };
    basePkg = file.pkg;
    fileRays = file.rays;
    fileSeed = file.seed;
    if (file.name) name = file.name;
  }
  const pkg = packageFromOptions(values, basePkg);
  const rays = integerOption(values, 'rays', 1000, 1e8, fileRays ?? 1_000_000);
  const seed = integerOption(values, 'seed', 0, 4294967295, fileSeed ?? 1);
  const threads = integerOption(values, 'threads', 1, MAX_THREADS, defaultThreads());
  const maxEvents = integerOption(values, 'max-events', 1, 1e6, 1000);
  const iesPath = stringOption(values, 'ies');
  const csvPath = stringOption(values, 'csv');
  const lumensGiven = values.lumens !== undefined;
  if (iesPath && !lumensGiven) throw new CliError('--ies needs --lumens (the flux to scale the file to, 1e-6 to 1e7 lm)');
  const lumens = numberOption(values, 'lumens', 1e-6, 1e7, 100);

  const started = performance.now();
  let tally;
  try {
    tally = threads === 1 ? traceSync(pkg, { rays, seed, maxEvents }) : await traceParallel(pkg, { rays, seed, maxEvents }, threads);
  } catch (error) {
    throw inOptionTerms(error);
  }
  const seconds = (performance.now() - started) / 1000;
  const s = summarize(tally);
  const notes: string[] = [];
  if (s.trappedNote) notes.push(s.trappedNote);
  if (s.geometryNote) notes.push(s.geometryNote);

  if (iesPath || csvPath) {
    if (s.counts.escaped === 0) throw new CliError('no ray escaped, so there is no far field to write');
    // The same file the dome page writes: zone-averaged near the poles, the smoothing stated in it
    const ies = traceIes({ binIntensities: s.farField.bins.map((b) => b.relativeIntensity), lumens, rays, seed,
      issueDate: new Date().toISOString().slice(0, 10), name, opening: packageOpening(pkg.encapsulant, pkg.chip) });
    if (iesPath) {
      writeOutput(iesPath, ies.text, 'ies');
      notes.push(`IES LM-63 file written to ${iesPath} (${lumens} lm)`);
    }
    if (csvPath) {
      writeOutput(csvPath, farFieldCsv(ies.farField, lumens), 'csv');
      notes.push(`far-field CSV written to ${csvPath}`);
    }
  }

  const result = {
    package: pkg, rays, seed, threads,
    extraction: s.extraction, stderr: s.stderr, ledger: s.ledger, counts: s.counts,
    escapedBelowHorizon: s.escapedBelowHorizon, perSurface: s.perSurface, eventsPerRay: s.eventsPerRay,
    geometryErrors: s.geometryErrors, raysPerSecond: rays / seconds, seconds,
    farField: { beamAngleDeg: s.farField.beamAngleDeg, onAxisVsLambertian: s.farField.onAxisVsLambertian, bins: s.farField.bins },
    notes
  };
  const rows: Row[] = [
    ['extraction', `${percent(s.extraction, 2)} ± ${percent(s.stderr, 2)}`, '(1 standard error)'],
    ['escaped', percent(s.ledger.escaped, 2)], ['  of which below the horizon', percent(s.escapedBelowHorizon, 2)],
    ['absorbed in the chip', percent(s.ledger.chip, 2)], ['absorbed in the encapsulant', percent(s.ledger.encapsulant, 2)],
    ['absorbed at the base', percent(s.ledger.base, 2)], ['lost (event cap)', percent(s.ledger.lost, 2)],
    ['beam angle (full width at half maximum)', s.farField.beamAngleDeg === null ? '—' : s.farField.beamAngleDeg.toFixed(1), s.farField.beamAngleDeg === null ? '' : '°'],
    ['on-axis intensity vs Lambertian', s.farField.onAxisVsLambertian === null ? '—' : s.farField.onAxisVsLambertian.toFixed(3), '×'],
    ['events per ray', s.eventsPerRay.toFixed(2)], ['rays', rays], ['threads', threads],
    ['speed', (rays / seconds / 1e6).toFixed(2), 'million rays/s']
  ];
  emit(values.json === true, result, 'Package ray trace', rows, notes);
}
