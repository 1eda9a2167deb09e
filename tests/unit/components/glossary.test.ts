import { describe, expect, it } from 'vitest';
import { GLOSSARY, termText, type GlossaryKey } from '../../../src/lib/components/glossary';

describe('glossary', () => {
  it('writes an abbreviation out on first use and keeps it short after', () => {
    expect(termText('tir', true)).toBe('total internal reflection (TIR)');
    expect(termText('tir', false)).toBe('TIR');
    expect(termText('etaF', true)).toBe('Fresnel-weighted escape fraction (ηF)');
  });

  it('prints a plain word once, never "closed form (closed form)"', () => {
    expect(termText('closedForm', true)).toBe('closed form');
    expect(termText('halfDiagonal', true)).toBe('half-diagonal');
  });

  it('gives every term a one-sentence meaning ending in a full stop, short enough for a tooltip', () => {
    for (const key of Object.keys(GLOSSARY) as GlossaryKey[]) {
      const m = GLOSSARY[key].meaning;
      expect(m, key).toMatch(/^[A-Z].*\.$/);
      expect(m.length, key).toBeLessThanOrEqual(200);
    }
  });
});
