/**
 * Invariants of the Monte Carlo package tracer over random valid packages: the energy ledger closes
 * exactly, every fraction is a fraction, the same seed gives the same tally, and no ray is stopped by a
 * geometry error. These are exact bookkeeping identities (every ray ends in exactly one bin — common
 * practice for Monte Carlo transport, e.g. M. Pharr, W. Jakob, G. Humphreys, Physically Based
 * Rendering, 3rd ed., ch. 14), so no statistical tolerance is involved: counts are compared exactly and
 * fractions of them to 8 ulps (a sum of five rounded quotients).
 *
 * Runs are small (2 000–5 000 rays, at most 50 events per ray: a lossless package keeps most rays
 * bouncing to the cap, and 'track' mode costs about 3 µs per event) so the whole property stays quick;
 * packages span chips from 50 µm to 2 mm, indices 1–4, bare chips, domes of any aspect ratio that hold
 * the chip, cylinders, plain and metal bases, absorbing and lossless media, both polarisation modes.
 */
import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { traceSync } from '../../src/lib/trace/trace';
import { summarize } from '../../src/lib/trace/summary';
import { validateTracePackage, type TracePackage } from '../../src/lib/trace/package-spec';
import { POLAR_BINS } from '../../src/lib/trace/tally';
import { check, real } from './support';

/** Cases per property: each traces a few thousand rays. */
const TRACE_CASES = 60;
/** Edge-geometry cases: 1 000 rays each. */
const EDGE_CASES = 100;
const FRACTION_SLACK = 8 * Number.EPSILON;

const absorption = (max: number) => fc.oneof(fc.constant(0), real(0, max));

/** A package that passes validateTracePackage by construction: the encapsulant is sized to hold the chip. */
const tracePackage: fc.Arbitrary<TracePackage> = fc
  .record({
    w: real(0.05, 2),
    l: real(0.05, 2),
    H: real(0.01, 0.5),
    nChip: real(1, 4),
    alphaChip: absorption(50),
    zFraction: fc.option(real(0, 1), { nil: undefined }),
    emission: fc.constantFrom('plane', 'volume') as fc.Arbitrary<'plane' | 'volume'>,
    base: fc.oneof(
      real(0, 1).map((reflectance) => ({ kind: 'reflectance' as const, reflectance })),
      fc.record({ kind: fc.constant('metal' as const), n: real(0.01, 5), k: real(0, 10) })
    ),
    shape: fc.constantFrom('none', 'dome', 'cylinder') as fc.Arbitrary<'none' | 'dome' | 'cylinder'>,
    heightFactor: real(1.05, 20),
    radiusFactor: real(1.001, 4),
    nEnc: real(1, 3),
    alphaEnc: absorption(5),
    outsideN: real(1, 2),
    polarization: fc.constantFrom('average', 'average', 'track') as fc.Arbitrary<'average' | 'track'>
  })
  .map((g): TracePackage => {
    const rho = Math.hypot(g.w / 2, g.l / 2);
    const h = g.H * g.heightFactor;
    // dome: the top corners lie inside x²/R² + y²/R² + z²/h² < 1 ⇔ R > ρ / √(1 − H²/h²); cylinder: R > ρ
    const minR = g.shape === 'dome' ? rho / Math.sqrt(1 - (g.H * g.H) / (h * h)) : rho;
    return {
      chip: {
        widthMm: g.w,
        lengthMm: g.l,
        heightMm: g.H,
        n: g.nChip,
        absorptionPerMm: g.alphaChip,
        emitterZMm: g.zFraction === undefined ? undefined : g.zFraction * g.H,
        emission: g.emission
      },
      base: g.base,
      encapsulant: { shape: g.shape, radiusMm: minR * g.radiusFactor, heightMm: h, n: g.nEnc, absorptionPerMm: g.alphaEnc },
      outsideN: g.outsideN,
      polarization: g.polarization
    };
  });

/** Log-uniform in [min, max]: sizes over several decades. */
const logUniform = (min: number, max: number) => real(Math.log10(min), Math.log10(max)).map((x) => 10 ** x);

/**
 * Edge geometry: chips from 1 µm to 100 mm, indices up to 10, domes and cylinders whose wall passes
 * within a relative 1e-12 of the chip's corners or whose height barely clears the chip, emitters on
 * the chip's bottom and top faces, outside media denser than the encapsulant. Not every draw is a valid
 * package (the margins are at the edge of rounding); the property skips the ones validation refuses.
 */
const edgePackage: fc.Arbitrary<TracePackage> = fc
  .record({
    w: logUniform(1e-3, 100),
    l: logUniform(1e-3, 100),
    H: logUniform(1e-3, 10),
    nChip: real(1, 10),
    zFraction: fc.constantFrom(0, 0.5, 1, undefined),
    emission: fc.constantFrom('plane', 'volume') as fc.Arbitrary<'plane' | 'volume'>,
    shape: fc.constantFrom('none', 'dome', 'cylinder') as fc.Arbitrary<'none' | 'dome' | 'cylinder'>,
    heightFactor: fc.constantFrom(1 + 1e-9, 1 + 1e-6, 1.001, 2, 1000),
    radiusFactor: fc.constantFrom(1 + 1e-12, 1 + 1e-9, 1 + 1e-6, 1.001, 2, 1000),
    nEnc: real(1, 10),
    outsideN: real(1, 10),
    reflectance: fc.constantFrom(0, 0.5, 1),
    polarization: fc.constantFrom('average', 'track') as fc.Arbitrary<'average' | 'track'>
  })
  .map((g): TracePackage => {
    const rho = Math.hypot(g.w / 2, g.l / 2);
    const h = g.H * g.heightFactor;
    const minR = g.shape === 'dome' ? rho / Math.sqrt(1 - (g.H * g.H) / (h * h)) : rho;
    return {
      chip: {
        widthMm: g.w,
        lengthMm: g.l,
        heightMm: g.H,
        n: g.nChip,
        absorptionPerMm: 0,
        emitterZMm: g.zFraction === undefined ? undefined : g.zFraction * g.H,
        emission: g.emission
      },
      base: { kind: 'reflectance', reflectance: g.reflectance },
      encapsulant: { shape: g.shape, radiusMm: minR * g.radiusFactor, heightMm: h, n: g.nEnc, absorptionPerMm: 0 },
      outsideN: g.outsideN,
      polarization: g.polarization
    };
  });

function isValid(pkg: TracePackage): boolean {
  try {
    validateTracePackage(pkg);
    return true;
  } catch {
    return false;
  }
}

const options = fc.record({
  rays: fc.integer({ min: 2000, max: 5000 }),
  seed: fc.integer({ min: 0, max: 4294967295 }),
  maxEvents: fc.integer({ min: 1, max: 50 })
});

/** Every number reachable in a summary, with its path, for the "no NaN anywhere" check. */
function numbers(value: unknown, path = 'summary', out: [string, number][] = []): [string, number][] {
  if (typeof value === 'number') out.push([path, value]);
  else if (Array.isArray(value)) value.forEach((v, i) => numbers(v, `${path}[${i}]`, out));
  else if (value && typeof value === 'object') for (const [k, v] of Object.entries(value)) numbers(v, `${path}.${k}`, out);
  return out;
}

describe('traceSync(pkg, options) on random valid packages', () => {
  it(`closes the ledger exactly, keeps every fraction in [0, 1] and has no geometry errors (${TRACE_CASES} cases)`, () => {
    check(
      'tracer ledger',
      fc.property(tracePackage, options, (pkg, opts) => {
        validateTracePackage(pkg); // the generator only makes valid packages
        const t = traceSync(pkg, opts);
        expect(t.launched).toBe(opts.rays);
        expect(t.escaped + t.absorbedChip + t.absorbedEncapsulant + t.absorbedBase + t.lost, 'ledger sum').toBe(opts.rays);
        expect(t.geometryErrors, 'geometry errors').toBe(0);
        expect(t.escapedChipTop + t.escapedChipSide + t.escapedDome + t.escapedCylinderTop + t.escapedCylinderSide, 'escapes by surface').toBe(
          t.escaped
        );
        expect(t.polarHistogram.length).toBe(POLAR_BINS);
        expect(t.polarHistogram.reduce((a, b) => a + b, 0), 'histogram sum').toBe(t.escaped);
        expect(t.escapedBelowHorizon).toBeLessThanOrEqual(t.escaped);
        expect(t.lost, 'event cap').toBeLessThanOrEqual(opts.rays);

        const s = summarize(t);
        const l = s.ledger;
        for (const [name, x] of Object.entries(l)) expect(x >= 0 && x <= 1, `ledger.${name} ${x}`).toBe(true);
        expect(Math.abs(l.escaped + l.chip + l.encapsulant + l.base + l.lost - 1), 'fractions sum to 1').toBeLessThanOrEqual(FRACTION_SLACK);
        expect(s.extraction).toBeLessThanOrEqual(1);
        expect(s.stderr >= 0 && s.stderr <= 0.5).toBe(true);
        for (const [path, x] of numbers(s)) expect(Number.isFinite(x), `${path} = ${x}`).toBe(true);
      }),
      TRACE_CASES
    );
  });

  it(`gives an identical tally for the same seed (${TRACE_CASES / 2} cases, each traced twice)`, () => {
    check(
      'tracer determinism',
      fc.property(tracePackage, options, (pkg, opts) => {
        const a = traceSync(pkg, opts);
        const b = traceSync(pkg, opts);
        expect(b).toEqual(a);
      }),
      TRACE_CASES / 2
    );
  });

  it(`closes the ledger with no geometry errors at edge geometries (${EDGE_CASES} cases)`, () => {
    check(
      'tracer edge geometry',
      fc.property(edgePackage, fc.integer({ min: 0, max: 4294967295 }), (pkg, seed) => {
        fc.pre(isValid(pkg));
        const t = traceSync(pkg, { rays: 1000, seed, maxEvents: 30 });
        expect(t.escaped + t.absorbedChip + t.absorbedEncapsulant + t.absorbedBase + t.lost, 'ledger sum').toBe(1000);
        expect(t.geometryErrors, `geometry errors in ${JSON.stringify(pkg)}`).toBe(0);
      }),
      EDGE_CASES
    );
  });
});
