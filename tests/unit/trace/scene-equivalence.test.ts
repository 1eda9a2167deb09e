/**
 * The scene-model tracer against the tallies recorded from the tracer it replaced (special-cased box
 * chip, base plane, dome / cylinder / none): bit for bit on the same seeds. The fixture and its
 * generator are in tests/fixtures/trace-ledgers.*.
 */
import { describe, expect, it } from 'vitest';
import { traceSync } from '../../../src/lib/trace/trace';
import recorded from '../../fixtures/trace-ledgers.json';
import { LEDGER_CASES } from '../../fixtures/trace-ledgers.packages';

describe('the scene-model tracer reproduces the special-cased tracer exactly', () => {
  it.each(LEDGER_CASES.map((c, i) => [c.name, c, recorded[i]] as const))('%s', (name, c, before) => {
    expect(before.name).toBe(name);
    const t = traceSync(c.pkg, { rays: c.rays, seed: c.seed, maxEvents: c.maxEvents });
    for (const [key, value] of Object.entries(before.counts)) expect(t[key as keyof typeof t], key).toBe(value);
    expect(Array.from(t.polarHistogram)).toEqual(before.polarHistogram);
    expect(Object.values(t.parts).reduce((a, b) => a + b, 0)).toBe(c.rays);
  });
});
