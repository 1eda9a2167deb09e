/**
 * Reference checks of the reflector cup and the diffuse base, against exact geometry.
 *
 * 1. An empty cup whose wall and floor absorb everything, with a tiny chip index-matched to the
 *    outside (so it neither reflects nor refracts) at the centre of the floor: a ray escapes if and
 *    only if it leaves through the opening, a disc of radius r1 at height Hc. From the source at
 *    height z_e that is a cone of half-angle θ = atan(r1/(Hc − z_e)), fraction (1 − cos θ)/2 of an
 *    isotropic source (solid angle of a cone over 4π, common practice). Tolerance 4σ (binomial),
 *    plus the chip's size: 1 µm (the smallest of the limits table) in a cup ten times the size quoted in the
 *    test names, so its effect on θ is under 1e-4 rad, a fraction change < 1e-4.
 * 2. A point source (tiny index-matched chip) on a Lambertian base of reflectance R under a
 *    transparent dome (index equal to the outside): half the rays go up and escape; the other half
 *    meet the base and are sent up with probability R, then escape; escape = (1 + R)/2 exactly.
 *    (The series of a closed enclosure reduces to one term as nothing returns light to the base.)
 */
import { describe, expect, it } from 'vitest';
import type { TracePackage } from '../../src/lib/trace/package-spec';
import { summarize } from '../../src/lib/trace/summary';
import { traceSync } from '../../src/lib/trace/trace';
import { assertInDelta } from '../support/assert';

const K = 4;
const tiny = 1e-3;
/** Cup dimensions are given at 1/10 scale in the test names and traced ten times larger (see above). */
const SCALE = 10;

function pointChip(n: number): TracePackage['chip'] {
  return { widthMm: tiny, lengthMm: tiny, heightMm: tiny, n, absorptionPerMm: 0, emission: 'plane', emitterZMm: tiny / 2 };
}

describe('reference: reflector cup, absorbing wall and floor, point source on the floor', () => {
  it.each([
    ['specular', 1.3, 1.5, 0.8],
    ['diffuse', 0.5, 2, 0.6]
  ] as const)('escape = solid angle of the opening over 4π (%s wall, r0 %s, r1 %s, depth %s mm; within 4σ)', (finish, r0, r1, depth) => {
    const pkg: TracePackage = {
      chip: pointChip(1),
      base: { kind: 'reflectance', reflectance: 0 },
      encapsulant: { shape: 'none', radiusMm: 1, heightMm: 1, n: 1, absorptionPerMm: 0 },
      outsideN: 1,
      polarization: 'average',
      body: { kind: 'cup', floorRadiusMm: r0 * SCALE, topRadiusMm: r1 * SCALE, depthMm: depth * SCALE, wallFinish: finish, wallReflectance: 0, fill: 'none' }
    };
    const N = 60_000;
    const s = summarize(traceSync(pkg, { rays: N, seed: 17 }));
    const h = depth * SCALE - tiny / 2;
    const expected = (1 - h / Math.hypot(h, r1 * SCALE)) / 2;
    assertInDelta(s.extraction, expected, K * Math.sqrt((expected * (1 - expected)) / N) + 1e-4);
    expect(s.geometryErrors).toBe(0);
    expect(s.parts.reduce((a, p) => a + p.count, 0)).toBe(N);
  });
});

describe('reference: Lambertian base under a transparent dome', () => {
  it('escape = (1 + R)/2 for a point source on the base (within 4σ)', () => {
    const R = 0.6;
    const pkg: TracePackage = {
      chip: pointChip(1),
      base: { kind: 'reflectance', reflectance: R },
      baseFinish: 'diffuse',
      encapsulant: { shape: 'dome', radiusMm: 2, heightMm: 2, n: 1, absorptionPerMm: 0 },
      outsideN: 1,
      polarization: 'average'
    };
    const N = 40_000;
    const s = summarize(traceSync(pkg, { rays: N, seed: 5 }));
    const expected = (1 + R) / 2;
    assertInDelta(s.extraction, expected, K * Math.sqrt((expected * (1 - expected)) / N));
    expect(s.ledger.base).toBeCloseTo(1 - expected, 1);
    expect(s.geometryErrors).toBe(0);
  });
});
