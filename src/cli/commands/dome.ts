import { domeEstimate } from '../../lib/optics';
import { CliError } from '../cli-error';
import { indexOption } from '../index-option';
import { numberOption, parseOptions, sizeOption, type OptionSpec } from '../options';
import { emit, percent, type Row } from '../output';

export const summary = 'closed-form dome encapsulant estimate: extraction, gain, no-TIR dome radius';
export const help = `outcouple dome — closed-form dome estimate (point-like chip at the centre of a spherical dome)

  --n-chip N | --chip-material M   chip index (1 to 6) or library material
  --n-enc N | --enc-material M     encapsulant index (1 to 6) or library material
  --n-out N                        outside index (default 1)
  --chip WxL                       chip footprint in mm (default 1x1), each 0.001 to 100
  --radius R                       dome radius in mm (0.001 to 1000), optional: checks the no-TIR size
  --wavelength NM                  for library materials (200 to 2500, default 450)
  --json                           print one JSON object

Example: outcouple dome --n-chip 2.45 --n-enc 1.41 --chip 1x1 --radius 2.5`;

const options: OptionSpec = {
  'n-chip': { type: 'string' }, 'chip-material': { type: 'string' }, 'n-enc': { type: 'string' },
  'enc-material': { type: 'string' }, 'n-out': { type: 'string' }, chip: { type: 'string' },
  radius: { type: 'string' }, wavelength: { type: 'string' }, json: { type: 'boolean' }
};

export function run(argv: string[]): void {
  const { values, positionals } = parseOptions(argv, options, 'dome');
  if (positionals.length) throw new CliError(`dome: unexpected argument '${positionals[0].slice(0, 40)}'`);
  const wavelengthNm = numberOption(values, 'wavelength', 200, 2500, 450);
  const chip = indexOption(values, 'n-chip', 'chip-material', wavelengthNm);
  const enc = indexOption(values, 'n-enc', 'enc-material', wavelengthNm);
  const outside = indexOption(values, 'n-out', null, wavelengthNm, '1');
  for (const [name, medium] of [['n-chip', chip], ['n-enc', enc], ['n-out', outside]] as const) {
    if (medium.n < 1 || medium.n > 6) throw new CliError(`--${name} must be from 1 to 6 (got ${medium.n})`);
  }
  const [chipWidthMm, chipLengthMm] = sizeOption(values, 'chip', 2, 0.001, 100, [1, 1]);
  const radiusGiven = values.radius !== undefined;
  const radiusMm = numberOption(values, 'radius', 0.001, 1000, 1000);

  const estimate = domeEstimate({ nChip: chip.n, nEnc: enc.n, nOut: outside.n, chipWidthMm, chipLengthMm, radiusMm });
  const result = {
    nChip: chip.n, nEnc: enc.n, nOut: outside.n, chipWidthMm, chipLengthMm,
    radiusMm: radiusGiven ? radiusMm : null,
    etaBare: estimate.etaBare, etaDome: estimate.etaDome, gain: estimate.gain,
    minRadiusNoTirMm: estimate.minRadiusNoTirMm,
    noTir: radiusGiven ? estimate.noTir : null,
    warnings: [chip.warning, enc.warning, outside.warning].filter(Boolean)
  };
  const rows: Row[] = [
    ['bare chip, one face (Fresnel-weighted)', percent(estimate.etaBare)],
    ['under the dome, one face', percent(estimate.etaDome)],
    ['gain', estimate.gain.toFixed(3), '×'],
    ['no-TIR dome radius (r·n_enc/n_out)', estimate.minRadiusNoTirMm.toFixed(3), 'mm']
  ];
  if (radiusGiven) {
    rows.push(['dome radius', radiusMm, 'mm'], ['no total internal reflection at the dome', estimate.noTir ? 'yes' : 'no — dome too small']);
  }
  emit(values.json === true, result, 'Dome estimate', rows, result.warnings as string[]);
}
