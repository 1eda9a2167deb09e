import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseIes } from '../../../src/lib/export/ies';
import { symmetricFlux } from '../../../src/lib/export/symmetric-flux';
import { luminousBinIntensities } from '../../../src/lib/export/white-ies';
import { luminousBandWeights } from '../../../src/lib/trace/luminous-bands';
import { photopicV } from '../../../src/lib/photometry/photopic';
import { createSpectralTally, SPECTRUM_BINS, SPECTRUM_FROM_NM, SPECTRUM_STEP_NM, ANGLE_BANDS } from '../../../src/lib/trace/spectral-tally';
import { runCli, runJson } from '../cli/run-cli';

const dir = mkdtempSync(join(tmpdir(), 'outcouple-white-ies-'));
const binOf = (nm: number) => Math.floor((nm - SPECTRUM_FROM_NM) / SPECTRUM_STEP_NM);

/** The flux of a parsed file, 2π ∫ I sin θ dθ (candela × multiplier). */
function fileFlux(text: string): number {
  const f = parseIes(text);
  return symmetricFlux(f.verticalAnglesDeg, f.candela[0].map((c) => c * f.candelaMultiplier));
}

describe('luminous far field of a white package', () => {
  it('weights each 1° bin by its band’s lumens per photon, V(λ)/λ: a 555 nm band against a 450 nm band (V = 1 and 0.038, CIE 1924 photopic, CIE 015:2018)', () => {
    const s = createSpectralTally();
    // band 0 (0–10°): 100 photons at 555 nm; band 1 (10–20°): 100 at 450 nm
    s.escaped[0 * SPECTRUM_BINS + binOf(555)] = 100;
    s.escaped[1 * SPECTRUM_BINS + binOf(450)] = 100;
    const bins = new Array(180).fill(0).map((_, j) => (j < 20 ? 1 : 0));
    const out = luminousBinIntensities(bins, luminousBandWeights(s));
    const nm0 = SPECTRUM_FROM_NM + (binOf(555) + 0.5) * SPECTRUM_STEP_NM;
    const nm1 = SPECTRUM_FROM_NM + (binOf(450) + 0.5) * SPECTRUM_STEP_NM;
    // lumens per photon ∝ V(λ)/λ at the bins' centres (555 and 451 nm): V(555) = 1.000, V(451) ≈ 0.0399 (CIE 1924 table)
    expect(out[0] / out[10]).toBeCloseTo(photopicV(nm0) / nm0 / (photopicV(nm1) / nm1), 9);
    expect(out[0] / out[10]).toBeGreaterThan((1 / nm0 / (0.041 / nm1)));
    expect(out[0] / out[10]).toBeLessThan((1 / nm0 / (0.038 / nm1)));
    // the weights keep the flux: mean weight by photons is 1
    expect(0.5 * (out[0] + out[10])).toBeCloseTo(1, 12);
    expect(out[30]).toBe(0);
    expect(ANGLE_BANDS).toBe(18);
  });

  it('CLI: without --lumens the file carries the traced luminous flux per 1 W of chip light, LER × W out per W of chip light (Km = 683 lm/W, CIE 015:2018), and says so; with --lumens it is scaled to them', () => {
    const path = join(dir, 'white.ies');
    const args = ['trace', '--rays', '20000', '--threads', '1', '--phosphor', 'garnet-yellow', '--phosphor-wt', '10'];
    const out = runJson([...args, '--ies', path]);
    const text = readFileSync(path, 'utf8');
    const expected = out.color.lerLmPerW * out.energyEfficiency;
    expect(expected).toBeGreaterThan(10);
    // the flux integral of the file's candela table against the traced flux: the 1° table's trapezoid error is below 1e-3
    expect(Math.abs(fileFlux(text) / expected - 1)).toBeLessThan(2e-3);
    expect(parseIes(text).keywords._LUMINOUS_FLUX).toMatch(/lm per 1 W of chip light/);
    const scaled = join(dir, 'white-500.ies');
    runJson([...args, '--ies', scaled, '--lumens', '500']);
    const scaledText = readFileSync(scaled, 'utf8');
    expect(Math.abs(fileFlux(scaledText) / 500 - 1)).toBeLessThan(2e-3);
    expect(parseIes(scaledText).keywords._LUMINOUS_FLUX).toMatch(/scaled to the 500 lm asked for/);
  });

  it('CLI: a package without phosphor still needs --lumens for an IES file (exit 2, one line)', () => {
    const r = runCli(['trace', '--rays', '1000', '--ies', join(dir, 'clear.ies')]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/--ies needs --lumens/);
  });
});
