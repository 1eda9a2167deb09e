import {
  checkClaim,
  CHIP_STRUCTURES,
  CLAIM_DEFAULTS,
  CLAIM_KINDS,
  CLAIM_VALUE_LIMIT,
  claimCoreValue,
  claimValueProblem,
  type ChipStructure,
  type ClaimKind
} from '../../lib/decisions';
import { parseNumber } from '../../lib/components/parse-number';
import { CliError } from '../cli-error';
import { choiceOption, parseOptions, type OptionSpec } from '../options';
import { emit, formatNumber, percent, type Row } from '../output';
import { SCENARIO_OPTION_HELP, SCENARIO_OPTIONS, scenarioFromOptions } from '../scenario-options';

const L = CLAIM_VALUE_LIMIT;

export const summary = 'is a stated extraction, gain or coating claim physically possible for the package?';
export const help = `outcouple claim — check an extraction, gain or flat-coating claim against the physical bounds

The same check, defaults and units as the app's claim page; the package is the scenario (the demo
unless --scenario or the package options below say otherwise: its chip, encapsulant and outside
indices at its wavelength; --shape none for a bare chip).

  --kind K                         extraction | gain | coating (default ${CLAIM_DEFAULTS.kind})
  --value V                        in percent for extraction and coating, as on the page:
                                     extraction: more than ${L.extraction.min} and at most ${L.extraction.max} (85 means 85 %)
                                     coating: more than ${L.coating.min} and at most ${L.coating.max} (40 means +40 %, -5 a 5 % decrease)
                                   gain: a factor, more than ${L.gain.min} and at most ${L.gain.max} (3.5 means 3.5×)
  --structure S                    planar | textured | thin-film | unknown (default ${CLAIM_DEFAULTS.structure})
  --faces F                        emitting faces of the chip: 1, 5 or 6 (default ${CLAIM_DEFAULTS.faces}: top and four sides)
  --json                           print one JSON object (values as fractions and factors)

${SCENARIO_OPTION_HELP}

Verdicts: consistent, optimistic (possible only with what the claim does not state), impossible.

Example: outcouple claim --kind extraction --value 85 --n-chip 2.45 --n-enc 1.41 --structure planar`;

const options: OptionSpec = { ...SCENARIO_OPTIONS, kind: { type: 'string' }, value: { type: 'string' }, structure: { type: 'string' },
  faces: { type: 'string' }, json: { type: 'boolean' } };

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
  const kind = choiceOption<ClaimKind>(values, 'kind', CLAIM_KINDS, CLAIM_DEFAULTS.kind);
  if (values.value === undefined) throw new CliError(`--value is required (${kind === 'gain' ? 'a factor, e.g. 3.5' : 'in percent, e.g. 85'})`);
  const stated = parseNumber(String(values.value));
  const problem = claimValueProblem(kind, stated);
  if (problem !== null || stated === null) throw new CliError(`--value: ${problem}`);
  const structure = choiceOption<ChipStructure>(values, 'structure', CHIP_STRUCTURES, CLAIM_DEFAULTS.structure);
  const faces = Number(choiceOption(values, 'faces', ['1', '5', '6'] as const, String(CLAIM_DEFAULTS.faces) as '1' | '5' | '6')) as 1 | 5 | 6;

  const { scenario, resolved, warnings } = scenarioFromOptions(values);
  const nChip = resolved.chip.n;
  const nOut = resolved.outside.n;
  const nEnc = scenario.encapsulant.shape === 'none' ? null : resolved.encapsulant.n;
  if (kind === 'gain' && (nEnc === null || nEnc === nOut)) {
    throw new CliError('--shape: a gain claim needs an encapsulant with an index other than the outside one (--n-enc or --enc-material)');
  }
  const value = claimCoreValue(kind, stated);
  const result = checkClaim({ kind, value, nChip, structure, nEnc, nOut, faces });
  const data = {
    kind, value, stated, structure, nChip, nEnc, nOut, faces, wavelengthNm: resolved.wavelengthNm,
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
