/** One row of the readable table: label, value and unit. */
export type Row = [label: string, value: string | number | boolean, unit?: string];

/** Prints either one JSON object or an aligned table of labelled rows with units. */
export function emit(json: boolean, data: unknown, title: string, rows: Row[], notes: string[] = []): void {
  if (json) {
    process.stdout.write(JSON.stringify(data, null, 2) + '\n');
    return;
  }
  const width = Math.max(...rows.map(([label]) => label.length));
  const lines = [title, '-'.repeat(title.length)];
  for (const [label, value, unit] of rows) {
    const shown = typeof value === 'number' ? formatNumber(value) : String(value);
    lines.push(`${label.padEnd(width)}  ${shown}${unit ? ` ${unit}` : ''}`);
  }
  for (const note of notes) lines.push(`note: ${note}`);
  process.stdout.write(lines.join('\n') + '\n');
}

/** Four to six significant digits, never exponent noise for ordinary magnitudes. */
export function formatNumber(value: number): string {
  if (!Number.isFinite(value)) return '—';
  if (value === 0) return '0';
  const magnitude = Math.abs(value);
  if (Number.isInteger(value) && magnitude < 1e12) return value.toLocaleString('en-US');
  if (magnitude >= 1e6 || magnitude < 1e-4) return value.toExponential(4);
  return Number(value.toPrecision(6)).toString();
}

/** A fraction as a percentage string. */
export function percent(fraction: number, digits = 3): string {
  return `${(fraction * 100).toFixed(digits)} %`;
}
