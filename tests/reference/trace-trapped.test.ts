/**
 * Reference check of light trapping in a lossless box chip (escape cone ½∫T sin θ dθ: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5: a cuboid has up to six escape
 * cones, summed without overlap while θc < 45°).
 *
 * A specular box keeps |dx|, |dy|, |dz| of a ray forever (reflections only flip signs; the perfect mirror
 * base too). So a ray escapes eventually if and only if its direction lies in one of the six cones
 * around ±x, ±y, ±z of half-angle θc — the −z cone reaches the top via the mirror — and the rest circle
 * until the event cap: trapped fraction = 1 − 6 · (1 − cos θc)/2 = 1 − 3(1 − cos θc) = 0.73873 for
 * n = 2.45 (θc = 24.09°), computed. Tolerance: 4σ below (σ binomial); above, 4σ plus 0.002 for in-cone
 * rays so close to θc that R → 1 keeps them past the cap (a sliver of the cone well under 0.2 %).
 */
import { describe, expect, it } from 'vitest';
import type { TracePackage } from '../../src/lib/trace/package-spec';
import { summarize } from '../../src/lib/trace/summary';
import { traceSync } from '../../src/lib/trace/trace';

const K = 4;

describe('reference: a lossless chip on a perfect mirror traps light outside its six escape cones', () => {
  it('loses 1 − 3(1 − cos θc) of the rays at the event cap, and says why', () => {
    const pkg: TracePackage = {
      chip: { widthMm: 1, lengthMm: 1, heightMm: 0.5, n: 2.45, absorptionPerMm: 0, emission: 'volume' },
      base: { kind: 'reflectance', reflectance: 1 },
      encapsulant: { shape: 'none', radiusMm: 1, heightMm: 1, n: 1, absorptionPerMm: 0 },
      outsideN: 1,
      polarization: 'average'
    };
    const N = 10_000;
    const s = summarize(traceSync(pkg, { rays: N, seed: 41, maxEvents: 1000 }));
    const trapped = 1 - 3 * (1 - Math.cos(Math.asin(1 / 2.45)));
    const sigma = Math.sqrt((trapped * (1 - trapped)) / N);
    expect(s.counts.lost).toBeGreaterThan(0);
    expect(s.ledger.lost).toBeGreaterThanOrEqual(trapped - K * sigma);
    expect(s.ledger.lost).toBeLessThanOrEqual(trapped + K * sigma + 0.002);
    expect(s.counts.escaped + s.counts.lost).toBe(N);
    expect(s.geometryErrors).toBe(0);
    expect(s.trappedNote).toMatch(/reached the event cap/);
  });
});
