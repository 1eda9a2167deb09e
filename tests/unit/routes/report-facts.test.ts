import { describe, expect, it } from 'vitest';
import { ASSUMPTIONS, assumptions, cautions } from '../../../src/routes/report/report-facts';
import { demoScenario } from '../../../src/lib/scenario/defaults';
import { resolveScenario } from '../../../src/lib/scenario/resolve';
import { assertScenario, type Scenario } from '../../../src/lib/scenario/schema';

const MINE = {
  id: 'my-silicone',
  name: 'My silicone',
  category: 'encapsulant',
  dispersion: { model: 'cauchy', A: 1.5, B: 0.004, C: 0 },
  validRangeNm: { min: 400, max: 800 },
  source: 'bench refractometer, lot 7'
};

function withUserEncapsulant(shape: Scenario['encapsulant']['shape']): Scenario {
  const s = demoScenario() as unknown as Record<string, unknown>;
  s.encapsulant = { ...(s.encapsulant as object), shape, medium: { kind: 'user', material: MINE } };
  return assertScenario(s);
}

describe('report facts', () => {
  it('the demo scenario gets the standard assumptions only', () => {
    const s = demoScenario();
    expect(assumptions(s, resolveScenario(s))).toEqual([...ASSUMPTIONS]);
  });

  it('a user encapsulant adds a line naming it and the source the user gave', () => {
    const s = withUserEncapsulant('dome');
    const lines = assumptions(s, resolveScenario(s));
    expect(lines).toHaveLength(ASSUMPTIONS.length + 1);
    expect(lines.at(-1)).toBe(
      "The encapsulant is the user's own material My silicone (source given: bench refractometer, lot 7); its index is as entered, not checked against a published source."
    );
  });

  it('a user encapsulant that is not used (no encapsulant) adds nothing', () => {
    const s = withUserEncapsulant('none');
    expect(assumptions(s, resolveScenario(s))).toHaveLength(ASSUMPTIONS.length);
  });

  it('the cautions name IEC 62471 for eye safety and end with the estimates caution (common practice)', () => {
    const s = withUserEncapsulant('dome');
    const c = cautions(s, resolveScenario(s));
    expect(c[0]).toMatch(/IEC 62471/);
    expect(c[1]).toMatch(/check the maker’s limit/); // a user material has no library temperature limit
    expect(c.at(-1)).toBe('These are estimates — verify with measurements and follow local codes and licensed practice.');
  });
});
