/**
 * Bar chart of where the light goes in a trace: escaped, absorbed in the chip, in the encapsulant,
 * at the base, or lost (stopped at the event cap), in percent of launched rays, with ±1 binomial
 * standard error bars. One series per traced package (e.g. the dome package and the bare chip).
 * Pure: takes ledger fractions, returns a ChartSpec.
 */
import type { ChartSpec, SeriesSpec } from './spec';

/** Ledger fractions of launched rays (they sum to 1). */
export interface LedgerFractions {
  escaped: number;
  chip: number;
  encapsulant: number;
  base: number;
  lost: number;
}

export interface LedgerSeriesInput {
  label: string;
  /** Rays launched (for the standard error), integer ≥ 1. */
  rays: number;
  ledger: LedgerFractions;
  /** Palette slot; defaults to the series' position. */
  color?: number;
}

/** The ledger's bins in chart order, with the category names shown. */
export const LEDGER_CATEGORIES: readonly { key: keyof LedgerFractions; label: string }[] = [
  { key: 'escaped', label: 'Escaped' },
  { key: 'chip', label: 'Absorbed in chip' },
  { key: 'encapsulant', label: 'Absorbed in encapsulant' },
  { key: 'base', label: 'Absorbed at base' },
  { key: 'lost', label: 'Lost (event cap)' }
];

/**
 * The ledger chart, y in percent 0–100. Error bars: ±√(p(1 − p)/N) (binomial standard error of a
 * share p of N rays). A non-finite share is drawn as 0 and named in the text, never as NaN.
 */
export function domeLedgerChart(input: readonly LedgerSeriesInput[]): ChartSpec {
  const bad: string[] = [];
  const series: SeriesSpec[] = input.map((s, i) => ({
    label: s.label,
    color: s.color ?? i,
    points: LEDGER_CATEGORIES.map((c, j) => {
      const p = s.ledger[c.key];
      if (!Number.isFinite(p) || !(s.rays >= 1)) {
        bad.push(`${s.label}: ${c.label.toLowerCase()}`);
        return { x: j, y: 0 };
      }
      // binomial standard error √(p(1 − p)/N)
      const se = Math.sqrt((p * (1 - p)) / s.rays);
      return { x: j, y: p * 100, yMin: Math.max(0, p - se) * 100, yMax: Math.min(1, p + se) * 100 };
    })
  }));

  const parts = input.map((s) => {
    const shares = LEDGER_CATEGORIES.filter((c) => Number.isFinite(s.ledger[c.key]))
      .map((c) => `${c.label.toLowerCase()} ${(s.ledger[c.key] * 100).toFixed(1)} %`)
      .join(', ');
    return `${s.label}: ${shares}`;
  });
  const text = input.length === 0 ? 'no trace yet' : parts.join('; ');
  const missing = bad.length > 0 ? ` Not available: ${bad.join(', ')}.` : '';
  return {
    kind: 'bar',
    title: 'Fate of every launched ray',
    ariaLabel: `Bar chart of the share of launched rays in percent that escaped or were absorbed in the chip, the encapsulant or at the base, or were lost. ${text}.${missing}`,
    x: { title: 'Fate of the ray' },
    y: { title: 'Share of rays (%)', min: 0, max: 100 },
    categories: LEDGER_CATEGORIES.map((c) => c.label),
    series
  };
}
