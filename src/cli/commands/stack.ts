import { incoherentStack, stackExtraction, thinFilm, type StackLayer } from '../../lib/optics';
import { resolveIndex } from '../../lib/materials';
import { CliError } from '../cli-error';
import { indexOption } from '../index-option';
import { numberOption, parseOptions, truncate, type OptionSpec } from '../options';
import { emit, percent, type Row } from '../output';
import { LIMITS } from '../../lib/scenario/limits';

const W = LIMITS.wavelengthNm;

export const summary = 'R, T, A of a planar layer stack between the chip and the outside; --extraction for the escape fraction';
export const help = `outcouple stack — planar layer stack from the chip outward

  --n-in N | --in MATERIAL     chip (incident) index or material
  --layer INDEX:THICKNESS      a layer, repeatable, from the chip outward; INDEX is a number, n+ki or a
                               material name; THICKNESS in nm (thin film) or µm with --incoherent
  --n-out N | --out MATERIAL   outside (exit) medium (default 1)
  --wavelength NM              ${W.min} to ${W.max} nm (default 550)
  --angle DEG                  angle of incidence in the chip, 0 to 90° (default 0)
  --incoherent                 thick layers: intensities add (thickness in µm)
  --extraction                 also the stack's escape fraction for an isotropic source in the chip
  --json                       print one JSON object

At most 200 layers. Example: outcouple stack --n-in 2.45 --layer 1.8:80 --layer 1.4:100 --n-out 1 --wavelength 550 --angle 20`;

const MAX_CLI_LAYERS = 200;

const options: OptionSpec = {
  'n-in': { type: 'string' }, in: { type: 'string' }, 'n-out': { type: 'string' }, out: { type: 'string' },
  layer: { type: 'string', multiple: true }, wavelength: { type: 'string' }, angle: { type: 'string' },
  incoherent: { type: 'boolean' }, extraction: { type: 'boolean' }, json: { type: 'boolean' }
};

/** Reads one `INDEX:THICKNESS` layer; thickness in nm, or µm for thick layers. */
function parseLayer(text: string, position: number, wavelengthNm: number, incoherent: boolean): StackLayer {
  const unit = incoherent ? 'µm' : 'nm';
  const maxThickness = incoherent ? 100_000 : 100_000; // 100 µm of thin film, 100 mm of thick layer
  const at = text.lastIndexOf(':');
  if (at <= 0 || at === text.length - 1) {
    throw new CliError(`--layer ${position}: expected INDEX:THICKNESS, e.g. 1.8:80 or SiO2:100 (got '${truncate(text)}')`);
  }
  const thickness = Number(text.slice(at + 1));
  if (!Number.isFinite(thickness) || thickness < 0 || thickness > maxThickness) {
    throw new CliError(`--layer ${position}: thickness must be a number from 0 to ${maxThickness} ${unit} (got '${truncate(text.slice(at + 1))}')`);
  }
  let index;
  try {
    index = resolveIndex(text.slice(0, at), wavelengthNm);
  } catch (error) {
    throw new CliError(`--layer ${position}: ${error instanceof Error ? error.message : String(error)}`);
  }
  return { n: index.n, k: index.k, thicknessNm: incoherent ? thickness * 1000 : thickness };
}

/** A core RangeError in the terms the user typed: nIn → --n-in, nOut → --n-out, layers[i].n → --layer i+1 n. */
function inOptionTerms(error: unknown): unknown {
  if (!(error instanceof RangeError)) return error;
  const message = error.message
    .replace(/\bnIn\b/g, '--n-in')
    .replace(/\bnOut\b/g, '--n-out')
    .replace(/\blayers\[(\d+)\]\.(\w+)/g, (_match, i: string, field: string) => `--layer ${Number(i) + 1} ${field === 'thicknessNm' ? 'thickness' : field}`);
  return new CliError(message);
}

export function run(argv: string[]): void {
  try {
    compute(argv);
  } catch (error) {
    throw inOptionTerms(error);
  }
}

function compute(argv: string[]): void {
  const { values, positionals } = parseOptions(argv, options, 'stack');
  if (positionals.length) throw new CliError(`stack: unexpected argument '${truncate(positionals[0])}'`);
  const wavelengthNm = numberOption(values, 'wavelength', W.min, W.max, 550);
  const angleDeg = numberOption(values, 'angle', 0, 90, 0);
  const incoherent = values.incoherent === true;
  const chip = indexOption(values, 'n-in', 'in', wavelengthNm);
  const outside = indexOption(values, 'n-out', 'out', wavelengthNm, '1');
  if (chip.k !== 0 || outside.k !== 0) throw new CliError('--n-in and --n-out must be lossless (k = 0): absorbing media belong in --layer');
  const layerTexts = (values.layer as string[] | undefined) ?? [];
  if (layerTexts.length > MAX_CLI_LAYERS) throw new CliError(`--layer: at most ${MAX_CLI_LAYERS} layers (got ${layerTexts.length})`);
  const layers = layerTexts.map((text, i) => parseLayer(text, i + 1, wavelengthNm, incoherent));

  const thetaIn = (angleDeg * Math.PI) / 180;
  const at = incoherent ? incoherentStack(chip.n, layers, outside.n, wavelengthNm, thetaIn) : thinFilm(chip.n, layers, outside.n, wavelengthNm, thetaIn);
  const result: Record<string, unknown> = {
    nIn: chip.n, nOut: outside.n, layers, wavelengthNm, angleDeg, mode: incoherent ? 'incoherent' : 'coherent',
    Rs: at.Rs, Rp: at.Rp, Ts: at.Ts, Tp: at.Tp, R: at.R, T: at.T, A: at.A
  };
  const rows: Row[] = [
    ['mode', incoherent ? 'thick layers (incoherent)' : 'thin films (coherent)'],
    ['angle of incidence in the chip', angleDeg, '°'], ['wavelength', wavelengthNm, 'nm'],
    ['Rs', percent(at.Rs)], ['Rp', percent(at.Rp)], ['Ts', percent(at.Ts)], ['Tp', percent(at.Tp)],
    ['R (unpolarised)', percent(at.R)], ['T (unpolarised)', percent(at.T)], ['A (unpolarised)', percent(at.A)]
  ];
  const notes: string[] = [];
  if (values.extraction === true) {
    const ex = stackExtraction(chip.n, layers, outside.n, wavelengthNm, incoherent ? 'incoherent' : 'coherent');
    result.extractionFraction = ex.fresnel;
    result.extractionFractionS = ex.fresnelS;
    result.extractionFractionP = ex.fresnelP;
    result.bareExtractionFraction = ex.bare.fresnel;
    result.gainOverBare = ex.gainOverBare;
    result.escapeConeDeg = (ex.escapeConeRad * 180) / Math.PI;
    result.trappedBands = ex.bands.map((b) => ({ fromDeg: b.fromDeg, toDeg: b.toDeg, fate: b.fate, trappedIn: b.trappedIn, text: b.text }));
    rows.push(
      ['extraction through the stack', percent(ex.fresnel)], ['bare interface', percent(ex.bare.fresnel)],
      ['gain over bare', ex.gainOverBare.toFixed(4), '×'], ['escape cone in the chip', (result.escapeConeDeg as number).toFixed(2), '°']
    );
    notes.push('a planar stack never widens the escape cone: n·sin θ is conserved through parallel layers');
    for (const band of ex.bands) notes.push(band.text);
  }
  for (const w of [chip.warning, outside.warning]) if (w) notes.push(w);
  emit(values.json === true, result, 'Layer stack', rows, notes);
}
