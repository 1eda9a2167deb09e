import { domeEstimate } from '../../lib/optics';
import { CliError } from '../cli-error';
import { parseOptions, type OptionSpec } from '../options';
import { emit, percent, type Row } from '../output';
import { SCENARIO_OPTION_HELP, SCENARIO_OPTIONS, scenarioFromOptions } from '../scenario-options';

export const summary = 'closed-form dome encapsulant estimate: extraction, gain, smallest dome radius with no total internal reflection';
export const help = `outcouple dome — closed-form dome estimate (point-like chip face at the centre of a spherical dome)

With no options it estimates the app's demo scenario. Only the chip footprint matters here, so
--chip WxL is enough; the absorption, base and trace options are read but not used.

${SCENARIO_OPTION_HELP}
  --json                              print one JSON object

Example: outcouple dome --n-chip 2.45 --n-enc 1.41 --chip 1x1 --radius 2.5`;

const options: OptionSpec = { ...SCENARIO_OPTIONS, json: { type: 'boolean' } };

export function run(argv: string[]): void {
  const { values, positionals } = parseOptions(argv, options, 'dome');
  if (positionals.length) throw new CliError(`dome: unexpected argument '${positionals[0].slice(0, 40)}'`);
  const { scenario, resolved, warnings } = scenarioFromOptions(values);
  if (scenario.encapsulant.shape === 'none') throw new CliError('--shape: the closed-form dome estimate needs an encapsulant (dome or cylinder), not none');
  const { widthMm: chipWidthMm, lengthMm: chipLengthMm } = scenario.chip;
  const radiusMm = scenario.encapsulant.radiusMm;
  const [nChip, nEnc, nOut] = [resolved.chip.n, resolved.encapsulant.n, resolved.outside.n];
  const estimate = domeEstimate({ nChip, nEnc, nOut, chipWidthMm, chipLengthMm, radiusMm });
  const result = {
    nChip, nEnc, nOut, chipWidthMm, chipLengthMm, radiusMm, wavelengthNm: resolved.wavelengthNm,
    etaBare: estimate.etaBare, etaDome: estimate.etaDome, gain: estimate.gain,
    minRadiusNoTirMm: estimate.minRadiusNoTirMm,
    noTir: estimate.noTir,
    warnings
  };
  const rows: Row[] = [
    ['chip, encapsulant, outside index', `${nChip.toFixed(4)}, ${nEnc.toFixed(4)}, ${nOut.toFixed(4)} at ${resolved.wavelengthNm} nm`],
    ['bare chip, one face (Fresnel-weighted)', percent(estimate.etaBare)],
    ['under the dome, one face', percent(estimate.etaDome)],
    ['gain', estimate.gain.toFixed(3), '×'],
    ['smallest radius with no total internal reflection', estimate.minRadiusNoTirMm.toFixed(3), 'mm (chip half-diagonal × encapsulant index ÷ outside index)'],
    ['dome radius', radiusMm, 'mm'],
    ['no total internal reflection at the dome', estimate.noTir ? 'yes' : 'no — dome too small']
  ];
  emit(values.json === true, result, 'Dome estimate', rows, warnings);
}
