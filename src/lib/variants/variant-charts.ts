/**
 * The comparison's two charts: the loss ledgers as one bar chart (a group of bars per ledger bin, one
 * bar per variant) and the far fields overlaid. Pure: figures in, ChartSpecs out.
 *
 * Far-field intensities are given against a Lambertian emitter carrying the FIRST variant's escaped
 * flux (I0 = Φ_first/π), so the curves compare amounts as well as shapes: a variant's own relative
 * intensity is scaled by η_variant / η_first (common practice: Lambertian I(θ) = I0 cos θ, Φ = π I0).
 */
import { domeLedgerChart } from '../charts/dome-ledger-chart';
import { farFieldExtentDeg, lambertianCurve, regroupFarField } from '../charts/dome-far-field-chart';
import type { ChartSpec, SeriesSpec } from '../charts/spec';
import type { VariantFigures } from './variant-figures';

/** Ledger shares of every traced variant, one series (colour) per variant in column order. */
export function variantsLedgerChart(variants: readonly VariantFigures[]): ChartSpec {
  const input = variants.flatMap((f, i) => (f.traced ? [{ label: f.name, rays: f.traced.rays, ledger: f.traced.trace.ledger, color: i }] : []));
  const spec = domeLedgerChart(input);
  return { ...spec, title: 'Fate of every launched ray, by variant' };
}

/**
 * Far fields of every traced variant on one chart, zones of `group` 1° bins, against θ from the
 * package normal; the Lambertian of the first variant's flux is drawn dashed. The CSV holds one
 * column per variant.
 */
export function variantsFarFieldChart(variants: readonly VariantFigures[], group = 3): ChartSpec {
  const traced = variants.map((f, i) => ({ f, i })).filter(({ f }) => f.traced !== null);
  const ref = variants[0]?.traced?.extraction.value ?? 0;
  const maxDeg = Math.max(90, ...traced.map(({ f }) => farFieldExtentDeg({ ...f.traced!.trace.farField, fullSphere: true })));
  const curves = traced.map(({ f, i }) => {
    const t = f.traced!;
    // scale to the first variant's Lambertian: I/I0,first = (I/I0,own) · η_own/η_first
    const scale = ref > 0 ? t.extraction.value / ref : 1;
    const zones = regroupFarField(t.trace.farField.bins, group, maxDeg);
    return { f, i, points: zones.map((z) => ({ x: z.thetaDeg, y: z.intensity * scale })) };
  });
  let peak = 1;
  for (const c of curves) for (const p of c.points) if (Number.isFinite(p.y) && p.y > peak) peak = p.y;
  const top = Math.round(Math.ceil((peak * 1.1) / 0.2 - 1e-9) * 2) / 10;
  const refName = variants[0]?.name ?? 'the first variant';
  const series: SeriesSpec[] = curves.map((c) => ({ label: c.f.name, points: c.points, color: c.i }));
  series.push({ label: `Lambertian of ${refName}'s flux (cos θ)`, points: lambertianCurve(), color: 5, dashed: true, role: 'marker' });
  const facts =
    curves.length === 0
      ? 'no variant has finished tracing, so only the Lambertian reference is drawn'
      : curves
          .map((c) => {
            const b = c.f.traced!.trace.farField.beamAngleDeg;
            return `${c.f.name}: beam angle ${b !== null && Number.isFinite(b) ? `${b.toFixed(1)}°` : 'not defined'}`;
          })
          .join('; ');
  const rows = (curves[0]?.points ?? []).map((p, j) => [p.x, ...curves.map((c) => c.points[j]?.y ?? '')]);
  return {
    kind: 'line',
    title: 'Far fields of the variants, overlaid',
    ariaLabel: `Line chart of intensity against the polar angle from the package normal, 0 to ${maxDeg} degrees, one line per variant, relative to a Lambertian emitter of ${refName}'s escaped flux; ${facts}.`,
    x: { title: 'Angle from the package normal θ (°)', min: 0, max: maxDeg },
    y: { title: `Intensity I / I₀ of ${refName}`, min: 0, max: top },
    series,
    csv: { headers: ['Angle from normal θ (°)', ...curves.map((c) => `${c.f.name} intensity / I0 of ${refName}`)], rows }
  };
}
