import { criticalAngle, cuboidChipEscape, escapeCone } from '../../lib/optics';
import { CliError } from '../cli-error';
import { indexOption } from '../index-option';
import { integerOption, numberOption, parseOptions, type OptionSpec } from '../options';
import { emit, percent, type Row } from '../output';
import { LIMITS } from '../../lib/scenario/limits';

const W = LIMITS.wavelengthNm;
const N = LIMITS.indexN;

export const summary = 'critical angle and escape fractions of an isotropic source through planar faces';
export const help = `outcouple escape — escape cone of a chip face

  --n-in N | --in MATERIAL     chip index (${N.min} to ${N.max}, or n+ki) or library material
  --n-out N | --out MATERIAL   surrounding medium (default 1, air)
  --wavelength NM              wavelength for library materials (${W.min} to ${W.max} nm, default 450)
  --faces 1|5|6                emitting faces of a cuboid chip: 1 top only; 5 top + 4 sides; 6 all (default 1)
  --json                       print one JSON object

Example: outcouple escape --n-in 2.45 --n-out 1 --json`;

const options: OptionSpec = {
  'n-in': { type: 'string' }, in: { type: 'string' }, 'n-out': { type: 'string' }, out: { type: 'string' },
  wavelength: { type: 'string' }, faces: { type: 'string' }, json: { type: 'boolean' }
};

export function run(argv: string[]): void {
  const { values, positionals } = parseOptions(argv, options, 'escape');
  if (positionals.length) throw new CliError(`escape: unexpected argument '${positionals[0].slice(0, 40)}'`);
  const wavelengthNm = numberOption(values, 'wavelength', W.min, W.max, 450);
  const chip = indexOption(values, 'n-in', 'in', wavelengthNm);
  const outside = indexOption(values, 'n-out', 'out', wavelengthNm, '1');
  const faces = integerOption(values, 'faces', 1, 6, 1);
  if (faces !== 1 && faces !== 5 && faces !== 6) throw new CliError(`--faces must be 1 (top only), 5 (top + 4 sides) or 6 (all faces) (got ${faces})`);
  for (const [name, m] of [['n-in', chip], ['n-out', outside]] as const) {
    if (m.n < N.min || m.n > N.max) throw new CliError(`--${name} must be from ${N.min} to ${N.max} (got ${m.n})`);
  }

  const cone = escapeCone(chip.n, outside.n);
  const chipEscape = cuboidChipEscape(chip.n, outside.n, faces as 1 | 5 | 6);
  const thetaC = criticalAngle(chip.n, outside.n);
  const result = {
    nIn: chip.n, nOut: outside.n, wavelengthNm, faces,
    criticalAngleDeg: thetaC === null ? null : (thetaC * 180) / Math.PI,
    escapeFractionGeometric: cone.geometric,
    escapeFractionSmallAngle: cone.smallAngle,
    escapeFractionFresnel: cone.fresnel,
    escapeFractionFresnelS: cone.fresnelS,
    escapeFractionFresnelP: cone.fresnelP,
    normalReflectance: cone.normalReflectance,
    chipEscapeFraction: chipEscape.fraction,
    conesOverlap: chipEscape.conesOverlap,
    warnings: [chip.warning, outside.warning, chipEscape.conesOverlap ? chipEscape.note : undefined,
      outside.n >= chip.n ? 'the surrounding index is not below the chip index: no critical angle, and the small-angle form does not apply' : undefined
    ].filter(Boolean)
  };
  const rows: Row[] = [
    ['chip index', chip.n], ['surrounding index', outside.n],
    ['critical angle', result.criticalAngleDeg === null ? 'none (no total internal reflection)' : result.criticalAngleDeg.toFixed(2), result.criticalAngleDeg === null ? '' : '°'],
    ['escape, geometric (1 − cos θc)/2', percent(cone.geometric)],
    ['escape, small-angle n²out/4n²in', outside.n >= chip.n ? 'not applicable' : percent(cone.smallAngle)],
    ['escape, Fresnel-weighted', percent(cone.fresnel)],
    ['  s-polarised', percent(cone.fresnelS)], ['  p-polarised', percent(cone.fresnelP)],
    ['normal reflectance', percent(cone.normalReflectance)],
    [`chip escape through ${faces} face${faces > 1 ? 's' : ''}`, percent(chipEscape.fraction)]
  ];
  emit(values.json === true, result, 'Escape cone', rows, result.warnings as string[]);
}
