/**
 * One scene for an optic over its source (optic-source.ts): the package's own scene plus the optic's
 * solids in its outside medium, or the idealised source / ray file in air under the optic.
 *
 * The idealised source and the ray file stand on a black board, the whole plane z = source plane
 * (absorbing: light sent back onto the source is counted apart, not returned); a ray's escape is
 * credited to the board until it meets a surface, so light that never meets the optic is counted as
 * missed.
 */
import { opticParts, type OpticFaceRole } from '../trace/body-optic';
import { packageScene } from '../trace/package-scene';
import type { MirrorSpec, SceneDescription, SceneSurface } from '../trace/scene';
import type { OpticDesign } from '../optic-design/optic-design';
import { packageIntrusionMm, sourceFootprint, type OpticSource } from './optic-source';

export const SOURCE_BOARD = 'source';
const OUTSIDE = 'outside';

export interface OpticScene {
  scene: SceneDescription;
  /** Role of each optic surface, by name (body-optic.ts). */
  roles: Record<string, OpticFaceRole>;
  /** Height of the design's source plane in the scene, mm. */
  zOffsetMm: number;
}

/**
 * The scene of `design` over `source`.
 * @param material index and absorption (1/mm) of the lens or TIR material at the run's wavelength
 * @param mirror the reflector's mirror
 * @throws RangeError naming gapMm when the optic would cut into the package's encapsulant
 */
export function opticScene(design: OpticDesign, source: OpticSource, material: { n: number; absorptionPerMm: number }, mirror: MirrorSpec): OpticScene {
  const { topMm } = sourceFootprint(source);
  const parts = opticParts(design, topMm, material, mirror, OUTSIDE, source.kind === 'package' ? source.pkg.outsideN : 1);
  if (source.kind === 'package') {
    let dip = 0;
    for (const f of design.surfaces) dip = Math.max(dip, packageIntrusionMm(source.pkg, f.r, f.z.map((v) => v + topMm)));
    if (dip > 0) {
      throw new RangeError(
        `gapMm: the optic meets the package's encapsulant; raise the gap to at least ${(design.gapMm + dip + 0.05).toFixed(2)} mm, in [0, height)`
      );
    }
    const base = packageScene(source.pkg);
    // With the optic in the outside, a ray leaving the package may meet it: no escape from the package is final
    const packageSurfaces = base.surfaces.map(({ finalExit: _final, ...s }) => s);
    return {
      scene: { ...base, media: [...base.media, ...parts.media], surfaces: [...packageSurfaces, ...parts.surfaces] },
      roles: parts.roles,
      zOffsetMm: topMm
    };
  }
  const boardZ = source.kind === 'lambertian' ? 0 : lowestStart(source.list.rays, source.list.count);
  const board: SceneSurface = {
    name: SOURCE_BOARD,
    shape: { kind: 'disc', at: boardZ, normalSign: 1, rInner: 0, rOuter: Infinity },
    front: OUTSIDE,
    behind: null,
    behaviour: { kind: 'absorber' }
  };
  const l = source.kind === 'lambertian' ? (source.lengthMm ?? source.widthMm) : 0;
  return {
    scene: {
      media: [{ name: OUTSIDE, role: 'outside', n: 1, absorptionPerMm: 0 }, ...parts.media],
      surfaces: [board, ...parts.surfaces],
      outside: OUTSIDE,
      emitter:
        source.kind === 'lambertian'
          ? { medium: OUTSIDE, mode: 'lambertian', z: 0, source: { shape: source.shape, widthMm: source.widthMm, lengthMm: l }, surface: SOURCE_BOARD }
          : { medium: OUTSIDE, mode: 'rays', z: boardZ, rays: source.list.rays, surface: SOURCE_BOARD },
      polarization: 'average'
    },
    roles: parts.roles,
    zOffsetMm: topMm
  };
}

/** The lowest start of the file's rays, a hair below (so no ray starts on the board), mm. */
function lowestStart(rays: Float64Array, count: number): number {
  let z = Infinity;
  for (let i = 0; i < count; i++) z = Math.min(z, rays[7 * i + 2]);
  return z - 1e-6;
}
