import { describe, it, expect } from 'vitest';
import { checkClaim, type Claim } from '../../../src/lib/decisions/claim-check';

const gan = (over: Partial<Claim>): Claim => ({ kind: 'extraction', value: 0.3, nChip: 2.45, nEnc: 1.41, structure: 'planar', ...over });

describe('checkClaim(claim) — extraction', () => {
  it('calls an extraction above the planar-chip limit impossible (85 % for planar GaN in a silicone dome)', () => {
    const r = checkClaim(gan({ value: 0.85 }));
    expect(r.verdict).toBe('impossible');
    expect(r.reason).toMatch(/85 %/);
    expect(r.reason).toMatch(/trapped/);
    expect(r.numbers.find((n) => n.id === 'recycling-limit')!.value).toBeLessThan(0.85);
  });

  it('calls a value between the single-pass ideal dome and the recycling limit optimistic, naming recycling', () => {
    const r = checkClaim(gan({ value: 0.5 }));
    expect(r.bounds.idealDome).toBeLessThan(0.5);
    expect(r.bounds.recyclingLimit).toBeGreaterThan(0.5);
    expect(r.verdict).toBe('optimistic');
    expect(r.requires.join(' ')).toMatch(/recycling/);
  });

  it('writes a tiny claimed share as "< 0.001 %", never in exponent form (1.6e-7 %)', () => {
    const r = checkClaim(gan({ value: 1.6e-9 }));
    expect(r.reason).toContain('< 0.001 %');
    expect(r.reason).not.toMatch(/\de-\d|10⁻/);
  });

  it('calls a value within the ideal dome consistent', () => {
    expect(checkClaim(gan({ value: 0.3 })).verdict).toBe('consistent');
  });

  it('gives the kinder verdict exactly at a bound', () => {
    const b = checkClaim(gan({ value: 0.3 })).bounds;
    expect(checkClaim(gan({ value: b.idealDome })).verdict).toBe('consistent');
    expect(checkClaim(gan({ value: b.recyclingLimit })).verdict).toBe('optimistic');
  });

  it('never calls a textured, thin-film or unknown chip impossible; above ~80 % it is optimistic with sources', () => {
    for (const structure of ['textured', 'thin-film', 'unknown'] as const) {
      const r = checkClaim(gan({ value: 0.9, structure }));
      expect(r.verdict).toBe('optimistic');
      expect(r.references.length).toBeGreaterThan(0);
      for (const ref of r.references) expect(ref.source).toMatch(/Appl\. Phys\. Lett\./);
    }
    expect(checkClaim(gan({ value: 0.7, structure: 'thin-film' })).verdict).toBe('consistent');
    expect(checkClaim(gan({ value: 0.7, structure: 'unknown' })).verdict).toBe('optimistic');
  });

  it('turns a consistent claim optimistic when it is more than 3 standard errors above a trace of the package', () => {
    expect(checkClaim(gan({ value: 0.4, trace: { extraction: 0.378, stderr: 0.0024 } })).verdict).toBe('optimistic');
    expect(checkClaim(gan({ value: 0.384, trace: { extraction: 0.378, stderr: 0.0024 } })).verdict).toBe('consistent');
  });

  it('treats a missing encapsulant as a bare chip', () => {
    const r = checkClaim(gan({ nEnc: null, value: 0.3 }));
    expect(r.bounds.encapsulated).toBe(false);
    expect(r.verdict).toBe('impossible'); // bare planar GaN: at most 3(1 − cos 24.1°) ≈ 26 %
    expect(r.reason).toMatch(/bare/);
  });
});

describe('checkClaim(claim) — gain', () => {
  it('a 2.5× dome gain for planar GaN under ~1.5 is consistent', () => {
    const r = checkClaim(gan({ kind: 'gain', value: 2.5, nEnc: 1.5 }));
    expect(r.verdict).toBe('consistent');
    expect(r.reason).toMatch(/2\.5×/);
  });

  it('3.5× for planar GaN under silicone is impossible', () => {
    for (const nEnc of [1.41, 1.53]) expect(checkClaim(gan({ kind: 'gain', value: 3.5, nEnc })).verdict).toBe('impossible');
  });

  it('10 % above the closed form is optimistic, not impossible', () => {
    const b = checkClaim(gan({ kind: 'gain', value: 2, nEnc: 1.41 })).bounds;
    const r = checkClaim(gan({ kind: 'gain', value: 1.1 * b.closedFormGain, nEnc: 1.41 }));
    expect(r.verdict).toBe('optimistic');
  });

  it('a non-planar chip above the closed form is optimistic, never impossible', () => {
    expect(checkClaim(gan({ kind: 'gain', value: 3.5, structure: 'textured' })).verdict).toBe('optimistic');
  });

  it('needs an encapsulant index', () => {
    expect(() => checkClaim(gan({ kind: 'gain', value: 2, nEnc: null }))).toThrow(/nEnc must be given for a gain claim/);
    expect(() => checkClaim(gan({ kind: 'gain', value: 2, nEnc: 1 }))).toThrow(/nEnc must be given/);
  });
});

describe('checkClaim(claim) — flat coating', () => {
  it('a flat coating said to raise bare GaN extraction by 40 % ("widening the escape cone") is impossible', () => {
    const r = checkClaim(gan({ kind: 'coating', value: 0.4, nEnc: null }));
    expect(r.verdict).toBe('impossible');
    expect(r.reason).toMatch(/cannot widen the escape cone/);
    expect(r.reason).toMatch(/n·sin θ/);
  });

  it('+10 % is consistent for bare GaN (one quarter-wave layer gives about +20 %)', () => {
    expect(checkClaim(gan({ kind: 'coating', value: 0.1, nEnc: null })).verdict).toBe('consistent');
  });

  it('between one quarter-wave layer and the flat limit is optimistic', () => {
    const b = checkClaim(gan({ kind: 'coating', value: 0, nEnc: null })).bounds;
    const r = checkClaim(gan({ kind: 'coating', value: (b.quarterWaveCoating + b.coatingLimit) / 2, nEnc: null }));
    expect(r.verdict).toBe('optimistic');
    expect(r.requires.join(' ')).toMatch(/graded-index or multilayer/);
  });

  it('under an encapsulant the coating faces the encapsulant, so its limit is smaller', () => {
    const bare = checkClaim(gan({ kind: 'coating', value: 0.1, nEnc: null })).bounds.coatingLimit;
    const dome = checkClaim(gan({ kind: 'coating', value: 0.1, nEnc: 1.41 })).bounds.coatingLimit;
    expect(dome).toBeLessThan(bare);
  });

  it('a negative "increase" from a coating is named a decrease and judged as a loss (possible)', () => {
    const r = checkClaim(gan({ kind: 'coating', value: -0.05 }));
    expect(r.verdict).toBe('consistent');
    expect(r.reason).toMatch(/^This is a decrease of 5 %, not an increase/);
    expect(r.numbers[0]).toMatchObject({ id: 'claim', label: 'Claimed decrease from a flat coating', value: -0.05 });
    expect(r.requires).toEqual([]);
  });

  it('a gain below 1 is named a loss and judged possible', () => {
    const r = checkClaim(gan({ kind: 'gain', value: 0.8, nEnc: 1.41 }));
    expect(r.verdict).toBe('consistent');
    expect(r.reason).toMatch(/is a loss of 20 %/);
  });

  it('takes an outside index anywhere in the package index range, like the scenario (up to 6)', () => {
    for (const nOut of [1, 3.5, 5, 6]) {
      const r = checkClaim(gan({ kind: 'extraction', value: 0.5, nOut, nEnc: null }));
      for (const n of r.numbers) expect(Number.isFinite(n.value), `${n.id} at nOut ${nOut}`).toBe(true);
    }
  });
});

describe('checkClaim(claim) — every verdict explains itself', () => {
  it('gives a one-sentence reason and the claim as the first number, for each kind and structure', () => {
    for (const kind of ['extraction', 'gain', 'coating'] as const) {
      for (const structure of ['planar', 'textured', 'thin-film', 'unknown'] as const) {
        for (const value of kind === 'extraction' ? [0.1, 0.5, 0.95] : kind === 'gain' ? [1.5, 2.5, 4] : [0.05, 0.25, 0.5]) {
          const r = checkClaim({ kind, value, nChip: 2.45, nEnc: 1.41, structure });
          expect(r.reason.length).toBeGreaterThan(20);
          expect(r.reason.trim().endsWith('.')).toBe(true);
          expect(r.reason).not.toMatch(/NaN|undefined|Infinity/);
          expect(r.numbers[0]).toMatchObject({ id: 'claim', value });
          for (const n of r.numbers) expect(Number.isFinite(n.value)).toBe(true);
          if (r.verdict !== 'consistent') expect(r.requires.length).toBeGreaterThan(0);
        }
      }
    }
  });
});

describe('checkClaim(claim) — bad input', () => {
  it('names the field and its allowed range', () => {
    expect(() => checkClaim(gan({ value: 1.2 }))).toThrow(/value \(extraction fraction\) must be a number in \(0, 1\]/);
    expect(() => checkClaim(gan({ value: 0 }))).toThrow(/\(0, 1\]/);
    expect(() => checkClaim(gan({ kind: 'gain', value: -1 }))).toThrow(/value \(gain factor\) must be a number in \(0, 100\]/);
    expect(() => checkClaim(gan({ kind: 'coating', value: -1 }))).toThrow(/relative change.*\(-1, 100\]/);
    expect(() => checkClaim(gan({ nChip: 0.5 }))).toThrow(/nChip must be a number in \[1, 6\]/);
    expect(() => checkClaim(gan({ nOut: 6.5 }))).toThrow(/nOut must be a number in \[1, 6\]/); // the package index range, as in the scenario
    expect(() => checkClaim(gan({ nEnc: NaN }))).toThrow(/nEnc must be a number in \[1, 6\]/);
    // @ts-expect-error — not a chip structure
    expect(() => checkClaim(gan({ structure: 'bumpy' }))).toThrow(/structure must be one of planar, textured, thin-film, unknown/);
    // @ts-expect-error — not a claim kind
    expect(() => checkClaim(gan({ kind: 'lumens' }))).toThrow(/kind must be one of extraction, gain, coating/);
    // @ts-expect-error — four faces is not a cuboid option
    expect(() => checkClaim(gan({ faces: 4 }))).toThrow(/faces must be 1, 5 or 6/);
    expect(() => checkClaim(gan({ trace: { extraction: 0.4, stderr: -1 } }))).toThrow(/trace.stderr must be a number in \[0, 1\]/);
  });
});
