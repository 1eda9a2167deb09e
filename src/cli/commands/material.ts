import { findMaterial, indexAt, listMaterials } from '../../lib/materials';
import { CliError } from '../cli-error';
import { numberOption, parseOptions, type OptionSpec } from '../options';
import { emit, type Row } from '../output';
import { LIMITS } from '../../lib/scenario/limits';

const W = LIMITS.wavelengthNm;

export const summary = 'refractive index n and k of a library material at a wavelength; --list lists them';
export const help = `outcouple material NAME — index of a library material

  --wavelength NM   wavelength (${W.min} to ${W.max} nm, default 450)
  --list            list every material with its model, validity range and source
  --json            print one JSON object

Example: outcouple material GaN --wavelength 450`;

const options: OptionSpec = { wavelength: { type: 'string' }, list: { type: 'boolean' }, json: { type: 'boolean' } };

export function run(argv: string[]): void {
  const { values, positionals } = parseOptions(argv, options, 'material');
  const json = values.json === true;
  if (values.list === true) {
    const list = listMaterials().map((m) => ({ id: m.id, name: m.name, category: m.category, model: m.dispersion.model,
      validRangeNm: [m.validRangeNm.min, m.validRangeNm.max], source: m.source }));
    if (json) {
      process.stdout.write(JSON.stringify({ materials: list }, null, 2) + '\n');
    } else {
      const lines = list.map((m) => `${m.id.padEnd(16)} ${m.name.padEnd(30)} ${m.category.padEnd(12)} ${String(m.validRangeNm[0]).padStart(5)}–${String(m.validRangeNm[1]).padEnd(6)} nm  ${m.model}`);
      process.stdout.write(['id               name                           category        valid range      model', ...lines].join('\n') + '\n');
    }
    return;
  }
  if (positionals.length !== 1) throw new CliError("material: name one material (e.g. 'outcouple material GaN'), or use --list");
  const name = positionals[0];
  const material = findMaterial(name);
  if (!material) throw new CliError(`material: unknown material '${name.slice(0, 40)}' ('outcouple material --list' lists them)`);
  const wavelengthNm = numberOption(values, 'wavelength', W.min, W.max, 450);
  const value = indexAt(material, wavelengthNm);
  const result = {
    id: material.id, name: material.name, wavelengthNm, n: value.n, k: value.k, model: material.dispersion.model,
    validRangeNm: [material.validRangeNm.min, material.validRangeNm.max], inRange: value.inRange, source: material.source,
    provenance: material.provenance, warning: value.warning ?? null
  };
  const rows: Row[] = [
    ['material', material.name], ['wavelength', wavelengthNm, 'nm'], ['n', value.n], ['k', value.k],
    ['model', material.dispersion.model], ['valid range', `${material.validRangeNm.min}–${material.validRangeNm.max}`, 'nm'],
    ['source', `${material.source} (${material.provenance})`]
  ];
  emit(json, result, `Material: ${material.name}`, rows, value.warning ? [value.warning] : []);
}
