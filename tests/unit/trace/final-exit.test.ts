/**
 * SceneSurface.finalExit is a shortcut, never a change of result: a ray leaving a convex package through
 * a marked surface meets nothing more (a convex solid is left for good; common practice in ray
 * tracing, e.g. M. Pharr, W. Jakob, G. Humphreys, Physically Based Rendering, 3rd ed., §3.1 on
 * ray–convex-shape intersections). The same chunk traced with and without the marks gives the same
 * ledger bit for bit, and the builders mark exactly the surfaces of convex outsides.
 */
import { describe, expect, it } from 'vitest';
import { compileScene } from '../../../src/lib/trace/compile-scene';
import { flipChipOnSapphire } from '../../../src/lib/trace/chip-presets';
import { packageScene } from '../../../src/lib/trace/package-scene';
import type { TracePackage } from '../../../src/lib/trace/package-spec';
import { createTally } from '../../../src/lib/trace/tally';
import { traceSceneChunk } from '../../../src/lib/trace/trace-chunk';
import { NO_ENCAPSULANT, cupPackage, domePackage, withEncapsulant } from '../../support/fixtures';

const cup = cupPackage(flipChipOnSapphire());
const cupDome = (radiusMm: number): TracePackage => ({
  ...cup,
  encapsulant: { ...cup.encapsulant, radiusMm, heightMm: 0.6 },
  body: { ...(cup.body as object), fill: 'dome' } as TracePackage['body']
});
const cases: [string, TracePackage, string[]][] = [
  ['dome', domePackage(), ['dome']],
  ['cylinder', withEncapsulant(domePackage(), { shape: 'cylinder', radiusMm: 2.5, heightMm: 1, n: 1.41, absorptionPerMm: 0.001 }), ['cylinder side', 'cylinder top']],
  ['bare chip', withEncapsulant(domePackage(), NO_ENCAPSULANT), ['chip top', 'chip +x', 'chip −x', 'chip +y', 'chip −y']],
  ['cup, flat fill', cup, ['cup top']],
  ['cup, dome filling the rim', cupDome(1.5), ['dome']],
  // the annulus beside a narrower dome can send rays back onto the dome: nothing is final
  ['cup, dome and rim annulus', cupDome(1.2), []],
  ['empty cup', { ...cup, body: { ...(cup.body as object), fill: 'none' } as TracePackage['body'] }, []]
];

describe('final exits (SceneSurface.finalExit)', () => {
  it.each(cases)('%s: marks exactly the convex outside and traces the same ledger without the marks', (_, pkg, marked) => {
    const scene = compileScene(packageScene(pkg));
    expect(scene.surfaceNames.filter((_, i) => scene.finalExit[i] === 1)).toEqual(marked);
    const withMarks = traceSceneChunk(scene, 0, 4000, 7, createTally());
    const unmarked = { ...scene, finalExit: new Uint8Array(scene.finalExit.length) };
    const without = traceSceneChunk(unmarked, 0, 4000, 7, createTally());
    expect(withMarks.parts).toEqual(without.parts);
    expect(Array.from(withMarks.polarHistogram)).toEqual(Array.from(without.polarHistogram));
    expect(withMarks.events).toBe(without.events);
  });
});
