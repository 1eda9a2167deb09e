import { LIMITS, toTracePackage } from '../../lib/scenario';
import { chipSpectrumRows, libraryPhosphor, traceWhite } from '../../lib/trace/white-light';
import { libraryOptics } from '../../lib/white/particle-optics';
import { withMixture, type MixComponent } from '../../lib/white/phosphor-mix';
import { parseWhiteSweepValues, runWhiteSweep, whiteSweepCsv, WHITE_SWEEP_AXES, MAX_WHITE_SWEEP_POINTS, type WhiteSweepAxis } from '../../lib/white/white-sweep';
import { listPhosphors } from '../../lib/phosphors';
import { CliError } from '../cli-error';
import { numberOption, parseOptions, stringOption, truncate, type OptionSpec } from '../options';
import { emit, type Row } from '../output';
import { PHOSPHOR_OPTION_HELP, PHOSPHOR_OPTIONS, phosphorFromOptions } from '../phosphor-options';
import { SCENARIO_OPTION_HELP, SCENARIO_OPTIONS, scenarioFromOptions } from '../scenario-options';

export const summary = 'CCT, efficacy and colour over angle of a white package against phosphor load or particle size';
export const help = `outcouple phosphor-sweep — the white trace over a list of phosphor loads or particle diameters

Traces the package at each value with the same rays and seed (common random numbers) and prints per
point: CCT ± σ, Duv, Ra, luminous efficacy of radiation (lm/W), lumens per watt of chip light, watts out
per watt of chip light, and Δu′v′ over angle (largest distance of a 10° band from the whole output).
Give exactly one of --loads and --diameters (1 to ${MAX_WHITE_SWEEP_POINTS} increasing values); the other
quantity stays at --phosphor-wt / --phosphor-diameter. Default rays: 20000 per point.

  --loads 2,4,8,12                    phosphor loads, ${LIMITS.phosphorWeightPercent.min} to ${LIMITS.phosphorWeightPercent.max} wt% (above 0)
  --diameters 2,6,12,20               particle diameters, ${LIMITS.phosphorDiameterUm.min} to ${LIMITS.phosphorDiameterUm.max} µm
  --red-phosphor ID --red-wt W        a red phosphor mixed in at a fixed load (its typical size and QY)
${SCENARIO_OPTION_HELP}
${PHOSPHOR_OPTION_HELP}
  --csv                               print CSV (one row per point) instead of the table
  --json                              print one JSON object

Example: outcouple phosphor-sweep --phosphor garnet-yellow --loads 2,4,8,12`;

const options: OptionSpec = {
  ...SCENARIO_OPTIONS, ...PHOSPHOR_OPTIONS,
  loads: { type: 'string' }, diameters: { type: 'string' },
  'red-phosphor': { type: 'string' }, 'red-wt': { type: 'string' },
  csv: { type: 'boolean' }, json: { type: 'boolean' }
};

export async function run(argv: string[]): Promise<void> {
  const { values, positionals } = parseOptions(argv, options, 'phosphor-sweep');
  if (positionals.length) throw new CliError(`phosphor-sweep: unexpected argument '${truncate(positionals[0])}'`);
  const loadsText = stringOption(values, 'loads');
  const diametersText = stringOption(values, 'diameters');
  if ((loadsText === undefined) === (diametersText === undefined)) throw new CliError('give exactly one of --loads and --diameters');
  const axis: WhiteSweepAxis = loadsText !== undefined ? 'load' : 'diameter';
  const option = axis === 'load' ? 'loads' : 'diameters';
  let sweep: number[];
  try {
    sweep = parseWhiteSweepValues(axis, (loadsText ?? diametersText)!);
  } catch (error) {
    throw new CliError(`--${option}: ${(error as Error).message}`);
  }
  if (axis === 'load' && values['phosphor-wt'] !== undefined) throw new CliError('--phosphor-wt and --loads both set the load; give one');
  if (axis === 'diameter' && values['phosphor-diameter'] !== undefined) throw new CliError('--phosphor-diameter and --diameters both set the size; give one');
  if (values['phosphor-coefficients'] !== undefined) throw new CliError('phosphor-sweep needs --phosphor ID (a load of particles), not --phosphor-coefficients');
  if (values['phosphor-emission'] !== undefined) throw new CliError("phosphor-sweep uses the phosphors' own emission; leave --phosphor-emission out");
  const setting = phosphorFromOptions({ phosphor: 'garnet-yellow', ...values });
  if (!setting || setting.kind !== 'particles') throw new CliError('--phosphor ID is needed');
  const main: MixComponent = { optics: libraryOptics(setting.phosphor), weightPercent: setting.weightPercent, diameterUm: setting.diameterUm, quantumYield: setting.quantumYield };
  const kinds = [main];
  const redId = stringOption(values, 'red-phosphor');
  if (redId !== undefined) {
    let p;
    try {
      p = libraryPhosphor(redId);
    } catch {
      throw new CliError(`--red-phosphor: unknown phosphor '${truncate(redId)}' (one of ${listPhosphors().map((x) => x.id).join(', ')})`);
    }
    const W = LIMITS.phosphorWeightPercent;
    kinds.push({ optics: libraryOptics(p), weightPercent: numberOption(values, 'red-wt', W.min, W.max), diameterUm: p.typicalD50Um, quantumYield: p.quantumYield });
  } else if (values['red-wt'] !== undefined) throw new CliError('--red-wt needs --red-phosphor ID');
  if (values.rays === undefined) values.rays = '20000';
  const { scenario, resolved } = scenarioFromOptions(values);
  const { rays, seed } = scenario.trace;
  const clearPkg = toTracePackage(scenario, resolved);
  const chip = chipSpectrumRows(scenario.emission);
  const started = performance.now();
  let points;
  try {
    points = await runWhiteSweep(sweep, async (v) => {
      const mix = kinds.map((k, i) => (i === 0 ? { ...k, ...(axis === 'load' ? { weightPercent: v } : { diameterUm: v }) } : k));
      return traceWhite(withMixture(clearPkg, mix, chip), rays, seed).summary;
    });
  } catch (error) {
    if (error instanceof RangeError) throw new CliError(`--${option}: ${error.message}`);
    throw error;
  }
  const seconds = (performance.now() - started) / 1000;
  if (values.csv === true) {
    process.stdout.write(whiteSweepCsv(axis, points));
    return;
  }
  const a = WHITE_SWEEP_AXES[axis];
  const f = (v: number | null, d: number) => (v === null ? '—' : v.toFixed(d));
  const rows: Row[] = points.map((p): Row => [
    `${a.label} ${p.value} ${a.unit}`,
    `${f(p.cctK, 0)} ± ${f(p.sigmaCctK, 0)} K, Duv ${f(p.duv, 4)}, Ra ${f(p.ra, 1)}, ${f(p.lerLmPerW, 0)} lm/W LER, ${f(p.lumensPerWattOfChip, 0)} lm per W of chip light, ${f(p.energyEfficiency * 100, 1)} % W out, Δu′v′ ${f(p.deltaUvPrime, 4)}`
  ]);
  const notes = [
    `${points.length} points of ${rays} rays each, seed ${seed} (common random numbers); ${seconds.toFixed(1)} s`,
    'refractive indices at the design wavelength for every ray (no per-ray dispersion yet)'
  ];
  const fixed = axis === 'load' ? `${main.diameterUm} µm` : `${main.weightPercent} wt%`;
  emit(values.json === true, { axis, unit: a.unit, phosphor: main.optics.id, fixed, ...(kinds[1] ? { redPhosphor: kinds[1].optics.id, redWeightPercent: kinds[1].weightPercent } : {}), points, rays, seed, seconds, notes }, `${main.optics.id} (${fixed}) against ${a.label.toLowerCase()}`, rows, notes);
}
