import { describe, it, expect } from 'vitest';
import {
  complex, cAdd, cSub, cMul, cDiv, cScale, cConj, cAbs, cAbs2, cSqrt, cExp,
  cMulInto, cDivInto, cSqrtInto, cExpInto
} from '../../../src/lib/optics/complex';
import { assertInDelta, EPS } from '../../support/assert';

describe('complex arithmetic, object form', () => {
  it('cMul(i, i) is −1 and cAdd/cSub/cScale/cConj act componentwise', () => {
    expect(cMul(complex(0, 1), complex(0, 1))).toEqual({ re: -1, im: 0 });
    expect(cAdd(complex(1, 2), complex(3, -5))).toEqual({ re: 4, im: -3 });
    expect(cSub(complex(1, 2), complex(3, -5))).toEqual({ re: -2, im: 7 });
    expect(cScale(complex(1, -2), 3)).toEqual({ re: 3, im: -6 });
    expect(cConj(complex(1, -2))).toEqual({ re: 1, im: 2 });
  });

  it('cDiv inverts cMul (4 ε)', () => {
    const a = complex(1.3, -0.7);
    const b = complex(-2.1, 0.4);
    const q = cDiv(cMul(a, b), b);
    assertInDelta(q.re, a.re, 4 * EPS);
    assertInDelta(q.im, a.im, 4 * EPS);
  });

  it('cDiv does not overflow for components near 1e300 (Smith division)', () => {
    const q = cDiv(complex(1e300, 1e300), complex(1e300, -1e300));
    assertInDelta(q.re, 0, 4 * EPS);
    assertInDelta(q.im, 1, 4 * EPS);
  });

  it('cSqrt takes the principal root (re ≥ 0) and squares back (4 ε relative)', () => {
    for (const [re, im] of [[-4, 0], [-4, -0], [3, 4], [-3, 4], [-3, -4], [0, 2], [1e-300, 0]]) {
      const r = cSqrt(complex(re, im));
      expect(r.re).toBeGreaterThanOrEqual(0);
      const sq = cMul(r, r);
      const scale = Math.hypot(re, im);
      assertInDelta(sq.re, re, 4 * EPS * scale);
      assertInDelta(sq.im, im, 4 * EPS * scale);
    }
    expect(cSqrt(complex(-4, 0))).toEqual({ re: 0, im: 2 });
    expect(cSqrt(complex(-4, -0))).toEqual({ re: 0, im: -2 });
  });

  it('cAbs, cAbs2 and cExp follow |3 + 4i| = 5 and e^{iπ} = −1', () => {
    expect(cAbs(complex(3, 4))).toBe(5);
    expect(cAbs2(complex(3, 4))).toBe(25);
    const e = cExp(complex(0, Math.PI));
    assertInDelta(e.re, -1, EPS);
    assertInDelta(e.im, 0, 2 * EPS);
  });
});

describe('complex arithmetic, buffer form', () => {
  it('writes at the given offset and returns the buffer', () => {
    const out = new Float64Array(6);
    expect(cMulInto(out, 2, 1, 2, 3, 4)).toBe(out);
    expect([...out]).toEqual([0, 0, -5, 10, 0, 0]);
  });

  it('is safe when the operands are read from the slot being written', () => {
    const out = new Float64Array([1, 2, 3, 4]);
    cMulInto(out, 0, out[0], out[1], out[2], out[3]);
    expect([out[0], out[1]]).toEqual([-5, 10]);
    const q = new Float64Array([-5, 10, 3, 4]);
    cDivInto(q, 0, q[0], q[1], q[2], q[3]);
    assertInDelta(q[0], 1, 4 * EPS);
    assertInDelta(q[1], 2, 4 * EPS);
  });

  it('agrees with the object form for sqrt and exp', () => {
    const out = new Float64Array(2);
    cSqrtInto(out, 0, -3, 4);
    expect({ re: out[0], im: out[1] }).toEqual(cSqrt(complex(-3, 4)));
    cExpInto(out, 0, 0.5, -1.2);
    expect({ re: out[0], im: out[1] }).toEqual(cExp(complex(0.5, -1.2)));
  });

  it('cSqrtInto(0) is 0', () => {
    const out = new Float64Array(2);
    cSqrtInto(out, 0, 0, 0);
    expect([...out]).toEqual([0, 0]);
  });
});
