/**
 * Invariants of planar stacks, coherent (thin-film, transfer matrix) and incoherent (thick layers),
 * over thousands of random stacks, angles, wavelengths and both polarisations.
 *
 * Sources of the identities: energy conservation R + T + A = 1 and A = 0 without absorption (Born &
 * Wolf, Principles of Optics, §1.5.3); reciprocity of transmission for a lossless stack (H. A. Macleod,
 * Thin-Film Optical Filters, 4th ed., ch. 2: T is the same in both directions); no transmission beyond
 * the exit critical angle because n·sin θ is conserved through parallel layers (Born & Wolf §1.5.4).
 *
 * Tolerances: 1e-12 absolute for R + T + A = 1 and for A = 0 — the same roundoff allowance the stack
 * code uses when it clamps a tiny negative A, about 4500 machine epsilons, room for the products of up
 * to 12 layer matrices (the largest error seen over these cases is about 1e-15). Reciprocity: 1e-9
 * relative to 1 — forward and reverse sweeps multiply the matrices in opposite order, and the reversed
 * input angle is recomputed through asin, which loses digits near grazing incidence. [0, 1] holds up to
 * four ulps (see inUnit).
 */
import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { thinFilm } from '../../src/lib/optics/thin-film';
import { incoherentStack } from '../../src/lib/optics/incoherent-stack';
import type { StackLayer, StackResult } from '../../src/lib/optics/layer';
import { check, real, RUNS } from './support';

const ENERGY_TOL = 1e-12;
const RECIPROCITY_TOL = 1e-9;

type Model = 'coherent' | 'incoherent';
const run = (model: Model) => (model === 'coherent' ? thinFilm : incoherentStack);

/** A layer: thin films up to 2 µm, thick layers up to 2 mm (in nm). Lossy layers include metals (n < 1, k up to 5). */
function layer(model: Model, lossy: boolean): fc.Arbitrary<StackLayer> {
  const maxThickness = model === 'coherent' ? 2000 : 2e6;
  return fc.record({
    n: lossy ? real(0.05, 4) : real(1, 4),
    // thick layers absorb weakly (k ≪ n is the model's own range); thin films may be metal
    k: lossy ? fc.oneof(fc.constant(0), model === 'coherent' ? real(0, 5) : real(0, 1e-3)) : fc.constant(0),
    thicknessNm: fc.oneof(fc.constant(0), real(0, maxThickness))
  });
}

const medium = real(1, 4);
const wavelength = real(200, 2500);
const angle = real(0, Math.PI / 2);
const stack = (model: Model, lossy: boolean) => fc.array(layer(model, lossy), { maxLength: 12 });

/** The three (R, T, A) triples of a result: s, p and unpolarised. */
function triples(r: StackResult): [string, number, number, number][] {
  return [
    ['s', r.Rs, r.Ts, r.As],
    ['p', r.Rp, r.Tp, r.Ap],
    ['unpolarised', r.R, r.T, r.A]
  ];
}

/**
 * In [0, 1] up to UNIT_SLACK: R and T are ratios of rounded sums, and at index-matched or grazing cases
 * they come out one ulp above 1 (1.0000000000000002 seen); four ulps of slack, nothing physical.
 */
const UNIT_SLACK = 4 * Number.EPSILON;
function inUnit(x: number): boolean {
  return x >= -UNIT_SLACK && x <= 1 + UNIT_SLACK;
}

describe.each(['coherent', 'incoherent'] as const)('%s stacks', (model) => {
  it(`R + T + A = 1 within ${ENERGY_TOL}, A = 0 and every value in [0, 1] for lossless stacks (${RUNS.many} cases)`, () => {
    check(
      `${model} lossless energy`,
      fc.property(medium, stack(model, false), medium, wavelength, angle, (nIn, layers, nOut, wl, theta) => {
        for (const [pol, R, T, A] of triples(run(model)(nIn, layers, nOut, wl, theta))) {
          expect(Math.abs(R + T + A - 1), `${pol}: R + T + A − 1`).toBeLessThanOrEqual(ENERGY_TOL);
          expect(Math.abs(A), `${pol}: A of a lossless stack`).toBeLessThanOrEqual(ENERGY_TOL);
          expect(inUnit(R) && inUnit(T) && inUnit(A), `${pol}: R ${R}, T ${T}, A ${A} in [0, 1]`).toBe(true);
        }
      }),
      RUNS.many
    );
  });

  it(`R + T + A = 1 within ${ENERGY_TOL} and every value in [0, 1] for lossy stacks (${RUNS.many} cases)`, () => {
    check(
      `${model} lossy energy`,
      fc.property(medium, stack(model, true), medium, wavelength, angle, (nIn, layers, nOut, wl, theta) => {
        for (const [pol, R, T, A] of triples(run(model)(nIn, layers, nOut, wl, theta))) {
          expect(Math.abs(R + T + A - 1), `${pol}: R + T + A − 1`).toBeLessThanOrEqual(ENERGY_TOL);
          expect(inUnit(R) && inUnit(T) && inUnit(A), `${pol}: R ${R}, T ${T}, A ${A} in [0, 1]`).toBe(true);
        }
      }),
      RUNS.many
    );
  });

  it(`transmits the same both ways through a lossless stack at Snell-matched angles (${RUNS.many} cases)`, () => {
    check(
      `${model} reciprocity`,
      fc.property(
        medium,
        stack(model, false),
        medium,
        wavelength,
        real(0, 0.999),
        (nIn, layers, nOut, wl, u) => {
          // Forward angle inside the smaller of the two cones, so the reversed angle is real and below 90°
          const sinMax = Math.min(1, nOut / nIn);
          const thetaIn = Math.asin(u * sinMax);
          const thetaOut = Math.asin((nIn * Math.sin(thetaIn)) / nOut);
          const fwd = run(model)(nIn, layers, nOut, wl, thetaIn);
          const back = run(model)(nOut, layers.slice().reverse(), nIn, wl, thetaOut);
          expect(Math.abs(fwd.Ts - back.Ts), `Ts ${fwd.Ts} vs ${back.Ts}`).toBeLessThanOrEqual(RECIPROCITY_TOL);
          expect(Math.abs(fwd.Tp - back.Tp), `Tp ${fwd.Tp} vs ${back.Tp}`).toBeLessThanOrEqual(RECIPROCITY_TOL);
        }
      ),
      RUNS.many
    );
  });

  it(`gives T = 0 beyond the exit critical angle, and R = 1 when lossless (${RUNS.many} cases)`, () => {
    check(
      `${model} total reflection`,
      fc.property(
        real(1.05, 4),
        fc.boolean().chain((lossy) => stack(model, lossy).map((layers) => ({ lossy, layers }))),
        real(0, 1),
        wavelength,
        real(1e-9, 1),
        (nIn, { lossy, layers }, f, wl, v) => {
          const nOut = 1 + f * (nIn - 1) * 0.95; // exit index below the chip index
          const thetaC = Math.asin(nOut / nIn);
          const theta = thetaC + v * (Math.PI / 2 - thetaC); // strictly beyond, up to grazing
          if (!(theta > thetaC)) return; // v so small the sum rounds onto the critical angle
          const r = run(model)(nIn, layers, nOut, wl, theta);
          expect(r.Ts, 'Ts').toBe(0);
          expect(r.Tp, 'Tp').toBe(0);
          if (!lossy || layers.every((l) => l.k === 0)) {
            expect(Math.abs(r.Rs - 1), 'Rs − 1').toBeLessThanOrEqual(ENERGY_TOL);
            expect(Math.abs(r.Rp - 1), 'Rp − 1').toBeLessThanOrEqual(ENERGY_TOL);
          }
        }
      ),
      RUNS.many
    );
  });
});

/** Log-uniform in [min, max]. */
const logUniform = (min: number, max: number) => real(Math.log10(min), Math.log10(max)).map((x) => 10 ** x);

describe('stacks at the edges of what validation accepts', () => {
  const wideLayer = fc.record({
    n: logUniform(1e-6, 1e6),
    k: fc.oneof(fc.constant(0), logUniform(1e-12, 1e6)),
    thicknessNm: fc.oneof(fc.constant(0), logUniform(1e-9, 1e12))
  });
  it.each(['coherent', 'incoherent'] as const)(`%s: finite R, T, A in [0, 1] for indices 1e-6…1e6, thicknesses up to 1 km, any wavelength (${RUNS.many} cases)`, (model) => {
    check(
      `${model} wide range`,
      fc.property(logUniform(1e-6, 1e6), fc.array(wideLayer, { maxLength: 5 }), logUniform(1e-6, 1e6), logUniform(1e-3, 1e9), angle, (nIn, layers, nOut, wl, theta) => {
        for (const [pol, R, T, A] of triples(run(model)(nIn, layers, nOut, wl, theta))) {
          expect(inUnit(R) && inUnit(T) && inUnit(A), `${pol}: R ${R}, T ${T}, A ${A}`).toBe(true);
          expect(Math.abs(R + T + A - 1), `${pol}: R + T + A − 1`).toBeLessThanOrEqual(ENERGY_TOL);
        }
      }),
      RUNS.many
    );
  });

  it('regression: an index below 1e-6 is refused by name instead of giving NaN', () => {
    // found by the command-line fuzzing: "stack --n-in 1e-320" printed "Rp NaN %"; the squared index
    // underflows below about 1e-150
    for (const f of [thinFilm, incoherentStack]) {
      expect(() => f(1e-200, [], 1, 550, 0.3)).toThrow('nIn must be a finite number ≥ 1e-6 (got 1e-200)');
      expect(() => f(2, [], 5e-324, 550, 0)).toThrow(/^nOut must be a finite number ≥ 1e-6/);
      expect(() => f(2, [{ n: 1e-300, k: 0, thicknessNm: 100 }], 1, 550, 0)).toThrow(/^layers\[0\]\.n must be a finite number ≥ 1e-6/);
    }
  });
});
