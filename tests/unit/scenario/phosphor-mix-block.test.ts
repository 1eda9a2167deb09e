import { describe, expect, it } from 'vitest';
import { demoScenario } from '../../../src/lib/scenario/defaults';
import { readScenario, toWhitePackage } from '../../../src/lib/scenario';
import { decodeScenarioParam, encodeScenarioParam } from '../../../src/lib/scenario/url';

const user = {
  id: 'user-amber', name: 'Amber test', absorption: [[400, 0.5], [450, 1], [520, 0]], kPeak: 0.001,
  emission: [[540, 0], [600, 1], [660, 0]], n: 1.8, densityGPerCm3: 4.2, quantumYield: 0.9, d50Um: 12
};
const block = { id: 'garnet-yellow', region: 'encapsulant', weightPercent: 10, diameterUm: 12, quantumYield: 0.95 };

describe('scenario phosphor block: a red phosphor mixed in, user phosphors carried in full', () => {
  it('a red phosphor reaches the traced package as a second particle kind', () => {
    const r = readScenario({ ...demoScenario(), phosphor: { ...block, red: { id: 'nitride-red', weightPercent: 1, diameterUm: 12, quantumYield: 0.88 } } });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const pkg = toWhitePackage(r.scenario);
    expect(pkg.phosphor?.mixedWith).toHaveLength(1);
    expect(pkg.phosphor?.mixedWith?.[0].quantumYield).toBe(0.88);
  });

  it('a user phosphor is carried in full and survives the link', () => {
    const scenario = { ...demoScenario(), phosphor: { ...block, id: 'user-amber', user } };
    const r = readScenario(scenario);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const back = decodeScenarioParam(encodeScenarioParam(r.scenario));
    expect(back.fromLink).toBe(true);
    expect(back.scenario.phosphor?.user).toEqual(user);
    expect(toWhitePackage(back.scenario).phosphor?.emission).toEqual(user.emission);
  });

  it.each([
    ['an unknown library phosphor', { ...block, id: 'no-such' }, /Phosphor 'no-such' is not in the phosphor library/],
    ['a user phosphor whose id differs', { ...block, id: 'user-other', user }, /must be the id of the user phosphor carried with it/],
    ['a user phosphor with an unsorted emission', { ...block, id: 'user-amber', user: { ...user, emission: [[600, 1], [540, 0]] } }, /User phosphor: Emission row 2: wavelength_nm must be above/],
    ['a red load above 60 wt%', { ...block, red: { id: 'nitride-red', weightPercent: 70, diameterUm: 12, quantumYield: 0.88 } }, /Red phosphor load/]
  ])('refuses %s, naming the field', (_, phosphor, message) => {
    const r = readScenario({ ...demoScenario(), phosphor });
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(JSON.stringify(r)).toMatch(message);
  });
});
