import { describe, expect, it } from 'vitest';
import { compileScene } from '../../../src/lib/trace/compile-scene';
import { packageScene } from '../../../src/lib/trace/package-scene';
import type { SceneDescription } from '../../../src/lib/trace/scene';
import { BOUNDARY_BOX, BOUNDARY_LIST, MEDIUM_STRIDE, M_BOUNDARY, M_LIST_COUNT, SURFACE_STRIDE, S_BEHAVIOUR, BEHAVIOUR_MIRROR } from '../../../src/lib/trace/scene-layout';
import { domePackage } from '../../support/fixtures';

describe('compileScene(description)', () => {
  const scene = compileScene(packageScene(domePackage()));

  it('names the ledger bins: the two lost bins first, then absorbing media, absorbing surfaces, escapes', () => {
    expect(scene.binNames).toEqual(['lost:event cap', 'lost:geometry error', 'medium:chip', 'medium:encapsulant', 'surface:base', 'escaped:dome']);
    expect(scene.binGroups).toEqual(['lost', 'lost', 'absorbedChip', 'absorbedEncapsulant', 'absorbedBase', 'escaped']);
  });

  it('packs the chip as a box medium and the encapsulant as a list of its bounding surfaces', () => {
    expect(scene.media[0 * MEDIUM_STRIDE + M_BOUNDARY]).toBe(BOUNDARY_BOX);
    expect(scene.media[1 * MEDIUM_STRIDE + M_BOUNDARY]).toBe(BOUNDARY_LIST);
    // five chip faces, the base and the dome
    expect(scene.media[1 * MEDIUM_STRIDE + M_LIST_COUNT]).toBe(7);
    expect(scene.surfaces[scene.surfaceNames.indexOf('base') * SURFACE_STRIDE + S_BEHAVIOUR]).toBe(BEHAVIOUR_MIRROR);
  });

  it('refuses inconsistent descriptions with a message naming the part', () => {
    const d = packageScene(domePackage());
    const dup: SceneDescription = { ...d, media: [...d.media, d.media[0]] };
    expect(() => compileScene(dup)).toThrow(/duplicate medium name 'chip'/);
    const open: SceneDescription = { ...d, surfaces: d.surfaces.map((s) => (s.name === 'dome' ? { ...s, front: null } : s)) };
    expect(() => compileScene(open)).toThrow(/surface 'dome' is an interface and needs a medium on both sides/);
    const unknown: SceneDescription = { ...d, emitter: { ...d.emitter, medium: 'nowhere' } };
    expect(() => compileScene(unknown)).toThrow(/unknown medium 'nowhere'/);
  });
});
