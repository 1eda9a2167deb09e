import { LIMITS, toTracePackage, withDispersion } from '../../lib/scenario';
import { chipSpectrumRows, loadForCct, LOAD_SEARCH, traceWhite, withPhosphor } from '../../lib/trace/white-light';
import { traceSync } from '../../lib/trace/trace';
import { CliError } from '../cli-error';
import { numberOption, parseOptions, truncate, type OptionSpec } from '../options';
import { emit, percent, type Row } from '../output';
import { checkPhosphorFit, PHOSPHOR_OPTION_HELP, PHOSPHOR_OPTIONS, phosphorFromOptions } from '../phosphor-options';
import { SCENARIO_OPTION_HELP, SCENARIO_OPTIONS, scenarioFromOptions } from '../scenario-options';

export const summary = 'The phosphor load that gives a target CCT in a package, and what that load costs';
export const help = `outcouple phosphor-load — the phosphor weight percent for a target correlated colour temperature

Traces each trial load with the same rays and seed (common random numbers), brackets the target and
narrows it by secant and bisection steps; reports the load, its colour and the efficiency it costs
against the same package without phosphor. Default rays: 20000 per trial (--rays to change).

  --target-cct K                      target CCT, ${LIMITS.targetCctK.min} to ${LIMITS.targetCctK.max} K (required)
${SCENARIO_OPTION_HELP}
${PHOSPHOR_OPTION_HELP}
  --json                              print one JSON object

Example: outcouple phosphor-load --target-cct 4000 --phosphor garnet-yellow --phosphor-diameter 12`;

const options: OptionSpec = { ...SCENARIO_OPTIONS, ...PHOSPHOR_OPTIONS, 'target-cct': { type: 'string' }, json: { type: 'boolean' } };

export async function run(argv: string[]): Promise<void> {
  const { values, positionals } = parseOptions(argv, options, 'phosphor-load');
  if (positionals.length) throw new CliError(`phosphor-load: unexpected argument '${truncate(positionals[0])}'`);
  const target = numberOption(values, 'target-cct', LIMITS.targetCctK.min, LIMITS.targetCctK.max);
  if (values['phosphor-wt'] !== undefined) throw new CliError('--phosphor-wt is what phosphor-load finds; leave it out');
  if (values['phosphor-coefficients'] !== undefined) throw new CliError('phosphor-load needs --phosphor ID (a load of particles), not --phosphor-coefficients');
  if (values.rays === undefined) values.rays = '20000';
  const { scenario, resolved } = scenarioFromOptions(values);
  const setting = phosphorFromOptions({ phosphor: 'garnet-yellow', ...values });
  if (!setting || setting.kind !== 'particles') throw new CliError('--phosphor ID is needed');
  const { rays, seed } = scenario.trace;
  const started = performance.now();
  // with its media's dispersion: once it holds the phosphor each ray sees the indices at its wavelength
  const clearPkg = withDispersion(toTracePackage(scenario, resolved), scenario, resolved);
  const chip = chipSpectrumRows(scenario.emission);
  const evaluate = async (weightPercent: number) => traceWhite(withPhosphor(clearPkg, { ...setting, weightPercent }, chip), rays, seed).summary;
  checkPhosphorFit(withPhosphor(clearPkg, setting, chip));
  const clear = traceSync(clearPkg, { rays, seed });
  const clearEfficiency = clear.escaped / clear.launched;
  let search;
  try {
    search = await loadForCct(evaluate, target);
  } catch (error) {
    if (error instanceof RangeError) throw new CliError(`--target-cct: ${error.message}`);
    throw error;
  }
  const seconds = (performance.now() - started) / 1000;
  const w = search.summary;
  const c = w.color!;
  const photonCost = 1 - w.photonEfficiency / clearEfficiency;
  const notes = [
    `${search.trials.length} trials of ${rays} rays each, seed ${seed} (common random numbers)`,
    ...(search.converged ? [] : [`not converged to ±${LOAD_SEARCH.toleranceK} K within ${LOAD_SEARCH.maxTrials} trials: the best trial is shown`]),
    'each ray sees the library indices at its own wavelength (typed indices, metal mirrors and the Mie host index stay at the design wavelength)',
    'caution: white LEDs emit intense blue light; do not stare into them; mind the phosphor heat in a real package'
  ];
  const result = {
    targetCctK: target, phosphor: setting.phosphor.id, region: setting.region ?? 'encapsulant',
    ...(setting.thicknessMm !== undefined ? { thicknessMm: setting.thicknessMm } : {}), diameterUm: setting.diameterUm, weightPercent: search.weightPercent,
    color: { x: c.x, y: c.y, cctK: c.cctK, duv: c.duv, ra: c.ra, r9: c.r9, lerLmPerW: c.lerLmPerW, sigma: c.sigma },
    photonEfficiency: w.photonEfficiency, energyEfficiency: w.energyEfficiency, clearEfficiency,
    photonCost, energyCost: 1 - w.energyEfficiency / clearEfficiency, phosphorHeat: w.phosphorHeat,
    lumensPerWattOfChipLight: c.lerLmPerW * w.energyEfficiency, deltaUvPrime: w.deltaUvPrime,
    trials: search.trials, converged: search.converged, rays, seed, seconds, notes
  };
  const rows: Row[] = [
    ['phosphor', `${setting.phosphor.id}, ${setting.diameterUm} µm, ${setting.region ?? 'encapsulant'}${setting.thicknessMm !== undefined ? ` layer ${setting.thicknessMm} mm` : ''}`],
    ['load found', search.weightPercent.toFixed(2), 'wt%'],
    ['CCT', `${c.cctK?.toFixed(0) ?? '—'} ± ${c.sigma.cctK?.toFixed(0) ?? '—'}`, 'K'], ['Duv', c.duv?.toFixed(4) ?? '—'],
    ['Ra, R9', `${c.ra?.toFixed(1) ?? '—'}, ${c.r9?.toFixed(1) ?? '—'}`],
    ['photons out / chip photons', percent(w.photonEfficiency, 2)], ['watts out / watts of chip light', percent(w.energyEfficiency, 2)],
    ['the same package without phosphor', percent(clearEfficiency, 2)],
    ['cost of the phosphor (photons)', percent(photonCost, 2)], ['cost of the phosphor (watts)', percent(result.energyCost, 2)],
    ['lumens per watt of chip light', result.lumensPerWattOfChipLight.toFixed(0), 'lm/W'],
    ['time', seconds.toFixed(1), 's']
  ];
  emit(values.json === true, result, `Phosphor load for ${target} K`, rows, notes);
}
