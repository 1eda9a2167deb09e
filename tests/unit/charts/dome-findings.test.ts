import { describe, expect, it } from 'vitest';
import { domeGap, lostExplanation, radiusNote, type TraceFacts } from '../../../src/lib/charts/dome-findings';
import type { TracePackage } from '../../../src/lib/trace/package-spec';
import { domePackage } from '../../support/fixtures';

const pkg = domePackage;


function trace(extraction: number, stderr: number, ledger: Partial<TraceFacts['ledger']> = {}): TraceFacts {
  const L = { escaped: extraction, chip: 0, encapsulant: 0, base: 0, lost: 0, ...ledger };
  return { rays: 200_000, extraction, stderr, ledger: L, outerSurfaceTir: 0, geometryErrors: 0 };
}

const closed = { etaDome: 0.0753, noTir: true, minRadiusNoTirMm: 1.003 };

describe('domeGap(pkg, closed, trace)', () => {
  it('calls a difference within 3σ agreement, even when it is over 1 %', () => {
    const g = domeGap(pkg(), closed, trace(0.0753 + 0.02, 0.007));
    expect(g.disagree).toBe(false);
    expect(g.reasons).toEqual([]);
    expect(g.headline).toMatch(/agree/);
  });

  it('calls a difference under 1 % absolute agreement, even when it is over 3σ', () => {
    expect(domeGap(pkg(), closed, trace(0.0753 + 0.009, 0.0001)).disagree).toBe(false);
  });

  it('names the finite chip first when the trace is higher, then the losses by size', () => {
    const g = domeGap(pkg(), closed, trace(0.38, 0.0015, { chip: 0.48, base: 0.137, encapsulant: 0.001 }));
    expect(g.disagree).toBe(true);
    expect(g.delta).toBeCloseTo(0.3047, 12);
    expect(g.reasons.map((r) => r.key)).toEqual(['finite-chip', 'chip-absorption', 'base-loss']);
    expect(g.reasons[1].text).toMatch(/48\.0 %/);
    expect(g.headline).toMatch(/higher/);
  });

  it('puts the losses first when the trace is lower', () => {
    const g = domeGap(pkg(), closed, trace(0.03, 0.001, { chip: 0.1, encapsulant: 0.4, base: 0.02 }));
    expect(g.reasons.map((r) => r.key)).toEqual(['encapsulant-absorption', 'chip-absorption', 'base-loss']);
  });

  it('names a dome below the no-TIR radius, with the count of TIR events', () => {
    const p = pkg();
    p.encapsulant.radiusMm = 0.8;
    p.encapsulant.heightMm = 0.8;
    const t = { ...trace(0.3, 0.002), outerSurfaceTir: 1234 };
    const g = domeGap(p, { ...closed, noTir: false }, t);
    const r = g.reasons.find((x) => x.key === 'dome-too-small')!;
    expect(r.text).toMatch(/R = 0\.8 mm.*1 mm/);
    expect(r.text).toMatch(/1234 total internal reflections/);
  });

  it('names a dome that is not a hemisphere, and a cylinder or no encapsulant', () => {
    const tall = pkg();
    tall.encapsulant.heightMm = 4;
    expect(domeGap(tall, closed, trace(0.3, 0.002)).reasons.map((r) => r.key)).toContain('not-hemisphere');
    const cyl = pkg();
    cyl.encapsulant.shape = 'cylinder';
    expect(domeGap(cyl, closed, trace(0.3, 0.002)).reasons.map((r) => r.key)).toContain('not-dome');
  });

  it('gives no verdict from a non-finite trace value', () => {
    const g = domeGap(pkg(), closed, trace(Number.NaN, 0));
    expect(g.disagree).toBe(false);
    expect(g.headline).toMatch(/No comparison/);
  });
});

describe('lostExplanation(pkg, trace)', () => {
  it('explains the endless trap of a lossless chip on a perfect mirror', () => {
    const p = pkg();
    p.chip.absorptionPerMm = 0;
    p.encapsulant.shape = 'none';
    p.base = { kind: 'reflectance', reflectance: 1 };
    const text = lostExplanation(p, trace(0.5, 0.001, { lost: 0.5 }));
    expect(text).toMatch(/perfect mirror/);
    expect(text).toMatch(/for ever/);
    expect(text).toMatch(/1000 surface events/);
  });

  it('gives a general explanation when some loss exists but rays still reach the cap', () => {
    const text = lostExplanation(pkg(), trace(0.3, 0.001, { lost: 0.02 }));
    expect(text).toMatch(/2\.0 % of the rays were still bouncing/);
  });

  it('says nothing below 1 % lost and no geometry errors; reports geometry errors on their own', () => {
    expect(lostExplanation(pkg(), trace(0.3, 0.001, { lost: 0.009 }))).toBeNull();
    expect(lostExplanation(pkg(), { ...trace(0.3, 0.001), geometryErrors: 3 })).toMatch(/3 rays stopped on a geometry error/);
  });
});

describe('radiusNote(pkg, closed)', () => {
  it('explains that a hemisphere past the no-TIR radius gains nothing from growing, and names the absorption', () => {
    const text = radiusNote(pkg(), closed)!;
    expect(text).toMatch(/2\.5 mm\) is already past the no-TIR radius \(1 mm/);
    expect(text).toMatch(/absorbs \(α = 0\.001 \/mm\)/);
    const clear = domePackage();
    clear.encapsulant.absorptionPerMm = 0;
    expect(radiusNote(clear, closed)).toMatch(/clear encapsulant/);
  });

  it('says nothing below the no-TIR radius, for a flattened dome or for a cylinder', () => {
    expect(radiusNote(pkg(), { ...closed, noTir: false })).toBeNull();
    const flat = domePackage();
    flat.encapsulant.heightMm = 1;
    expect(radiusNote(flat, closed)).toBeNull();
    expect(radiusNote({ ...pkg(), encapsulant: { ...pkg().encapsulant, shape: 'cylinder' } }, closed)).toBeNull();
  });

  it('comes with every gap finding, agreeing or not', () => {
    expect(domeGap(pkg(), closed, trace(0.0753, 0.001)).radiusNote).toBe(radiusNote(pkg(), closed));
  });
});
