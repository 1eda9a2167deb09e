/** Mie efficiencies against published values and the limits of the theory. */
import { describe, expect, it } from 'vitest';
import { mieEfficiencies } from '../../src/lib/scatter';
import { assertInDelta, expectClose } from '../support/assert';

describe('mieEfficiencies (BHMIE)', () => {
  it('reproduces Bohren & Huffman\'s worked example: m = 1.55, x = 2π·0.525/0.6328', () => {
    // published: C. F. Bohren, D. R. Huffman, Absorption and Scattering of Light by Small Particles (Wiley, 1983),
    // appendix A, sample output of BHMIE: Qsca = Qext = 3.10543, Qback = 2.92534 (printed to 5 decimals)
    const q = mieEfficiencies(1.55, 0, (2 * Math.PI * 0.525) / 0.6328);
    assertInDelta(q.qExt, 3.10543, 1e-5, 'Qext');
    assertInDelta(q.qSca, 3.10543, 1e-5, 'Qsca');
    assertInDelta(q.qBack, 2.92534, 1e-5, 'Qback');
    assertInDelta(q.qAbs, 0, 1e-12, 'Qabs of a lossless sphere');
  });

  it.each([
    // published: W. J. Wiscombe, "Mie scattering calculations: advances in technique and fast, vector-speed computer
    // codes", NCAR Technical Note NCAR/TN-140+STR (1979, rev. 1996), MIEV0 test cases 12, 14, 15, 16, 17
    // (m = 1.5 − 1i in Wiscombe's sign convention = 1.5 + 1i in B&H's); printed to 7 significant digits
    [1.5, 1, 0.055, 0.101491, 0.000011],
    [1.5, 1, 1, 2.336321, 0.6634538],
    [1.5, 1, 100, 2.097502, 1.283697],
    [1.5, 1, 10000, 2.004368, 1.236575],
    [10, 10, 1, 2.532993, 2.049405]
  ])('m = %f + %fi, x = %f: Qext = %f, Qsca = %f (Wiscombe 1979)', (mRe, mIm, x, qExt, qSca) => {
    const q = mieEfficiencies(mRe, mIm, x);
    expectClose(q.qExt, qExt, { rel: 2e-6, abs: 1e-6 }, 'Qext');
    expectClose(q.qSca, qSca, { rel: 2e-6, abs: 1e-6 }, 'Qsca');
  });

  it('meets the Rayleigh limit Qsca = (8/3)x⁴|(m² − 1)/(m² + 2)|² for small x', () => {
    // published: Bohren & Huffman (1983) eq. 5.8; the next term is O(x²) relative, so 1e-3 relative at x = 0.01
    for (const [mRe, mIm] of [[1.5, 0], [1.83, 0.0005], [2, 1]]) {
      const x = 0.01;
      // (m² − 1)/(m² + 2) in complex arithmetic
      const m2Re = mRe * mRe - mIm * mIm, m2Im = 2 * mRe * mIm;
      const nRe = m2Re - 1, dRe = m2Re + 2;
      const ratio2 = (nRe * nRe + m2Im * m2Im) / (dRe * dRe + m2Im * m2Im);
      expectClose(mieEfficiencies(mRe, mIm, x).qSca, (8 / 3) * x ** 4 * ratio2, { rel: 1e-3 }, `m = ${mRe} + ${mIm}i`);
    }
  });

  it('approaches the extinction paradox Qext → 2 for large spheres', () => {
    // published: Bohren & Huffman (1983) §4.4.3 (extinction paradox). The edge term is about 2·x^(−2/3)
    // (H. C. van de Hulst, Light Scattering by Small Particles (1957), §17.2, from memory): allow 2.5·x^(−2/3)
    let previous = Infinity;
    for (const x of [100, 500, 2000]) {
      const excess = mieEfficiencies(1.33, 0.001, x).qExt - 2;
      expect(Math.abs(excess), `x = ${x}`).toBeLessThan(2.5 * x ** (-2 / 3));
      expect(Math.abs(excess)).toBeLessThan(previous);
      previous = Math.abs(excess);
    }
  });

  it('scatters symmetrically (g → 0) for small spheres and forward for large ones', () => {
    // Rayleigh scattering has a symmetric phase function, g = 0 (Bohren & Huffman §5.2); g grows as O(x²)
    expect(Math.abs(mieEfficiencies(1.5, 0, 0.01).g)).toBeLessThan(1e-4);
    expect(mieEfficiencies(1.5, 0, 50).g).toBeGreaterThan(0.7);
  });

  it('refuses sizes and indices outside its range with a message naming them', () => {
    expect(() => mieEfficiencies(1.5, 0, 0)).toThrow(/size parameter x must be from/);
    expect(() => mieEfficiencies(1.5, -0.1, 1)).toThrow(/imaginary part/);
    expect(() => mieEfficiencies(Number.NaN, 0, 1)).toThrow(/real part/);
  });
});
