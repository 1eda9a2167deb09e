/**
 * Chart of the escape fraction through one flat face against the surrounding index, from air (1.0)
 * up to the index of the medium the light starts in: the geometric cone (1 − cos θc)/2 and the
 * Fresnel-weighted fraction, with the current surrounding index marked.
 */
import type { ChartSpec } from './spec';

/** The two escape fractions for one pair of indices (as `escapeCone` in the optics core gives them). */
export type EscapeFn = (nIn: number, nOut: number) => { geometric: number; fresnel: number };

function fmt(x: number, digits: number): string {
  return String(Number(x.toPrecision(digits)));
}

/**
 * Samples `escape(nIn, nOut)` at `steps` + 1 evenly spaced surrounding indices from 1 to
 * max(nIn, nOutNow) and builds the chart in percent. A degenerate range (nIn = 1) is widened to
 * [1, 1.05] so there is always a curve. Samples that come back non-finite are dropped.
 * @param nIn index the light starts in (≥ 1); @param nOutNow the surrounding index now chosen (marked)
 * @param steps intervals, integer ≥ 2 (default 60)
 */
export function escapeIndexChart(nIn: number, nOutNow: number, escape: EscapeFn, steps = 60): ChartSpec {
  const lo = 1;
  const hi = Math.max(nIn, nOutNow, lo + 0.05);
  const geometric = [];
  const fresnel = [];
  for (let i = 0; i <= steps; i++) {
    const nOut = lo + ((hi - lo) * i) / steps;
    const e = escape(nIn, nOut);
    if (Number.isFinite(e.geometric)) geometric.push({ x: nOut, y: e.geometric * 100 });
    if (Number.isFinite(e.fresnel)) fresnel.push({ x: nOut, y: e.fresnel * 100 });
  }
  const now = escape(nIn, nOutNow);
  const top = Math.max(50, ...geometric.map((p) => p.y));
  return {
    kind: 'line',
    title: `Escape through one face against surrounding index (inside n ${fmt(nIn, 4)})`,
    ariaLabel:
      `Line chart of the escape fraction through one flat face, in percent, against the surrounding index from ${fmt(lo, 3)} to ${fmt(hi, 4)}, ` +
      `for light starting in index ${fmt(nIn, 4)}: geometric cone and Fresnel-weighted. ` +
      `At the chosen surrounding index ${fmt(nOutNow, 4)} the Fresnel-weighted fraction is ${fmt(now.fresnel * 100, 3)} percent.`,
    x: { title: 'Surrounding index nₒᵤₜ', min: lo, max: hi },
    y: { title: 'Escape, one face (%)', min: 0, max: top },
    series: [
      { label: 'Geometric cone (1 − cos θc)/2', points: geometric, color: 3, dashed: true },
      { label: 'Fresnel-weighted (unpolarised)', points: fresnel, color: 0 },
      {
        label: `Chosen surrounding n = ${fmt(nOutNow, 4)}`,
        points: [
          { x: nOutNow, y: 0 },
          { x: nOutNow, y: top }
        ],
        color: 5,
        role: 'marker',
        dashed: true
      }
    ]
  };
}
