/**
 * The command line's phosphor options (trace, phosphor-load): a library phosphor by particles (Mie),
 * or a measured coefficient table; its emission, quantum yield and region. Ranges from the one limits
 * table (src/lib/scenario/limits.ts); a bad value is one line naming the option and its range.
 */
import { readFileSync, statSync } from 'node:fs';
import { LIMITS } from '../lib/scenario';
import { PHOSPHOR_REGIONS } from '../lib/trace/package-phosphor';
import { gaussianRows, libraryPhosphor, type PhosphorSetting } from '../lib/trace/white-light';
import { validateTracePackage, type TracePackage } from '../lib/trace/package-spec';
import { listPhosphors } from '../lib/phosphors';
import { CliError } from './cli-error';
import { choiceOption, numberOption, stringOption, truncate, type OptionSpec, type ParsedValues } from './options';

export const PHOSPHOR_OPTION_HELP = `Phosphor (white light; rays then carry their wavelength)
  --phosphor ID                       library phosphor: ${listPhosphors().map((p) => p.id).join(', ')}
  --phosphor-wt W                     phosphor weight in the encapsulant, ${LIMITS.phosphorWeightPercent.min} to ${LIMITS.phosphorWeightPercent.max} wt% (default 8)
  --phosphor-diameter D               particle diameter, ${LIMITS.phosphorDiameterUm.min} to ${LIMITS.phosphorDiameterUm.max} µm (default: the phosphor's typical d50)
  --phosphor-coefficients FILE.csv    instead of particles: columns wavelength_nm, mus_per_mm, mua_per_mm, g
                                      (linear between rows, the ends held; no Mie is run)
  --phosphor-emission FILE.csv|gaussian:PEAK:FWHM   emission spectrum (needed with a coefficients file)
  --quantum-yield Q                   0 to 1 (default: the phosphor's typical)
  --phosphor-region ${PHOSPHOR_REGIONS.join('|')}   where it is (default encapsulant: dispersed in all of it);
                                      conformal: a layer around the chip's top and sides; remote: the top of a
                                      flat fill or cylinder, or a shell under a dome; floor: settled around the chip
  --phosphor-thickness T              layer thickness, ${LIMITS.phosphorThicknessMm.min} to ${LIMITS.phosphorThicknessMm.max} mm (needed for the layer regions)`;

export const PHOSPHOR_OPTIONS: OptionSpec = Object.fromEntries(
  ['phosphor', 'phosphor-wt', 'phosphor-diameter', 'phosphor-coefficients', 'phosphor-emission', 'quantum-yield', 'phosphor-region', 'phosphor-thickness'].map(
    (n) => [n, { type: 'string' as const }]
  )
);

const MAX_BYTES = 5e6;

function readRows(option: string, path: string, columns: string[]): number[][] {
  let text: string;
  try {
    if (statSync(path).size > MAX_BYTES) throw new CliError(`--${option}: '${truncate(path, 80)}' is larger than ${MAX_BYTES / 1e6} MB`);
    text = readFileSync(path, 'utf8');
  } catch (error) {
    if (error instanceof CliError) throw error;
    throw new CliError(`--${option}: cannot read '${truncate(path, 80)}'`);
  }
  const rows: number[][] = [];
  let firstLine = true;
  text.split(/\r?\n/).forEach((line, i) => {
    const t = line.trim();
    if (t === '' || t.startsWith('#')) return;
    const cells = t.split(/[,;\t]/).map((c) => c.trim());
    // only the first line may be a header (column names)
    const header = firstLine && cells.some((c) => Number.isNaN(Number(c)));
    firstLine = false;
    if (header) return;
    const nums = cells.map((c) => (c === '' ? NaN : Number(c)));
    if (nums.length !== columns.length || nums.some((v) => !Number.isFinite(v))) {
      throw new CliError(`--${option}: line ${i + 1} must hold ${columns.length} numbers (${columns.join(', ')})`);
    }
    if (rows.length && !(nums[0] > rows[rows.length - 1][0])) throw new CliError(`--${option}: line ${i + 1}: wavelength_nm must be above the previous row's (rows sorted, no repeats)`);
    const negative = nums.findIndex((v, k) => k > 0 && v < 0 && columns[k] !== 'g');
    if (negative > 0) throw new CliError(`--${option}: line ${i + 1}: ${columns[negative]} must be ≥ 0 (got ${nums[negative]})`);
    rows.push(nums);
  });
  if (!rows.length) throw new CliError(`--${option}: '${truncate(path, 80)}' holds no rows of ${columns.join(', ')}`);
  return rows;
}

function emissionOption(values: ParsedValues): [number, number][] | undefined {
  const raw = stringOption(values, 'phosphor-emission');
  if (raw === undefined) return undefined;
  const m = /^gaussian:([^:]+):([^:]+)$/.exec(raw);
  if (m) {
    const peak = Number(m[1]);
    const fwhm = Number(m[2]);
    const W = LIMITS.wavelengthNm;
    const F = LIMITS.phosphorEmissionFwhmNm;
    if (!(peak >= W.min && peak <= W.max)) throw new CliError(`--phosphor-emission: PEAK must be from ${W.min} to ${W.max} nm (got '${truncate(m[1])}')`);
    if (!(fwhm >= F.min && fwhm <= F.max)) throw new CliError(`--phosphor-emission: FWHM must be from ${F.min} to ${F.max} nm (got '${truncate(m[2])}')`);
    return gaussianRows(peak, fwhm);
  }
  const rows = readRows('phosphor-emission', raw, ['wavelength_nm', 'value']);
  if (!rows.some((r) => r[1] > 0)) throw new CliError('--phosphor-emission: some value must be above 0');
  return rows as [number, number][];
}

/** The particle diameter, µm, inside the range the Mie evaluation supports (said so when outside). */
function diameterOption(values: ParsedValues, fallback: number): number {
  const D = LIMITS.phosphorDiameterUm;
  try {
    return numberOption(values, 'phosphor-diameter', D.min, D.max, fallback);
  } catch (error) {
    if (error instanceof CliError) throw new CliError(`${error.message}: particle diameters in µm, the range the Mie evaluation supports`);
    throw error;
  }
}

/**
 * Checks that the phosphor's region fits the package (the tracer's edge check), naming the command
 * line's option rather than the package field: --phosphor-thickness or --phosphor-region.
 */
export function checkPhosphorFit(pkg: TracePackage): void {
  if (!pkg.phosphor) return;
  try {
    validateTracePackage(pkg);
  } catch (error) {
    if (!(error instanceof RangeError)) throw error;
    const m = /^phosphor\.(thicknessMm|region): (.*)$/.exec(error.message);
    if (m) throw new CliError(`--phosphor-${m[1] === 'region' ? 'region' : 'thickness'}: ${m[2]}`);
    throw error;
  }
}

/** The phosphor setting the options name, or null when no phosphor option is given. */
export function phosphorFromOptions(values: ParsedValues, defaultWeightPercent = 8): PhosphorSetting | null {
  const given = Object.keys(PHOSPHOR_OPTIONS).some((k) => values[k] !== undefined);
  if (!given) return null;
  const region = choiceOption(values, 'phosphor-region', PHOSPHOR_REGIONS, 'encapsulant');
  const Th = LIMITS.phosphorThicknessMm;
  if (region === 'encapsulant' && values['phosphor-thickness'] !== undefined) {
    throw new CliError('--phosphor-thickness applies to a layer region (conformal, remote, floor); the encapsulant region fills the whole encapsulant');
  }
  if (region !== 'encapsulant' && values['phosphor-thickness'] === undefined) {
    throw new CliError(`--phosphor-region ${region} needs --phosphor-thickness T (${Th.min} to ${Th.max} mm)`);
  }
  const placement = region === 'encapsulant' ? { region } : { region, thicknessMm: numberOption(values, 'phosphor-thickness', Th.min, Th.max) };
  const emission = emissionOption(values);
  const coefficientsPath = stringOption(values, 'phosphor-coefficients');
  const Q = LIMITS.quantumYield;
  if (coefficientsPath !== undefined) {
    if (values.phosphor !== undefined) throw new CliError('give --phosphor ID or --phosphor-coefficients FILE, not both');
    const rows = readRows('phosphor-coefficients', coefficientsPath, ['wavelength_nm', 'mus_per_mm', 'mua_per_mm', 'g']);
    rows.forEach((r, i) => {
      if (!(r[3] > -1 && r[3] < 1)) throw new CliError(`--phosphor-coefficients: row ${i + 1}: g must lie in (−1, 1) (got ${r[3]})`);
    });
    if (!emission) throw new CliError('--phosphor-coefficients needs --phosphor-emission FILE.csv or gaussian:PEAK:FWHM');
    return {
      ...placement,
      kind: 'table',
      coefficients: rows as [number, number, number, number][],
      emission,
      quantumYield: numberOption(values, 'quantum-yield', Q.min, Q.max, 0.95)
    };
  }
  const id = stringOption(values, 'phosphor');
  if (id === undefined) throw new CliError('--phosphor ID (or --phosphor-coefficients FILE) is needed with the phosphor options');
  let phosphor;
  try {
    phosphor = libraryPhosphor(id, '--phosphor');
  } catch {
    throw new CliError(`--phosphor: unknown phosphor '${truncate(id)}' (one of ${listPhosphors().map((p) => p.id).join(', ')})`);
  }
  const W = LIMITS.phosphorWeightPercent;
  return {
    ...placement,
    kind: 'particles',
    phosphor,
    weightPercent: numberOption(values, 'phosphor-wt', W.min, W.max, defaultWeightPercent),
    diameterUm: diameterOption(values, phosphor.typicalD50Um),
    quantumYield: numberOption(values, 'quantum-yield', Q.min, Q.max, phosphor.quantumYield),
    ...(emission ? { emission } : {})
  };
}
