/**
 * Charts of a white package's trace (phosphor-summary.ts): the escaped spectrum with the chip's light
 * and the converted band told apart, the CIE 1931 chromaticity diagram (spectral locus, Planckian
 * locus with isotherm ticks, the result with its ±2σ box), and the colour over polar angle.
 * Pure: no DOM. Non-finite values are dropped, never drawn.
 */
import { planckianLocus, spectralLocus } from '../color/index';
import type { AngleColor, ColorWithSigma, SpectrumBin } from '../trace/phosphor-summary';
import type { ChartSpec, SeriesSpec } from './spec';

const finite = (p: { x: number; y: number }) => Number.isFinite(p.x) && Number.isFinite(p.y);

/**
 * Escaped spectral power per nm per chip photon, split at `splitNm` into the chip's band (blue leak)
 * and the converted band (the split is where the two overlap least: the minimum between the peaks).
 */
export function whiteSpectrumChart(bins: SpectrumBin[], chipPeakNm: number): ChartSpec {
  const visible = bins.filter((b) => b.wavelengthNm >= 380 && b.wavelengthNm <= 780);
  // The split: the lowest power between the chip's peak and the converted peak beyond it
  const after = visible.filter((b) => b.wavelengthNm > chipPeakNm + 10);
  const convertedPeak = after.reduce((m, b) => (b.power > m.power ? b : m), after[0] ?? { wavelengthNm: chipPeakNm + 100, power: 0 });
  const between = visible.filter((b) => b.wavelengthNm > chipPeakNm && b.wavelengthNm < convertedPeak.wavelengthNm);
  const split = between.reduce((m, b) => (b.power < m.power ? b : m), between[0] ?? convertedPeak).wavelengthNm;
  const scale = 1e3;
  const pts = (from: number, to: number) => visible.filter((b) => b.wavelengthNm >= from && b.wavelengthNm <= to).map((b) => ({ x: b.wavelengthNm, y: b.power * scale })).filter(finite);
  return {
    kind: 'line',
    title: 'Escaped spectrum',
    ariaLabel: `Escaped spectral power from 380 to 780 nm; chip light below ${split} nm, converted light above`,
    x: { title: 'Wavelength λ (nm)', min: 380, max: 780 },
    y: { title: 'Power per nm (relative, per chip photon)', min: 0 },
    series: [
      { label: 'Chip light that escaped (blue leak)', points: pts(380, split), color: 0 },
      { label: 'Converted light', points: pts(split, 780), color: 3 }
    ]
  };
}

/** CIE 1931 x, y diagram: spectral locus, Planckian locus with isotherms, the result (±2σ box). */
export function cieDiagramChart(color: ColorWithSigma | null): ChartSpec {
  const locus = spectralLocus(5, 380, 700);
  const planck = planckianLocus({ fromK: 1500, toK: 20000, points: 80, isothermsK: [2700, 3000, 4000, 5000, 6500, 10000], isothermDuv: 0.02 });
  const series: SeriesSpec[] = [
    { label: 'Spectral locus', points: [...locus, locus[0]].map((p) => ({ x: p.x, y: p.y })).filter(finite), color: 5, role: 'guide' },
    { label: 'Planckian locus', points: planck.points.map((p) => ({ x: p.x, y: p.y })).filter(finite), color: 1, role: 'marker' }
  ];
  for (const iso of planck.isotherms) {
    series.push({ label: `${iso.cctK} K`, points: [iso.below, iso.above].map((p) => ({ x: p.x, y: p.y })).filter(finite), color: 1, role: 'guide' });
  }
  if (color && Number.isFinite(color.x) && Number.isFinite(color.y)) {
    const sx = 2 * color.sigma.x;
    const sy = 2 * color.sigma.y;
    series.push({ label: `Result x ${color.x.toFixed(4)}, y ${color.y.toFixed(4)} (±2σ)`, points: [{ x: color.x, y: color.y, yMin: color.y - sy, yMax: color.y + sy }], color: 3, line: false, markers: true, marker: 'star' });
    if (sx > 0) series.push({ label: 'x ± 2σ', points: [{ x: color.x - sx, y: color.y }, { x: color.x + sx, y: color.y }], color: 3, role: 'guide' });
  }
  return {
    kind: 'scatter',
    title: 'Chromaticity (CIE 1931)',
    ariaLabel: color ? `CIE 1931 chromaticity diagram; result at x ${color.x.toFixed(4)}, y ${color.y.toFixed(4)}` : 'CIE 1931 chromaticity diagram; no result yet',
    x: { title: 'x', min: 0, max: 0.8 },
    y: { title: 'y', min: 0, max: 0.9 },
    series: series.map((s) => (s.role === 'guide' || s.role === 'marker' ? { ...s, line: true, markers: false } : s))
  };
}

/** CCT (K) and x, y over polar angle bands (band centres). */
export function colorOverAngleChart(bins: AngleColor[]): ChartSpec {
  const mid = (b: AngleColor) => (b.fromDeg + b.toDeg) / 2;
  return {
    kind: 'line',
    title: 'Colour over angle',
    ariaLabel: `Correlated colour temperature in 10° polar bands from ${bins[0]?.fromDeg ?? 0}° to ${bins[bins.length - 1]?.toDeg ?? 90}°`,
    x: { title: 'Polar angle θ from the axis (°)', min: 0, max: 180 },
    y: { title: 'CCT (K)' },
    series: [
      { label: 'CCT', points: bins.filter((b) => b.cctK !== null).map((b) => ({ x: mid(b), y: b.cctK as number })).filter(finite), color: 0, markers: true }
    ]
  };
}
