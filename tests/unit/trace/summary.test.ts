import { describe, expect, it } from 'vitest';
import { ledgerPartLabel, summarize } from '../../../src/lib/trace/summary';
import { POLAR_BINS, createTally } from '../../../src/lib/trace/tally';
import { assertInDelta } from '../../support/assert';

const RAD = Math.PI / 180;

/** A tally whose histogram holds the exact expected counts of an emitter with intensity ∝ f(θ). */
function tallyFor(intensity: (thetaDeg: number) => number, escaped: number) {
  const t = createTally();
  // counts ∝ ∫ f(θ) 2π sin θ dθ over each 1° bin (midpoint rule on 20 sub-steps)
  let sum = 0;
  for (let i = 0; i < POLAR_BINS; i++) {
    let w = 0;
    for (let k = 0; k < 20; k++) {
      const th = i + (k + 0.5) / 20;
      w += intensity(th) * Math.sin(th * RAD);
    }
    t.polarHistogram[i] = w;
    sum += w;
  }
  for (let i = 0; i < POLAR_BINS; i++) t.polarHistogram[i] *= escaped / sum;
  t.launched = 2 * escaped;
  t.escaped = escaped;
  t.absorbedChip = escaped;
  return t;
}

describe('summarize(tally)', () => {
  // Lambertian I(θ) = I0 cos θ, I0 = Φ/π, full width at half maximum 120° (common practice).
  it('reads a Lambertian histogram as relative intensity cos θ, beam angle 120° and on-axis ≈ 1', () => {
    const s = summarize(tallyFor((th) => Math.max(0, Math.cos(th * RAD)), 1e6));
    // 5-bin smoothing of cos θ and the 20-step midpoint rule: ±0.2° on the beam angle
    assertInDelta(s.farField.beamAngleDeg ?? NaN, 120, 0.2);
    // mean over the 0–5° cap of cos θ is (1 + cos 5°)/2 = 0.99810 (midpoint rule error < 1e-4)
    assertInDelta(s.farField.onAxisVsLambertian ?? NaN, (1 + Math.cos(5 * RAD)) / 2, 1e-4);
    for (const b of s.farField.bins.filter((_, i) => i % 15 === 7)) {
      assertInDelta(b.relativeIntensity, Math.max(0, Math.cos(b.thetaDeg * RAD)), 2e-3);
    }
  });

  it('reads an isotropic upper hemisphere as intensity 1/2 of the Lambertian peak and a 180° beam', () => {
    const s = summarize(tallyFor((th) => (th < 90 ? 1 : 0), 1e6));
    assertInDelta(s.farField.onAxisVsLambertian ?? NaN, 0.5, 1e-4);
    assertInDelta(s.farField.beamAngleDeg ?? NaN, 180, 1);
  });

  it('bounds the beam angle at 180°: light still above half its peak below the horizon gets a sentence, not 200°', () => {
    // Uniform intensity out to 100° from the normal: the half maximum lies about 10° below the horizon.
    const s = summarize(tallyFor((th) => (th < 100 ? 1 : 0), 1e6));
    expect(s.farField.beamAngleDeg).toBeNull();
    expect(s.farField.beamAngleNote).toMatch(/^Wider than 180°: .* falls to half only 10\.\d° below it/);
    const lambert = summarize(tallyFor((th) => Math.max(0, Math.cos(th * RAD)), 1e6));
    expect(lambert.farField.beamAngleNote).toBeNull();
  });

  it('gives the binomial standard error √(p(1 − p)/N) and ledger fractions that sum to 1', () => {
    const t = createTally();
    t.launched = 1000;
    t.escaped = 400;
    t.absorbedChip = 300;
    t.absorbedEncapsulant = 100;
    t.absorbedBase = 150;
    t.lost = 50;
    const s = summarize(t);
    expect(s.extraction).toBe(0.4);
    assertInDelta(s.stderr, Math.sqrt((0.4 * 0.6) / 1000), 1e-16);
    const l = s.ledger;
    assertInDelta(l.escaped + l.chip + l.encapsulant + l.base + l.lost, 1, 1e-15);
    expect(s.counts).toEqual({ rays: 1000, escaped: 400, chip: 300, encapsulant: 100, base: 150, lost: 50, escapedBelowHorizon: 0 });
  });

  it('flags rays lost at the event cap with a note, and geometry errors with another', () => {
    const t = createTally();
    t.launched = 100;
    t.escaped = 100;
    expect(summarize(t).trappedNote).toBeNull();
    expect(summarize(t).geometryNote).toBeNull();
    t.escaped = 90;
    t.lost = 10;
    t.geometryErrors = 2;
    const s = summarize(t);
    expect(s.trappedNote).toMatch(/^8\.0 % of rays reached the event cap/);
    expect(s.geometryNote).toMatch(/^2 rays stopped on a geometry error/);
  });

  it('reports null beam angle and on-axis intensity, and zero bins, when nothing escaped (never NaN)', () => {
    const t = createTally();
    t.launched = 10;
    t.absorbedChip = 10;
    const s = summarize(t);
    expect(s.farField.beamAngleDeg).toBeNull();
    expect(s.farField.onAxisVsLambertian).toBeNull();
    expect(s.farField.bins).toHaveLength(180);
    expect(s.farField.bins.every((b) => b.relativeIntensity === 0)).toBe(true);
    expect(Number.isNaN(s.stderr)).toBe(false);
    expect(summarize(createTally()).extraction).toBe(0);
  });
});

describe('ledgerPartLabel', () => {
  it('names each kind of ledger bin in words for the tables', () => {
    expect(ledgerPartLabel({ kind: 'escaped', part: 'dome' })).toBe('escaped through the dome');
    expect(ledgerPartLabel({ kind: 'medium', part: 'GaN' })).toBe('absorbed in the GaN');
    expect(ledgerPartLabel({ kind: 'surface', part: 'base' })).toBe('absorbed at the base');
    expect(ledgerPartLabel({ kind: 'phosphor', part: 'encapsulant' })).toBe('phosphor heat in the encapsulant');
    expect(ledgerPartLabel({ kind: 'lost', part: 'event cap' })).toBe('lost (event cap)');
  });
});
