/**
 * A white-light sweep (white-sweep.ts) as a chart: one quantity (CCT with its ±σ bars, efficacy,
 * efficiency or Δu′v′) against the swept load or particle diameter. Pure: no DOM; points without a
 * value (no CCT beyond the locus' range) are left out, never drawn as zero.
 */
import { WHITE_SWEEP_AXES, type WhiteSweepAxis, type WhiteSweepPoint } from '../white/white-sweep';
import type { ChartPoint, ChartSpec } from './spec';

export type WhiteSweepQuantity = 'cct' | 'lumensPerWattOfChip' | 'ler' | 'energyEfficiency' | 'deltaUvPrime';

export const WHITE_SWEEP_QUANTITIES: Record<WhiteSweepQuantity, { label: string; axis: string; of: (p: WhiteSweepPoint) => number | null }> = {
  cct: { label: 'CCT', axis: 'CCT (K)', of: (p) => p.cctK },
  lumensPerWattOfChip: { label: 'Lumens per watt of chip light', axis: 'Lumens per watt of chip light (lm/W)', of: (p) => p.lumensPerWattOfChip },
  ler: { label: 'Luminous efficacy of radiation', axis: 'Luminous efficacy of radiation (lm/W)', of: (p) => p.lerLmPerW },
  energyEfficiency: { label: 'Watts out per watt of chip light', axis: 'Watts out per watt of chip light (%)', of: (p) => p.energyEfficiency * 100 },
  deltaUvPrime: { label: 'Δu′v′ over angle', axis: 'Δu′v′ over angle (CIE 1976, unitless)', of: (p) => p.deltaUvPrime }
};

export function whiteSweepChart(axis: WhiteSweepAxis, quantity: WhiteSweepQuantity, points: readonly WhiteSweepPoint[]): ChartSpec {
  const a = WHITE_SWEEP_AXES[axis];
  const q = WHITE_SWEEP_QUANTITIES[quantity];
  const pts: ChartPoint[] = [];
  for (const p of points) {
    const y = q.of(p);
    if (y === null || !Number.isFinite(y)) continue;
    const s = quantity === 'cct' ? p.sigmaCctK : null;
    pts.push(s !== null && Number.isFinite(s) ? { x: p.value, y, yMin: y - s, yMax: y + s } : { x: p.value, y });
  }
  const range = pts.length ? `${pts[0].x} to ${pts[pts.length - 1].x} ${a.unit}` : 'no points with a value yet';
  return {
    kind: 'line',
    title: `${q.label} against ${a.label.toLowerCase()}`,
    ariaLabel: `${q.label} against ${a.label.toLowerCase()}, ${range}${quantity === 'cct' ? ', bars ±1σ' : ''}`,
    x: { title: `${a.label} (${a.unit})` },
    y: { title: q.axis },
    series: [{ label: quantity === 'cct' ? `${q.label} (±1σ)` : q.label, points: pts, color: axis === 'load' ? 3 : 2, markers: true }]
  };
}
