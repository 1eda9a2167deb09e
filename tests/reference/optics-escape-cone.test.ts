/**
 * Reference checks for the escape cone of one planar face (Schubert, Light-Emitting Diodes, 2nd ed., ch. 5). All table values are
 * computed: worked from the formulas in double precision, given to 4 significant
 * figures; tolerance is half a unit in the last digit shown.
 */
import { describe, it, expect } from 'vitest';
import { escapeCone } from '../../src/lib/optics/escape-cone';
import { cuboidChipEscape } from '../../src/lib/optics/chip-escape';
import { assertInDelta } from '../support/assert';

const DEG = 180 / Math.PI;

// n1, n2, θc (deg), (1 − cos θc)/2, η_F — computed from θc = asin(n2/n1) and ½∫T sin θ dθ (Schubert, Light-Emitting Diodes, 2nd ed., ch. 5)
const table: [number, number, number, number, number][] = [
  [3.5, 1, 16.6, 0.02084, 0.01408],
  [2.5, 1, 23.58, 0.04174, 0.03243],
  [2.45, 1, 24.09, 0.04355, 0.03408],
  [2.5, 1.5, 36.87, 0.1, 0.08796],
  [1.5, 1, 41.81, 0.1273, 0.1148]
];

/** half a unit in the last significant digit of a 4-significant-figure value */
const halfUlp4 = (v: number) => 0.5 * 10 ** (Math.floor(Math.log10(Math.abs(v))) - 3);

describe('reference: escape cone (escape cone ½∫T sin θ dθ: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5)', () => {
  it.each(table)('%s → %s: θc = %s° [computed]', (n1, n2, deg) => {
    assertInDelta(escapeCone(n1, n2).criticalAngleRad * DEG, deg, 0.005);
  });
  it.each(table)('%s → %s: geometric (1 − cos θc)/2 = %s [computed]', (n1, n2, _deg, geo) => {
    assertInDelta(escapeCone(n1, n2).geometric, geo, halfUlp4(geo));
  });
  it.each(table)('%s → %s: Fresnel-weighted η_F = %s [computed]', (n1, n2, _deg, _geo, fres) => {
    assertInDelta(escapeCone(n1, n2).fresnel, fres, halfUlp4(fres));
  });

  // Published context: "a mere 2 % of the internally generated light is coupled into free space through the
  // 16° escape cone" — I. Schnitzer, E. Yablonovitch et al., Appl. Phys. Lett. 63, 2174 (1993).
  // "About 2 %" and "16°" are rounded prose: tolerance ±0.5 percentage points and ±1°.
  it('GaAs-type chip (3.5) into air: about 2 % through a 16° cone [published: Schnitzer et al. 1993, loose]', () => {
    const e = escapeCone(3.5, 1);
    assertInDelta(e.geometric, 0.02, 0.005);
    assertInDelta(e.criticalAngleRad * DEG, 16, 1);
  });

  // Small-angle form nOut²/(4 nIn²) against ½(1 − cos θc): E. F. Schubert, Light-Emitting Diodes, 2nd ed.,
  // ch. 5 (from memory). They agree to O(θc²): within 3 % relative for 3.5 → 1 (loose, from memory).
  it('small-angle form n²out/4n²in tracks ½(1 − cos θc) within 3 % for 3.5 → 1 [from memory: Schubert ch. 5]', () => {
    const e = escapeCone(3.5, 1);
    assertInDelta(e.smallAngle / e.geometric, 1, 0.03);
  });

  // A cuboid has six cones; the no-overlap sum holds while θc < 45° (common practice; Schubert, Light-Emitting Diodes, 2nd ed., ch. 5).
  it('six escape cones of a 2.5 chip in air do not overlap (θc 23.6° < 45°) [common practice]', () => {
    const c = cuboidChipEscape(2.5, 1, 6);
    expect(c.conesOverlap).toBe(false);
    assertInDelta(c.fraction, 6 * 0.03243, 6 * halfUlp4(0.03243));
  });
  it('cones of a 1.3 chip in air overlap (θc 50.3° > 45°) and the estimate says so [common practice]', () => {
    const c = cuboidChipEscape(1.3, 1, 6);
    expect(c.conesOverlap).toBe(true);
    expect(c.note).toMatch(/overestimate/);
  });
});
