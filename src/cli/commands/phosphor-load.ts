import { LIMITS, toTracePackage, withDispersion } from '../../lib/scenario';
import { chipSpectrumRows, libraryPhosphor, traceWhite, withPhosphor } from '../../lib/trace/white-light';
import { traceSync } from '../../lib/trace/trace';
import { libraryOptics } from '../../lib/white/particle-optics';
import { withMixture, type MixComponent } from '../../lib/white/phosphor-mix';
import { loadCost, loadsForTarget, TARGET_SEARCH } from '../../lib/white/target-loads';
import { listPhosphors } from '../../lib/phosphors';
import { CliError } from '../cli-error';
import { numberOption, parseOptions, stringOption, truncate, type OptionSpec, type ParsedValues } from '../options';
import { emit, percent, type Row } from '../output';
import { checkPhosphorFit, PHOSPHOR_OPTION_HELP, PHOSPHOR_OPTIONS, phosphorFromOptions } from '../phosphor-options';
import { SCENARIO_OPTION_HELP, SCENARIO_OPTIONS, scenarioFromOptions } from '../scenario-options';

export const summary = 'The phosphor load (or yellow + red pair of loads) that gives a target CCT in a package, and what it costs';
export const help = `outcouple phosphor-load — the phosphor weight percent for a target correlated colour temperature

Traces each trial with the same rays and seed (common random numbers). One phosphor: the load whose
light has the target CCT. With --red-phosphor: the pair of loads (main + red, mixed in the same region)
whose light has the target CCT and the target Duv (default 0, on the Planckian locus) — for each red
load the main load that meets the CCT, then the red load that meets the Duv. Reports the loads, their
colour and what they cost against the same package without phosphor. A target out of reach is a
one-line message saying why. Default rays: 20000 per trial (--rays to change).

  --target-cct K                      target CCT, ${LIMITS.targetCctK.min} to ${LIMITS.targetCctK.max} K (required)
  --red-phosphor ID                   a second (red) phosphor mixed in: ${listPhosphors().map((p) => p.id).join(', ')}
  --red-diameter D                    its particle diameter, ${LIMITS.phosphorDiameterUm.min} to ${LIMITS.phosphorDiameterUm.max} µm (default: its typical d50)
  --red-quantum-yield Q               its quantum yield, 0 to 1 (default: its typical)
  --target-duv D                      target Duv with --red-phosphor, ${LIMITS.targetDuv.min} to ${LIMITS.targetDuv.max} (default 0)
${SCENARIO_OPTION_HELP}
${PHOSPHOR_OPTION_HELP}
  --json                              print one JSON object

Examples: outcouple phosphor-load --target-cct 4000 --phosphor garnet-yellow --phosphor-diameter 12
          outcouple phosphor-load --target-cct 3000 --phosphor garnet-yellow --red-phosphor nitride-red`;

const options: OptionSpec = {
  ...SCENARIO_OPTIONS, ...PHOSPHOR_OPTIONS,
  'target-cct': { type: 'string' }, 'target-duv': { type: 'string' },
  'red-phosphor': { type: 'string' }, 'red-diameter': { type: 'string' }, 'red-quantum-yield': { type: 'string' },
  json: { type: 'boolean' }
};

/** The red phosphor the options name, or null. */
function redFromOptions(values: ParsedValues): MixComponent | null {
  const id = stringOption(values, 'red-phosphor');
  if (id === undefined) {
    for (const o of ['red-diameter', 'red-quantum-yield', 'target-duv']) if (values[o] !== undefined) throw new CliError(`--${o} needs --red-phosphor ID`);
    return null;
  }
  let p;
  try {
    p = libraryPhosphor(id, '--red-phosphor');
  } catch {
    throw new CliError(`--red-phosphor: unknown phosphor '${truncate(id)}' (one of ${listPhosphors().map((x) => x.id).join(', ')})`);
  }
  const D = LIMITS.phosphorDiameterUm;
  const Q = LIMITS.quantumYield;
  return {
    optics: libraryOptics(p), weightPercent: 0,
    diameterUm: numberOption(values, 'red-diameter', D.min, D.max, p.typicalD50Um),
    quantumYield: numberOption(values, 'red-quantum-yield', Q.min, Q.max, p.quantumYield)
  };
}

export async function run(argv: string[]): Promise<void> {
  const { values, positionals } = parseOptions(argv, options, 'phosphor-load');
  if (positionals.length) throw new CliError(`phosphor-load: unexpected argument '${truncate(positionals[0])}'`);
  const target = numberOption(values, 'target-cct', LIMITS.targetCctK.min, LIMITS.targetCctK.max);
  if (values['phosphor-wt'] !== undefined) throw new CliError('--phosphor-wt is what phosphor-load finds; leave it out');
  if (values['phosphor-coefficients'] !== undefined) throw new CliError('phosphor-load needs --phosphor ID (a load of particles), not --phosphor-coefficients');
  if (values['phosphor-emission'] !== undefined) throw new CliError("phosphor-load uses the phosphors' own emission; leave --phosphor-emission out");
  const red = redFromOptions(values);
  const targetDuv = numberOption(values, 'target-duv', LIMITS.targetDuv.min, LIMITS.targetDuv.max, 0);
  if (values.rays === undefined) values.rays = '20000';
  const { scenario, resolved } = scenarioFromOptions(values);
  const setting = phosphorFromOptions({ phosphor: 'garnet-yellow', ...values });
  if (!setting || setting.kind !== 'particles') throw new CliError('--phosphor ID is needed');
  const main: MixComponent = { optics: libraryOptics(setting.phosphor), weightPercent: 0, diameterUm: setting.diameterUm, quantumYield: setting.quantumYield };
  const kinds = red ? [main, red] : [main];
  const { rays, seed } = scenario.trace;
  const started = performance.now();
  // with its media's dispersion: once it holds the phosphor each ray sees the indices at its wavelength
  const clearPkg = withDispersion(toTracePackage(scenario, resolved), scenario, resolved);
  const chip = chipSpectrumRows(scenario.emission);
  const layer = { region: setting.region ?? 'encapsulant', ...(setting.thicknessMm !== undefined ? { thicknessMm: setting.thicknessMm } : {}) } as const;
  checkPhosphorFit(withPhosphor(clearPkg, setting, chip));
  const evaluate = async (loads: readonly number[]) =>
    traceWhite(withMixture(clearPkg, kinds.map((k, i) => ({ ...k, weightPercent: loads[i] })), chip, layer), rays, seed).summary;
  const clear = traceSync(clearPkg, { rays, seed });
  const clearEfficiency = clear.escaped / clear.launched;
  let search;
  try {
    search = await loadsForTarget(evaluate, { cctK: target, duv: targetDuv }, kinds.map((k) => k.optics.id));
  } catch (error) {
    if (error instanceof RangeError) throw new CliError(`--target-cct: ${error.message}`);
    throw error;
  }
  const seconds = (performance.now() - started) / 1000;
  const w = search.summary;
  const c = w.color!;
  const cost = loadCost(w, clearEfficiency);
  const notes = [
    `${search.trials.length} trials of ${rays} rays each, seed ${seed} (common random numbers)`,
    ...(search.converged ? [] : [`not within ±${TARGET_SEARCH.toleranceK} K${red ? ` and ±${TARGET_SEARCH.toleranceDuv} Duv` : ''} (or ±σ) within the trials allowed: the best trial is shown`]),
    'each ray sees the library indices at its own wavelength (typed indices, metal mirrors and the Mie host index stay at the design wavelength)',
    'caution: white LEDs emit intense blue light; do not stare into them; mind the phosphor heat in a real package'
  ];
  const loads = kinds.map((k, i) => ({ phosphor: k.optics.id, diameterUm: k.diameterUm, quantumYield: k.quantumYield, weightPercent: search.loads[i] }));
  const result = {
    targetCctK: target, ...(red ? { targetDuv } : {}),
    phosphor: main.optics.id, region: layer.region, ...(setting.thicknessMm !== undefined ? { thicknessMm: setting.thicknessMm } : {}),
    diameterUm: main.diameterUm, weightPercent: search.loads[0],
    ...(red ? { redPhosphor: red.optics.id, redWeightPercent: search.loads[1] } : {}),
    loads,
    color: { x: c.x, y: c.y, cctK: c.cctK, duv: c.duv, ra: c.ra, r9: c.r9, lerLmPerW: c.lerLmPerW, sigma: c.sigma },
    photonEfficiency: w.photonEfficiency, energyEfficiency: w.energyEfficiency, clearEfficiency,
    photonCost: cost.photonCost, energyCost: cost.energyCost, phosphorHeat: w.phosphorHeat,
    lumensPerWattOfChipLight: cost.lumensPerWattOfChip, deltaUvPrime: w.deltaUvPrime,
    trials: search.trials, converged: search.converged, rays, seed, seconds, notes
  };
  const rows: Row[] = [
    ['region', `${layer.region}${setting.thicknessMm !== undefined ? ` layer ${setting.thicknessMm} mm` : ''}`],
    ...loads.map((l): Row => [`load of ${l.phosphor} (${l.diameterUm} µm)`, l.weightPercent.toFixed(2), 'wt%']),
    ['CCT', `${c.cctK?.toFixed(0) ?? '—'} ± ${c.sigma.cctK?.toFixed(0) ?? '—'}`, 'K'], ['Duv', `${c.duv?.toFixed(4) ?? '—'} ± ${c.sigma.duv?.toFixed(4) ?? '—'}`],
    ['Ra, R9', `${c.ra?.toFixed(1) ?? '—'}, ${c.r9?.toFixed(1) ?? '—'}`],
    ['photons out / chip photons', percent(w.photonEfficiency, 2)], ['watts out / watts of chip light', percent(w.energyEfficiency, 2)],
    ['the same package without phosphor', percent(clearEfficiency, 2)],
    ['cost of the phosphor (photons)', percent(cost.photonCost, 2)], ['cost of the phosphor (watts)', percent(cost.energyCost, 2)],
    ['lumens per watt of chip light', cost.lumensPerWattOfChip?.toFixed(0) ?? '—', 'lm/W'],
    ['time', seconds.toFixed(1), 's']
  ];
  emit(values.json === true, result, `Phosphor load${red ? 's' : ''} for ${target} K${red ? `, Duv ${targetDuv}` : ''}`, rows, notes);
}
