import { describe, expect, it } from 'vitest';
import { profilePadNm, stackProfileChart } from '../../../src/lib/charts/stack-profile-chart';
import { chartTable } from '../../../src/lib/charts/csv';

const chip = { label: 'GaN', n: 2.48 };
const exit = { label: 'Air', n: 1 };

describe('stackProfileChart(input)', () => {
  it('draws the chip, each layer and the exit medium as steps at their depths', () => {
    const spec = stackProfileChart({
      chip,
      layers: [
        { label: 'SiO2', n: 1.46, k: 0, thicknessNm: 100 },
        { label: 'MgF2', n: 1.38, k: 0, thicknessNm: 50 }
      ],
      exit,
      unit: 'nm'
    });
    const pad = profilePadNm(150, 'nm');
    expect(spec.series[0].points).toEqual([
      { x: -pad, y: 2.48 },
      { x: 0, y: 2.48 },
      { x: 0, y: 1.46 },
      { x: 100, y: 1.46 },
      { x: 100, y: 1.38 },
      { x: 150, y: 1.38 },
      { x: 150, y: 1 },
      { x: 150 + pad, y: 1 }
    ]);
    expect(spec.x.title).toBe('Depth from the chip surface (nm)');
    expect(spec.y.title).toBe('Refractive index n');
  });

  it('converts depths to µm when asked (1 µm = 1000 nm exactly)', () => {
    const spec = stackProfileChart({ chip, layers: [{ label: 'Sapphire', n: 1.77, k: 0, thicknessNm: 2000 }], exit, unit: 'µm' });
    expect(spec.series[0].points[3]).toEqual({ x: 2, y: 1.77 });
    expect(spec.x.title).toContain('(µm)');
  });

  it('marks the escape limit n·sin θ = n_exit as a horizontal marker across the plot', () => {
    const spec = stackProfileChart({ chip, layers: [], exit: { label: 'Methyl silicone', n: 1.41 }, unit: 'nm' });
    const m = spec.series.find((s) => s.role === 'marker')!;
    expect(m.points.map((p) => p.y)).toEqual([1.41, 1.41]);
    expect(m.points[0].x).toBe(spec.x.min);
    expect(m.points[1].x).toBe(spec.x.max);
  });

  it('keeps every index inside the y range, with 0.1 of room', () => {
    const spec = stackProfileChart({ chip, layers: [{ label: 'Ag', n: 0.05, k: 3.6, thicknessNm: 10 }], exit, unit: 'nm' });
    expect(spec.y.min).toBe(0);
    expect(spec.y.max).toBeGreaterThanOrEqual(2.58);
  });

  it('exports one CSV row per region with depths, n and k', () => {
    const spec = stackProfileChart({ chip, layers: [{ label: 'ITO', n: 1.9, k: 0.01, thicknessNm: 80 }], exit, unit: 'nm' });
    const t = chartTable(spec);
    expect(t.headers).toEqual(['region', 'from depth (nm)', 'to depth (nm)', 'n', 'k']);
    expect(t.rows[1]).toEqual(['ITO', 0, 80, 1.9, 0.01]);
    expect(t.rows).toHaveLength(3);
  });

  it('shows a bare interface when there are no layers', () => {
    const spec = stackProfileChart({ chip, layers: [], exit, unit: 'nm' });
    expect(spec.series[0].points).toHaveLength(4);
    expect(spec.ariaLabel).toContain('0 layers');
  });
});

describe('profilePadNm(totalNm, unit)', () => {
  it('pads about 15 % of the stack, rounded up to 1, 2 or 5 × 10ⁿ, with a floor', () => {
    expect(profilePadNm(0, 'nm')).toBe(50);
    expect(profilePadNm(150, 'nm')).toBe(50);
    expect(profilePadNm(610, 'nm')).toBe(100); // 91.5 → 100
    expect(profilePadNm(2000, 'nm')).toBe(500); // 300 → 500
    expect(profilePadNm(0, 'µm')).toBe(500);
    expect(profilePadNm(1e6, 'µm')).toBe(200_000); // 150 µm → 200 µm
  });
});
