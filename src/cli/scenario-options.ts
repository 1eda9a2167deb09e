/**
 * The command line's package options ARE the scenario: they start from the app's demo scenario (or a
 * `--scenario FILE`, the same JSON the page exports), each option overwrites one field, and the result
 * goes through the scenario schema — the same check, limits and messages as the page. An issue's path
 * is mapped back to the option that set it, so the message names what the user typed.
 */
import { readFileSync, statSync } from 'node:fs';
import { findMaterial } from '../lib/materials';
import { demoScenario, readScenario, resolveScenario, type ResolvedScenario, type Scenario } from '../lib/scenario';
import type { MediumSpec } from '../lib/scenario/schema';
import { layerSpan } from '../lib/scenario/package-fit';
import { parseNumber } from '../lib/components/parse-number';
import { CliError } from './cli-error';
import { truncate, type OptionSpec, type ParsedValues } from './options';

/** Option name → what it sets, for --help texts. */
export const SCENARIO_OPTION_HELP = `Package (defaults: the app's demo scenario, or the --scenario file)
  --scenario FILE.json                a scenario exported by the app (any version); options given here win
  --wavelength NM                     single emission wavelength, nm
  --n-chip N | --chip-material M      chip: typed index (n or n+ki) or library material
  --chip WxLxH                        chip size in mm (WxL keeps the height)
  --emitter-z Z                       emitting plane height in mm, 0 to the chip height
                                      (default: the scenario's, scaled with the chip height)
  --emission plane|volume             emitting plane, or the whole chip volume
  --chip-absorption A                 chip bulk absorption, 1/mm
  --chip-layers "T:N:A,T:N:A"         layered chip, bottom to top: thickness mm : index or material id :
                                      absorption 1/mm (the chip height becomes their total)
  --emit-layer L                      emitting layer, counted from 1 at the bottom (the emitter moves to
                                      its middle unless --emitter-z is given)
  --chip-mirror R|METAL|none          the chip's own bottom mirror: reflectance 0 to 1, or a metal
  --top-texture S                     textured chip top: fraction 0 to 1 leaving in a Lambertian direction
  --body flat|cup                     flat base, or a reflector cup (the chip stands on its floor)
  --cup-floor-radius R --cup-top-radius R --cup-depth D   cup size, mm (defaults 1.3, 1.5, 0.8)
  --wall specular|diffuse --wall-reflectance R            cup wall finish and reflectance (diffuse, 0.93)
  --shape flat|dome|none|cylinder|box encapsulant shape; in a cup: flat fills it to the rim, dome adds a
                                      dome on the rim plane, none leaves it empty (--body cup alone: flat);
                                      box: a square block (--radius its half side)
  --radius R --height H               encapsulant radius (a box's half side) and height, mm (a dome with
                                      H = R is a hemisphere)
  --n-enc N | --enc-material M        encapsulant: typed index or library material
  --enc-absorption A                  encapsulant bulk absorption, 1/mm
  --base-reflectance R | --base-material METAL   base (the cup floor): reflectance 0 to 1, or a metal
  --base specular|diffuse             base finish (diffuse needs --base-reflectance)
  --n-out N | --out-material M        outside medium (the demo: air)
  --rays N --seed S                   trace settings
  --polarization average|track        Fresnel choice from (Rs+Rp)/2, or a tracked field
Ranges are the app's; a value out of range is refused with the range named.`;

const NAMES = ['scenario', 'wavelength', 'n-chip', 'chip-material', 'chip', 'emitter-z', 'emission', 'chip-absorption', 'shape',
  'radius', 'height', 'n-enc', 'enc-material', 'enc-absorption', 'base-reflectance', 'base-material', 'n-out', 'out-material',
  'rays', 'seed', 'polarization', 'body', 'cup-floor-radius', 'cup-top-radius', 'cup-depth', 'wall-reflectance', 'wall', 'base',
  'top-texture', 'chip-layers', 'emit-layer', 'chip-mirror'] as const;

/** The cup --body cup starts from when the scenario has none (the mid-power preset's). */
const DEFAULT_CUP = { kind: 'cup', floorRadiusMm: 1.3, topRadiusMm: 1.5, depthMm: 0.8, wallFinish: 'diffuse', wallReflectance: 0.93 } as const;
const CUP_OPTIONS = ['cup-floor-radius', 'cup-top-radius', 'cup-depth', 'wall-reflectance', 'wall'] as const;

export const SCENARIO_OPTIONS: OptionSpec = Object.fromEntries(NAMES.map((name) => [name, { type: 'string' as const }]));

/** Scenario path prefix → the options that set it, or that make it fail (a material at a new wavelength), most direct first. */
const OPTION_OF_PATH: [prefix: string, options: readonly string[]][] = [
  ['emission', ['wavelength']],
  ['chip.medium', ['n-chip', 'chip-material', 'wavelength']],
  ['chip.widthMm', ['chip']],
  ['chip.lengthMm', ['chip']],
  ['chip.heightMm', ['chip', 'chip-layers']],
  ['chip.emitterZMm', ['emitter-z', 'emit-layer', 'chip-layers', 'chip']],
  ['chip.absorptionPerMm', ['chip-absorption']],
  ['chip.emission', ['emission']],
  ['chip.topTexture', ['top-texture']],
  ['chip.layers', ['chip-layers', 'wavelength']],
  ['chip.emitLayer', ['emit-layer', 'chip-layers']],
  ['chip.mirror', ['chip-mirror', 'wavelength']],
  ['baseFinish', ['base', 'base-material']],
  ['base', ['base-reflectance', 'base-material', 'wavelength']],
  ['body.floorRadiusMm', ['cup-floor-radius', 'chip', 'body']],
  ['body.topRadiusMm', ['cup-top-radius', 'cup-floor-radius', 'body']],
  ['body.depthMm', ['cup-depth', 'chip', 'chip-layers', 'body']],
  ['body.wallFinish', ['wall']],
  ['body.wallReflectance', ['wall-reflectance']],
  ['body', ['body']],
  ['encapsulant.medium', ['n-enc', 'enc-material', 'wavelength', 'shape']],
  ['encapsulant.shape', ['shape', 'body']],
  ['encapsulant.radiusMm', ['radius', 'cup-top-radius', 'chip', 'height', 'shape', 'body']],
  ['encapsulant.heightMm', ['height', 'chip', 'shape']],
  ['encapsulant.absorptionPerMm', ['enc-absorption']],
  ['outside', ['n-out', 'out-material', 'wavelength']],
  ['trace.rays', ['rays']],
  ['trace.seed', ['seed']],
  ['trace.polarization', ['polarization']]
];

/** The option a schema issue path belongs to: the first one of its options the user gave, else --scenario or the demo. */
export function optionForPath(path: string, given: (name: string) => boolean, fromFile: boolean): string {
  const entry = OPTION_OF_PATH.find(([prefix]) => path === prefix || path.startsWith(`${prefix}.`));
  const option = entry?.[1].find(given);
  if (option) return `--${option}`;
  return fromFile ? '--scenario' : 'the demo scenario';
}

const MAX_SCENARIO_BYTES = 2 * 1024 * 1024;

/** Reads --scenario: a scenario exported by the app (any known version), or a page export holding one under `scenario`. */
function readScenarioFile(path: string): unknown {
  let text: string;
  try {
    if (statSync(path).size > MAX_SCENARIO_BYTES) throw new CliError(`--scenario: file is larger than 2 MB (${truncate(path, 80)})`);
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
  return 'scenario' in object && !('chip' in object) ? object.scenario : object;
}

/** A typed number as the user wrote it; text that is not a plain decimal number becomes NaN for the schema to refuse. */
function numberOf(raw: string): number {
  return parseNumber(raw) ?? Number.NaN;
}

/** "2.45" or "2.4+0.01i" → a typed index; the schema checks its range. */
function typedIndex(raw: string): MediumSpec {
  const m = /^\s*([^+\s]+?)\s*(?:\+\s*([^i\s]*)\s*i)?\s*$/.exec(raw);
  return { kind: 'index', n: m ? numberOf(m[1]) : Number.NaN, k: m && m[2] !== undefined ? numberOf(m[2] === '' ? '1' : m[2]) : 0 };
}

/** A library material by id, name or alias; an unknown name goes through as an id the schema refuses by name. */
function libraryMedium(raw: string): MediumSpec {
  const material = findMaterial(raw.trim());
  return { kind: 'material', id: material ? material.id : raw.trim().toLowerCase().slice(0, 40) };
}

function either(values: ParsedValues, typed: string, named: string): string | undefined {
  if (values[typed] !== undefined && values[named] !== undefined) throw new CliError(`give either --${typed} or --${named}, not both`);
  return values[typed] !== undefined ? typed : values[named] !== undefined ? named : undefined;
}

function text(values: ParsedValues, name: string): string {
  const raw = values[name];
  if (typeof raw !== 'string' || raw.trim() === '') throw new CliError(`--${name} needs a value`);
  if (raw.length > 200) throw new CliError(`--${name} is too long (at most 200 characters)`);
  return raw;
}

/**
 * --chip-layers "0.005:2.45:0.5,0.15:sapphire-o:0": thickness mm : index or material id : absorption
 * 1/mm, bottom to top. Each layer is named after its material (or "layer i" for a typed index); the
 * chip height becomes the total, and the emitting layer stays the bottom one unless --emit-layer says.
 */
function applyLayers(s: Scenario, raw: string): void {
  const pieces = raw.split(',').map((p) => p.trim());
  const layers = pieces.map((piece, i) => {
    const parts = piece.split(':').map((p) => p.trim());
    if (parts.length !== 3 || parts.some((p) => p === '')) {
      throw new CliError(`--chip-layers: layer ${i + 1} must be THICKNESS:INDEX-OR-MATERIAL:ABSORPTION, e.g. 0.15:sapphire-o:0 (got '${truncate(piece)}')`);
    }
    const [t, medium, a] = parts;
    const typed = /^[-+.\d]/.test(medium);
    const spec = typed ? { kind: 'index' as const, n: numberOf(medium) } : libraryMedium(medium);
    const name = !typed && spec.kind === 'material' ? spec.id : `layer ${i + 1}`;
    return { name, medium: spec as NonNullable<Scenario['chip']['layers']>[number]['medium'], thicknessMm: numberOf(t), absorptionPerMm: numberOf(a) };
  });
  // names are the ledger's bins: two layers of one material are told apart by their number
  const repeated = new Set(layers.map((l) => l.name).filter((name, i, all) => all.indexOf(name) !== i));
  layers.forEach((layer, i) => {
    if (repeated.has(layer.name)) layer.name = `${layer.name} (layer ${i + 1})`;
  });
  s.chip.layers = layers;
  if (s.chip.emitLayer === undefined || s.chip.emitLayer >= layers.length) s.chip.emitLayer = 0;
  const total = layers.reduce((sum, l) => sum + l.thicknessMm, 0);
  if (Number.isFinite(total)) s.chip.heightMm = Number(total.toPrecision(12));
}

/** The scenario object the options describe, before validation. */
function applyOptions(base: Scenario, values: ParsedValues): Scenario {
  const s = structuredClone(base);
  const has = (name: string) => values[name] !== undefined;
  if (has('wavelength')) s.emission = { kind: 'single', wavelengthNm: numberOf(text(values, 'wavelength')) };

  const chipMedium = either(values, 'n-chip', 'chip-material');
  if (chipMedium) s.chip.medium = chipMedium === 'n-chip' ? typedIndex(text(values, 'n-chip')) : libraryMedium(text(values, 'chip-material'));
  if (has('chip')) {
    const raw = text(values, 'chip');
    const pieces = raw.toLowerCase().split(/[x×*]/).map((p) => p.trim());
    if (pieces.length !== 2 && pieces.length !== 3) {
      throw new CliError(`--chip must look like WIDTHxLENGTHxHEIGHT or WIDTHxLENGTH in mm, e.g. 1x1x0.15 (got '${truncate(raw)}')`);
    }
    const [w, l, h] = pieces.map(numberOf);
    s.chip.widthMm = w;
    s.chip.lengthMm = l;
    if (h !== undefined) {
      // the emitter keeps its place relative to the chip height unless --emitter-z says otherwise
      if (!has('emitter-z') && Number.isFinite(h)) s.chip.emitterZMm = Number(((s.chip.emitterZMm / s.chip.heightMm) * h).toPrecision(12));
      s.chip.heightMm = h;
    }
  }
  if (has('chip-layers')) applyLayers(s, text(values, 'chip-layers'));
  if (has('emit-layer')) {
    const raw = text(values, 'emit-layer');
    const count = s.chip.layers?.length ?? 1;
    const n = numberOf(raw);
    if (!Number.isInteger(n) || n < 1 || n > count) {
      throw new CliError(`--emit-layer must be a whole layer number from 1 to ${count} (got '${truncate(raw)}')`);
    }
    s.chip.emitLayer = n - 1;
  }
  // a new layer stack or emitting layer puts the emitter in the middle of the emitting layer
  if ((has('chip-layers') || has('emit-layer')) && s.chip.layers) {
    const [z0, z1] = layerSpan(s.chip.layers, s.chip.emitLayer ?? 0);
    s.chip.emitterZMm = Number(((z0 + z1) / 2).toPrecision(12));
  }
  if (has('emitter-z')) s.chip.emitterZMm = numberOf(text(values, 'emitter-z'));
  if (has('chip-mirror')) {
    const raw = text(values, 'chip-mirror').trim();
    if (raw.toLowerCase() === 'none') delete s.chip.mirror;
    else if (/^[-+.\d]/.test(raw)) s.chip.mirror = { kind: 'reflectance', reflectance: numberOf(raw) };
    else {
      const material = findMaterial(raw);
      s.chip.mirror = { kind: 'metal', id: material ? material.id : raw.toLowerCase().slice(0, 40) };
    }
  }
  if (has('top-texture')) s.chip.topTexture = numberOf(text(values, 'top-texture'));
  if (has('emission')) s.chip.emission = text(values, 'emission') as Scenario['chip']['emission'];
  if (has('chip-absorption')) s.chip.absorptionPerMm = numberOf(text(values, 'chip-absorption'));

  if (has('body')) {
    const body = text(values, 'body').trim();
    if (body === 'flat') s.body = { kind: 'flat' };
    else if (body === 'cup') {
      if (s.body.kind !== 'cup') {
        s.body = { ...DEFAULT_CUP };
        // a cup alone is filled flat to its rim
        if (!has('shape')) s.encapsulant.shape = 'flat';
      }
    } else throw new CliError(`--body must be 'flat' or 'cup' (got '${truncate(body)}')`);
  }
  const cupOption = CUP_OPTIONS.find(has);
  if (cupOption && s.body.kind !== 'cup') throw new CliError(`--${cupOption} needs --body cup (a reflector cup)`);
  if (s.body.kind === 'cup') {
    const cup = s.body;
    if (has('cup-floor-radius')) cup.floorRadiusMm = numberOf(text(values, 'cup-floor-radius'));
    if (has('cup-top-radius')) cup.topRadiusMm = numberOf(text(values, 'cup-top-radius'));
    if (has('cup-depth')) cup.depthMm = numberOf(text(values, 'cup-depth'));
    if (has('wall-reflectance')) cup.wallReflectance = numberOf(text(values, 'wall-reflectance'));
    if (has('wall')) cup.wallFinish = text(values, 'wall').trim() as 'specular';
  }
  if (has('base')) s.baseFinish = text(values, 'base').trim() as Scenario['baseFinish'];
  if (has('shape')) s.encapsulant.shape = text(values, 'shape') as Scenario['encapsulant']['shape'];
  if (has('radius')) s.encapsulant.radiusMm = numberOf(text(values, 'radius'));
  if (has('height')) s.encapsulant.heightMm = numberOf(text(values, 'height'));
  const encMedium = either(values, 'n-enc', 'enc-material');
  if (encMedium === 'n-enc') {
    const typed = typedIndex(text(values, 'n-enc'));
    if (typed.kind === 'index' && typed.k !== 0) throw new CliError("--n-enc: give the encapsulant's index n alone; its loss is --enc-absorption (1/mm)");
    s.encapsulant.medium = { kind: 'index', n: typed.kind === 'index' ? typed.n : Number.NaN };
  } else if (encMedium) s.encapsulant.medium = libraryMedium(text(values, 'enc-material'));
  if (has('enc-absorption')) s.encapsulant.absorptionPerMm = numberOf(text(values, 'enc-absorption'));

  const baseOption = either(values, 'base-reflectance', 'base-material');
  if (baseOption === 'base-reflectance') s.base = { kind: 'reflectance', reflectance: numberOf(text(values, 'base-reflectance')) };
  if (baseOption === 'base-material') {
    const material = findMaterial(text(values, 'base-material').trim());
    s.base = { kind: 'metal', id: material ? material.id : text(values, 'base-material').trim().toLowerCase().slice(0, 40) };
  }
  const outside = either(values, 'n-out', 'out-material');
  if (outside) s.outside = outside === 'n-out' ? typedIndex(text(values, 'n-out')) : libraryMedium(text(values, 'out-material'));

  if (has('rays')) s.trace.rays = numberOf(text(values, 'rays'));
  if (has('seed')) s.trace.seed = numberOf(text(values, 'seed'));
  if (has('polarization')) s.trace.polarization = text(values, 'polarization') as Scenario['trace']['polarization'];
  return s;
}

export interface CliScenario {
  scenario: Scenario;
  resolved: ResolvedScenario;
  /** Library range warnings for the media used. */
  warnings: string[];
}

/**
 * The scenario the options describe: the demo (or --scenario FILE) with each given option applied,
 * validated by the scenario schema. A refusal names the option behind the first issue and the
 * schema's own message.
 * @throws CliError (exit code 2)
 */
export function scenarioFromOptions(values: ParsedValues): CliScenario {
  const file = values.scenario !== undefined ? text(values, 'scenario').trim() : undefined;
  let base: Scenario = demoScenario();
  if (file !== undefined) {
    const read = readScenario(readScenarioFile(file));
    if (!read.ok) throw new CliError(`--scenario: ${read.message}`);
    base = read.scenario;
  }
  const read = readScenario(applyOptions(base, values));
  if (!read.ok) {
    const issue = read.issues[0];
    const option = optionForPath(issue.path, (name) => values[name] !== undefined, file !== undefined);
    throw new CliError(`${option}: ${issue.message}`);
  }
  const resolved = resolveScenario(read.scenario);
  return { scenario: read.scenario, resolved, warnings: resolved.warnings };
}
