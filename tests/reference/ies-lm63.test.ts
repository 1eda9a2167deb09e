/**
 * The IES file we write, checked against the published description of the format:
 * ANSI/IES LM-63-2019, "Standard File Format for the Electronic Transfer of Photometric Data and
 * Related Information" (Illuminating Engineering Society). Field order is the one the standard gives
 * (and LM-63-2002 before it, whose text is public); the file generation type code is from memory.
 * Physics checks: Lambert's cosine law (Φ = π·I0, common practice) and the flux of a symmetric
 * distribution, Φ = 2π ∫ I sin θ dθ (definition of intensity, CIE S 017).
 */
import { describe, it, expect } from 'vitest';
import { parseIes, writeIes } from '../../src/lib/export/ies';
import { assertInDelta, expectClose } from '../support/assert';

const DEG = Math.PI / 180;

function lambertFarField() {
  // Histogram-like: 1° bins, centres 0.5 … 179.5°, I ∝ cos θ above the horizon, 0 below
  const thetaDeg = Array.from({ length: 180 }, (_, i) => i + 0.5);
  return { thetaDeg, relativeIntensity: thetaDeg.map((t) => Math.max(0, Math.cos(t * DEG))) };
}

function write(lumens: number, farField = lambertFarField(), stepDeg = 1) {
  return writeIes({
    farField,
    lumens,
    rays: 200000,
    seed: 7,
    issueDate: '2026-12-02',
    name: 'Demo: blue 1 mm chip',
    opening: { shape: 'cylinder', widthMm: 5, lengthMm: 5, heightMm: 2.5 },
    inputWatts: 1,
    stepDeg
  });
}

describe('IES LM-63-2019 structure, field by field (ANSI/IES LM-63-2019)', () => {
  const lines = write(100).split('\r\n');
  const tiltRow = lines.indexOf('TILT=NONE');

  it('line 1 is the edition identifier IES:LM-63-2019', () => {
    expect(lines[0]).toBe('IES:LM-63-2019');
  });

  it('keyword lines follow, each "[KEYWORD] text", the four required ones included', () => {
    const keywordLines = lines.slice(1, tiltRow);
    for (const l of keywordLines) expect(l).toMatch(/^\[[A-Z_]+\] \S/);
    const keys = keywordLines.map((l) => /^\[([A-Z_]+)\]/.exec(l)![1]);
    for (const required of ['TEST', 'TESTLAB', 'ISSUEDATE', 'MANUFAC']) expect(keys).toContain(required);
    for (const listed of ['LUMCAT', 'LUMINAIRE', 'LAMPCAT', 'LAMP', 'FILEGENINFO']) expect(keys).toContain(listed);
    expect(keywordLines.find((l) => l.startsWith('[TEST]'))).toBe('[TEST] Monte Carlo trace 200000 rays seed 7');
    expect(keywordLines.find((l) => l.startsWith('[MANUFAC]'))).toBe('[MANUFAC] Outcouple simulation');
    expect(keywordLines.find((l) => l.startsWith('[ISSUEDATE]'))).toBe('[ISSUEDATE] 2026-12-02');
  });

  it('TILT=NONE comes right after the keywords', () => {
    expect(tiltRow).toBeGreaterThan(4);
  });

  it('then the ten numbers: lamps, lumens per lamp, multiplier, #vertical, #horizontal, type, units, w, l, h', () => {
    const f = lines[tiltRow + 1].split(' ');
    expect(f.length).toBe(10);
    expect(f[0]).toBe('1'); // number of lamps
    expect(f[1]).toBe('-1'); // lumens per lamp: −1 = absolute photometry
    expect(f[2]).toBe('1'); // candela multiplier
    expect(f[3]).toBe('181'); // vertical angles 0..180 by 1°
    expect(f[4]).toBe('1'); // one horizontal angle: rotationally symmetric
    expect(f[5]).toBe('1'); // photometric type 1 = type C
    expect(f[6]).toBe('2'); // units type 2 = metres
    expect(f.slice(7).map(Number)).toEqual([-0.005, -0.005, 0.0025]); // vertical cylinder, Ø 5 mm, 2.5 mm high
  });

  it('then ballast factor, file generation type (2019; "future use" before) and input watts', () => {
    const f = lines[tiltRow + 2].split(' ');
    expect(f).toEqual(['1', '1.00010', '1']);
  });

  it('then the vertical angles 0 … 180 ascending, the horizontal angle 0, and one candela per vertical angle', () => {
    const rest = lines.slice(tiltRow + 3).join(' ').trim().split(/\s+/).map(Number);
    const vertical = rest.slice(0, 181);
    expect(vertical[0]).toBe(0);
    expect(vertical[180]).toBe(180);
    for (let i = 1; i < vertical.length; i++) expect(vertical[i]).toBeGreaterThan(vertical[i - 1]);
    expect(rest[181]).toBe(0);
    const candela = rest.slice(182);
    expect(candela.length).toBe(181);
    for (const c of candela) expect(c).toBeGreaterThanOrEqual(0);
  });
});

describe('IES round trip: write → parseIes', () => {
  it('reproduces the flux asked for within 1 % for Lambertian and noisy histogram far fields', () => {
    // The standard's files carry 6 significant digits; our parser integrates 2π ∫ I sin θ dθ
    // independently of the writer's scaling path. Tolerance: 1 % (the brief's requirement).
    let state = 12345;
    const noisy = lambertFarField();
    noisy.relativeIntensity = noisy.relativeIntensity.map((v) => {
      state = (1103515245 * state + 12345) % 2147483648; // fixed LCG: a reproducible ragged histogram
      return v * (0.8 + 0.4 * (state / 2147483648));
    });
    for (const [lumens, ff, step] of [[100, lambertFarField(), 1], [3.7, noisy, 2.5], [25000, noisy, 0.5]] as const) {
      const p = parseIes(write(lumens, ff, step));
      expectClose(p.fluxLm, lumens, { rel: 0.01 });
    }
  });

  it('a Lambertian source gives I(θ) ∝ cos θ and Φ = π·I0 (Lambert; tolerance from 1° sampling)', () => {
    // Bin centres start at 0.5°, so I(0) is held at cos 0.5° (relative error 3.8e-5); the 1° piecewise-
    // linear flux integral errs by ≤ 4e-5; 6-digit printing adds 5e-6. Allow 2e-4 relative.
    const lumens = 100;
    const p = parseIes(write(lumens));
    const I = p.candela[0];
    const I0 = I[0];
    expectClose(I0, lumens / Math.PI, { rel: 2e-4 });
    for (let i = 0; i <= 89; i++) {
      const theta = p.verticalAnglesDeg[i];
      // I(θ)/I0 against cos θ: interpolation between bin centres errs by ≤ h²/8 ≈ 4e-5 of I0
      assertInDelta(I[i] / I0, Math.cos(theta * DEG), 2e-4, `θ = ${theta}°`);
    }
    for (let i = 91; i <= 180; i++) expect(I[i]).toBe(0);
    expectClose(p.fluxLm, Math.PI * I0, { rel: 2e-4 });
  });
});
