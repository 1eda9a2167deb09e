/**
 * Reference checks for single interfaces (Fresnel equations: Born & Wolf, Principles of Optics, §1.5.2). Each row names its source and tag:
 * published (source named), computed (worked from the formula, double precision), common practice.
 * Tolerances: half a unit in the last digit given in the table, unless stated.
 */
import { describe, it } from 'vitest';
import { fresnelReal, normalReflectance, reflectanceComplex, fresnelComplex } from '../../src/lib/optics/fresnel';
import { brewsterAngle } from '../../src/lib/optics/brewster';
import { criticalAngle } from '../../src/lib/optics/critical-angle';
import { assertInDelta } from '../support/assert';

const DEG = Math.PI / 180;
const fr = new Float64Array(3);
const rc = new Float64Array(2);

function rsAt(nI: number, nT: number, deg: number): number {
  fresnelReal(Math.cos(deg * DEG), nI, nT, fr);
  return fr[0];
}
function rpAt(nI: number, nT: number, deg: number): number {
  fresnelReal(Math.cos(deg * DEG), nI, nT, fr);
  return fr[1];
}

type Row = [label: string, actual: () => number, expected: number, tolerance: number];

const rows: Row[] = [
  // Normal incidence, lossless: R = ((n1 − n2)/(n1 + n2))²
  ['R 1.5 / air, normal = 0.04000 [common practice]', () => normalReflectance(1.5, 0, 1, 0), 0.04, 5e-6],
  ['R 2.5 / air, normal = 0.1837 [computed]', () => normalReflectance(2.5, 0, 1, 0), 0.1837, 5e-5],
  ['R 3.5 / air, normal = 0.3086 [computed]', () => normalReflectance(3.5, 0, 1, 0), 0.3086, 5e-5],
  // Brewster angle, air → 1.5
  ['Brewster angle air → 1.5 = 56.31° [published: NCERT Physics XII exercise; R. Tatum, Physical Optics §2.4]', () => brewsterAngle(1, 1.5) / DEG, 56.31, 0.005],
  ['Rs at Brewster air → 1.5 = 0.1479 [published: R. Tatum, Physical Optics §2.4]', () => rsAt(1, 1.5, brewsterAngle(1, 1.5) / DEG), 0.1479, 5e-5],
  ['Rp at Brewster air → 1.5 = 0 [published: NCERT Physics XII; definition of the Brewster angle]', () => rpAt(1, 1.5, brewsterAngle(1, 1.5) / DEG), 0, 1e-15],
  // Critical angles
  ['critical angle 1.5 / air = 41.81° [common practice]', () => (criticalAngle(1.5, 1) as number) / DEG, 41.81, 0.005],
  ['critical angle 2.45 / air = 24.09° [computed]', () => (criticalAngle(2.45, 1) as number) / DEG, 24.09, 0.005],
  // Oblique incidence
  ['air → 1.61 at 75°, natural light R = 27.1 % [published: 1993 science-formula collection, "Reflectance of natural light at an interface"]', () => 0.5 * (rsAt(1, 1.61, 75) + rpAt(1, 1.61, 75)), 0.271, 5e-4],
  ['air → 1.61 at 75°, Rs = 0.4427 [published: same collection]', () => rsAt(1, 1.61, 75), 0.4427, 5e-5],
  ['air → 1.61 at 75°, Rp = 0.09926 [published: same collection]', () => rpAt(1, 1.61, 75), 0.09926, 5e-6],
  ['air → 1.5 at 45°, Rs = 0.09201 [computed]', () => rsAt(1, 1.5, 45), 0.09201, 5e-6],
  // A value Rp = 0.008472 is sometimes quoted here, but that value breaks the exact 45° identity Rp = Rs² (F. Abelès, 1950,
  // from memory) against its own Rs = 0.09201: 0.09201² = 0.0084658. A hand calculation agrees
  // (rp = (1.5·0.707107 − 0.881917)/(1.5·0.707107 + 0.881917) = 0.092013). We check Rs² of the table's Rs,
  // tolerance 2 · 0.092 · 5e-6 ≈ 1e-6 carried from the Rs rounding. The discrepancy is reported to the lead.
  ['air → 1.5 at 45°, Rp = Rs² = 0.09201² (a rounded 0.008472 seen in notes is off by 5.5e-6) [computed, Abelès identity from memory]', () => rpAt(1, 1.5, 45), 0.09201 ** 2, 1e-6],
  ['2.5 → air at 20° (inside the chip), Rs = 0.4075 [computed]', () => rsAt(2.5, 1, 20), 0.4075, 5e-5],
  ['2.5 → air at 20° (inside the chip), Rp = 0.02544 [computed]', () => rpAt(2.5, 1, 20), 0.02544, 5e-6],
  // Metals: n, k published by K. M. McPeak et al., ACS Photonics 2, 326 (2015); R computed
  ['Ag 550 nm (n 0.04382, k 3.6101) into air R = 0.9876 [n,k published: McPeak 2015; R computed]', () => normalReflectance(1, 0, 0.04382, 3.6101), 0.9876, 5e-5],
  ['Ag 550 nm into 1.5, R = 0.9829 [n,k published: McPeak 2015; R computed]', () => normalReflectance(1.5, 0, 0.04382, 3.6101), 0.9829, 5e-5],
  ['Al 450 nm (n 0.4892, k 4.7783) into air R = 0.9219 [n,k published: McPeak 2015; R computed]', () => normalReflectance(1, 0, 0.4892, 4.7783), 0.9219, 5e-5],
  ['Al 450 nm into air through the tracer path reflectanceComplex, Rs at normal = 0.9219 [same source]', () => reflectanceComplex(1, 1, 0.4892, 4.7783, rc)[0], 0.9219, 5e-5],
  ['Ag 550 nm into 1.5 through fresnelComplex, R at normal = 0.9829 [same source]', () => fresnelComplex(0, 1.5, 0, 0.04382, 3.6101).R, 0.9829, 5e-5]
];

describe('reference: interfaces (Fresnel equations: Born & Wolf, Principles of Optics, §1.5.2)', () => {
  it.each(rows)('%s', (_label, actual, expected, tolerance) => {
    assertInDelta(actual(), expected, tolerance);
  });
});
