import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO, demoScenario } from '../../../src/lib/scenario/defaults';
import { parseScenario, SCENARIO_VERSION, type Scenario } from '../../../src/lib/scenario/schema';
import {
  decodeScenarioParam,
  decodeScenarioQuery,
  encodeScenarioParam,
  SCENARIO_PARAM,
  scenarioQuery
} from '../../../src/lib/scenario/url';

function b64url(text: string): string {
  return Buffer.from(text, 'utf8').toString('base64url');
}

/** Valid scenarios: random values inside every limit, shapes that always fit the chip. */
const scenarioArb: fc.Arbitrary<Scenario> = fc
  .record({
    name: fc.string({ minLength: 1, maxLength: 40 }).filter((s) => s.trim().length > 0 && s.trim() === s),
    wl: fc.double({ min: 200, max: 2500, noNaN: true }),
    chipN: fc.double({ min: 1, max: 6, noNaN: true }),
    k: fc.double({ min: 0, max: 10, noNaN: true }),
    w: fc.double({ min: 0.001, max: 5, noNaN: true }),
    l: fc.double({ min: 0.001, max: 5, noNaN: true }),
    h: fc.double({ min: 0.001, max: 1, noNaN: true }),
    zFrac: fc.double({ min: 0, max: 1, noNaN: true }),
    shape: fc.constantFrom('none', 'dome', 'cylinder'),
    refl: fc.double({ min: 0, max: 1, noNaN: true }),
    rays: fc.integer({ min: 1000, max: 20_000_000 }),
    seed: fc.integer({ min: 0, max: 4_294_967_295 }),
    enc: fc.constantFrom('silicone-methyl', 'silicone-phenyl', 'epoxy', 'pmma')
  })
  .map((v) => {
    const s = demoScenario();
    s.name = v.name;
    s.emission = { kind: 'single', wavelengthNm: v.wl };
    s.chip = { ...s.chip, medium: { kind: 'index', n: v.chipN, k: v.k }, widthMm: v.w, lengthMm: v.l, heightMm: v.h, emitterZMm: v.h * v.zFrac };
    s.encapsulant = { ...s.encapsulant, medium: { kind: 'material', id: v.enc }, shape: v.shape as Scenario['encapsulant']['shape'], radiusMm: 10, heightMm: 10 };
    s.base = { kind: 'reflectance', reflectance: v.refl };
    s.trace = { rays: v.rays, seed: v.seed, polarization: 'track' };
    return s;
  });

describe('scenario in the URL', () => {
  it('decode(encode(s)) gives back exactly s for the demo scenario', () => {
    const d = decodeScenarioParam(encodeScenarioParam(DEMO_SCENARIO));
    expect(d).toEqual({ scenario: DEMO_SCENARIO, message: null, fromLink: true });
  });

  it('round-trips every valid scenario bit for bit (property, 200 cases)', () => {
    fc.assert(
      fc.property(scenarioArb, (s) => {
        expect(parseScenario(s).ok).toBe(true);
        const d = decodeScenarioParam(encodeScenarioParam(s));
        expect(d.fromLink).toBe(true);
        expect(d.scenario).toEqual(s);
        // Object.is on a few doubles: JSON keeps the shortest exact decimal, so not even 1 ulp is lost.
        expect(Object.is(d.scenario.chip.widthMm, s.chip.widthMm)).toBe(true);
      }),
      { numRuns: 200 }
    );
  });

  it('keeps a name with non-ASCII characters (UTF-8 inside base64url)', () => {
    const s = { ...demoScenario(), name: 'Dôme — 1 mm² chip, λ = 450 nm ✓' };
    expect(decodeScenarioParam(encodeScenarioParam(s)).scenario.name).toBe(s.name);
  });

  it('the parameter is versioned and URL-safe (no characters that need escaping)', () => {
    const p = encodeScenarioParam(DEMO_SCENARIO);
    expect(p.startsWith('4.')).toBe(true);
    expect(p).toMatch(/^[0-9]+\.[A-Za-z0-9_-]+$/);
    expect(encodeURIComponent(p)).toBe(p);
    expect(scenarioQuery(DEMO_SCENARIO)).toBe(`${SCENARIO_PARAM}=${p}`);
  });

  it('no parameter: the demo scenario, no message', () => {
    for (const none of [null, undefined, '']) {
      expect(decodeScenarioParam(none)).toEqual({ scenario: DEMO_SCENARIO, message: null, fromLink: false });
    }
    expect(decodeScenarioQuery('?into=air').fromLink).toBe(false);
  });

  it.each([
    ['no version prefix', 'eyJ2ZXJzaW9uIjoxfQ'],
    ['bad base64', '1.@@@'],
    ['cut short', encodeScenarioParam(DEMO_SCENARIO).slice(0, 100)],
    ['not JSON', `1.${b64url('{version: 1')}`],
    ['invalid UTF-8', `1.${Buffer.from([0xff, 0xfe, 0x7b]).toString('base64url')}`]
  ])('a damaged link (%s) gives the demo scenario and says it could not be read', (_name, param) => {
    const d = decodeScenarioParam(param);
    expect(d.fromLink).toBe(false);
    expect(d.scenario).toEqual(DEMO_SCENARIO);
    expect(d.message).toBe('The scenario in this link could not be read (damaged or cut short). Showing the demo scenario instead.');
  });

  it('a newer version gives the demo scenario and says so, whether the prefix or the body is newer', () => {
    for (const param of ['5.eyJ9', `4.${b64url(JSON.stringify({ ...demoScenario(), version: 6 }))}`]) {
      const d = decodeScenarioParam(param);
      expect(d.scenario).toEqual(DEMO_SCENARIO);
      expect(d.message).toMatch(/newer version of Outcouple \(scenario version [56]\)/);
      expect(d.message).toMatch(/Showing the demo scenario instead\.$/);
    }
  });

  it('a link saved at version 3 opens as the same package (flat body, specular base, flat chip top)', () => {
    const { baseFinish: _f, body: _b, ...v3 } = demoScenario();
    const { topTexture: _t, ...chip } = v3.chip;
    const d = decodeScenarioParam(`3.${b64url(JSON.stringify({ ...v3, version: 3, chip }))}`);
    expect(d.fromLink).toBe(true);
    expect(d.scenario).toEqual(DEMO_SCENARIO);
  });

  it('an invalid scenario names the field and range in the message', () => {
    const bad = { ...demoScenario(), chip: { ...demoScenario().chip, widthMm: -1 } };
    const d = decodeScenarioParam(`1.${b64url(JSON.stringify(bad))}`);
    expect(d.fromLink).toBe(false);
    expect(d.message).toBe(
      'The scenario in this link is not valid: Chip width must be between 0.001 and 1000 mm. Showing the demo scenario instead.'
    );
  });

  it('an old (version-0) scenario in a link is migrated', () => {
    const v0 = { version: 0, wavelengthNm: 620, chip: { material: 'algainp', widthMm: 0.3, lengthMm: 0.3, heightMm: 0.2 }, base: 'ag' };
    const d = decodeScenarioParam(`0.${b64url(JSON.stringify(v0))}`);
    expect(d.message).toBeNull();
    expect(d.scenario.emission).toEqual({ kind: 'single', wavelengthNm: 620 });
    expect(d.scenario.base).toEqual({ kind: 'metal', id: 'ag' });
  });

  it('decodes from a whole query string with other parameters', () => {
    const q = `?into=n%3A1.5&${scenarioQuery(DEMO_SCENARIO)}&from=chip`;
    expect(decodeScenarioQuery(q).fromLink).toBe(true);
    expect(decodeScenarioQuery(new URLSearchParams(q)).scenario).toEqual(DEMO_SCENARIO);
  });
});

describe('retired library ids in saved scenarios', () => {
  it('a link naming a retired id (borosilicate-crown, ingan, algainp) opens with the entry that replaced it', () => {
    const old = {
      ...DEMO_SCENARIO,
      chip: { ...DEMO_SCENARIO.chip, medium: { kind: 'material', id: 'ingan' } },
      encapsulant: { ...DEMO_SCENARIO.encapsulant, medium: { kind: 'material', id: 'borosilicate-crown' } }
    };
    const d = decodeScenarioParam(`${SCENARIO_VERSION}.${b64url(JSON.stringify(old))}`);
    expect(d.message).toBeNull();
    expect(d.scenario.chip.medium).toEqual({ kind: 'material', id: 'gan' });
    expect(d.scenario.encapsulant.medium).toEqual({ kind: 'material', id: 'soda-lime-glass' });
  });
});
