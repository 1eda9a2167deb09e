/**
 * Claim verdicts against published statements:
 * - "a mere 2 % of the internally generated light is coupled into free space through the 16° escape
 *   cone" of a planar high-index (n ≈ 3.5) LED — I. Schnitzer, E. Yablonovitch et al., Appl. Phys. Lett.
 *   63, 2174 (1993);
 * - encapsulation raises extraction "by a factor of about 2–3" — E. F. Schubert, Light-Emitting Diodes,
 *   2nd ed. (2006), ch. 5 (from memory: loose use only, a gain inside 2–3 for GaN under 1.5 must not be
 *   called impossible);
 * - thin-film flip-chip GaN LEDs with roughened surfaces reached ~80 % light extraction — O. B. Shchekin
 *   et al., Appl. Phys. Lett. 89, 071109 (2006) (from memory).
 * - Snell invariance: n·sin θ is conserved through parallel layers, so a flat layer never widens the
 *   escape cone (Born & Wolf §1.5; common practice).
 */
import { describe, it, expect } from 'vitest';
import { checkClaim } from '../../src/lib/decisions/claim-check';
import { assertInDelta } from '../support/assert';

describe('claims against published statements', () => {
  it('planar n 3.5 in air, top face: the 16.6° cone holds ~2 % geometrically (Schnitzer 1993), 1.4 % after Fresnel loss', () => {
    const r = checkClaim({ kind: 'extraction', value: 0.02, nChip: 3.5, structure: 'planar', faces: 1 });
    assertInDelta((r.bounds.criticalAngleRad * 180) / Math.PI, 16.6, 0.1); // 0.1°: the source rounds to 16°–17°
    // Schnitzer's "a mere 2 %" is the geometric cone (1 − cos θc)/2 = 0.02084 (computed), Fresnel loss not counted
    assertInDelta(r.bounds.exitFace.geometric, 0.02, 0.001);
    // single pass, one face: η_F = 0.01408 (computed; escape cone ½∫T sin θ dθ: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5); with the mirrored cone up to 4.2 %
    assertInDelta(r.bounds.idealDome, 0.01408, 5e-5);
    // 2 % exceeds the Fresnel-weighted single pass (1.4 %) but not the recycling limit (4.2 %): the checker
    // says the Fresnel-reflected light must come back for it — optimistic, not impossible
    expect(r.verdict).toBe('optimistic');
    expect(checkClaim({ kind: 'extraction', value: 0.014, nChip: 3.5, structure: 'planar', faces: 1 }).verdict).toBe('consistent');
    expect(checkClaim({ kind: 'extraction', value: 0.05, nChip: 3.5, structure: 'planar', faces: 1 }).verdict).toBe('impossible');
  });

  it('gains of 2–3 for planar GaN under n 1.5 are not impossible (Schubert 2006, from memory)', () => {
    for (const value of [2, 2.5, 3]) {
      expect(checkClaim({ kind: 'gain', value, nChip: 2.45, nEnc: 1.5, structure: 'planar' }).verdict).not.toBe('impossible');
    }
  });

  it('80 % extraction is consistent for a thin-film chip, impossible for a planar one (Shchekin 2006, from memory)', () => {
    expect(checkClaim({ kind: 'extraction', value: 0.8, nChip: 2.45, nEnc: 1.41, structure: 'thin-film' }).verdict).toBe('consistent');
    expect(checkClaim({ kind: 'extraction', value: 0.8, nChip: 2.45, nEnc: 1.41, structure: 'planar' }).verdict).toBe('impossible');
  });

  it('the flat-coating limit for GaN (2.45) into air is 0.04355 / 0.03408 − 1 = 27.8 % (computed; escape cone ½∫T sin θ dθ: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5; 0.2 %)', () => {
    const r = checkClaim({ kind: 'coating', value: 0.4, nChip: 2.45, structure: 'planar' });
    assertInDelta(r.bounds.coatingLimit, 0.04355 / 0.03408 - 1, 0.002);
    expect(r.verdict).toBe('impossible');
  });
});
