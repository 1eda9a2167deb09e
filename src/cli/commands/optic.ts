import { readFileSync, statSync, writeFileSync } from 'node:fs';
import { exportJsonReplacer } from '../../lib/export/number-text';
import { profileCsv } from '../../lib/optic-design/profile-csv';
import { opticIes, packageRayFile, parseRayFile, runOptic, type OpticSource } from '../../lib/optic-trace';
import { designWavelengthNm, LIMITS, toWhitePackage } from '../../lib/scenario';
import type { TracePackage } from '../../lib/trace/package-spec';
import { CliError } from '../cli-error';
import { choiceOption, integerOption, numberOption, parseOptions, stringOption, truncate, type OptionSpec, type ParsedValues } from '../options';
import { emit, percent, type Row } from '../output';
import { SCENARIO_OPTIONS, scenarioFromOptions } from '../scenario-options';

export const summary = 'design a reflector, lens or TIR collimator over the package and trace it: efficiency, beam, cd/klm';
export const help = `outcouple optic — a beam optic over the package, designed and ray traced (units mm, degrees)

Optic
  --type reflector|lens|tir           required
  --shape paraboloid|cpc|aspheric|plano-convex   reflector: paraboloid (default) or cpc; lens: aspheric (default) or plano-convex
  --exit-diameter D                   exit aperture, mm, ${LIMITS.opticSizeMm.min} to ${LIMITS.opticSizeMm.max} (default 20)
  --height H                          top of the optic above the source plane, mm, ${LIMITS.opticSizeMm.min} to ${LIMITS.opticSizeMm.max} (default 12)
  --material M                        lens or TIR material from the library, or an index (default pmma)
  --target-beam DEG                   full beam angle wanted, ${LIMITS.targetBeamDeg.min} to ${LIMITS.targetBeamDeg.max}: sizes a CPC, checked against the étendue limit
  --reflectance R | --metal al|ag|au  reflector mirror, [0, 1] (default 0.92), or a library metal
  --gap G                             clearance between the source plane and the optic, mm, ${LIMITS.opticGapMm.min} to ${LIMITS.opticGapMm.max}, below the height (default 0.2)
Source (default package)
  --source package                    the scenario's package traced with the optic (the demo package, or --scenario
                                      FILE.json, plus the package options of outcouple trace --help, its phosphor
                                      included; --shape-enc and --enc-height stand for the encapsulant's --shape
                                      and --height, which name the optic here)
  --source lambertian:WxL | lambertian:disc:D    an idealised flat Lambertian source, mm, ${LIMITS.lambertianSourceMm.min} to ${LIMITS.lambertianSourceMm.max}
  --source rays:FILE.csv              a ray file (x_mm,y_mm,z_mm,dx,dy,dz,wavelength_nm,weight)
  --wavelength NM                     idealised source's wavelength for the material, 360 to 830 (default 550)
Run and output
  --rays N                            1000 to 100000000 (default 1000000)
  --seed S                            0 to 4294967295 (default 1)
  --json                              one JSON object: efficiency, efficiencyInBeam, beamAngleDeg, fieldAngleDeg,
                                      peakCdPerKlm, etendueLimitDeg, ledger, farField
  --ies FILE [--lumens L]             the beam as IES LM-63-2019, scaled to L lm (default 1000)
  --profile FILE.csv                  the optic's meridian profile as a point list
  --write-rays FILE.csv [--ray-count N]   the package's escaping rays as a ray file (N traced rays, default 100000)

Example: outcouple optic --type tir --exit-diameter 20 --height 12 --material pmma --source lambertian:1x1 --rays 1000000 --json`;

const opticOptions = ['type', 'shape', 'exit-diameter', 'height', 'material', 'target-beam', 'reflectance', 'metal', 'gap', 'source',
  'wavelength', 'rays', 'seed', 'ies', 'lumens', 'profile', 'write-rays', 'ray-count'] as const;
/** The package options the optic's own names take (--shape, --height): renamed for the package source. */
const RENAMED: Record<string, string> = { 'shape-enc': 'shape', 'enc-height': 'height' };
const options: OptionSpec = { json: { type: 'boolean' }, 'shape-enc': { type: 'string' }, 'enc-height': { type: 'string' } };
for (const name of Object.keys(SCENARIO_OPTIONS)) if (!(opticOptions as readonly string[]).includes(name)) options[name] = { type: 'string' };
for (const name of opticOptions) options[name] = { type: 'string' };

const MAX_RAY_FILE_BYTES = 200 * 1024 * 1024;

function writeOutput(path: string, text: string, option: string): void {
  try {
    writeFileSync(path, text);
  } catch {
    throw new CliError(`--${option}: cannot write '${truncate(path, 80)}'`);
  }
}

/**
 * The package of --source package: the demo scenario or --scenario FILE.json with the package options on
 * top (the scenario's own schema and messages), its phosphor included; traced at its design wavelength.
 */
function packageSource(values: ParsedValues): { pkg: TracePackage; wavelengthNm: number; name: string } {
  const packageValues: ParsedValues = {};
  for (const [key, value] of Object.entries(values)) {
    const name = RENAMED[key] ?? key;
    if (name in SCENARIO_OPTIONS && !(opticOptions as readonly string[]).includes(key)) packageValues[name] = value;
  }
  let cli;
  try {
    cli = scenarioFromOptions(packageValues);
  } catch (error) {
    // the scenario's messages name --shape and --height for the encapsulant: here they are --shape-enc, --enc-height
    if (error instanceof CliError) throw new CliError(error.message.replace(/^--shape:/, '--shape-enc:').replace(/^--height:/, '--enc-height:'));
    throw error;
  }
  const { scenario, resolved } = cli;
  return { pkg: toWhitePackage(scenario, resolved), wavelengthNm: designWavelengthNm(scenario.emission), name: scenario.name };
}

function readRays(path: string) {
  let text: string;
  try {
    if (statSync(path).size > MAX_RAY_FILE_BYTES) throw new CliError(`--source rays: file is larger than 200 MB (${truncate(path, 80)})`);
    text = readFileSync(path, 'utf8');
  } catch (error) {
    if (error instanceof CliError) throw error;
    throw new CliError(`--source rays: cannot read '${truncate(path, 80)}'`);
  }
  try {
    return parseRayFile(text);
  } catch (error) {
    throw new CliError(`--source ${error instanceof Error ? error.message : String(error)}`);
  }
}

/** --source: package, lambertian:WxL, lambertian:disc:D, rays:FILE. */
function sourceOption(values: ParsedValues): { source: OpticSource; name: string } {
  const text = stringOption(values, 'source') ?? 'package';
  if (text === 'package') {
    const p = packageSource(values);
    return { source: { kind: 'package', pkg: p.pkg, wavelengthNm: p.wavelengthNm, scenario: p.name }, name: p.name };
  }
  const disc = /^lambertian:disc:([0-9.eE+-]+)$/.exec(text);
  const rect = /^lambertian:([0-9.eE+-]+)(?:x([0-9.eE+-]+))?$/.exec(text);
  const size = (s: string) => {
    const v = Number(s);
    const L = LIMITS.lambertianSourceMm;
    if (!(Number.isFinite(v) && v >= L.min && v <= L.max)) throw new CliError(`--source: the Lambertian source's size must be from ${L.min} to ${L.max} mm (got ${truncate(s)})`);
    return v;
  };
  if (disc) return { source: { kind: 'lambertian', shape: 'disc', widthMm: size(disc[1]) }, name: `Lambertian disc ${disc[1]} mm` };
  if (rect) {
    const w = size(rect[1]);
    const l = rect[2] === undefined ? w : size(rect[2]);
    return { source: { kind: 'lambertian', shape: 'rect', widthMm: w, lengthMm: l }, name: `Lambertian ${w}x${l} mm` };
  }
  if (text.startsWith('rays:')) {
    const list = readRays(text.slice(5));
    return { source: { kind: 'rays', list }, name: list.scenario || 'ray file' };
  }
  throw new CliError(`--source must be package, lambertian:WxL, lambertian:disc:D or rays:FILE.csv (got ${truncate(text)})`);
}

/** Core field names as the options that set them, so a core RangeError names what the user typed. */
const optionOfField: [RegExp, string][] = [
  [/\bexitDiameterMm\b/g, '--exit-diameter'], [/\bheightMm\b/g, '--height'], [/\bgapMm\b/g, '--gap'], [/\btargetBeamDeg\b/g, '--target-beam'],
  [/\breflectance\b/g, '--reflectance'], [/\bn of material\b/g, '--material'], [/^n must/g, '--material must'], [/\bwavelengthNm\b/g, '--wavelength']
];

function inOptionTerms(error: unknown): unknown {
  if (!(error instanceof RangeError)) return error;
  let message = error.message;
  for (const [pattern, option] of optionOfField) message = message.replace(pattern, option);
  return new CliError(message);
}

export async function run(argv: string[]): Promise<void> {
  const { values, positionals } = parseOptions(argv, options, 'optic');
  if (positionals.length) throw new CliError(`optic: unexpected argument '${truncate(positionals[0])}'`);
  if (values.type === undefined) throw new CliError('--type is required: reflector, lens or tir');
  const type = choiceOption(values, 'type', ['reflector', 'lens', 'tir'] as const, 'tir');
  const shapes = { reflector: ['paraboloid', 'cpc'], lens: ['aspheric', 'plano-convex'], tir: ['tir'] } as const;
  const shape = choiceOption(values, 'shape', shapes[type], shapes[type][0]);
  const exitDiameterMm = numberOption(values, 'exit-diameter', LIMITS.opticSizeMm.min, LIMITS.opticSizeMm.max, 20);
  const heightMm = numberOption(values, 'height', LIMITS.opticSizeMm.min, LIMITS.opticSizeMm.max, 12);
  const gapMm = numberOption(values, 'gap', LIMITS.opticGapMm.min, LIMITS.opticGapMm.max, 0.2);
  const targetBeamDeg = values['target-beam'] === undefined ? undefined : numberOption(values, 'target-beam', LIMITS.targetBeamDeg.min, LIMITS.targetBeamDeg.max);
  if (values.reflectance !== undefined && values.metal !== undefined) throw new CliError('give either --reflectance or --metal, not both');
  const reflectance = numberOption(values, 'reflectance', LIMITS.reflectance.min, LIMITS.reflectance.max, 0.92);
  const metal = stringOption(values, 'metal');
  if (metal !== undefined && !['al', 'ag', 'au'].includes(metal)) throw new CliError(`--metal must be al, ag or au (got ${truncate(metal)})`);
  const material = stringOption(values, 'material') ?? 'pmma';
  const rays = integerOption(values, 'rays', LIMITS.opticRays.min, LIMITS.opticRays.max, 1_000_000);
  const seed = integerOption(values, 'seed', LIMITS.seed.min, LIMITS.seed.max, 1);
  const lumens = numberOption(values, 'lumens', 1e-6, 1e7, 1000);
  const wavelengthNm = numberOption(values, 'wavelength', 360, 830, 550);
  const { source, name } = sourceOption(values);

  const writeRaysPath = stringOption(values, 'write-rays');
  const notes: string[] = [];
  if (writeRaysPath) {
    if (source.kind !== 'package') throw new CliError('--write-rays needs --source package (it writes the package\'s escaping rays)');
    const count = integerOption(values, 'ray-count', 1000, 2_000_000, 100_000);
    writeOutput(writeRaysPath, packageRayFile(source.pkg, count, seed, source.wavelengthNm, name), 'write-rays');
    notes.push(`the package's escaping rays of ${count} traced written to ${writeRaysPath}`);
  }

  const started = performance.now();
  let run;
  try {
    run = runOptic({
      design: { type, shape, exitDiameterMm, heightMm, gapMm, targetBeamDeg, reflectance, material },
      source,
      metal,
      wavelengthNm,
      rays,
      seed
    });
  } catch (error) {
    throw inOptionTerms(error);
  }
  const seconds = (performance.now() - started) / 1000;
  const { results: r, prepared } = run;
  const profilePath = stringOption(values, 'profile');
  if (profilePath) {
    writeOutput(profilePath, profileCsv(prepared.design), 'profile');
    notes.push(`profile written to ${profilePath}`);
  }
  const iesPath = stringOption(values, 'ies');
  if (iesPath) {
    if (r.ledger.out + r.ledger.missed === 0) throw new CliError('no ray left the optic, so there is no beam to write');
    const text = opticIes({ results: r, exitDiameterMm, lumens, seed, issueDate: new Date().toISOString().slice(0, 10), name: `${name}, ${type}` });
    writeOutput(iesPath, text, 'ies');
    notes.push(`IES LM-63 file written to ${iesPath} (${lumens} lm)`);
  }
  const d = prepared.design;
  const failures = d.tirFailures?.length ?? 0;
  if (failures) notes.push(`${failures} design rays meet the TIR wall below the critical angle: they leak through the side`);
  notes.push('Caution: a collimated LED beam is much brighter on axis than the bare package; assess photobiological safety under IEC 62471 and follow local codes.');
  const result = {
    type,
    shape: d.shape,
    source: prepared.footprint.label,
    wavelengthNm: prepared.wavelengthNm,
    n: d.n,
    exitDiameterMm,
    heightMm: d.heightMm,
    gapMm,
    efficiency: r.efficiency,
    efficiencyInBeam: r.efficiencyInBeam,
    beamAngleDeg: r.beamAngleDeg,
    fieldAngleDeg: r.fieldAngleDeg,
    peakCdPerKlm: r.peakCdPerKlm,
    etendueLimitDeg: r.etendueLimitDeg,
    etendueRatio: r.etendueRatio,
    ledger: r.ledger,
    parts: r.parts,
    farField: r.farField,
    rays,
    seed,
    seconds
  };
  const rows: Row[] = [
    ['Optic', `${type} (${d.shape}), exit ${exitDiameterMm} mm, height ${d.heightMm.toFixed(2)} mm, gap ${gapMm} mm`],
    ['Source', prepared.footprint.label],
    ['Efficiency (out / into the optic)', percent(r.efficiency)],
    ['Efficiency in the beam (/ source)', percent(r.efficiencyInBeam)],
    ['Beam angle (50 %)', r.beamAngleDeg.toFixed(2), '°'],
    ['Field angle (10 %)', r.fieldAngleDeg.toFixed(2), '°'],
    ['Peak intensity', r.peakCdPerKlm.toFixed(0), 'cd/klm'],
    ['Étendue limit for this source and exit', r.etendueLimitDeg.toFixed(2), '°'],
    ...Object.entries(r.ledger).map(([k, v]): Row => [`Ledger: ${k}`, percent(v)]),
    ['Rays', rays],
    ['Time', seconds.toFixed(2), 's']
  ];
  if (values.json === true) {
    process.stdout.write(JSON.stringify({ ...result, notes }, exportJsonReplacer) + '\n');
    return;
  }
  emit(false, result, 'Optic over the package', rows, notes);
}
