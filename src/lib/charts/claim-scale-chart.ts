/**
 * The claim on a scale: one bar per physical bound of the package (bare chip and ideal dome: single
 * pass over the emitting faces; recycling limit: a planar chip with lossless recycling; best reported:
 * the thin-film chip figure we cite) and one for the claim, sorted by value, so the eye sees where the
 * claim falls — below the single pass, between the ideal dome and the recycling limit, beyond the best
 * reported figure. Pure: takes a checked claim, returns a ChartSpec.
 */
import type { ClaimKind, ClaimResult } from '../decisions/index';
import { BEST_REPORTED_EXTRACTION } from '../decisions/index';
import type { ChartSpec } from './spec';

export interface ClaimScaleBar {
  label: string;
  /** In the unit the claim is stated in: percent for extraction and coating, a factor for gain. */
  value: number;
  isClaim: boolean;
}

/** Palette slots: bounds in the first colour, the claim in the second. */
const BOUND_COLOR = 0;
const CLAIM_COLOR = 1;

function pct(x: number): number {
  return x * 100;
}

/** The bars for a checked claim, ascending (the claim after a bound of equal value). */
export function claimScaleBars(kind: ClaimKind, value: number, result: ClaimResult): ClaimScaleBar[] {
  const b = result.bounds;
  const bars: ClaimScaleBar[] = [];
  const bound = (label: string, v: number) => bars.push({ label, value: v, isClaim: false });
  if (kind === 'extraction') {
    bound('Bare chip', pct(b.bareCuboid));
    if (b.encapsulated) bound('Ideal dome', pct(b.idealDome));
    bound('Recycling limit', pct(b.recyclingLimit));
    bound('Best reported', pct(BEST_REPORTED_EXTRACTION.value));
    const traced = result.numbers.find((n) => n.id === 'trace-extraction');
    if (traced) bound('Traced', pct(traced.value));
    bars.push({ label: 'Claim', value: pct(value), isClaim: true });
  } else if (kind === 'gain') {
    bound('No encapsulant', 1);
    bound('Ideal dome', b.closedFormGain);
    bound('Gain limit', b.gainLimit);
    bars.push({ label: 'Claim', value, isClaim: true });
  } else {
    bound('No coating', 0);
    bound('Quarter-wave layer', pct(b.quarterWaveCoating));
    bound('Flat-coating limit', pct(b.coatingLimit));
    bars.push({ label: 'Claim', value: pct(value), isClaim: true });
  }
  return bars.sort((p, q) => p.value - q.value || Number(p.isClaim) - Number(q.isClaim));
}

const AXIS: Record<ClaimKind, { title: string; unit: string }> = {
  extraction: { title: 'Extraction (%)', unit: '%' },
  gain: { title: 'Gain over bare chip (×)', unit: '×' },
  coating: { title: 'Change from coating (%)', unit: '%' }
};

function shown(v: number, unit: string): string {
  const digits = Math.abs(v) >= 10 ? 3 : 2;
  const text = Number(v.toPrecision(digits)).toString();
  return unit === '×' ? `${text}×` : `${text} %`;
}

/**
 * The bar chart: bounds and claim, ascending; extraction on 0–100 %, gain from 0, coating from
 * min(0, claim). @param value the claim in the core's terms (fraction, factor or relative change)
 */
export function claimScaleChart(kind: ClaimKind, value: number, result: ClaimResult): ChartSpec {
  const bars = claimScaleBars(kind, value, result);
  const axis = AXIS[kind];
  const top = Math.max(...bars.map((bar) => bar.value));
  const bottom = Math.min(0, ...bars.map((bar) => bar.value));
  const words = bars.map((bar) => `${bar.label} ${shown(bar.value, axis.unit)}`).join(', ');
  return {
    kind: 'bar',
    // Sideways: the bound names stay level and readable at phone width (upright bars would tilt them)
    horizontal: true,
    title: 'The claim against the physical bounds',
    ariaLabel: `Bar chart of the claim among the bounds of this package, in ascending order: ${words}. Verdict: ${result.verdict}.`,
    x: { title: 'Bound (ascending, top to bottom)' },
    y: kind === 'extraction' ? { title: axis.title, min: 0, max: 100 } : { title: axis.title, min: bottom, max: top > 0 ? undefined : 1 },
    categories: bars.map((bar) => `${bar.label} ${shown(bar.value, axis.unit)}`),
    series: [
      {
        label: 'Bounds of this package; the claim in the second colour',
        color: BOUND_COLOR,
        points: bars.map((bar, i) => ({ x: i, y: bar.value })),
        pointColors: bars.map((bar) => (bar.isClaim ? CLAIM_COLOR : BOUND_COLOR))
      }
    ]
  };
}
