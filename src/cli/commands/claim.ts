import { checkClaim, CHIP_STRUCTURES, CLAIM_KINDS, type ChipStructure, type ClaimKind } from '../../lib/decisions';
import { CliError } from '../cli-error';
import { indexOption } from '../index-option';
import { choiceOption, numberOption, parseOptions, stringOption, type OptionSpec } from '../options';
import { emit, formatNumber, percent, type Row } from '../output';

export const summary = 'is a stated extraction, gain or coating claim physically possible for the package?';
export const help = `outcouple claim — check an extraction, gain or flat-coating claim against the physical bounds

  --kind K                         extraction | gain | coating
  --value V                        extraction: fraction 0 to 1 (0.85 = 85 %)
                                   gain: factor 0 to 100 (3.5 = 3.5×)
                                   coating: relative increase -1 to 100 (0.4 = +40 %)
  --n-chip N | --chip-material M   chip index (1 to 6) or library material
  --structure S                    planar | textured | thin-film | unknown (default unknown)
  --n-enc N | --enc-material M     encapsulant index (1 to 6) or material; omit for a bare chip (needed for gain)
  --n-out N                        outside index (1 to 3, default 1)
  --faces F                        emitting faces of the chip: 1, 5 or 6 (default 6, the most generous)
  --wavelength NM                  for library materials (200 to 2500, default 450)
  --json                           print one JSON object

Verdicts: consistent, optimistic (possible only with what the claim does not state), impossible.

Example: outcouple claim --kind extraction --value 0.85 --n-chip 2.45 --n-enc 1.41 --structure planar`;

const options: OptionSpec = {
  kind: { type: 'string' }, value: { type: 'string' }, 'n-chip': { type: 'string' }, 'chip-material': { type: 'string' },
  structure: { type: 'string' }, 'n-enc': { type: 'string' }, 'enc-material': { type: 'string' },
  'n-out': { type: 'string' }, faces: { type: 'string' }, wavelength: { type: 'string' }, json: { type: 'boolean' }
};

const VALUE_RANGE: Record<ClaimKind, [number, number]> = { extraction: [0, 1], gain: [0, 100], coating: [-1, 100] };

function shown(value: number, unit: string): string {
  if (unit === 'fraction') return percent(value, 2);
  if (unit === 'relative increase') return `${value >= 0 ? '+' : ''}${percent(value, 2)}`;
  if (unit === 'factor') return `${formatNumber(Number(value.toPrecision(4)))}×`;
  if (unit === 'degrees') return `${value.toFixed(2)}°`;
  return formatNumber(value);
}

export function run(argv: string[]): void {
  const { values, positionals } = parseOptions(argv, options, 'claim');
  if (positionals.length) throw new CliError(`claim: unexpected argument '${positionals[0].slice(0, 40)}'`);
  if (stringOption(values, 'kind') === undefined) throw new CliError(`--kind is required (one of ${CLAIM_KINDS.join(', ')})`);
  const kind = choiceOption<ClaimKind>(values, 'kind', CLAIM_KINDS, 'extraction');
  const [min, max] = VALUE_RANGE[kind];
  const value = numberOption(values, 'value', min, max);
  if (kind !== 'coating' && value === 0) throw new CliError(`--value must be above 0 and at most ${max} for a ${kind} claim (got 0)`);
  const structure = choiceOption<ChipStructure>(values, 'structure', CHIP_STRUCTURES, 'unknown');
  const wavelengthNm = numberOption(values, 'wavelength', 200, 2500, 450);
  const facesText = choiceOption(values, 'faces', ['1', '5', '6'] as const, '6');
  const faces = Number(facesText) as 1 | 5 | 6;

  const chip = indexOption(values, 'n-chip', 'chip-material', wavelengthNm);
  const encGiven = values['n-enc'] !== undefined || values['enc-material'] !== undefined;
  const enc = encGiven ? indexOption(values, 'n-enc', 'enc-material', wavelengthNm) : null;
  const outside = indexOption(values, 'n-out', null, wavelengthNm, '1');
  if (chip.n < 1 || chip.n > 6) throw new CliError(`--n-chip must be from 1 to 6 (got ${chip.n})`);
  if (enc && (enc.n < 1 || enc.n > 6)) throw new CliError(`--n-enc must be from 1 to 6 (got ${enc.n})`);
  if (outside.n < 1 || outside.n > 3) throw new CliError(`--n-out must be from 1 to 3 (got ${outside.n})`);
  if (kind === 'gain' && !enc) throw new CliError('--n-enc (or --enc-material) is required for a gain claim (an index from 1 to 6)');

  const result = checkClaim({ kind, value, nChip: chip.n, structure, nEnc: enc ? enc.n : null, nOut: outside.n, faces });
  const warnings = [chip.warning, enc?.warning, outside.warning].filter((w): w is string => Boolean(w));
  const data = {
    kind, value, structure, nChip: chip.n, nEnc: enc ? enc.n : null, nOut: outside.n, faces,
    verdict: result.verdict,
    reason: result.reason,
    requires: result.requires,
    bounds: result.numbers.map(({ id, label, value: v, unit }) => ({ id, label, value: v, unit })),
    references: result.references.map(({ device, measure, value: v, source, tag }) => ({ device, measure, value: v, source, tag })),
    notes: result.notes,
    warnings
  };
  const rows: Row[] = [['verdict', result.verdict.toUpperCase()]];
  for (const n of result.numbers) rows.push([n.label, shown(n.value, n.unit)]);
  const notes = [result.reason, ...result.requires.map((r) => `would need: ${r}`), ...result.notes, ...warnings];
  emit(values.json === true, data, `Claim check: ${kind}`, rows, notes);
}
