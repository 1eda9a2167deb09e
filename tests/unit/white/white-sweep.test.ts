import { describe, expect, it } from 'vitest';
import { whiteSweepChart } from '../../../src/lib/charts/white-sweep-chart';
import { demoScenario } from '../../../src/lib/scenario/defaults';
import { toTracePackage } from '../../../src/lib/scenario';
import { libraryPhosphor, traceWhite } from '../../../src/lib/trace/white-light';
import { libraryOptics } from '../../../src/lib/white/particle-optics';
import { withMixture } from '../../../src/lib/white/phosphor-mix';
import { parseWhiteSweepValues, runWhiteSweep, whiteSweepCsv } from '../../../src/lib/white/white-sweep';

const pkg = toTracePackage(demoScenario());
const yellow = libraryOptics(libraryPhosphor('garnet-yellow'));

describe('white sweeps', () => {
  it('parses the swept values and refuses bad ones naming the field and range', () => {
    expect(parseWhiteSweepValues('load', '2, 4;8 12')).toEqual([2, 4, 8, 12]);
    expect(() => parseWhiteSweepValues('load', '0, 4')).toThrow(/Phosphor load values \(wt%\) must each be a number in \[0.01, 60\]/);
    expect(() => parseWhiteSweepValues('diameter', '5, 100')).toThrow(/Particle diameter values \(µm\) must each be a number in \[0.05, 50\]/);
    expect(() => parseWhiteSweepValues('diameter', '')).toThrow(/1 to 24 numbers/);
  });

  it('over load, with common random numbers: CCT falls as the load rises (common practice); lm per W of chip = LER × energy efficiency; CSV and chart carry every point', async () => {
    const points = await runWhiteSweep([10, 14, 20], async (w) => traceWhite(withMixture(pkg, [{ optics: yellow, weightPercent: w, diameterUm: 12 }], [[450, 1]]), 4000, 5).summary);
    expect(points[1].cctK!).toBeLessThan(points[0].cctK!);
    expect(points[2].cctK!).toBeLessThan(points[1].cctK!);
    for (const p of points) expect(p.lumensPerWattOfChip!).toBeCloseTo(p.lerLmPerW! * p.energyEfficiency, 9);
    const csv = whiteSweepCsv('load', points).trim().split('\n');
    expect(csv[0].startsWith('load_wt_percent,cct_k,sigma_cct_k,duv')).toBe(true);
    expect(csv).toHaveLength(4);
    const chart = whiteSweepChart('load', 'cct', points);
    expect(chart.series[0].points.map((p) => p.x)).toEqual([10, 14, 20]);
    expect(chart.series[0].points[0].yMax! - chart.series[0].points[0].y).toBeCloseTo(points[0].sigmaCctK!, 9);
    expect(whiteSweepChart('load', 'deltaUvPrime', [{ ...points[0], deltaUvPrime: null }]).series[0].points).toEqual([]);
  });
});
