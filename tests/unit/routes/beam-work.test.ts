import { describe, expect, it } from 'vitest';
import { DEFAULT_FORM, fieldNotes, inFieldTerms, prepareAll, traceAll } from '../../../src/routes/beam/beam-work';
import { syncSceneTracer } from '../../../src/lib/runs/scene-tracer';
import { demoScenario, resolveScenario, toTracePackage } from '../../../src/lib/scenario';

const scenario = demoScenario();
const ctx = { pkg: toTracePackage(scenario, resolveScenario(scenario)), wavelengthNm: 450, scenario: scenario.name, rayFile: null };

describe('beam page work', () => {
  it('designs the three default optics over the idealised source', () => {
    const all = prepareAll(DEFAULT_FORM, ctx);
    for (const k of ['reflector', 'lens', 'tir'] as const) expect(typeof all[k]).not.toBe('string');
  });

  it("a TIR collimator that cuts into the package's dome is refused naming the gap and the gap it needs", () => {
    const all = prepareAll({ ...DEFAULT_FORM, source: 'package', heightMm: 12, gapMm: 0.2 }, ctx);
    expect(all.tir).toMatch(/^(Gap: the optic meets the package's encapsulant; raise the gap to at least \d|Height)/);
  });

  it('names fields as the page labels them', () => {
    expect(inFieldTerms('heightMm must be … (got 12)')).toBe('Height must be … (got 12)');
  });

  it('traces the optics it could design in one run and keeps the reason of the one it could not', async () => {
    const prepared = prepareAll(DEFAULT_FORM, ctx);
    prepared.lens = 'Height must be a number in [1, 200] mm (got 0)';
    const fractions: number[] = [];
    const out = await traceAll(prepared, 20_000, syncSceneTracer, { progress: (f) => fractions.push(f) });
    expect(out.optics.lens).toEqual({ error: prepared.lens });
    for (const k of ['reflector', 'tir'] as const) {
      const o = out.optics[k];
      if (!('results' in o)) throw new Error(`${k} was not traced`);
      const sum = Object.values(o.results.ledger).reduce((a, b) => a + b, 0);
      expect(sum).toBeCloseTo(1, 12); // the ledger closes
    }
    expect(out).toMatchObject({ rays: 20_000, workers: 1 });
    expect(fractions.at(-1)).toBe(1);
  });

  it('refuses a ray count outside the limits before tracing', async () => {
    await expect(traceAll(prepareAll(DEFAULT_FORM, ctx), 10, syncSceneTracer, {})).rejects.toThrow(/^rays must be an integer in \[1000, /);
  });

  it('a height that cannot hold a design: that optic says why beside the Height field, the others still design', () => {
    const all = prepareAll({ ...DEFAULT_FORM, heightMm: 3 }, ctx);
    expect(typeof all.reflector).not.toBe('string');
    const notes = fieldNotes(all);
    expect(notes.Height).toMatch(/^(Lens: Height.*)?\s?TIR collimator: Height: a TIR collimator 20 mm wide .* fits heights in \(/);
    expect(notes.Height?.split('\n')).toHaveLength(1);
  });

  it('an optic smaller than the source is refused naming the exit diameter and the source size', () => {
    const all = prepareAll({ ...DEFAULT_FORM, sourceWidthMm: 5, exitDiameterMm: 4 }, ctx);
    for (const k of ['reflector', 'lens', 'tir'] as const) expect(all[k]).toMatch(/^Exit diameter must exceed the source's diameter 7.07 mm: the optic is smaller than the source/);
    expect(fieldNotes(all)['Exit diameter']).toMatch(/^Metal reflector: Exit diameter must exceed/);
  });
});
