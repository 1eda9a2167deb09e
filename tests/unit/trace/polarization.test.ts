import { describe, expect, it } from 'vitest';
import {
  TRACK_REFLECTED,
  TRACK_TIR,
  TRACK_TRANSMITTED,
  field,
  launchPolarization as launchWith,
  trackedInterface as interfaceWith,
  trackedMirror as mirrorWith
} from '../../../src/lib/trace/polarization';
import { assertInDelta } from '../../support/assert';

// The functions take their numbers in an array (no boxing in the tracer); these spell them out.
const trackedInterface = (d: Float64Array, n: Float64Array, cosI: number, etaI: number, etaT: number, u: number) =>
  interfaceWith(d, n, Float64Array.of(cosI, etaI, etaT, u));
const trackedMirror = (d: Float64Array, n: Float64Array, rsRe: number, rsIm: number, rpRe: number, rpIm: number, u: number) =>
  mirrorWith(d, n, Float64Array.of(rsRe, rsIm, rpRe, rpIm, u));
const launchPolarization = (d: Float64Array, u: number) => launchWith(d, Float64Array.of(u));

const up = Float64Array.of(0, 0, 1); // normal of the plane z = 0 facing a ray that comes down

/** Direction in the x–z plane, θ from the normal, heading down onto z = 0. */
function down(theta: number): Float64Array {
  return Float64Array.of(Math.sin(theta), 0, -Math.cos(theta));
}

/** Sets a real linear field E = a·ŷ + b·(cos θ, 0, sin θ): s along ŷ, p in the plane of incidence. */
function setLinear(theta: number, a: number, b: number): void {
  field.set([b * Math.cos(theta), 0, a, 0, b * Math.sin(theta), 0]);
}

function fieldNorm2(): number {
  let s = 0;
  for (let i = 0; i < 6; i++) s += field[i] * field[i];
  return s;
}

function fieldDot(d: Float64Array): [number, number] {
  return [field[0] * d[0] + field[2] * d[1] + field[4] * d[2], field[1] * d[0] + field[3] * d[1] + field[5] * d[2]];
}

describe('trackedInterface(d, n, [cosThetaI, etaI, etaT, u])', () => {
  // Brewster angle air → 1.5 is 56.31° with Rp = 0 and Rs = 0.1479 there (published: NCERT Physics XII;
  // R. Tatum, Physical Optics §2.4). Tolerance 5e-5: the published Rs has 4 digits.
  it('never reflects p light at the Brewster angle, and reflects s light with Rs = 0.1479', () => {
    const theta = Math.atan(1.5);
    const c = Math.cos(theta);
    setLinear(theta, 0, 1);
    expect(trackedInterface(down(theta), up, c, 1, 1.5, 0)).toBe(TRACK_TRANSMITTED);
    // s light: find R by where the choice flips
    let lo = 0;
    let hi = 1;
    for (let i = 0; i < 40; i++) {
      const mid = (lo + hi) / 2;
      setLinear(theta, 1, 0);
      if (trackedInterface(down(theta), up, c, 1, 1.5, mid) === TRACK_REFLECTED) lo = mid;
      else hi = mid;
    }
    assertInDelta(lo, 0.1479, 5e-5);
  });

  // Air → 1.5 at 45°: Rs = 0.09201, Rp = 0.008472 (computed; Fresnel equations: Born & Wolf, Principles of Optics, §1.5.2). A field at azimuth ψ from s
  // reflects with R = Rs cos²ψ + Rp sin²ψ; the choice must flip at that R (to 1e-9 of bisection).
  it.each([0, 0.3, 0.7854, 1.2, 1.5708])('reflects light polarised at ψ = %s rad from s with Rs cos²ψ + Rp sin²ψ', (psi) => {
    const theta = Math.PI / 4;
    const expected = 0.09201 * Math.cos(psi) ** 2 + 0.008472 * Math.sin(psi) ** 2;
    let lo = 0;
    let hi = 1;
    for (let i = 0; i < 30; i++) {
      const mid = (lo + hi) / 2;
      setLinear(theta, Math.cos(psi), Math.sin(psi));
      if (trackedInterface(down(theta), up, Math.cos(theta), 1, 1.5, mid) === TRACK_REFLECTED) lo = mid;
      else hi = mid;
    }
    assertInDelta(lo, expected, 1e-5); // the table values carry 4 significant digits
  });

  it('reverses the field at normal incidence on denser glass (r = −0.2) and keeps it on transmission', () => {
    // Lab frame: E_r = r E_i with r = (n1 − n2)/(n1 + n2) < 0, E_t = t E_i with t > 0 (common practice)
    const E = [0.6, 0, 0.8, 0, 0, 0];
    field.set(E);
    const d = down(0);
    expect(trackedInterface(d, up, 1, 1, 1.5, 0)).toBe(TRACK_REFLECTED);
    expect(Array.from(d)).toEqual([0, 0, 1]);
    for (let i = 0; i < 6; i++) assertInDelta(field[i], -E[i], 1e-15);
    field.set(E);
    const d2 = down(0);
    expect(trackedInterface(d2, up, 1, 1, 1.5, 0.999)).toBe(TRACK_TRANSMITTED);
    for (let i = 0; i < 6; i++) assertInDelta(field[i], E[i], 1e-15);
  });

  // Born & Wolf, Principles of Optics, §1.5.4: on total reflection the phase difference δ between the
  // p and s components obeys tan(δ/2) = cos θ √(sin²θ − n²)/sin²θ, n = n2/n1 (from memory; the formula is
  // textbook). Glass 1.5 → air at 60°: δ = 40.46°. Tolerance 1e-9 rad (double-precision arithmetic).
  it('turns 45° linear light elliptical on total internal reflection, with the textbook phase difference', () => {
    const theta = Math.PI / 3;
    setLinear(theta, Math.SQRT1_2, Math.SQRT1_2);
    const d = down(theta);
    expect(trackedInterface(d, up, Math.cos(theta), 1.5, 1, 0.5)).toBe(TRACK_TIR);
    // reflected direction (sin θ, 0, cos θ); s = ŷ up to sign, p_r = d_r × s
    const s = Float64Array.of(0, -1, 0);
    const p = Float64Array.of(d[1] * s[2] - d[2] * s[1], d[2] * s[0] - d[0] * s[2], d[0] * s[1] - d[1] * s[0]);
    const [esRe, esIm] = fieldDot(s);
    const [epRe, epIm] = fieldDot(p);
    assertInDelta(esRe * esRe + esIm * esIm, 0.5, 1e-14); // |rs| = |rp| = 1: the split stays 50/50
    const delta = Math.abs(Math.atan2(epIm, epRe) - Math.atan2(esIm, esRe));
    const n = 1 / 1.5;
    const sin2 = Math.sin(theta) ** 2;
    const expected = 2 * Math.atan((Math.cos(theta) * Math.sqrt(sin2 - n * n)) / sin2);
    assertInDelta(Math.min(delta, 2 * Math.PI - delta), expected, 1e-9);
  });

  it('keeps the field of unit intensity and perpendicular to the ray through many random events (1e-12)', () => {
    launchPolarization(Float64Array.of(0, 0, -1), 0.37);
    let seed = 1;
    const rand = () => ((seed = (seed * 16807) % 2147483647) / 2147483647);
    const d = Float64Array.of(0.3, -0.4, -Math.sqrt(1 - 0.25));
    for (let k = 0; k < 200; k++) {
      // a random interface normal facing the ray
      let nx = rand() - 0.5;
      let ny = rand() - 0.5;
      let nz = rand() - 0.5;
      const len = Math.hypot(nx, ny, nz);
      nx /= len;
      ny /= len;
      nz /= len;
      let c = -(d[0] * nx + d[1] * ny + d[2] * nz);
      if (c < 0) {
        nx = -nx;
        ny = -ny;
        nz = -nz;
        c = -c;
      }
      const [a, b] = rand() < 0.5 ? [1, 2.45] : [2.45, 1.41];
      trackedInterface(d, Float64Array.of(nx, ny, nz), c, a, b, rand());
      assertInDelta(Math.hypot(d[0], d[1], d[2]), 1, 1e-12);
      assertInDelta(fieldNorm2(), 1, 1e-12);
      const [re, im] = fieldDot(d);
      assertInDelta(Math.hypot(re, im), 0, 1e-12);
    }
  });
});

describe('trackedMirror(d, n, [rs, rp, u])', () => {
  it('with rs = −1, rp = +1 (perfect conductor) reverses the field at normal incidence: E_r = −E_i', () => {
    // the tangential field vanishes at a perfect conductor (common practice)
    const E = [0.28, 0.1, -0.95, 0.05, 0, 0];
    const norm = Math.hypot(...E);
    field.set(E.map((v) => v / norm));
    const d = down(0);
    expect(trackedMirror(d, up, -1, 0, 1, 0, 0.999)).toBe(true);
    for (let i = 0; i < 6; i++) assertInDelta(field[i], -E[i] / norm, 1e-15);
  });

  it('absorbs with probability 1 − R: an s-polarised ray with |rs|² = 0.3 reflects only for u < 0.3', () => {
    const theta = 0.5;
    setLinear(theta, 1, 0);
    expect(trackedMirror(down(theta), up, -Math.sqrt(0.3), 0, 0.9, 0, 0.2999)).toBe(true);
    setLinear(theta, 1, 0);
    expect(trackedMirror(down(theta), up, -Math.sqrt(0.3), 0, 0.9, 0, 0.3001)).toBe(false);
  });
});

describe('launchPolarization(d, [u])', () => {
  it('starts a real, unit, transverse field whose azimuth turns with u', () => {
    const d = Float64Array.of(0.48, 0.6, 0.64);
    launchPolarization(d, 0);
    const first = Array.from(field);
    assertInDelta(fieldNorm2(), 1, 1e-15);
    expect(field[1] === 0 && field[3] === 0 && field[5] === 0).toBe(true);
    assertInDelta(fieldDot(d)[0], 0, 1e-15);
    launchPolarization(d, 0.25);
    // a quarter turn: orthogonal to the first field
    assertInDelta(field[0] * first[0] + field[2] * first[2] + field[4] * first[4], 0, 1e-15);
  });
});
