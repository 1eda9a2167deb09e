/**
 * Reads a spectrum file: CSV with columns wavelength_nm,value (an optional header row with those names,
 * blank lines and lines starting with # ignored). The one reader for the CLI's `color` command and for
 * pages that accept a spectrum file; every error names the file's line and the field.
 */
import { colorSpectrum, COLOR_SPECTRUM_LIMITS, type ColorSpectrum } from './color-spectrum';

/**
 * Parses and checks a spectrum CSV.
 * @param text the file's text (LF or CRLF)
 * @throws RangeError "line N: …" naming the field and the allowed range
 */
export function parseSpectrumCsv(text: string): ColorSpectrum {
  const rows: [number, number][] = [];
  const lineOf: number[] = [];
  const lines = text.split(/\r?\n/);
  let seenData = false;
  for (let i = 0; i < lines.length; i++) {
    const line = lines[i].trim();
    if (line === '' || line.startsWith('#')) continue;
    if (rows.length >= COLOR_SPECTRUM_LIMITS.rows.max) throw new RangeError(`line ${i + 1}: too many rows (at most ${COLOR_SPECTRUM_LIMITS.rows.max})`);
    const cells = line.split(',').map((c) => c.trim());
    if (!seenData && !/^[-+.\d]/.test(cells[0])) {
      // a header row: must name the two columns
      if (cells.length !== 2 || cells[0].toLowerCase() !== 'wavelength_nm' || cells[1].toLowerCase() !== 'value') {
        throw new RangeError(`line ${i + 1}: expected the header 'wavelength_nm,value' or two numbers (got '${line.slice(0, 40)}')`);
      }
      seenData = true;
      continue;
    }
    seenData = true;
    if (cells.length !== 2) throw new RangeError(`line ${i + 1}: expected 2 columns wavelength_nm,value (got ${cells.length})`);
    const w = cells[0] === '' ? NaN : Number(cells[0]);
    const v = cells[1] === '' ? NaN : Number(cells[1]);
    if (!Number.isFinite(w)) throw new RangeError(`line ${i + 1}: wavelength_nm must be a number (got '${cells[0].slice(0, 20)}')`);
    if (!Number.isFinite(v)) throw new RangeError(`line ${i + 1}: value must be a finite number ≥ 0 (got '${cells[1].slice(0, 20)}')`);
    rows.push([w, v]);
    lineOf.push(i + 1);
  }
  return colorSpectrum(rows, (i) => `line ${lineOf[i]}`);
}
