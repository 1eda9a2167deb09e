import { describe, expect, it } from 'vitest';
import { exportFileName, slug } from '../../../src/lib/export/file-name';

describe('exportFileName({page, scenario, variant, what, ext})', () => {
  it('joins outcouple, page, scenario, variant and content, each slugged', () => {
    expect(exportFileName({ page: 'dome', scenario: 'Demo: blue 1 mm chip, silicone choice', variant: 'B', what: 'far field', ext: 'png' })).toBe(
      'outcouple-dome-demo-blue-1-mm-chip-silicone-choice-b-far-field.png'
    );
  });
  it('leaves out an absent or empty variant', () => {
    expect(exportFileName({ page: 'stack', scenario: 'Demo', what: 'results', ext: 'json' })).toBe('outcouple-stack-demo-results.json');
    expect(exportFileName({ page: 'stack', scenario: 'Demo', variant: '  ', what: 'results', ext: 'json' })).toBe('outcouple-stack-demo-results.json');
  });
  it('gives two variants of one scenario two names (they never overwrite each other)', () => {
    const a = exportFileName({ page: 'dome', scenario: 'Demo', variant: 'A', what: 'ledger', ext: 'csv' });
    const b = exportFileName({ page: 'dome', scenario: 'Demo', variant: 'B', what: 'ledger', ext: 'csv' });
    expect(a).not.toBe(b);
  });
  it('gives two pages and two contents two names', () => {
    const names = new Set(
      ['dome', 'compare'].flatMap((page) => ['far field', 'far field polar'].map((what) => exportFileName({ page, scenario: 'Demo', what, ext: 'png' })))
    );
    expect(names.size).toBe(4);
  });
  it('names an unnamed scenario "scenario"', () => {
    expect(exportFileName({ page: 'dome', scenario: '', what: 'results', ext: 'json' })).toBe('outcouple-dome-scenario-results.json');
  });
  it('keeps only ASCII letters, digits and dashes, whatever the names hold', () => {
    const name = exportFileName({ page: 'compare', scenario: 'Phényl / méthyl ≈ 1.53 η_dome', variant: 'Ω?*', what: 'T(θ) — s, p', ext: 'CSV' });
    expect(name).toMatch(/^[a-z0-9-]+\.[a-z0-9]+$/);
    expect(name).toBe('outcouple-compare-phenyl-methyl-approx-1-53-eta-dome-t-theta-s-p.csv');
  });
  it('refuses a page, content or extension with no letters or digits, naming the field', () => {
    expect(() => exportFileName({ page: '—', scenario: 'x', what: 'a', ext: 'csv' })).toThrow(/page/);
    expect(() => exportFileName({ page: 'dome', scenario: 'x', what: '', ext: 'csv' })).toThrow(/what/);
    expect(() => exportFileName({ page: 'dome', scenario: 'x', what: 'a', ext: '.' })).toThrow(/ext/);
  });
});

describe('slug(text)', () => {
  it('spells Greek letters and ≈, drops accents, joins words with dashes', () => {
    expect(slug('Methyl silicone (n ≈ 1.41)')).toBe('methyl-silicone-n-approx-1-41');
    expect(slug('Transmission T(θ) — s, p')).toBe('transmission-t-theta-s-p');
    expect(slug('Crème brûlée')).toBe('creme-brulee');
  });
  it('cuts at the limit without a trailing dash', () => {
    const s = slug('a'.repeat(39) + ' bcd', 40);
    expect(s).toBe('a'.repeat(39));
  });
});
