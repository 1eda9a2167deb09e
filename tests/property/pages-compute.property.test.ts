/**
 * Whatever the scenario schema accepts, every page's computation computes: fast-check generates
 * scenarios (library, typed and edge-of-range media, sizes from the smallest to the largest the limits
 * table allows, every shape and base), keeps those the schema accepts, and runs on each what the pages
 * run — escape cones and their charts, the stack extraction, the dome closed form, a small trace,
 * the compare ranking and its chart, the claim check of every kind with its scale chart, and the report's
 * facts. None may throw, and no number they return may be NaN (nor any text they print say "NaN").
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { listMaterials } from '../../src/lib/materials';
import { demoScenario, LIMITS, parseScenario, resolveScenario, toTracePackage, type Scenario } from '../../src/lib/scenario';
import { minEncapsulantRadiusMm } from '../../src/lib/scenario/package-fit';
import { cuboidChipEscape, escapeCone, transmissionCurve, stackExtraction } from '../../src/lib/optics';
import { escapeIndexChart } from '../../src/lib/charts/escape-index-chart';
import { transmissionChart } from '../../src/lib/charts/transmission-chart';
import { claimScaleChart } from '../../src/lib/charts/claim-scale-chart';
import { domeClosedForm } from '../../src/lib/sweeps/dome-closed-form';
import { traceSync } from '../../src/lib/trace/trace';
import { summarize } from '../../src/lib/trace/summary';
import { checkClaim, CLAIM_KINDS, rankingChart } from '../../src/lib/decisions';
import { scenarioRanking } from '../../src/lib/decisions/scenario-ranking';
import { defaultForm, formToClaim } from '../../src/routes/claim/claim-form';
import { assumptions, cautions, closedFormRows, scenarioRows } from '../../src/routes/report/report-facts';
import { check } from './support';

/** Cases: each runs a 300-ray trace and a full encapsulant ranking, so a few hundred keep the file to seconds. */
const CASES = 300;

/** Paths of every NaN number (and every "NaN" in a text) inside a result. */
function nanPaths(value: unknown, path = '', out: string[] = []): string[] {
  if (typeof value === 'number' && Number.isNaN(value)) out.push(path);
  else if (typeof value === 'string' && /\bNaN\b/.test(value)) out.push(`${path}: "${value.slice(0, 80)}"`);
  else if (Array.isArray(value) || value instanceof Float64Array) for (let i = 0; i < value.length; i++) nanPaths(value[i], `${path}[${i}]`, out);
  else if (value && typeof value === 'object') for (const [k, v] of Object.entries(value)) if (typeof v !== 'function') nanPaths(v, `${path}.${k}`, out);
  return out;
}

const dielectrics = listMaterials().filter((m) => m.category !== 'metal').map((m) => m.id);
const metals = listMaterials().filter((m) => m.category === 'metal').map((m) => m.id);
const N = LIMITS.indexN;

/** Numbers that favour the edges of a range: both ends and values near them. */
function ranged(min: number, max: number) {
  return fc.oneof(fc.constantFrom(min, max), fc.double({ min, max, noNaN: true }));
}

/** A length from the limits table, spread over its decades. */
const lengthMm = fc.oneof(fc.constantFrom(LIMITS.sizeMm.min, 0.15, 1, LIMITS.sizeMm.max), fc.double({ min: -3, max: 3, noNaN: true }).map((e) => 10 ** e));

const medium = fc.oneof(
  fc.constantFrom(...dielectrics).map((id) => ({ kind: 'material' as const, id })),
  fc.record({ kind: fc.constant('index' as const), n: ranged(N.min, N.max), k: ranged(LIMITS.indexK.min, LIMITS.indexK.max) })
);

const scenarioArb = fc
  .record({
    wavelengthNm: ranged(LIMITS.wavelengthNm.min, LIMITS.wavelengthNm.max),
    chipMedium: medium,
    encMedium: medium,
    outside: medium,
    w: lengthMm,
    l: lengthMm,
    h: lengthMm,
    emitterShare: fc.double({ min: 0, max: 1, noNaN: true }),
    chipAbs: ranged(LIMITS.absorptionPerMm.min, LIMITS.absorptionPerMm.max),
    emission: fc.constantFrom('plane' as const, 'volume' as const),
    base: fc.oneof(
      ranged(0, 1).map((reflectance) => ({ kind: 'reflectance' as const, reflectance })),
      fc.constantFrom(...metals).map((id) => ({ kind: 'metal' as const, id }))
    ),
    shape: fc.constantFrom('none' as const, 'dome' as const, 'cylinder' as const),
    heightOver: fc.double({ min: 1.0001, max: 50, noNaN: true }),
    radiusOver: fc.double({ min: 1.0001, max: 50, noNaN: true }),
    encAbs: ranged(LIMITS.absorptionPerMm.min, LIMITS.absorptionPerMm.max),
    polarization: fc.constantFrom('average' as const, 'track' as const),
    seed: fc.integer({ min: 0, max: LIMITS.seed.max })
  })
  .map((g): unknown => {
    const s: Scenario = demoScenario();
    s.emission = { kind: 'single', wavelengthNm: g.wavelengthNm };
    s.chip = { medium: g.chipMedium, widthMm: g.w, lengthMm: g.l, heightMm: g.h, emitterZMm: g.h * g.emitterShare, absorptionPerMm: g.chipAbs, emission: g.emission, topTexture: 0 };
    s.base = g.base;
    const heightMm = Math.min(LIMITS.sizeMm.max, g.h * g.heightOver);
    const minR = minEncapsulantRadiusMm(s.chip, { shape: g.shape, radiusMm: 1, heightMm });
    const radiusMm = Math.min(LIMITS.sizeMm.max, Number.isFinite(minR) ? minR * g.radiusOver : 1);
    s.encapsulant = { medium: g.encMedium, shape: g.shape, radiusMm, heightMm, absorptionPerMm: g.encAbs };
    s.outside = g.outside;
    s.trace = { rays: LIMITS.rays.min, seed: g.seed, polarization: g.polarization };
    return s;
  });

/** Every page's computation on one accepted scenario; returns what they produced. */
function computeEveryPage(s: Scenario): Record<string, unknown> {
  const r = resolveScenario(s);
  const out: Record<string, unknown> = {};
  // /escape: chip into the outside (the page's default sides), cones, cuboid sums and both charts
  const cone = escapeCone(r.chip.n, r.outside.n);
  out.escape = { cone, cuboid: [1, 5, 6].map((f) => cuboidChipEscape(r.chip.n, r.outside.n, f as 1 | 5 | 6)) };
  out.escapeCharts = [
    transmissionChart(transmissionCurve(r.chip.n, r.outside.n, 181), cone.criticalAngleRad, r.chip.n, r.outside.n),
    escapeIndexChart(r.chip.n, r.outside.n, escapeCone, 60)
  ];
  // /stack: a quarter-wave layer of the ideal index between the chip and the outside, at the design wavelength
  const nLayer = Math.sqrt(r.chip.n * r.outside.n);
  out.stack = stackExtraction(r.chip.n, [{ n: nLayer, k: 0, thicknessNm: r.wavelengthNm / (4 * nLayer) }], r.outside.n, r.wavelengthNm);
  // /dome: the closed form (with an encapsulant) and a small trace of the package
  const pkg = toTracePackage(s, r);
  if (s.encapsulant.shape !== 'none') out.dome = domeClosedForm(pkg);
  out.trace = summarize(traceSync(pkg, { rays: 300, seed: s.trace.seed, maxEvents: 200 }));
  // /compare and /report: the ranking and its chart, the report's facts
  const ranking = scenarioRanking(s, r, [], 'design', true);
  out.ranking = ranking;
  out.rankingChart = rankingChart(ranking);
  out.report = [scenarioRows(s, r), closedFormRows(s, r), assumptions(s, r), cautions(s, r)];
  // /claim: the page's default claim of each kind for the scenario's indices, and its scale chart
  const indices = { nChip: r.chip.n, nEnc: s.encapsulant.shape === 'none' ? null : r.encapsulant.n, nOut: r.outside.n };
  out.claims = CLAIM_KINDS.filter((kind) => kind !== 'gain' || (indices.nEnc !== null && indices.nEnc !== indices.nOut)).map((kind) => {
    const claim = formToClaim({ ...defaultForm(indices), kind, shown: kind === 'gain' ? 2 : 30 }, indices);
    const result = checkClaim(claim);
    return { result, chart: claimScaleChart(kind, claim.value, result) };
  });
  return out;
}

describe('every page computes every scenario the schema accepts', () => {
  it(`runs escape, stack, dome, trace, compare, claim and report on accepted scenarios without throwing or NaN (${CASES} cases)`, () => {
    let accepted = 0;
    check(
      'pages compute accepted scenarios',
      fc.property(scenarioArb, (raw) => {
        const parsed = parseScenario(raw);
        fc.pre(parsed.ok);
        if (!parsed.ok) return;
        accepted++;
        const out = computeEveryPage(parsed.scenario);
        expect(nanPaths(out), JSON.stringify(raw).slice(0, 600)).toEqual([]);
      }),
      CASES
    );
    expect(accepted).toBe(CASES);
  });

  it('regression: an outside index of 5 (the panel accepts up to 6) computes on every page', () => {
    const s = demoScenario();
    s.outside = { kind: 'index', n: 5, k: 0 };
    const parsed = parseScenario(s);
    expect(parsed.ok).toBe(true);
    if (parsed.ok) expect(nanPaths(computeEveryPage(parsed.scenario))).toEqual([]);
  });

  it('regression: a library chip whose formula leaves the index range at the wavelength is refused by the schema, with the range named', () => {
    const s = demoScenario();
    s.chip.medium = { kind: 'material', id: 'gaas' };
    // GaAs's formula (Skauli et al. 2003) has a pole at 874.6 nm: just past it, extrapolated below its
    // 970 nm data range, it gives n ≈ 6.5 — inside GaAs's own emission band
    s.emission = { kind: 'single', wavelengthNm: 875 };
    const parsed = parseScenario(s);
    expect(parsed.ok).toBe(false);
    if (!parsed.ok) expect(parsed.issues.map((i) => i.message)).toContainEqual(expect.stringMatching(/^Chip index n must be between 1 and 6; .* gives 6\.\d+ at 875 nm\.$/));
  });
});
