/**
 * The /stack page's own link parameter (`stack=<version>.<base64url JSON>`) and the computation it
 * feeds. decodeStackParam must never throw and always hand back a stack that passes checkStack, with a
 * message when the link's stack was not used; a valid stack round-trips exactly; computeStack on any
 * valid stack gives either per-item problems or finite results with R, T, A in [0, 1] — never NaN on
 * the page.
 */
import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { checkStack, defaultStack, STACK_LIMITS, PROFILES, type StackDoc, type StackItem } from '../../src/routes/stack/stack-doc';
import { decodeStackParam, encodeStackParam } from '../../src/routes/stack/stack-url';
import { computeStack } from '../../src/routes/stack/stack-results';
import { findMaterial, listMaterials } from '../../src/lib/materials';
import { check, deeplyNested, hostileValue, prototypePolluted, real, RUNS } from './support';

const L = STACK_LIMITS;
/** computeStack integrates extraction and sweeps 181 angles: about 40 ms a case. */
const COMPUTE_CASES = 60;
const num = (min: number, max: number) => real(min, max).map((x) => x + 0);
const ids = listMaterials().map((m) => m.id);

const layerItem: fc.Arbitrary<StackItem> = fc.record({
  kind: fc.constant('layer' as const),
  medium: fc.oneof(
    fc.constantFrom(...ids).map((id) => ({ kind: 'material' as const, id })),
    fc.record({ kind: fc.constant('index' as const), n: num(L.indexN.min, L.indexN.max), k: num(L.indexK.min, L.indexK.max) })
  ),
  thicknessNm: num(0, L.thinNm.max)
});
const gradedItem: fc.Arbitrary<StackItem> = fc.record({
  kind: fc.constant('graded' as const),
  fromN: num(L.gradedN.min, L.gradedN.max),
  toN: num(L.gradedN.min, L.gradedN.max),
  thicknessNm: num(0, 2000),
  profile: fc.constantFrom(...PROFILES),
  sublayers: fc.integer({ min: 1, max: 12 })
});
const validDoc: fc.Arbitrary<StackDoc> = fc.record({
  version: fc.constant(2 as const),
  mode: fc.constantFrom('thin', 'thick') as fc.Arbitrary<'thin' | 'thick'>,
  exit: fc.constantFrom('encapsulant', 'outside') as fc.Arbitrary<'encapsulant' | 'outside'>,
  items: fc.array(fc.oneof({ weight: 3, arbitrary: layerItem }, { weight: 1, arbitrary: gradedItem }), { maxLength: 5 }),
  userMaterials: fc.constant([])
});

function b64url(text: string): string {
  return Buffer.from(text, 'utf8').toString('base64url');
}

function expectUsable(d: ReturnType<typeof decodeStackParam>, param: string): void {
  expect(checkStack(d.doc).ok, 'the decoder always returns a valid stack').toBe(true);
  if (param === '') expect(d).toEqual({ doc: defaultStack(), message: null, fromLink: false });
  else if (!d.fromLink) {
    expect(typeof d.message).toBe('string');
    expect(d.message!.length).toBeLessThanOrEqual(400);
    expect(d.doc).toEqual(defaultStack());
  } else expect(d.message).toBeNull();
}

describe('decodeStackParam(param)', () => {
  it(`round-trips every valid stack exactly (${RUNS.fuzz / 2} cases)`, () => {
    check(
      'stack link round trip',
      fc.property(validDoc, (doc) => {
        const c = checkStack(doc);
        fc.pre(c.ok); // a random thick layer may exceed the thin-film limit; those are refused by name
        expect(decodeStackParam(encodeStackParam(doc))).toEqual({ doc, message: null, fromLink: true });
      }),
      RUNS.fuzz / 2
    );
  });

  it(`never throws on any text, encoded hostile JSON or a damaged link (${RUNS.fuzz} cases)`, () => {
    check(
      'decodeStackParam on hostile links',
      fc.property(
        fc.oneof(
          fc.string({ maxLength: 200 }),
          fc.tuple(fc.constantFrom('0', '1', '2', '999999', ''), hostileValue).map(([v, x]) => `${v}.${b64url(JSON.stringify(x) ?? 'undefined')}`),
          fc.tuple(validDoc.map(encodeStackParam), real(0, 1), fc.integer({ min: 0, max: 127 })).map(([p, at, code]) => {
            const i = Math.floor(at * p.length);
            return p.slice(0, i) + String.fromCharCode(code) + p.slice(i + 1);
          }),
          validDoc.map((doc) => `1.${b64url(JSON.stringify({ ...doc, extra: { __proto__: { polluted: true } } }))}`)
        ),
        (param) => expectUsable(decodeStackParam(param), param)
      ),
      RUNS.fuzz
    );
    expect(prototypePolluted()).toBe(false);
  });

  it('states the layer limit, and survives deep nesting and a multi-megabyte link', () => {
    const many = { ...defaultStack(), items: Array.from({ length: L.totalLayers.max + 1 }, () => defaultStack().items[0]) };
    const d = decodeStackParam(`1.${b64url(JSON.stringify(many))}`);
    expect(d.message).toBe(
      `The layer stack in this link is not valid: The stack would have ${L.totalLayers.max + 1} layers (graded sections count each sublayer); at most ${L.totalLayers.max} are allowed. Showing your last stack instead.`
    );
    const deep = `1.${b64url(deeplyNested(200_000, 'array'))}`;
    expectUsable(decodeStackParam(deep), deep);
    const huge = `1.${'A'.repeat(4_000_000)}`;
    expectUsable(decodeStackParam(huge), huge);
  });
});

describe('computeStack(doc, chip, exit, wavelengthNm, find)', () => {
  it(`gives finite results with R, T, A in [0, 1] or named problems, for any valid stack (${COMPUTE_CASES} cases)`, () => {
    check(
      'computeStack on valid stacks',
      fc.property(validDoc, num(1, 4), num(1, 2), num(200, 2500), (doc, nChip, nExit, wl) => {
        fc.pre(checkStack(doc).ok);
        const r = computeStack(doc, { label: 'chip', n: nChip, k: 0 }, { label: 'exit', n: nExit, k: 0 }, wl, (id) => findMaterial(id));
        if (!r.ok) {
          for (const p of r.problems) expect(p.message).toMatch(/^Layer \d+: /);
          return;
        }
        const { normal, extraction, angle } = r.results;
        for (const x of [normal.R, normal.T, normal.A, extraction.fresnel, extraction.bare.fresnel]) {
          expect(Number.isFinite(x) && x >= -1e-12 && x <= 1 + 1e-12, `value ${x}`).toBe(true);
        }
        for (const list of Object.values(angle)) {
          if (Array.isArray(list)) for (const x of list) expect(Number.isFinite(x), `curve value ${x}`).toBe(true);
        }
      }),
      COMPUTE_CASES
    );
  });
});
