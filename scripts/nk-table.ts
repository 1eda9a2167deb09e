#!/usr/bin/env node
/**
 * Turns one optical-constant file of data/nk/ (refractiveindex.info YAML, wavelengths in µm) into the
 * rows of a `table` entry of data/materials.json: [wavelength nm, n, k], ascending, within an optional
 * wavelength window. Values are copied as written in the file (µm → nm by moving the decimal point);
 * a file with a Cauchy formula for n (type "formula 5") and a k table gets n computed from the formula
 * at each k row. This is how the library's metal, GaP, ITO and soda-lime tables were made; the
 * reference test tests/reference/materials-sources.test.ts checks the library against the files again.
 *
 * Usage: npx tsx scripts/nk-table.ts data/nk/<file>.yml [minNm maxNm]   (prints JSON rows)
 */
import { readFileSync } from 'node:fs';

/** µm text → nm number, exactly for decimal inputs (0.31 → 310, not 310.00000000000006). */
export function umToNm(text: string): number {
  return Number((Number(text) * 1000).toPrecision(12));
}

interface NkBlock {
  type: string;
  /** Rows of number texts, as written. */
  rows: string[][];
  coefficients: number[];
}

/** The DATA blocks of a file: type, coefficients or rows of numbers. Only what our files use. */
export function readNkFile(text: string): NkBlock[] {
  const blocks: NkBlock[] = [];
  let block: NkBlock | null = null;
  let inData = false;
  for (const line of text.split('\n')) {
    const type = /^\s*- type:\s*(.+)$/.exec(line);
    if (type) {
      block = { type: type[1].trim(), rows: [], coefficients: [] };
      blocks.push(block);
      inData = false;
      continue;
    }
    if (!block) continue;
    const coeff = /^\s*coefficients:\s*(.+)$/.exec(line);
    if (coeff) block.coefficients = coeff[1].trim().split(/\s+/).map(Number);
    if (/^\s*data:\s*\|/.test(line)) {
      inData = true;
      continue;
    }
    if (inData) {
      const cells = line.trim().split(/\s+/);
      if (cells.length >= 2 && cells.every((c) => c !== '' && Number.isFinite(Number(c)))) block.rows.push(cells);
      else if (line.trim() !== '') inData = false;
    }
  }
  return blocks;
}

/** Cauchy, refractiveindex.info formula 5: n = C1 + Σ C₂ᵢ λ^C₂ᵢ₊₁, λ in µm. */
function cauchy5(c: number[], um: number): number {
  let n = c[0];
  for (let i = 1; i + 1 < c.length; i += 2) n += c[i] * um ** c[i + 1];
  return n;
}

/** [nm, n, k] rows of a file, ascending, within [minNm, maxNm]. */
export function nkRows(text: string, minNm = 0, maxNm = Infinity): [number, number, number][] {
  const blocks = readNkFile(text);
  let rows: [number, number, number][];
  const nk = blocks.find((b) => b.type === 'tabulated nk');
  if (nk) rows = nk.rows.map(([w, n, k]): [number, number, number] => [umToNm(w), Number(n), Number(k)]);
  else {
    const f5 = blocks.find((b) => b.type === 'formula 5');
    const k = blocks.find((b) => b.type === 'tabulated k');
    if (!f5 || !k) throw new Error('supported: "tabulated nk", or "formula 5" with "tabulated k"');
    // n from the published formula at each k row, to 6 decimals (the formula's own digits are 4–6)
    rows = k.rows.map(([w, kk]): [number, number, number] => [umToNm(w), Number(cauchy5(f5.coefficients, Number(w)).toFixed(6)), Number(kk)]);
  }
  return rows.filter((r) => r[0] >= minNm && r[0] <= maxNm).sort((a, b) => a[0] - b[0]);
}

if (process.argv[1]?.endsWith('nk-table.ts')) {
  const [file, min, max] = process.argv.slice(2);
  if (!file) {
    console.error('usage: npx tsx scripts/nk-table.ts data/nk/<file>.yml [minNm maxNm]');
    process.exit(2);
  }
  const rows = nkRows(readFileSync(file, 'utf8'), min ? Number(min) : 0, max ? Number(max) : Infinity);
  console.log(JSON.stringify(rows));
}
