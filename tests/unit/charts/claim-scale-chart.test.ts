import { describe, expect, it } from 'vitest';
import { checkClaim } from '../../../src/lib/decisions';
import { claimScaleBars, claimScaleChart } from '../../../src/lib/charts/claim-scale-chart';

const gan = { nChip: 2.45, nEnc: 1.41, structure: 'planar' as const, faces: 5 as const };

describe('claimScaleBars(kind, value, result)', () => {
  it('places an extraction claim among the single-pass, ideal-dome, recycling and best-reported bounds, ascending', () => {
    const result = checkClaim({ ...gan, kind: 'extraction', value: 0.45 });
    const bars = claimScaleBars('extraction', 0.45, result);
    expect(bars.map((b) => b.label)).toEqual(['Bare chip', 'Ideal dome', 'Claim', 'Recycling limit', 'Best reported']);
    const b = result.bounds;
    expect(bars[0].value).toBeCloseTo(b.bareCuboid * 100, 12);
    expect(bars[1].value).toBeCloseTo(b.idealDome * 100, 12);
    expect(bars[2]).toEqual({ label: 'Claim', value: 45, isClaim: true });
    expect(bars[4].value).toBe(80); // Shchekin et al., Appl. Phys. Lett. 89, 071109 (2006), from memory
    for (let i = 1; i < bars.length; i++) expect(bars[i].value).toBeGreaterThanOrEqual(bars[i - 1].value);
  });

  it('leaves out the ideal dome for a bare chip and adds the traced package when there is one', () => {
    const result = checkClaim({ ...gan, nEnc: null, kind: 'extraction', value: 0.2, trace: { extraction: 0.1, stderr: 0.001 } });
    const labels = claimScaleBars('extraction', 0.2, result).map((b) => b.label);
    expect(labels).not.toContain('Ideal dome');
    expect(labels).toContain('Traced');
  });

  it('a gain claim is placed against no encapsulant (1×), the closed-form gain and the planar-chip gain limit', () => {
    const result = checkClaim({ ...gan, kind: 'gain', value: 2.5 });
    const bars = claimScaleBars('gain', 2.5, result);
    expect(bars[0]).toEqual({ label: 'No encapsulant', value: 1, isClaim: false });
    expect(bars.find((b) => b.isClaim)?.value).toBe(2.5);
    expect(bars.map((b) => b.value)).toContain(result.bounds.closedFormGain);
  });

  it('a coating decrease sits below "no coating"', () => {
    const result = checkClaim({ ...gan, nEnc: null, kind: 'coating', value: -0.05 });
    const bars = claimScaleBars('coating', -0.05, result);
    expect(bars[0]).toEqual({ label: 'Claim', value: -5, isClaim: true });
    expect(bars[1].label).toBe('No coating');
  });
});

describe('claimScaleChart(kind, value, result)', () => {
  it('is one bar series with the claim in its own colour, extraction on 0–100 %, and names every bar in its text', () => {
    const result = checkClaim({ ...gan, kind: 'extraction', value: 0.85 });
    const spec = claimScaleChart('extraction', 0.85, result);
    expect(spec.kind).toBe('bar');
    expect(spec.y).toMatchObject({ min: 0, max: 100 });
    expect(spec.series).toHaveLength(1);
    const colors = spec.series[0].pointColors!;
    expect(colors.filter((c) => c === 1)).toHaveLength(1);
    expect(spec.categories![colors.indexOf(1)]).toBe('Claim 85 %');
    expect(spec.ariaLabel).toMatch(/Verdict: impossible\.$/);
    expect(spec.ariaLabel).not.toMatch(/NaN/);
  });

  it('a coating chart reaches down to a negative claim', () => {
    const result = checkClaim({ ...gan, nEnc: null, kind: 'coating', value: -0.3 });
    expect(claimScaleChart('coating', -0.3, result).y.min).toBe(-30);
  });
});
