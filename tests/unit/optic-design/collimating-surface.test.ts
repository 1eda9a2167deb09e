import { describe, expect, it } from 'vitest';
import { integrateCollimatingSurface, type RayFamily } from '../../../src/lib/optic-design';

const fromOrigin: RayFamily = (t, o) => {
  o.set([0, 0, 0, 0, Math.sin(t), Math.cos(t), Math.cos(t), -Math.sin(t)]);
};

describe('integrateCollimatingSurface(family, law, θ0, θ1, s0, tolerance)', () => {
  it('reports errors within its tolerance and integrates in either direction', () => {
    const down = integrateCollimatingSurface(fromOrigin, { kind: 'mirror' }, Math.PI / 2, 0.6, 2, 1e-6);
    expect(down.odeErrorMm).toBeLessThanOrEqual(1e-6);
    expect(down.chordErrorMm).toBeLessThanOrEqual(1e-6);
    const up = integrateCollimatingSurface(fromOrigin, { kind: 'mirror' }, 0.6, Math.PI / 2, down.s.at(-1)!, 1e-6);
    expect(Math.abs(up.s.at(-1)! - 2)).toBeLessThan(1e-6);
  });

  it('refuses a family it cannot collimate (the surface would run back through its rays)', () => {
    // refraction from index 1.5 into 1 with a start at the asymptote-side: s turns negative
    expect(() => integrateCollimatingSurface(fromOrigin, { kind: 'refract', nIn: 1, nOut: 1.5 }, 0, 0.9, 1, 1e-6)).toThrowError(
      /^the collimating surface runs through its own rays/
    );
  });
});
