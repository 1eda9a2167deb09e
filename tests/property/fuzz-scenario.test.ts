/**
 * Hostile input where a scenario enters: a JSON object (a saved file, localStorage, another tab) read
 * by readScenario / parseScenario, and the `s` link parameter read by decodeScenarioParam /
 * decodeScenarioQuery. None may throw; an invalid scenario gives ok: false (or the demo scenario and a
 * message) naming the field; a valid one round-trips exactly. Generated inputs: wrong types, NaN,
 * ±Infinity, negative and huge numbers, empty and multi-megabyte strings, deep nesting, unknown fields,
 * prototype-pollution keys, damaged base64, truncated links.
 */
import { describe, it, expect, afterAll } from 'vitest';
import fc from 'fast-check';
import { readScenario } from '../../src/lib/scenario/read-scenario';
import { parseScenario, type Scenario } from '../../src/lib/scenario/schema';
import { DEMO_SCENARIO, demoScenario } from '../../src/lib/scenario/defaults';
import { LIMITS } from '../../src/lib/scenario/limits';
import { resolveScenario } from '../../src/lib/scenario/resolve';
import { decodeScenarioParam, decodeScenarioQuery, encodeScenarioParam, SCENARIO_PARAM } from '../../src/lib/scenario/url';
import { listMaterials } from '../../src/lib/materials';
import { check, deeplyNested, hostileValue, prototypePolluted, real, RUNS } from './support';

/** Words a scenario message uses to name its field (the schema's own field labels). */
const FIELD_WORDS =
  /scenario|version|name|emission|wavelength|spectrum|peak|width|chip|emitter|absorption|base|metal|reflectance|encapsulant|radius|height|length|outside|index|extinction|rays|seed|trace|polari[sz]ation|material|medium|shape|body|cup|finish|wall|layer|mirror|textur/i;

function expectNamesAField(message: unknown): void {
  expect(typeof message, 'message is text').toBe('string');
  const text = message as string;
  expect(text.length > 0 && text.length < 400, `message length ${text.length}`).toBe(true);
  expect(text, 'message names a field').toMatch(FIELD_WORDS);
  expect(text).not.toMatch(/\bNaN\b|undefined|\[object Object\]/);
}

afterAll(() => {
  expect(prototypePolluted(), 'Object.prototype polluted by a fuzz input').toBe(false);
});

// ---------------------------------------------------------------- valid scenarios, every kind

const nonMetals = listMaterials().filter((m) => m.category !== 'metal').map((m) => m.id);
const metals = listMaterials().filter((m) => m.category === 'metal').map((m) => m.id);
/** JSON writes −0 as 0: the same number, so −0 is generated as 0. */
const num = (min: number, max: number) => real(min, max).map((x) => x + 0);
/** A user's own material carried in the scenario (version 2), written in full so that it round-trips as is. */
const userMaterial = fc.record({
  id: fc.stringMatching(/^[a-z0-9-]{1,30}$/).map((s) => `u-${s}`),
  name: fc.string({ minLength: 1, maxLength: 40 }).map((s) => s.trim()).filter((s) => s.length > 0),
  aliases: fc.constant([] as string[]),
  category: fc.constantFrom('encapsulant', 'layer', 'optic', 'substrate') as fc.Arbitrary<'encapsulant' | 'layer' | 'optic' | 'substrate'>,
  dispersion: fc.record({ model: fc.constant('cauchy' as const), A: num(1, 3), B: num(0, 0.05), C: num(0, 0.001) }),
  validRangeNm: fc.constant({ min: 200, max: 2500 }),
  source: fc.constant('user supplied'),
  provenance: fc.constant('user supplied' as const)
});
const medium = fc.oneof(
  fc.constantFrom(...nonMetals).map((id) => ({ kind: 'material' as const, id })),
  fc.record({ kind: fc.constant('index' as const), n: num(LIMITS.indexN.min, LIMITS.indexN.max), k: num(0, LIMITS.indexK.max) }),
  userMaterial.map((material) => ({ kind: 'user' as const, material }))
);
/** The encapsulant's medium: a typed index there is n alone (its loss is the absorption per mm). */
const encapsulantMedium = medium.map((m) => (m.kind === 'index' ? { kind: 'index' as const, n: m.n } : m));
/** Names of any UTF-16 code units, lone surrogates included, already trimmed (the schema trims). */
const name = fc
  .string({ unit: fc.integer({ min: 0, max: 0xffff }).map((c) => String.fromCharCode(c)), minLength: 1, maxLength: LIMITS.nameLength.max })
  .map((s) => s.trim())
  .filter((s) => s.length >= 1);
const emission = fc.oneof(
  num(200, 2500).map((wavelengthNm) => ({ kind: 'single' as const, wavelengthNm })),
  fc.record({ kind: fc.constant('gaussian' as const), peakNm: num(200, 2500), fwhmNm: num(1, 500) }),
  fc
    .uniqueArray(num(200, 2500), { minLength: 2, maxLength: 40 })
    .chain((wls) => fc.array(num(0, 1e12), { minLength: wls.length, maxLength: wls.length }).map((ws) => ({ wls, ws })))
    .filter(({ ws }) => ws.some((w) => w > 0))
    .map(({ wls, ws }) => {
      const sorted = wls.slice().sort((a, b) => a - b);
      return { kind: 'table' as const, rows: sorted.map((wl, i) => [wl, ws[i]] as [number, number]) };
    })
);

/** Scenarios valid field by field; a library formula may still have no index at the wavelength (GaAs below 875 nm). */
const wellFormedScenario: fc.Arbitrary<Scenario> = fc
  .record({
    name,
    emission,
    chipMedium: medium,
    w: num(0.001, 100),
    l: num(0.001, 100),
    H: num(0.001, 10),
    zFraction: num(0, 1),
    chipAbs: num(0, 1000),
    chipEmission: fc.constantFrom('plane', 'volume') as fc.Arbitrary<'plane' | 'volume'>,
    base: fc.oneof(
      num(0, 1).map((reflectance) => ({ kind: 'reflectance' as const, reflectance })),
      fc.constantFrom(...metals).map((id) => ({ kind: 'metal' as const, id }))
    ),
    encMedium: encapsulantMedium,
    shape: fc.constantFrom('none', 'dome', 'cylinder') as fc.Arbitrary<'none' | 'dome' | 'cylinder'>,
    heightFactor: num(1.01, 3),
    radiusFactor: num(1.01, 3),
    encAbs: num(0, 1000),
    outside: medium,
    rays: fc.integer({ min: LIMITS.rays.min, max: LIMITS.rays.max }),
    seed: fc.integer({ min: 0, max: LIMITS.seed.max }),
    polarization: fc.constantFrom('average', 'track') as fc.Arbitrary<'average' | 'track'>
  })
  .map((g): Scenario => {
    const rho = Math.hypot(g.w / 2, g.l / 2);
    const h = g.H * g.heightFactor;
    const minR = g.shape === 'dome' ? rho / Math.sqrt(1 - (g.H * g.H) / (h * h)) : rho;
    return {
      version: 4,
      name: g.name,
      emission: g.emission,
      chip: {
        medium: g.chipMedium,
        widthMm: g.w,
        lengthMm: g.l,
        heightMm: g.H,
        emitterZMm: g.H * g.zFraction,
        absorptionPerMm: g.chipAbs,
        emission: g.chipEmission,
        topTexture: 0
      },
      base: g.base,
      baseFinish: 'specular',
      body: { kind: 'flat' },
      encapsulant: {
        medium: g.encMedium,
        shape: g.shape,
        radiusMm: g.shape === 'none' ? 2.5 : minR * g.radiusFactor,
        heightMm: g.shape === 'none' ? 2.5 : h,
        absorptionPerMm: g.encAbs
      },
      outside: g.outside,
      trace: { rays: g.rays, seed: g.seed, polarization: g.polarization }
    };
  })
  .filter((s) => {
    const { radiusMm, heightMm } = s.encapsulant;
    const { min, max } = LIMITS.sizeMm;
    return radiusMm >= min && radiusMm <= max && heightMm >= min && heightMm <= max;
  });

/** Every medium gives an index at the design wavelength, inside the package index range (LIMITS.indexN). */
function resolves(s: Scenario): boolean {
  try {
    const r = resolveScenario(s);
    const inRange = (n: number) => n >= LIMITS.indexN.min && n <= LIMITS.indexN.max;
    return inRange(r.chip.n) && inRange(r.outside.n) && (s.encapsulant.shape === 'none' || inRange(r.encapsulant.n));
  } catch {
    return false;
  }
}

const validScenario = wellFormedScenario.filter(resolves);

describe('valid scenarios', () => {
  it(`are accepted only when every material gives an index at the design wavelength (${RUNS.fuzz / 2} cases)`, () => {
    check(
      'scenario accepted implies resolvable',
      fc.property(wellFormedScenario, (s) => {
        const parsed = parseScenario(s);
        expect(parsed.ok, 'accepted exactly when it resolves').toBe(resolves(s));
        if (!parsed.ok) expectNamesAField(parsed.issues[0].message);
      }),
      RUNS.fuzz / 2
    );
  });

  it(`parse, and round-trip exactly through JSON and through the link (${RUNS.fuzz / 2} cases)`, () => {
    check(
      'scenario round trip',
      fc.property(validScenario, (s) => {
        const parsed = parseScenario(s);
        expect(parsed.ok, parsed.ok ? '' : parsed.issues[0].message).toBe(true);
        const viaJson = readScenario(JSON.parse(JSON.stringify(s)));
        expect(viaJson.ok && viaJson.scenario).toEqual(s);
        const viaLink = decodeScenarioParam(encodeScenarioParam(s));
        expect(viaLink).toEqual({ scenario: s, message: null, fromLink: true });
        const viaQuery = decodeScenarioQuery(`?into=air&${SCENARIO_PARAM}=${encodeScenarioParam(s)}`);
        expect(viaQuery.scenario).toEqual(s);
      }),
      RUNS.fuzz / 2
    );
  });
});

// ---------------------------------------------------------------- hostile scenario objects

/** Every path of the demo scenario, as key lists, for targeted damage. */
function paths(value: unknown, prefix: string[] = [], out: string[][] = []): string[][] {
  if (value && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) {
      out.push([...prefix, k]);
      paths(v, [...prefix, k], out);
    }
  }
  return out;
}
const DEMO_PATHS = paths(DEMO_SCENARIO);

/** A copy of `s` with the value at `path` replaced (or deleted when `value` is the DELETE marker). */
const DELETE = Symbol('delete');
function withValue(s: Scenario, path: string[], value: unknown): unknown {
  const copy = structuredClone(s) as unknown as Record<string, unknown>;
  let at = copy;
  for (const key of path.slice(0, -1)) at = at[key] as Record<string, unknown>;
  const last = path[path.length - 1];
  if (value === DELETE) delete at[last];
  else Object.defineProperty(at, last, { value, enumerable: true, writable: true, configurable: true });
  return copy;
}

describe('hostile scenario objects', () => {
  it(`readScenario never throws on any value and names a field when it refuses (${RUNS.fuzz} cases)`, () => {
    check(
      'readScenario on any value',
      fc.property(hostileValue, (raw) => {
        const r = readScenario(raw);
        if (!r.ok) expectNamesAField(r.message);
        else expect(parseScenario(r.scenario).ok).toBe(true);
      }),
      RUNS.fuzz
    );
  });

  it(`readScenario refuses one damaged field with a message naming a field (${RUNS.fuzz} cases)`, () => {
    check(
      'readScenario with one field damaged',
      fc.property(
        fc.constantFrom(...DEMO_PATHS),
        fc.oneof(hostileValue, fc.constant(DELETE), fc.constantFrom(-1, 1e9, NaN, Infinity, '', 'x'.repeat(10_000))),
        (path, value) => {
          const r = readScenario(withValue(demoScenario(), path, value));
          if (!r.ok) {
            expectNamesAField(r.message);
            expect(r.issues.length).toBeGreaterThan(0);
          } else {
            // the damage happened to be a valid value (e.g. a number inside the range)
            expect(parseScenario(r.scenario).ok).toBe(true);
          }
        }
      ),
      RUNS.fuzz
    );
  });

  it(`readScenario refuses unknown fields and prototype-pollution keys at any level (${RUNS.fuzz} cases)`, () => {
    check(
      'readScenario with an extra key',
      fc.property(
        fc.constantFrom([], ...DEMO_PATHS.filter((p) => typeof pick(DEMO_SCENARIO, p) === 'object')),
        fc.oneof(fc.constantFrom('__proto__', 'constructor', 'prototype', 'polluted', 'isAdmin'), fc.string({ minLength: 1, maxLength: 12 })),
        hostileValue,
        (path, key, value) => {
          const s = demoScenario() as unknown as Record<string, unknown>;
          const target = path.length === 0 ? s : (pick(s, path) as Record<string, unknown>);
          fc.pre(!Object.prototype.hasOwnProperty.call(target, key));
          // JSON.parse makes "__proto__" an own key; build it the same way
          const raw = JSON.parse(JSON.stringify(s));
          const at = path.length === 0 ? raw : pick(raw, path);
          Object.defineProperty(at, key, { value: value === undefined ? null : value, enumerable: true, writable: true, configurable: true });
          const r = readScenario(JSON.parse(JSON.stringify(raw)));
          expect(r.ok, `extra key ${JSON.stringify(key)} at ${path.join('.') || 'top'} was accepted`).toBe(false);
          if (!r.ok) expectNamesAField(r.message);
          expect(prototypePolluted()).toBe(false);
        }
      ),
      RUNS.fuzz
    );
  });

  it('regression: a part that is not an object, or has an unknown field, is named in the message', () => {
    // found by the damaged-field property: zod's defaults said "Invalid input: expected object, received
    // number" and "Unrecognized key: "extra"" without naming the part
    const notObject = readScenario({ ...demoScenario(), chip: -1 });
    expect(notObject.ok || notObject.message).toBe('Chip must be an object with named fields.');
    const trace = readScenario({ ...demoScenario(), trace: null });
    expect(trace.ok || trace.message).toBe('Trace settings must be an object with named fields.');
    const s = demoScenario();
    (s.chip.medium as Record<string, unknown>).extra = 1;
    const extra = readScenario(s);
    expect(extra.ok || extra.message).toBe('Chip medium has unknown field "extra".');
    const many = readScenario({ ...demoScenario(), a: 1, b: 2, c: 3, d: 4 });
    expect(many.ok || many.message).toBe('Scenario has unknown fields "a", "b", "c" and 1 more.');
  });

  it('survives a multi-megabyte name, deep nesting and a __proto__ payload', () => {
    const big = { ...demoScenario(), name: 'x'.repeat(5_000_000) };
    const r1 = readScenario(big);
    expect(r1.ok).toBe(false);
    if (!r1.ok) expect(r1.message).toBe(`Name length must be a whole number between 1 and ${LIMITS.nameLength.max} characters.`);

    for (const kind of ['array', 'object'] as const) {
      const deep = JSON.parse(deeplyNested(100_000, kind));
      expect(readScenario(deep).ok).toBe(false);
      expect(readScenario({ ...demoScenario(), name: deep }).ok).toBe(false);
      expect(readScenario({ ...demoScenario(), chip: deep }).ok).toBe(false);
    }

    const polluting = JSON.parse(`{"version":1,"__proto__":{"polluted":true},"constructor":{"prototype":{"isAdmin":true}}}`);
    expect(readScenario(polluting).ok).toBe(false);
    expect(prototypePolluted()).toBe(false);
  });
});

function pick(value: unknown, path: string[]): unknown {
  let at = value as Record<string, unknown>;
  for (const key of path) at = at[key] as Record<string, unknown>;
  return at;
}

// ---------------------------------------------------------------- hostile links

function b64url(text: string): string {
  return Buffer.from(text, 'utf8').toString('base64url');
}

/** Asserts the decoder's contract: a valid scenario always, a message whenever the link was not used. */
function expectUsable(d: ReturnType<typeof decodeScenarioParam>, param: string | null): void {
  expect(parseScenario(d.scenario).ok, 'the decoder always returns a valid scenario').toBe(true);
  if (d.fromLink) expect(d.message).toBeNull();
  else if (param) {
    expect(typeof d.message).toBe('string');
    expect(d.message).toMatch(/demo scenario/);
    expect(d.message).not.toMatch(/\bNaN\b|undefined|\[object Object\]/);
    expect(d.scenario).toEqual(DEMO_SCENARIO);
  }
}

const validParam = validScenario.map(encodeScenarioParam);

describe('hostile link parameters', () => {
  it(`decodeScenarioParam never throws on any string (${RUNS.fuzz} cases)`, () => {
    check(
      'decodeScenarioParam on any string',
      fc.property(fc.oneof(fc.string({ maxLength: 200 }), fc.string({ unit: 'binary', maxLength: 200 }), fc.base64String({ maxLength: 200 })), (param) => {
        expectUsable(decodeScenarioParam(param), param);
      }),
      RUNS.fuzz
    );
  });

  it(`decodeScenarioParam reads "<version>.<base64url of any JSON>" without throwing (${RUNS.fuzz} cases)`, () => {
    check(
      'decodeScenarioParam on encoded hostile JSON',
      fc.property(fc.constantFrom('0', '1', '2', '999999', '01', '-1', '1e0', ''), hostileValue, (version, value) => {
        const json = JSON.stringify(value) ?? 'undefined';
        const param = `${version}.${b64url(json)}`;
        expectUsable(decodeScenarioParam(param), param);
      }),
      RUNS.fuzz
    );
  });

  it(`a valid link cut short or with one character changed gives the demo and a message, or a valid scenario (${RUNS.fuzz} cases)`, () => {
    check(
      'decodeScenarioParam on damaged links',
      fc.property(validParam, real(0, 1), fc.integer({ min: 0, max: 127 }), fc.boolean(), (param, at, code, cut) => {
        const i = Math.floor(at * param.length);
        const damaged = cut ? param.slice(0, i) : param.slice(0, i) + String.fromCharCode(code) + param.slice(i + 1);
        expectUsable(decodeScenarioParam(damaged), damaged);
      }),
      RUNS.fuzz
    );
  });

  it(`decodeScenarioQuery never throws on any query string (${RUNS.fuzz} cases)`, () => {
    check(
      'decodeScenarioQuery on any query',
      fc.property(
        fc.oneof(
          fc.string({ maxLength: 120 }),
          fc.webQueryParameters(),
          fc.tuple(fc.string({ maxLength: 40 }), validParam).map(([junk, p]) => `?${junk}&s=${p}&s=${junk}`),
          fc.string({ maxLength: 60 }).map((junk) => `?s=${encodeURIComponent(junk)}`)
        ),
        (query) => {
          const d = decodeScenarioQuery(query);
          const param = new URLSearchParams(query).get(SCENARIO_PARAM);
          expectUsable(d, param);
        }
      ),
      RUNS.fuzz
    );
  });

  it('survives a multi-megabyte link, deep nesting, a newer version and a __proto__ payload', () => {
    const huge = `1.${'A'.repeat(8_000_000)}`;
    expectUsable(decodeScenarioParam(huge), huge);
    const hugeJson = `1.${b64url(JSON.stringify({ ...demoScenario(), name: 'y'.repeat(3_000_000) }))}`;
    const d = decodeScenarioParam(hugeJson);
    expectUsable(d, hugeJson);
    expect(d.message).toMatch(/Name length/);

    for (const kind of ['array', 'object'] as const) {
      const deep = `1.${b64url(deeplyNested(200_000, kind))}`;
      expectUsable(decodeScenarioParam(deep), deep);
    }
    const newer = `7.${b64url(JSON.stringify({ ...demoScenario(), version: 7 }))}`;
    expect(decodeScenarioParam(newer).message).toMatch(/newer version/);

    const polluting = `1.${b64url('{"__proto__":{"polluted":true},"version":1}')}`;
    expectUsable(decodeScenarioParam(polluting), polluting);
    expect(prototypePolluted()).toBe(false);

    for (const odd of ['1.', '.', '1', '1..', '1.=', '1.====', '1.%%%', '1.\u0000', ' 1.e30', '1.\uD800']) {
      expectUsable(decodeScenarioParam(odd), odd);
    }
  });
});
