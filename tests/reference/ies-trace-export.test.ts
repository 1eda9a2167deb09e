/**
 * The IES file the dome page writes for the scenario itself, checked against the format's own rules and
 * against the counting statistics of the trace behind it:
 * - it parses (ANSI/IES LM-63-2019 layout, read by our reader) and every header line is printable ASCII
 *   (LM-63 files are ASCII text; ANSI X3.4 printable range 0x20–0x7E);
 * - its flux, Φ = 2π ∫ I sin θ dθ (definition of intensity, CIE S 017), is the asked lumens within 1 %;
 * - its candela curve has no dip deeper than k = 3 standard errors of its own counting noise. A value
 *   averaged over a zone of solid angle Ω holds N = E · I Ω / Φ of the E escaped rays (the zone's share of
 *   the flux); its binomial standard error is σ_I = I √(N(1 − N/E)) / N (common practice).
 * k = 3: with 179 interior angles and independent noise, a 3σ one-sided excursion is expected in about
 * 0.2 of a file by chance (0.00135 × 179); the overlapping zones make neighbours share counts, which
 * shrinks real dips further, and the seed is fixed, so the check is deterministic.
 */
import { describe, expect, it } from 'vitest';
import { parseIes } from '../../src/lib/export/ies';
import { traceIes } from '../../src/lib/export/trace-ies';
import { packageOpening } from '../../src/lib/export/ies-opening';
import { DEMO_SCENARIO } from '../../src/lib/scenario/defaults';
import { toTracePackage } from '../../src/lib/scenario/resolve';
import { summarize } from '../../src/lib/trace/summary';
import { traceSync } from '../../src/lib/trace/trace';

const K = 3;

/**
 * Angles (degrees) of dips: I below both neighbours by more than K·σ_I (a local minimum deeper than the
 * noise allows). A real feature of the package (the shadow of the base near the horizon) spans
 * several degrees and is no single-angle minimum; a noisy polar bin is.
 * @param sigma standard error of each value
 */
function dips(thetaDeg: number[], candela: number[], sigma: number[]): number[] {
  const out: number[] = [];
  for (let j = 0; j < candela.length; j++) {
    const left = j > 0 ? candela[j - 1] : candela[j + 1];
    const right = j < candela.length - 1 ? candela[j + 1] : candela[j - 1];
    if (Math.min(left, right) - candela[j] > K * sigma[j]) out.push(thetaDeg[j]);
  }
  return out;
}

/** Binomial standard error of each zone-averaged intensity (see the file comment). */
function countingSigma(candela: number[], zoneSr: number[], fluxLm: number, escaped: number): number[] {
  return candela.map((I, j) => {
    const N = (escaped * I * zoneSr[j]) / fluxLm;
    return N > 0 ? (I * Math.sqrt(N * (1 - N / escaped))) / N : 0;
  });
}

describe('IES file of the demo scenario, from the dome page (LM-63-2019, CIE S 017)', () => {
  const scenario = DEMO_SCENARIO;
  const summary = summarize(traceSync(toTracePackage(scenario), { rays: scenario.trace.rays, seed: scenario.trace.seed }));
  const lumens = 100;
  const { text, farField } = traceIes({
    binIntensities: summary.farField.bins.map((b) => b.relativeIntensity),
    lumens,
    rays: summary.rays,
    seed: scenario.trace.seed,
    issueDate: '2026-12-03',
    name: 'Methyl silicone (n ≈ 1.41) dome ± 0.1 mm, θ 0–90°',
    opening: packageOpening(scenario.encapsulant, scenario.chip)
  });
  const file = parseIes(text);
  const candela = file.candela[0];

  it('parses, with one horizontal angle and 181 vertical angles 0…180°', () => {
    expect(file.version).toBe('IES:LM-63-2019');
    expect(file.horizontalAnglesDeg).toEqual([0]);
    expect(file.verticalAnglesDeg.length).toBe(181);
  });

  it('writes every header line (up to TILT=) in printable ASCII, "≈", "±", "θ" and "–" spelled out', () => {
    const header = text.split('\r\n').slice(0, text.split('\r\n').indexOf('TILT=NONE') + 1);
    for (const line of header) expect(line).toMatch(/^[\x20-\x7e]*$/);
    expect(file.keywords.LUMINAIRE).toBe('Methyl silicone (n ~ 1.41) dome +/- 0.1 mm, theta 0-90 deg');
  });

  it('states its smoothing in the [_SMOOTHING] keyword', () => {
    expect(file.keywords._SMOOTHING).toMatch(/0\.05 sr/);
    expect(file.keywords._SMOOTHING).toMatch(/0-8 deg cap/);
  });

  it('carries the asked flux within 1 %', () => {
    expect(Math.abs(file.fluxLm - lumens) / lumens).toBeLessThan(0.01);
  });

  it(`has no dip deeper than ${K} standard errors of its own counting noise, 0° included`, () => {
    const sigma = countingSigma(candela, farField.zoneSolidAngleSr, file.fluxLm, summary.counts.escaped);
    expect(dips(file.verticalAnglesDeg, candela, sigma)).toEqual([]);
    // The on-axis value is within K σ of its neighbour (the old file showed 8.9 cd beside 12–14 cd)
    expect(Math.abs(candela[0] - candela[2])).toBeLessThan(K * sigma[0]);
  });

  it('the dip check itself catches a single low 1° bin of a raw trace (the check can fail)', () => {
    // The raw 0.5° bin centre, held at 0°, as an unsmoothed writer would give it: 30 % low
    const lowered = candela.slice();
    lowered[0] *= 0.7;
    const sigma = countingSigma(candela, farField.zoneSolidAngleSr, file.fluxLm, summary.counts.escaped);
    expect(dips(file.verticalAnglesDeg, lowered, sigma)).toEqual([0]);
  });
});
