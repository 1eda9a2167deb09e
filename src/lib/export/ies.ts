/**
 * A traced far field as an IES photometric data file, and our own reader for such files.
 *
 * Structure written, per ANSI/IES LM-63-2019 "Standard File Format for the Electronic Transfer of
 * Photometric Data and Related Information" (section numbers not quoted; field order from the standard's
 * file description, checked against LM-63-2002, whose text is public):
 *   1. `IES:LM-63-2019`
 *   2. keyword lines `[KEYWORD] text`; [TEST], [TESTLAB], [ISSUEDATE] and [MANUFAC] are required
 *   3. `TILT=NONE`
 *   4. number of lamps, lumens per lamp (−1: absolute photometry), candela multiplier, number of
 *      vertical angles, number of horizontal angles, photometric type (1 = type C), units type
 *      (2 = metres), width, length, height of the luminous opening
 *   5. ballast factor, file generation type, input watts
 *   6. vertical angles; 7. horizontal angles; 8. candela values, one set of vertical angles per
 *      horizontal angle.
 * A rotationally symmetric distribution has one horizontal angle, 0°; type C vertical angles run 0–180°.
 * The second field of line 5 was "future use" (always 1) in LM-63-2002; LM-63-2019 made it the file
 * generation type, and 1.00010 marks a computer simulation (from memory; the digits are flags).
 * Lines are CR LF terminated and kept within 132 characters (the 2019 edition allows 256; older readers 132).
 */
import { candelaDistribution, type FarFieldSamples } from './candela-distribution';
import { iesOpeningMetres, type IesOpening } from './ies-opening';
import { symmetricFlux } from './symmetric-flux';

/** First line of a file in the current edition. */
export const IES_VERSION_LINE = 'IES:LM-63-2019';
/** Keywords the 2019 edition requires. */
export const IES_REQUIRED_KEYWORDS: readonly string[] = ['TEST', 'TESTLAB', 'ISSUEDATE', 'MANUFAC'];
/** File generation type of a computer simulation (LM-63-2019, from memory). */
export const IES_FILE_GENERATION_SIMULATION = 1.0001;

const MAX_LINE = 132;
const EOL = '\r\n';

export interface IesWriteInput {
  /** Relative intensity against polar angle (0° = package axis). */
  farField: FarFieldSamples;
  /** Flux the file carries, lm, in [1e-6, 1e7]. */
  lumens: number;
  /** Rays and seed of the trace, for [TEST]. */
  rays: number;
  seed: number;
  /** Issue date, YYYY-MM-DD (the caller passes today's date: the core reads no clock). */
  issueDate: string;
  /** Scenario name, for [LUMINAIRE] (user text: cleaned to one printable ASCII line). */
  name: string;
  /** Luminous opening of the package. */
  opening: IesOpening;
  /** Electrical input, W, [0, 1e6]; 0 (default) = not known. */
  inputWatts?: number;
  /** Vertical angle step, degrees (default 1). */
  stepDeg?: number;
  /** How the far field was smoothed, if it was: written as the [_SMOOTHING] keyword. */
  smoothing?: string;
  /** Where the flux comes from (a white package's traced spectrum), if stated: the [_LUMINOUS_FLUX] keyword. */
  fluxNote?: string;
}

/** Spellings of the non-ASCII characters our names and notes use (a keyword line is ASCII only). */
const ASCII_SPELLING: readonly [RegExp, string][] = [
  [/≈/g, '~'],
  [/±/g, '+/-'],
  [/×/g, 'x'],
  [/·/g, '*'],
  [/[µμ]/g, 'u'],
  [/[–—−]/g, '-'],
  [/°/g, ' deg'],
  [/≤/g, '<='],
  [/≥/g, '>='],
  [/→/g, '->'],
  [/[‘’]/g, "'"],
  [/[“”]/g, '"'],
  [/…/g, '...'],
  [/[θΘ]/g, 'theta'],
  [/[ηΗ]/g, 'eta'],
  [/[λΛ]/g, 'lambda'],
  [/Φ/g, 'Phi'],
  [/[σ]/g, 'sigma'],
  [/Ω/g, 'Omega'],
  [/Ø/g, 'dia.'],
  [/²/g, '2'],
  [/³/g, '3']
];

/**
 * Text as printable ASCII on one line: the spellings above, accents dropped (é → e), anything else
 * that is not printable ASCII as '?'.
 */
export function asciiText(text: string): string {
  let out = String(text);
  for (const [pattern, spelling] of ASCII_SPELLING) out = out.replace(pattern, spelling);
  return out
    .replace(/[₀-₉]/g, (d) => String(d.charCodeAt(0) - 0x2080))
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .replace(/[\r\n\t]+/g, ' ')
    .replace(/[^\x20-\x7e]/g, '?')
    .replace(/\s+/g, ' ')
    .trim();
}

/** Replaces what a keyword line cannot hold (see asciiText) and cuts it to `room` characters. */
function keywordText(text: string, room: number): string {
  const plain = asciiText(text);
  return plain.length > room ? plain.slice(0, room) : plain;
}

/** A keyword and its text as lines: `[KEY] text`, continued on `[MORE] text` lines, words kept whole. */
function keywordLines(key: string, text: string): string[] {
  const words = asciiText(text).split(' ').filter((w) => w !== '');
  const lines: string[] = [];
  let head = `[${key}] `;
  let line = '';
  for (const word of words) {
    const room = MAX_LINE - head.length;
    const w = word.length > room ? word.slice(0, room) : word;
    if (line !== '' && line.length + 1 + w.length > room) {
      lines.push(head + line);
      head = '[MORE] ';
      line = w;
    } else line = line === '' ? w : `${line} ${w}`;
  }
  lines.push(head + (line || 'none'));
  return lines;
}

/** A number as an LM-63 reader expects it: plain decimals, no exponent, at most 6 significant digits. */
export function iesNumber(x: number): string {
  if (x === 0 || Object.is(x, -0)) return '0';
  const text = String(Number(x.toPrecision(6)));
  if (!/e/i.test(text)) return text;
  // Tiny or huge: fixed notation, trailing zeros trimmed
  if (Math.abs(x) >= 1) return BigInt(Math.round(Number(x.toPrecision(6)))).toString();
  return x.toFixed(12).replace(/(\.\d*?)0+$/, '$1').replace(/\.$/, '');
}

/** Space-separated numbers wrapped into lines of at most MAX_LINE characters. */
function wrapNumbers(values: readonly number[]): string[] {
  const lines: string[] = [];
  let line = '';
  for (const v of values) {
    const word = iesNumber(v);
    if (line.length > 0 && line.length + 1 + word.length > MAX_LINE) {
      lines.push(line);
      line = word;
    } else {
      line = line.length > 0 ? `${line} ${word}` : word;
    }
  }
  if (line.length > 0) lines.push(line);
  return lines;
}

/**
 * Writes a traced far field as an LM-63-2019 file, rotationally symmetric (one horizontal angle),
 * type C, metres, absolute photometry (lumens per lamp −1), candela scaled so the file's flux
 * 2π ∫ I sin θ dθ equals `lumens`.
 * @throws RangeError naming the field for bad input (see {@link IesWriteInput} for ranges)
 */
export function writeIes(input: IesWriteInput): string {
  if (!input || typeof input !== 'object') throw new RangeError('IES input must be an object');
  const { rays, seed, issueDate } = input;
  if (typeof rays !== 'number' || !Number.isInteger(rays) || rays < 1 || rays > 1e9) {
    throw new RangeError(`rays must be an integer in [1, 1e9] (got ${String(rays)})`);
  }
  if (typeof seed !== 'number' || !Number.isInteger(seed) || seed < 0 || seed > 4294967295) {
    throw new RangeError(`seed must be an integer in [0, 4294967295] (got ${String(seed)})`);
  }
  if (typeof issueDate !== 'string' || !/^\d{4}-\d{2}-\d{2}$/.test(issueDate)) {
    throw new RangeError(`issueDate must be a date written YYYY-MM-DD (got ${String(issueDate)})`);
  }
  const inputWatts = input.inputWatts ?? 0;
  if (typeof inputWatts !== 'number' || !(inputWatts >= 0 && inputWatts <= 1e6)) {
    throw new RangeError(`inputWatts must be a number in [0, 1e6] W (got ${String(inputWatts)})`);
  }
  const opening = iesOpeningMetres(input.opening);
  const dist = candelaDistribution(input.farField, input.lumens, input.stepDeg ?? 1);

  const keywords: [string, string][] = [
    ['TEST', `Monte Carlo trace ${rays} rays seed ${seed}`],
    ['TESTLAB', 'Outcouple simulation (computed, not a laboratory test)'],
    ['ISSUEDATE', issueDate],
    ['MANUFAC', 'Outcouple simulation'],
    ['LUMCAT', 'OUTCOUPLE-TRACE'],
    ['LUMINAIRE', input.name],
    ['LAMPCAT', 'none'],
    ['LAMP', 'LED package (simulated)'],
    [
      'FILEGENINFO',
      `Geometric-optics Monte Carlo far field, averaged over azimuth, scaled to ${iesNumber(input.lumens)} lm. ` +
        'An estimate, not a measurement.'
    ]
  ];
  const lines: string[] = [IES_VERSION_LINE];
  for (const [key, text] of keywords) {
    const head = `[${key}] `;
    lines.push(head + (keywordText(text, MAX_LINE - head.length) || 'none'));
  }
  if (input.smoothing !== undefined) lines.push(...keywordLines('_SMOOTHING', input.smoothing));
  if (input.fluxNote !== undefined) lines.push(...keywordLines('_LUMINOUS_FLUX', input.fluxNote));
  lines.push('TILT=NONE');
  // Line 4: lamps, lumens per lamp, multiplier, #vertical, #horizontal, type C, metres, w, l, h
  lines.push(
    ['1', '-1', '1', String(dist.thetaDeg.length), '1', '1', '2', ...opening.map(iesNumber)].join(' ')
  );
  // Line 5: ballast factor, file generation type, input watts
  lines.push(['1', IES_FILE_GENERATION_SIMULATION.toFixed(5), iesNumber(inputWatts)].join(' '));
  lines.push(...wrapNumbers(dist.thetaDeg));
  lines.push('0');
  lines.push(...wrapNumbers(dist.candela));
  return lines.join(EOL) + EOL;
}

/** What {@link parseIes} reads from a file. */
export interface IesPhotometry {
  /** First line, e.g. "IES:LM-63-2019"; "" for a file without one (LM-63-1986). */
  version: string;
  /** Keyword text by keyword name (without brackets); [MORE] lines are joined with a line break. */
  keywords: Record<string, string>;
  tilt: string;
  lampCount: number;
  /** −1 means absolute photometry. */
  lumensPerLamp: number;
  candelaMultiplier: number;
  /** 1 = type C, 2 = type B, 3 = type A. */
  photometricType: number;
  /** 1 = feet, 2 = metres. */
  unitsType: number;
  width: number;
  length: number;
  height: number;
  ballastFactor: number;
  /** "Future use" in LM-63-2002, file generation type in LM-63-2019. */
  fileGenerationType: number;
  inputWatts: number;
  verticalAnglesDeg: number[];
  horizontalAnglesDeg: number[];
  /** Candela values as written, one array of vertical-angle values per horizontal angle. */
  candela: number[][];
  /** Flux of the distribution, lm: candela × multiplier integrated over the sphere (type C). */
  fluxLm: number;
}

const MAX_ANGLES = 100_000;

/** Reads numbers one at a time from the data part of a file, naming the field when one is missing. */
class NumberReader {
  private i = 0;
  constructor(private readonly tokens: string[]) {}
  next(field: string): number {
    if (this.i >= this.tokens.length) throw new RangeError(`IES file ends before ${field}`);
    const token = this.tokens[this.i++];
    const v = Number(token);
    if (!Number.isFinite(v)) throw new RangeError(`IES ${field} must be a number (got '${token.slice(0, 20)}')`);
    return v;
  }
  count(field: string, max: number): number {
    const v = this.next(field);
    if (!Number.isInteger(v) || v < 1 || v > max) throw new RangeError(`IES ${field} must be an integer in [1, ${max}] (got ${v})`);
    return v;
  }
}

/**
 * Parses an IES photometric data file (LM-63-1986 to LM-63-2019 layouts, TILT=NONE or TILT=INCLUDE)
 * and integrates its flux for type C photometry:
 *   Φ = Σ_planes w_j · 2π ∫ I_j(θ) sin θ dθ · multiplier,
 * w_j trapezoid weights of the horizontal angles over their span (one plane: rotational symmetry; the
 * standard's quadrant and bilateral symmetries are averages over their span too).
 * @throws RangeError naming the field that is missing or out of range; TILT=<file> is not supported
 */
export function parseIes(text: string): IesPhotometry {
  if (typeof text !== 'string' || text.trim() === '') throw new RangeError('IES text must be a non-empty string');
  const lines = text.replace(/^\uFEFF/, '').split(/\r\n|\r|\n/);
  let row = 0;
  let version = '';
  if (!lines[0].trim().startsWith('[') && !/^TILT\s*=/i.test(lines[0].trim())) {
    version = lines[0].trim();
    row = 1;
  }

  // Keyword lines up to TILT=
  const keywords: Record<string, string> = {};
  let last = '';
  for (; row < lines.length; row++) {
    const line = lines[row].trim();
    if (/^TILT\s*=/i.test(line)) break;
    const m = /^\[([^\]]+)\]\s?(.*)$/.exec(line);
    if (!m) continue; // free text of pre-keyword files
    const key = m[1].trim().toUpperCase();
    if (key === 'MORE' && last) keywords[last] += `\n${m[2]}`;
    else {
      keywords[key] = m[2];
      last = key;
    }
  }
  if (row >= lines.length) throw new RangeError('IES file has no TILT= line');
  const tilt = lines[row].trim().replace(/^TILT\s*=\s*/i, '');
  row++;
  const reader = new NumberReader(lines.slice(row).join(' ').split(/[\s,]+/).filter((t) => t.length > 0));

  if (/^INCLUDE$/i.test(tilt)) {
    // Lamp-to-luminaire geometry, number of pairs, angles, multiplying factors: read and set aside
    reader.next('TILT lamp-to-luminaire geometry');
    const pairs = reader.count('TILT number of angles', MAX_ANGLES);
    for (let i = 0; i < 2 * pairs; i++) reader.next('TILT angles and factors');
  } else if (!/^NONE$/i.test(tilt)) {
    throw new RangeError(`IES TILT must be NONE or INCLUDE (a separate tilt file is not supported; got '${tilt.slice(0, 40)}')`);
  }

  const lampCount = reader.next('number of lamps');
  const lumensPerLamp = reader.next('lumens per lamp');
  const candelaMultiplier = reader.next('candela multiplier');
  const nV = reader.count('number of vertical angles', MAX_ANGLES);
  const nH = reader.count('number of horizontal angles', MAX_ANGLES);
  const photometricType = reader.next('photometric type');
  const unitsType = reader.next('units type');
  const width = reader.next('width');
  const length = reader.next('length');
  const height = reader.next('height');
  const ballastFactor = reader.next('ballast factor');
  const fileGenerationType = reader.next('file generation type');
  const inputWatts = reader.next('input watts');
  const verticalAnglesDeg: number[] = [];
  for (let i = 0; i < nV; i++) verticalAnglesDeg.push(reader.next(`vertical angle ${i + 1}`));
  const horizontalAnglesDeg: number[] = [];
  for (let i = 0; i < nH; i++) horizontalAnglesDeg.push(reader.next(`horizontal angle ${i + 1}`));
  const candela: number[][] = [];
  for (let j = 0; j < nH; j++) {
    const plane: number[] = [];
    for (let i = 0; i < nV; i++) plane.push(reader.next(`candela value ${j * nV + i + 1} of ${nV * nH}`));
    candela.push(plane);
  }

  if (photometricType !== 1) {
    throw new RangeError(`IES photometric type must be 1 (type C) to integrate the flux (got ${photometricType})`);
  }
  if (!(candelaMultiplier >= 0)) throw new RangeError(`IES candela multiplier must be ≥ 0 (got ${candelaMultiplier})`);

  // Φ = Σ w_j Φ_j, trapezoid weights over the horizontal span (a single plane has weight 1)
  let fluxLm = 0;
  if (nH === 1) {
    fluxLm = symmetricFlux(verticalAnglesDeg, candela[0]);
  } else {
    const span = horizontalAnglesDeg[nH - 1] - horizontalAnglesDeg[0];
    if (!(span > 0)) throw new RangeError('IES horizontal angles must increase');
    for (let j = 0; j < nH; j++) {
      const left = j > 0 ? horizontalAnglesDeg[j] - horizontalAnglesDeg[j - 1] : 0;
      const right = j < nH - 1 ? horizontalAnglesDeg[j + 1] - horizontalAnglesDeg[j] : 0;
      fluxLm += ((left + right) / 2 / span) * symmetricFlux(verticalAnglesDeg, candela[j]);
    }
  }
  fluxLm *= candelaMultiplier;
  if (!Number.isFinite(fluxLm)) {
    throw new RangeError('IES candela values times the candela multiplier give a flux too large to represent');
  }

  return {
    version,
    keywords,
    tilt,
    lampCount,
    lumensPerLamp,
    candelaMultiplier,
    photometricType,
    unitsType,
    width,
    length,
    height,
    ballastFactor,
    fileGenerationType,
    inputWatts,
    verticalAnglesDeg,
    horizontalAnglesDeg,
    candela,
    fluxLm
  };
}
