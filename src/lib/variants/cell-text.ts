/**
 * A comparison cell as text with its unit: "38.637 ± 0.097 %", "1.0851 ± 0.0037 ×", "— (trace not
 * finished)". The page's table and the command line print the same text. Pure.
 */
import type { ComparisonRow } from './comparison-rows';
import { decimalText } from './precision';

export function cellText(row: ComparisonRow, i: number): string {
  const c = row.cells[i];
  if (!c) return `— (${row.why[i] ?? 'not defined'})`;
  const v = row.unit === 'rays' ? c.value.toLocaleString('en-US') : decimalText(c.value, c.decimals);
  const unit = row.unit === '' ? '' : row.unit === '°' ? '°' : ` ${row.unit}`;
  return c.sigma !== null && c.sigma > 0 ? `${v} ± ${decimalText(c.sigma, c.decimals)}${unit}` : `${v}${unit}`;
}
