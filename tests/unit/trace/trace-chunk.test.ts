import { describe, expect, it } from 'vitest';
import type { TracePackage } from '../../../src/lib/trace/package-spec';
import { createTally, mergeTally, type Tally } from '../../../src/lib/trace/tally';
import { traceChunk } from '../../../src/lib/trace/trace-chunk';
import { NO_ENCAPSULANT, domePackage, withEncapsulant } from '../../support/fixtures';

function ledgerSum(t: Tally): number {
  return t.escaped + t.absorbedChip + t.absorbedEncapsulant + t.absorbedBase + t.lost;
}

function histogramSum(t: Tally): number {
  return t.polarHistogram.reduce((a, b) => a + b, 0);
}

const cylinder: TracePackage['encapsulant'] = { shape: 'cylinder', radiusMm: 2.5, heightMm: 1, n: 1.41, absorptionPerMm: 0.001 };
const packages: [string, TracePackage][] = [
  ['dome', domePackage()],
  ['cylinder', withEncapsulant(domePackage(), cylinder)],
  ['bare chip', withEncapsulant(domePackage(), NO_ENCAPSULANT)],
  ['dome, tracked polarisation, metal base', { ...domePackage(), polarization: 'track', base: { kind: 'metal', n: 0.4892, k: 4.7783 } }],
  ['flat spheroid dome, volume emission', {
    ...withEncapsulant(domePackage(), { shape: 'dome', radiusMm: 3, heightMm: 0.5, n: 1.53, absorptionPerMm: 0.01 }),
    chip: { ...domePackage().chip, emission: 'volume' }
  }]
];

describe('traceChunk(pkg, chunkIndex, rays, seed, tally)', () => {
  it.each(packages)('%s: every ray ends in exactly one ledger bin, with no geometry errors', (_, pkg) => {
    const t = traceChunk(pkg, 0, 5000, 11, createTally());
    expect(t.launched).toBe(5000);
    expect(ledgerSum(t)).toBe(5000);
    expect(t.geometryErrors).toBe(0);
    expect(histogramSum(t)).toBe(t.escaped);
    expect(t.escapedChipTop + t.escapedChipSide + t.escapedDome + t.escapedCylinderTop + t.escapedCylinderSide).toBe(t.escaped);
    expect(t.escapedBelowHorizon).toBeLessThanOrEqual(t.escaped);
    expect(t.events).toBeGreaterThanOrEqual(5000);
    for (const [key, value] of Object.entries(t)) {
      if (typeof value === 'number') expect(Number.isInteger(value), key).toBe(true);
    }
  });

  it('gives the same tally for the same seed and chunk, and a different one for another chunk', () => {
    const pkg = domePackage();
    const a = traceChunk(pkg, 3, 4000, 42, createTally());
    const b = traceChunk(pkg, 3, 4000, 42, createTally());
    const c = traceChunk(pkg, 4, 4000, 42, createTally());
    expect(b).toEqual(a);
    expect(c).not.toEqual(a);
  });

  it('adds to the tally it is given (chunks merge by addition)', () => {
    const pkg = domePackage();
    const one = traceChunk(pkg, 0, 3000, 5, createTally());
    const two = traceChunk(pkg, 1, 3000, 5, createTally());
    const both = traceChunk(pkg, 1, 3000, 5, traceChunk(pkg, 0, 3000, 5, createTally()));
    expect(both).toEqual(mergeTally(one, two));
  });

  it('counts every ray lost when the event cap is 1 and no ray can end on its first event', () => {
    // lossless chip on a perfect mirror under an index-matched dome: the first event never ends a ray
    const pkg: TracePackage = {
      ...withEncapsulant(domePackage(), { shape: 'dome', radiusMm: 2.5, heightMm: 2.5, n: 2.45, absorptionPerMm: 0 }),
      chip: { ...domePackage().chip, absorptionPerMm: 0 },
      base: { kind: 'reflectance', reflectance: 1 }
    };
    const t = traceChunk(pkg, 0, 1000, 1, createTally(), 1);
    expect(t.lost).toBe(1000);
    expect(t.events).toBe(1000);
  });

  it('calls onProgress inside a chunk every 2048 rays', () => {
    const seen: number[] = [];
    traceChunk(domePackage(), 0, 5000, 1, createTally(), 1000, (n) => seen.push(n));
    expect(seen).toEqual([2048, 4096]);
  });
});
