/**
 * The chip's faces as one convex solid (SceneSurface.convexSolid) and a convex region around it
 * (SceneMedium.convexAroundSolid) are shortcuts of the list search, never a change of result: a ray that
 * has just met a face of a convex solid from without heads away from it (each face's plane supports the
 * solid), a ray whose line misses a sphere around the solid cannot meet it, and a ray inside a convex
 * region crosses its boundary once (common practice in ray tracing,
 * e.g. M. Pharr, W. Jakob, G. Humphreys, Physically Based Rendering, 3rd ed., §3.1 on convex shapes).
 * The same chunk traced from the scene with and without the hints gives the same ledger bit for bit.
 */
import { describe, expect, it } from 'vitest';
import { compileScene } from '../../../src/lib/trace/compile-scene';
import { packageScene } from '../../../src/lib/trace/package-scene';
import type { TracePackage } from '../../../src/lib/trace/package-spec';
import type { SceneDescription } from '../../../src/lib/trace/scene';
import { createTally } from '../../../src/lib/trace/tally';
import { traceSceneChunk } from '../../../src/lib/trace/trace-chunk';
import { libraryPhosphor, withPhosphor } from '../../../src/lib/trace/white-light';
import { packagePresets } from '../../../src/lib/scenario/presets';
import { toTracePackage } from '../../../src/lib/scenario/resolve';

const [dome, cup, chipScale] = packagePresets().map((p) => toTracePackage(p.scenario));
const cupBody = cup.body as Extract<TracePackage['body'], { kind: 'cup' }>;
const cupDome = (radiusMm: number): TracePackage => ({ ...cup, body: { ...cupBody, fill: 'dome' }, encapsulant: { ...cup.encapsulant, radiusMm, heightMm: 0.6 } });
const cylinder: TracePackage = { ...dome, encapsulant: { ...dome.encapsulant, shape: 'cylinder', radiusMm: 1.5, heightMm: 1.0 } };
const conformal = withPhosphor(dome, { kind: 'particles', phosphor: libraryPhosphor('garnet-yellow'), weightPercent: 20, diameterUm: 15, region: 'conformal', thicknessMm: 0.08 }, [[450, 1]]);

/** The scene without either hint. */
function withoutHints(scene: SceneDescription): SceneDescription {
  return {
    ...scene,
    media: scene.media.map(({ convexAroundSolid: _, ...m }) => m),
    surfaces: scene.surfaces.map(({ convexSolid: _, ...s }) => s)
  };
}

// [name, package, whether the encapsulant is marked a convex region around the chip]
const cases: [string, TracePackage, boolean][] = [
  ['dome', dome, true],
  ['cylinder', cylinder, true],
  ['chip-scale box', chipScale, true],
  ['cup, flat fill', cup, true],
  ['cup, dome filling the rim', cupDome(cupBody.topRadiusMm), true],
  // the rim annulus beside a narrower dome is a concave corner
  ['cup, dome and rim annulus', cupDome(1.2), false],
  // the layer's outer faces lie inside the encapsulant
  ['conformal phosphor under a dome', conformal, false]
];

describe('convex search shortcuts (convexSolid, convexAroundSolid)', () => {
  it.each(cases)('%s: traces the same ledger without the hints', (_, pkg, convexAround) => {
    const description = packageScene(pkg);
    expect(description.media.find((m) => m.name === 'encapsulant')?.convexAroundSolid === true).toBe(convexAround);
    expect(description.surfaces.some((s) => s.convexSolid === 'chip')).toBe(true);
    const hinted = traceSceneChunk(compileScene(description), 0, 4000, 11, createTally());
    const plain = traceSceneChunk(compileScene(withoutHints(description)), 0, 4000, 11, createTally());
    expect(hinted.parts).toEqual(plain.parts);
    expect(Array.from(hinted.polarHistogram)).toEqual(Array.from(plain.polarHistogram));
    expect(hinted.events).toBe(plain.events);
  });
});
