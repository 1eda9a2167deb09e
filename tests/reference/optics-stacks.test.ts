/**
 * Reference checks for planar stacks (incoherent and thin-film stacks: Macleod, Thin-Film Optical Filters, 4th ed., ch. 2). Tags: computed (from the named formula), published (source named), common practice.
 * Tolerances: half a unit in the last digit shown, unless stated.
 */
import { describe, it, expect } from 'vitest';
import { incoherentStack } from '../../src/lib/optics/incoherent-stack';
import { thinFilm } from '../../src/lib/optics/thin-film';
import { stackExtraction } from '../../src/lib/optics/stack-extraction';
import { escapeCone } from '../../src/lib/optics/escape-cone';
import { normalReflectance } from '../../src/lib/optics/fresnel';
import { singleLayerOptimumIndex, quarterWaveThicknessNm } from '../../src/lib/optics/graded-index';
import type { StackLayer } from '../../src/lib/optics/layer';
import { assertInDelta } from '../support/assert';

const thick = (n: number): StackLayer => ({ n, k: 0, thicknessNm: 1e6 }); // 1 mm, incoherent

/** Geometric index ladder nIn → nOut in N equal-ratio steps: N − 1 intermediate thick layers. */
function ladder(nIn: number, nOut: number, steps: number): StackLayer[] {
  const layers: StackLayer[] = [];
  for (let i = 1; i < steps; i++) layers.push(thick(nIn * (nOut / nIn) ** (i / steps)));
  return layers;
}

/** Air | (H L)^pairs | substrate, quarter waves at the design wavelength. */
function highReflector(pairs: number, nH: number, nL: number, lambda: number): StackLayer[] {
  const layers: StackLayer[] = [];
  for (let i = 0; i < pairs; i++) {
    layers.push({ n: nH, k: 0, thicknessNm: quarterWaveThicknessNm(nH, lambda) });
    layers.push({ n: nL, k: 0, thicknessNm: quarterWaveThicknessNm(nL, lambda) });
  }
  return layers;
}

const mgf2 = [{ n: 1.38, k: 0, thicknessNm: quarterWaveThicknessNm(1.38, 550) }];

type Row = [label: string, actual: () => number, expected: number, tolerance: number];

const rows: Row[] = [
  ['incoherent 2.5 → 1.5 → 1.0, normal: T = 0.9023 [computed]', () => incoherentStack(2.5, [thick(1.5)], 1, 450, 0).T, 0.9023, 5e-5],
  ['bare 2.5 → 1, normal: T = 0.8163 [computed]', () => incoherentStack(2.5, [], 1, 450, 0).T, 0.8163, 5e-5],
  ['index ladder 2.5 → 1, N = 2, normal: T = 0.9035 [computed]', () => incoherentStack(2.5, ladder(2.5, 1, 2), 1, 450, 0).T, 0.9035, 5e-5],
  ['index ladder 2.5 → 1, N = 5, normal: T = 0.9596 [computed]', () => incoherentStack(2.5, ladder(2.5, 1, 5), 1, 450, 0).T, 0.9596, 5e-5],
  ['index ladder 2.5 → 1, N = 20, normal: T = 0.9896 [computed]', () => incoherentStack(2.5, ladder(2.5, 1, 20), 1, 450, 0).T, 0.9896, 5e-5],
  ['quarter-wave MgF2 (1.38) on glass (1.52), normal, design λ: R = 1.260 % [computed]', () => thinFilm(1, mgf2, 1.52, 550, 0).R, 0.0126, 5e-6],
  // published in optics course notes on thin-film reflectance as "1.3 %": rounded, tolerance half of 0.1 %
  ['quarter-wave MgF2 on glass: R ≈ 1.3 % [published, rounded: optics course notes on thin-film reflectance]', () => thinFilm(1, mgf2, 1.52, 550, 0).R, 0.013, 5e-4],
  ['bare glass 1.52, normal: R = 4.258 % [computed]', () => thinFilm(1, [], 1.52, 550, 0).R, 0.04258, 5e-6],
  // E. Hecht, Optics, thin-film section (from memory for the page): √(n0 ns) cancels R at a quarter wave
  ['ideal single-layer AR index √(n0 ns) on 1.52 cancels R at a quarter wave [published: Hecht, from memory]', () => {
    const n1 = singleLayerOptimumIndex(1, 1.52);
    return thinFilm(1, [{ n: n1, k: 0, thicknessNm: quarterWaveThicknessNm(n1, 550) }], 1.52, 550, 0).R;
  }, 0, 1e-15],
  ['half-wave layer (n 2.0) at its design λ: R equals the bare interface 1 → 1.52 [common practice]', () => thinFilm(1, [{ n: 2, k: 0, thicknessNm: 550 / 4 }], 1.52, 550, 0).R, normalReflectance(1, 0, 1.52, 0), 1e-14]
];

describe('reference: planar stacks (incoherent and thin-film stacks: Macleod, Thin-Film Optical Filters, 4th ed., ch. 2)', () => {
  it.each(rows)('%s', (_label, actual, expected, tolerance) => {
    assertInDelta(actual(), expected, tolerance);
  });

  // Univ. of Tennessee, Optics 507, assignment 3 solution: nH 2.5, nL 1.5 on a 1.5 substrate needs 7 pairs
  // for R ≥ 0.995 (published). Layout: air | (H L)^N | substrate, quarter waves at the design wavelength.
  it('quarter-wave high reflector nH 2.5 / nL 1.5 on 1.5: 7 pairs reach R ≥ 0.995 [published: U. Tennessee Optics 507, assignment 3]', () => {
    expect(thinFilm(1, highReflector(7, 2.5, 1.5, 550), 1.5, 550, 0).R).toBeGreaterThanOrEqual(0.995);
  });
  it('…and 6 pairs stay below 0.995 [published: same source]', () => {
    expect(thinFilm(1, highReflector(6, 2.5, 1.5, 550), 1.5, 550, 0).R).toBeLessThan(0.995);
  });

  // incoherent and thin-film stacks: Macleod, Thin-Film Optical Filters, 4th ed., ch. 2: a planar stack never widens the escape cone into the outside medium.
  it('a 2.5 → 1.5 → air stack leaves the escape cone at asin(1/2.5) = 23.58° and only cuts losses inside it [computed]', () => {
    const r = stackExtraction(2.5, [thick(1.5)], 1, 450, 'incoherent');
    assertInDelta((r.escapeConeRad * 180) / Math.PI, 23.58, 0.005);
    expect(r.fresnel).toBeGreaterThan(r.bare.fresnel);
    expect(r.fresnel).toBeLessThanOrEqual(escapeCone(2.5, 1).geometric);
    expect(incoherentStack(2.5, [thick(1.5)], 1, 450, (23.6 * Math.PI) / 180).T).toBe(0);
  });
});
