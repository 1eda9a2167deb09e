import { describe, it, expect } from 'vitest';
import { claimCoreValue as claimValue } from '../../../src/lib/decisions';
import { defaultForm, formFromParams, formToClaim, formToParams } from '../../../src/routes/claim/claim-form';

const scenario = { nChip: 2.4869, nEnc: 1.4134, nOut: 1 };

describe('claim form', () => {
  it('converts the shown value: percent for extraction and coating, a factor for gain', () => {
    expect(claimValue('extraction', 85)).toBe(0.85);
    expect(claimValue('coating', 40)).toBe(0.4);
    expect(claimValue('gain', 3.5)).toBe(3.5);
  });

  it('takes the scenario indices unless the form types its own, and "none" makes a bare chip', () => {
    const f = defaultForm(scenario);
    expect(formToClaim(f, scenario)).toMatchObject({ nChip: 2.4869, nEnc: 1.4134, nOut: 1, value: 0.85 });
    expect(formToClaim({ ...f, chip: 'typed', chipN: 3.5, enc: 'none' }, scenario)).toMatchObject({ nChip: 3.5, nEnc: null });
    expect(formToClaim({ ...f, enc: 'typed', encN: 1.53 }, scenario).nEnc).toBe(1.53);
  });

  it('starts as a bare chip when the scenario has no encapsulant', () => {
    expect(defaultForm({ ...scenario, nEnc: null }).enc).toBe('none');
  });

  it('round-trips through link parameters', () => {
    const f = { ...defaultForm(scenario), kind: 'gain' as const, shown: 2.5, structure: 'textured' as const, faces: 1 as const, enc: 'typed' as const, encN: 1.5 };
    const params = formToParams(f);
    const back = formFromParams((name) => params[name] ?? null, scenario);
    expect(back).toEqual(f);
  });

  it('ignores link parameters that are unknown or out of range', () => {
    const params: Record<string, string> = { kind: 'lumens', value: '500', structure: 'bumpy', faces: '4', chip: '9', out: 'x' };
    expect(formFromParams((n) => params[n] ?? null, scenario)).toEqual(defaultForm(scenario));
  });
});
