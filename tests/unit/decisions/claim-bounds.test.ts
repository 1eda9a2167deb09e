import { describe, it, expect } from 'vitest';
import { claimBounds } from '../../../src/lib/decisions/claim-bounds';
import { escapeCone } from '../../../src/lib/optics/index';
import { assertInDelta, EPS } from '../../support/assert';

describe('claimBounds(package)', () => {
  it('bare chip: the ideal bound is the sum of Fresnel-weighted cones, the surface transmission 1', () => {
    const b = claimBounds({ nChip: 2.45, nEnc: null, nOut: 1, faces: 6 });
    expect(b.encapsulated).toBe(false);
    expect(b.domeSurfaceTransmission).toBe(1);
    assertInDelta(b.idealDome, 6 * escapeCone(2.45, 1).fresnel, 8 * EPS);
    expect(b.closedFormGain).toBe(1);
    expect(b.gainLimit).toBe(1);
  });

  it('an encapsulant equal to the outside medium counts as no encapsulant', () => {
    expect(claimBounds({ nChip: 2.45, nEnc: 1, nOut: 1, faces: 5 }).encapsulated).toBe(false);
  });

  it('dome: ideal bound = faces · η_F(chip → enc) · (1 − R_normal), capped at 1', () => {
    const b = claimBounds({ nChip: 2.45, nEnc: 1.41, nOut: 1, faces: 5 });
    const T = 1 - ((1.41 - 1) / 2.41) ** 2;
    assertInDelta(b.domeSurfaceTransmission, T, 4 * EPS);
    assertInDelta(b.idealDome, 5 * escapeCone(2.45, 1.41).fresnel * T, 8 * EPS);
    expect(claimBounds({ nChip: 1.6, nEnc: 1.59, nOut: 1, faces: 6 }).idealDome).toBeLessThanOrEqual(1);
  });

  it('orders the bounds: single pass ≤ recycling limit, closed-form gain ≤ gain limit, quarter-wave ≤ coating limit', () => {
    for (const [nChip, nEnc] of [[2.45, 1.41], [3.5, 1.5], [2.0, 1.53], [2.45, null]] as const) {
      for (const faces of [1, 5, 6] as const) {
        const b = claimBounds({ nChip, nEnc, nOut: 1, faces });
        expect(b.idealDome).toBeLessThanOrEqual(b.recyclingLimit + 1e-12);
        expect(b.closedFormGain).toBeLessThanOrEqual(b.gainLimit + 1e-12);
        expect(b.quarterWaveCoating).toBeLessThanOrEqual(b.coatingLimit + 1e-12);
        expect(b.quarterWaveCoating).toBeGreaterThan(0);
      }
    }
  });

  it('gain limit = geometric cone into the encapsulant over the Fresnel-weighted bare cone while cones are apart (8 ε)', () => {
    const b = claimBounds({ nChip: 2.45, nEnc: 1.5, nOut: 1, faces: 6 });
    assertInDelta(b.gainLimit, escapeCone(2.45, 1.5).geometric / escapeCone(2.45, 1).fresnel, 8 * EPS);
  });

  it('flags overlapping cones (θc > 45° into the encapsulant)', () => {
    expect(claimBounds({ nChip: 2.0, nEnc: 1.53, nOut: 1, faces: 6 }).conesOverlap).toBe(true);
    expect(claimBounds({ nChip: 2.45, nEnc: 1.53, nOut: 1, faces: 6 }).conesOverlap).toBe(false);
  });

  it('the quarter-wave layer index is √(n_chip · n_exit)', () => {
    assertInDelta(claimBounds({ nChip: 2.45, nEnc: 1.41, nOut: 1, faces: 1 }).quarterWaveIndex, Math.sqrt(2.45 * 1.41), 4 * EPS);
  });
});
