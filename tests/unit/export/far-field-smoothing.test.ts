import { describe, expect, it } from 'vitest';
import { FAR_FIELD_MIN_ZONE_SR, smoothFarField } from '../../../src/lib/export/far-field-smoothing';
import { assertInDelta } from '../../support/assert';

const DEG = Math.PI / 180;
const zone = (a: number, b: number) => 2 * Math.PI * (Math.cos(a * DEG) - Math.cos(b * DEG));

describe('smoothFarField(bins) averages over zones of at least 0.05 sr', () => {
  it('returns 181 angles 0, 1, …, 180°', () => {
    const s = smoothFarField(new Array(180).fill(1));
    expect(s.thetaDeg).toEqual(Array.from({ length: 181 }, (_, i) => i));
  });

  it('leaves a uniform intensity unchanged (to rounding)', () => {
    const s = smoothFarField(new Array(180).fill(0.7));
    for (const v of s.relativeIntensity) assertInDelta(v, 0.7, 1e-12);
  });

  it('uses ±1° from 14° to 166° and widens toward the poles to a 0–8° cap (zone solid angle 2π(cos θ1 − cos θ2))', () => {
    const s = smoothFarField(new Array(180).fill(1));
    expect(s.halfWidthDeg[0]).toBe(8);
    expect(s.halfWidthDeg[180]).toBe(8);
    expect(s.halfWidthDeg[13]).toBe(2);
    for (let t = 14; t <= 166; t++) expect(s.halfWidthDeg[t]).toBe(1);
    assertInDelta(s.zoneSolidAngleSr[0], zone(0, 8), 1e-12);
    for (const omega of s.zoneSolidAngleSr) expect(omega).toBeGreaterThanOrEqual(FAR_FIELD_MIN_ZONE_SR);
  });

  it('weights each bin by its solid angle: the mean over the cap is counts over solid angle', () => {
    const bins = new Array(180).fill(0);
    bins[0] = 100; // 0–1° bin only
    const s = smoothFarField(bins);
    assertInDelta(s.relativeIntensity[0], (100 * zone(0, 1)) / zone(0, 8), 1e-12);
  });

  it('keeps a Lambertian cos θ within 1 % at 0° and 0.1 % at 45° (the zone mean of a smooth curve)', () => {
    const bins = Array.from({ length: 180 }, (_, i) => Math.max(0, (Math.sin((i + 1) * DEG) ** 2 - Math.sin(i * DEG) ** 2) / 2 / (Math.cos(i * DEG) - Math.cos((i + 1) * DEG))));
    const s = smoothFarField(bins);
    assertInDelta(s.relativeIntensity[0], 1, 0.01);
    assertInDelta(s.relativeIntensity[45], Math.cos(45 * DEG), 1e-3);
  });

  it('states its smoothing in plain ASCII', () => {
    expect(smoothFarField(new Array(180).fill(1)).note).toMatch(/^[\x20-\x7e]+$/);
  });

  it('refuses a far field without 180 finite values ≥ 0, naming the field', () => {
    expect(() => smoothFarField(new Array(179).fill(1))).toThrow(/relativeIntensity must hold 180/);
    const bad = new Array(180).fill(1);
    bad[3] = Number.NaN;
    expect(() => smoothFarField(bad)).toThrow(/relativeIntensity\[3\]/);
    expect(() => smoothFarField(new Array(180).fill(1), 0)).toThrow(/minZoneSr/);
  });
});
