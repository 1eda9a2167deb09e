import { describe, expect, it } from 'vitest';
import { runCli, runJson } from './run-cli';

describe('outcouple stack', () => {
  it('reports Rs, Rp, Ts, Tp, R, T, A that close (R + T + A = 1) for the example stack', () => {
    const out = runJson(['stack', '--n-in', '2.45', '--layer', '1.8:80', '--layer', '1.4:100', '--n-out', '1', '--wavelength', '550', '--angle', '20']);
    for (const key of ['Rs', 'Rp', 'Ts', 'Tp', 'R', 'T', 'A']) expect(Number.isFinite(out[key])).toBe(true);
    expect(out.R + out.T + out.A).toBeCloseTo(1, 12);
    expect(out.A).toBeCloseTo(0, 12); // lossless layers
  });

  it('--incoherent 2.5 → 1.5 (thick) → 1 at normal incidence gives T = 0.9023 (computed; incoherent and thin-film stacks: Macleod, Thin-Film Optical Filters, 4th ed., ch. 2)', () => {
    const out = runJson(['stack', '--n-in', '2.5', '--layer', '1.5:1000', '--n-out', '1', '--incoherent']);
    expect(out.T).toBeCloseTo(0.9023, 4);
  });

  it('--extraction never widens the cone: the stack escape cone equals the bare one (n·sin θ invariance)', () => {
    const out = runJson(['stack', '--n-in', '2.45', '--layer', 'SiO2:100', '--n-out', '1', '--extraction']);
    expect(out.escapeConeDeg).toBeCloseTo(24.0895, 3);
    expect(out.bareExtractionFraction).toBeCloseTo(0.03408, 4);
    expect(out.extractionFraction).toBeLessThanOrEqual(0.04355); // the geometric cone bounds any stack (common practice)
  });

  it('a bad layer names the layer and the allowed form', () => {
    const run = runCli(['stack', '--n-in', '2.45', '--layer', '1.8', '--n-out', '1']);
    expect(run.code).toBe(2);
    expect(run.stderr).toMatch(/--layer 1: expected INDEX:THICKNESS/);
  });
});

describe('outcouple dome', () => {
  it('dome --n-chip 2.45 --n-enc 1.41 --chip 1x1 --radius 2.5: gain ≈ 2.26, no-TIR radius 0.997 mm (computed; dome: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5; sine rule, Born & Wolf §4.2.3)', () => {
    const out = runJson(['dome', '--n-chip', '2.45', '--n-enc', '1.41', '--chip', '1x1', '--radius', '2.5']);
    expect(out.etaBare).toBeCloseTo(0.03408, 4);
    expect(out.gain).toBeCloseTo(2.26, 1);
    expect(out.minRadiusNoTirMm).toBeCloseTo(0.997, 3);
    expect(out.noTir).toBe(true);
    expect(runJson(['dome', '--n-chip', '2.45', '--n-enc', '1.41', '--chip', '1x1', '--radius', '0.9']).noTir).toBe(false);
  });

  it('rejects a malformed chip size with the expected form', () => {
    const run = runCli(['dome', '--n-chip', '2.45', '--n-enc', '1.41', '--chip', '1by1']);
    expect(run.code).toBe(2);
    expect(run.stderr).toMatch(/--chip must look like WIDTHxLENGTH/);
  });
});

describe('outcouple material', () => {
  it('material GaN --wavelength 450 gives n 2.4869 with model, range and source (Barker & Ilegems 1973)', () => {
    const out = runJson(['material', 'GaN', '--wavelength', '450']);
    expect(out.n).toBeCloseTo(2.4869, 4);
    expect(out.k).toBe(0);
    expect(out.inRange).toBe(true);
    expect(out.source).toMatch(/Barker/);
    expect(out.validRangeNm).toHaveLength(2);
  });

  it('--list lists at least 20 materials', () => {
    expect(runJson(['material', '--list']).materials.length).toBeGreaterThanOrEqual(20);
  });

  it('an unknown material is a one-line error with exit code 2', () => {
    const run = runCli(['material', 'unobtainium']);
    expect(run.code).toBe(2);
    expect(run.stderr).toMatch(/unknown material 'unobtainium'/);
  });
});
