import { describe, expect, it } from 'vitest';
import { prepareOptic } from '../../../src/lib/optic-trace/optic-run';
import { compileScene } from '../../../src/lib/trace/compile-scene';
import { chunkPlan, raysInChunk } from '../../../src/lib/trace/chunk-plan';
import { createTally } from '../../../src/lib/trace/tally';
import { traceSceneChunk } from '../../../src/lib/trace/trace-chunk';
import type { SceneDescription } from '../../../src/lib/trace/scene';

function traced(scene: SceneDescription, rays: number) {
  const compiled = compileScene(scene);
  const plan = chunkPlan(rays);
  const tally = createTally();
  for (let i = 0; i < plan.chunkCount; i++) traceSceneChunk(compiled, i, raysInChunk(plan, i), 7, tally);
  return tally;
}

describe('opticParts: flat faces as discs', () => {
  it.each(['lens', 'tir'] as const)('a %s traces exactly as with every face a sampled profile (same planes, same random numbers)', (type) => {
    const prepared = prepareOptic({
      design: { type, exitDiameterMm: 20, heightMm: 12, gapMm: 0.2, material: 'pmma' },
      source: { kind: 'lambertian', shape: 'rect', widthMm: 1 },
      rays: 20_000,
      seed: 7
    });
    const scene = prepared.optic.scene;
    const discs = scene.surfaces.filter((s) => s.name.startsWith('optic ') && s.shape.kind === 'disc');
    expect(discs.map((s) => s.name)).toContain('optic exit');
    // the same scene with the design's own profiles for those faces
    const asProfiles: SceneDescription = {
      ...scene,
      surfaces: scene.surfaces.map((s) => {
        const face = prepared.design.surfaces.find((f) => `optic ${f.name}` === s.name);
        if (!face || s.shape.kind !== 'disc') return s;
        return { ...s, shape: { kind: 'revolution', r: Float64Array.from(face.r), z: face.z.map((z) => z + prepared.optic.zOffsetMm) } };
      })
    };
    expect(traced(scene, 20_000)).toEqual(traced(asProfiles, 20_000));
  });
});
