/**
 * Chart of a stack's refractive index against depth: the chip below 0, each layer as a step, the exit
 * medium above the stack's top face. A horizontal marker at the exit index shows the escape limit:
 * a ray whose conserved n·sin θ exceeds it cannot leave through a planar stack. Pure.
 */
import type { ChartPoint, ChartSpec } from './spec';

export interface ProfileLayer {
  label: string;
  /** Real part of the index. */
  n: number;
  /** Extinction coefficient (≥ 0); only written to the CSV. */
  k: number;
  thicknessNm: number;
}

export interface StackProfileInput {
  chip: { label: string; n: number };
  /** Layers in order from the chip outwards. */
  layers: readonly ProfileLayer[];
  exit: { label: string; n: number };
  /** Depth unit of the x axis. */
  unit: 'nm' | 'µm';
}

/**
 * Depth shown for the chip and the exit medium on either side of the stack, in nm: about 15 % of the
 * stack, at least 50 nm (500 nm for µm axes), rounded up to 1, 2 or 5 × 10ⁿ so the axis ends on a round number.
 */
export function profilePadNm(totalNm: number, unit: 'nm' | 'µm'): number {
  const floor = unit === 'nm' ? 50 : 500;
  const want = Math.max(floor, 0.15 * totalNm);
  const decade = Math.pow(10, Math.floor(Math.log10(want)));
  for (const step of [1, 2, 5, 10]) if (step * decade >= want * (1 - 1e-12)) return step * decade;
  return want;
}

/**
 * Index-against-depth step chart. Depth 0 is the chip surface; depth grows outwards through the
 * stack. With no layers the chart shows the bare interface. The CSV lists one row per region with
 * its depth interval (the chip and exit rows cover only the drawn padding).
 */
export function stackProfileChart(input: StackProfileInput): ChartSpec {
  const scale = input.unit === 'nm' ? 1 : 1e-3;
  let totalNm = 0;
  for (const l of input.layers) totalNm += l.thicknessNm;
  const pad = profilePadNm(totalNm, input.unit);

  const pts: ChartPoint[] = [
    { x: -pad * scale, y: input.chip.n },
    { x: 0, y: input.chip.n }
  ];
  const rows: (string | number)[][] = [[input.chip.label + ' (chip)', -pad * scale, 0, input.chip.n, '']];
  let z = 0;
  for (const l of input.layers) {
    const z1 = z + l.thicknessNm;
    pts.push({ x: z * scale, y: l.n }, { x: z1 * scale, y: l.n });
    rows.push([l.label, z * scale, z1 * scale, l.n, l.k]);
    z = z1;
  }
  pts.push({ x: z * scale, y: input.exit.n }, { x: (z + pad) * scale, y: input.exit.n });
  rows.push([input.exit.label + ' (exit)', z * scale, (z + pad) * scale, input.exit.n, '']);

  let nMin = Math.min(input.chip.n, input.exit.n);
  let nMax = Math.max(input.chip.n, input.exit.n);
  for (const l of input.layers) {
    nMin = Math.min(nMin, l.n);
    nMax = Math.max(nMax, l.n);
  }
  const yMin = Math.max(0, Math.floor((nMin - 0.1) * 10) / 10);
  const yMax = Math.ceil((nMax + 0.1) * 10) / 10;

  const xLo = -pad * scale;
  const xHi = (totalNm + pad) * scale;
  const count = input.layers.length;
  return {
    kind: 'line',
    title: 'Index profile of the stack',
    ariaLabel: `Step chart of the refractive index against depth from the chip surface in ${input.unit}: chip n = ${input.chip.n.toFixed(3)} below 0, ${count} layer${count === 1 ? '' : 's'} over ${(totalNm * scale).toPrecision(4)} ${input.unit}, then ${input.exit.label} n = ${input.exit.n.toFixed(3)}; a horizontal line marks the escape limit n·sin θ = ${input.exit.n.toFixed(3)}.`,
    x: { title: `Depth from the chip surface (${input.unit})`, min: xLo, max: xHi },
    y: { title: 'Refractive index n', min: yMin, max: yMax },
    series: [
      { label: 'Index n', points: pts, color: 0 },
      {
        label: `Escape limit n·sin θ = ${input.exit.n.toFixed(3)}`,
        points: [
          { x: xLo, y: input.exit.n },
          { x: xHi, y: input.exit.n }
        ],
        color: 3,
        role: 'marker',
        dashed: true
      }
    ],
    csv: {
      headers: ['region', `from depth (${input.unit})`, `to depth (${input.unit})`, 'n', 'k'],
      rows
    }
  };
}
