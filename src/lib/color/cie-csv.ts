/**
 * Reader for the CIE's open-data CSV tables (no header, comma separated, first column the wavelength
 * in nm, `NaN` where the CIE left a cell blank). Used by the generator of data/cie/cie-tables.json and
 * by the tests that re-read the CIE's own files; the app itself reads the generated JSON.
 * @see CIE data tables, https://cie.co.at/data-tables (format described in each dataset's metadata)
 */

/**
 * Parses a CIE CSV table into rows of numbers.
 * @param text the file's text (CRLF or LF line ends; blank lines ignored)
 * @param columns expected number of columns in every row (wavelength included)
 * @param name the file's name, for error messages
 * @throws Error naming the file and line when a row has the wrong width, a non-number or an unsorted wavelength
 */
export function parseCieCsv(text: string, columns: number, name: string): number[][] {
  const rows: number[][] = [];
  const lines = text.split(/\r?\n/);
  for (let i = 0; i < lines.length; i++) {
    const line = lines[i].trim();
    if (line === '') continue;
    const cells = line.split(',');
    if (cells.length !== columns) throw new Error(`${name} line ${i + 1}: ${cells.length} columns, expected ${columns}`);
    const row = cells.map((cell) => (cell.trim() === 'NaN' ? Number.NaN : Number(cell)));
    if (row.some((v, j) => Number.isNaN(v) && cells[j].trim() !== 'NaN')) throw new Error(`${name} line ${i + 1}: not a number`);
    if (rows.length && !(row[0] > rows[rows.length - 1][0])) throw new Error(`${name} line ${i + 1}: wavelength not ascending`);
    rows.push(row);
  }
  return rows;
}
