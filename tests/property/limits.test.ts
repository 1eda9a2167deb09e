/**
 * Every size limit at an entry point exists, holds exactly at its edge (the limit itself is accepted,
 * one more is refused) and is stated in the refusal. Limits checked elsewhere in this tier: n,k table
 * rows and characters, user-material file size and count (fuzz-materials), CLI layers, rays and option
 * length (fuzz-cli), the stack page's layer count (fuzz-stack-link), IES angle counts (fuzz-ies).
 */
import { describe, it, expect } from 'vitest';
import { validateTraceOptions, validateTracePackage, TRACE_LIMITS } from '../../src/lib/trace/package-spec';
import { validateStack, MAX_LAYERS } from '../../src/lib/optics/layer';
import { readScenario } from '../../src/lib/scenario/read-scenario';
import { demoScenario } from '../../src/lib/scenario/defaults';
import { LIMITS } from '../../src/lib/scenario/limits';
import { validateUserMaterial } from '../../src/lib/materials/user-material';
import { MATERIAL_LIMITS } from '../../src/lib/materials/limits';
import { main } from '../../src/cli/main';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

/** The refusal message, or null when accepted. */
function refusal(f: () => void): string | null {
  try {
    f();
    return null;
  } catch (error) {
    return (error as Error).message;
  }
}

describe('trace core', () => {
  const pkg = {
    chip: { widthMm: 1, lengthMm: 1, heightMm: 0.15, n: 2.45, absorptionPerMm: 0, emission: 'plane' as const },
    base: { kind: 'reflectance' as const, reflectance: 0.9 },
    encapsulant: { shape: 'dome' as const, radiusMm: 2.5, heightMm: 2.5, n: 1.41, absorptionPerMm: 0 },
    outsideN: 1,
    polarization: 'average' as const
  };

  it(`takes at most ${TRACE_LIMITS.rays.max} rays and ${TRACE_LIMITS.maxEvents.max} events per ray, and says so`, () => {
    expect(refusal(() => validateTraceOptions({ rays: TRACE_LIMITS.rays.max, seed: 0 }))).toBeNull();
    expect(refusal(() => validateTraceOptions({ rays: TRACE_LIMITS.rays.max + 1, seed: 0 }))).toBe(
      'rays must be an integer in [1, 20000000] (got 20000001)'
    );
    expect(refusal(() => validateTraceOptions({ rays: 10, seed: 0, maxEvents: TRACE_LIMITS.maxEvents.max + 1 }))).toBe(
      'maxEvents must be an integer in [1, 1000000] (got 1000001)'
    );
  });

  it('states the size limit of a package', () => {
    const big = { ...pkg, encapsulant: { ...pkg.encapsulant, radiusMm: TRACE_LIMITS.sizeMm.max * 2 } };
    expect(refusal(() => validateTracePackage(big))).toBe('encapsulant.radiusMm must be a number in [0.001, 1000] (got 2000)');
  });
});

describe('stack core', () => {
  it(`takes at most ${MAX_LAYERS} layers and says so`, () => {
    const layer = { n: 1.5, k: 0, thicknessNm: 10 };
    expect(refusal(() => validateStack(2, Array(MAX_LAYERS).fill(layer), 1, 550))).toBeNull();
    expect(refusal(() => validateStack(2, Array(MAX_LAYERS + 1).fill(layer), 1, 550))).toBe('layers must have at most 10000 entries (got 10001)');
  });
});

describe('scenario', () => {
  const cases: [string, (s: ReturnType<typeof demoScenario>) => void, string][] = [
    ['rays', (s) => (s.trace.rays = LIMITS.rays.max + 1), 'Rays must be a whole number between 1000 and 20000000 rays.'],
    ['name length', (s) => (s.name = 'n'.repeat(LIMITS.nameLength.max + 1)), 'Name length must be a whole number between 1 and 120 characters.'],
    [
      'spectrum rows',
      (s) => (s.emission = { kind: 'table', rows: Array.from({ length: LIMITS.spectrumRows.max + 1 }, (_, i) => [400 + i * 0.1, 1] as [number, number]) }),
      'Number of spectrum rows must be a whole number between 2 and 2000 rows.'
    ],
    ['chip size', (s) => (s.chip.widthMm = LIMITS.sizeMm.max + 1), 'Chip width must be between 0.001 and 1000 mm.']
  ];
  it.each(cases)('states the %s limit', (_name, edit, message) => {
    const s = demoScenario();
    edit(s);
    const r = readScenario(s);
    expect(r.ok || r.message).toBe(message);
  });

  it('accepts each limit itself', () => {
    const s = demoScenario();
    s.trace.rays = LIMITS.rays.max;
    s.name = 'n'.repeat(LIMITS.nameLength.max);
    s.emission = { kind: 'table', rows: Array.from({ length: LIMITS.spectrumRows.max }, (_, i) => [400 + i * 0.1, 1] as [number, number]) };
    expect(readScenario(s).ok).toBe(true);
  });
});

describe('user material', () => {
  const base = {
    id: 'my-film',
    name: 'My film',
    category: 'layer',
    dispersion: { model: 'cauchy', A: 1.6, B: 0, C: 0 },
    validRangeNm: { min: 400, max: 800 }
  };
  const rows = (count: number) => Array.from({ length: count }, (_, i) => [400 + i * 0.05, 1.5, 0]);
  const cases: [string, Record<string, unknown>, string][] = [
    ['name', { name: 'x'.repeat(121) }, 'name must be 1–120 characters'],
    ['source', { source: 'x'.repeat(2001) }, 'source must be at most 2000 characters'],
    ['aliases', { aliases: Array.from({ length: 21 }, (_, i) => `a${i}`) }, 'aliases must hold at most 20 aliases'],
    ['alias length', { aliases: ['x'.repeat(61)] }, 'aliases.0 must be at most 60 characters'],
    ['notes', { notes: Array.from({ length: 21 }, () => ({ text: 't', tag: 'published' })) }, 'notes must hold at most 20 notes'],
    ['note length', { notes: [{ text: 'x'.repeat(2001), tag: 'published' }] }, 'notes.0.text must be at most 2000 characters'],
    ['terms', { dispersion: { model: 'sellmeier', terms: Array(MATERIAL_LIMITS.formulaTerms.max + 1).fill({ B: 0.1, C: 0.1 }) } }, 'dispersion.terms must hold 1 to 8 terms'],
    ['table rows', { dispersion: { model: 'table', rows: rows(MATERIAL_LIMITS.tableRows.max + 1) }, validRangeNm: undefined }, 'dispersion.rows must hold 2 to 5000 rows']
  ];
  it.each(cases)('states the %s limit', (_name, change, message) => {
    const r = validateUserMaterial({ ...base, ...change });
    expect(r.ok || r.errors[0].message).toBe(message);
  });

  it('accepts the table-row limit itself', () => {
    const r = validateUserMaterial({ ...base, dispersion: { model: 'table', rows: rows(MATERIAL_LIMITS.tableRows.max) }, validRangeNm: undefined });
    expect(r.ok).toBe(true);
  });
});

describe('command line files', () => {
  it('refuses a scenario file over 2 MB with the limit in the message', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'outcouple-limits-'));
    try {
      const path = join(dir, 'big.json');
      writeFileSync(path, JSON.stringify({ ...demoScenario(), name: 'n'.repeat(2 * 1024 * 1024) }));
      let stderr = '';
      const write = process.stderr.write;
      process.stderr.write = ((chunk: string) => ((stderr += chunk), true)) as typeof process.stderr.write;
      let code: number;
      try {
        code = await main(['trace', '--scenario', path, '--threads', '1']);
      } finally {
        process.stderr.write = write;
      }
      expect(code).toBe(2);
      expect(stderr).toBe(`outcouple trace: --scenario: file is larger than 2 MB (${path.slice(0, 80)})\n`);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
