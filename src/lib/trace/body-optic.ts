/**
 * A beam optic (optic-design's OpticDesign) as scene parts over a source: its faces become surfaces
 * of revolution in the outside medium, shifted up by `zOffsetMm` (the design's source plane z = 0
 * sits on the package's top or the idealised source).
 * - Reflector: one mirror surface (specular, a reflectance or a metal's n + ik) facing the axis (the
 *   outside medium behind its outward normal; its back is opaque and never met by light from the
 *   source inside it), open front; a thin exit window of the outside's own index across the front (Fresnel
 *   at equal indices never reflects) credits the light leaving through the front to the optic.
 * - Lens, TIR collimator: one closed solid of the optic's material, every face a Fresnel interface.
 * Surface names are 'optic <face>'; the roles tell the ledger which face is the exit, the side wall,
 * an entry face or the mirror.
 */
import type { OpticDesign } from '../optic-design/optic-design';
import type { MirrorSpec, SceneMedium, SceneSurface, Shape } from './scene';

/** What a face does for the beam, for the ledger: light leaving through it is out, leaked, or turned back. */
export type OpticFaceRole = 'exit' | 'side' | 'entry' | 'mirror';

export interface OpticParts {
  media: SceneMedium[];
  surfaces: SceneSurface[];
  /** Role of each optic surface, by surface name. */
  roles: Record<string, OpticFaceRole>;
  /** Medium name of the optic's material (absent for a reflector). */
  mediumName?: string;
}

export const OPTIC_MEDIUM = 'optic';
const EXIT_WINDOW = 'exit window';
/** Thickness of the reflector's exit window, mm (any small value: nothing happens inside it). */
const WINDOW_MM = 0.01;

/** Faces through which the beam leaves (the exit) and the side walls where light leaks, by design face name. */
const ROLE_BY_FACE: Record<string, OpticFaceRole> = { exit: 'exit', 'tir-wall': 'side', edge: 'side' };

function shifted(r: Float64Array, z: Float64Array, dz: number): { kind: 'revolution'; r: Float64Array; z: Float64Array } {
  return { kind: 'revolution', r: Float64Array.from(r), z: z.map((v) => v + dz) };
}

/**
 * A flat face of one segment (z constant) as the scene's own disc or annulus: intersected in closed form,
 * far cheaper than a profile, and the same plane. The profile's front lies right of its direction
 * (outward normal (0, −Δr)): +z when the segment runs toward the axis. Null for any other face.
 * (Walls stay profiles: as a native cylinder the cavity wall, whose outside medium is inside it, lost rays.)
 */
function flatFace(r: Float64Array, z: Float64Array, dz: number): Shape | null {
  if (r.length !== 2 || z[0] !== z[1] || r[0] === r[1]) return null;
  return { kind: 'disc', at: z[0] + dz, normalSign: r[1] < r[0] ? 1 : -1, rInner: Math.min(r[0], r[1]), rOuter: Math.max(r[0], r[1]) };
}

/**
 * The optic's media and surfaces.
 * @param material the lens or TIR material at the run's wavelength: index and bulk absorption (1/mm)
 * @param mirror the reflector's mirror
 * @param outside name of the scene's outside medium
 * @param outsideN its index
 */
export function opticParts(
  design: OpticDesign,
  zOffsetMm: number,
  material: { n: number; absorptionPerMm: number },
  mirror: MirrorSpec,
  outside: string,
  outsideN: number
): OpticParts {
  const roles: Record<string, OpticFaceRole> = {};
  if (design.type === 'reflector') {
    const surfaces: SceneSurface[] = design.surfaces.map((s) => {
      const name = `optic ${s.name}`;
      roles[name] = 'mirror';
      return { name, shape: shifted(s.r, s.z, zOffsetMm), front: null, behind: outside, behaviour: { kind: 'mirror', mirror } };
    });
    // The exit window: a thin disc-shaped region of the outside's own index over the open front, so light
    // through the front is credited to the optic (a surface with one medium on both sides would meet itself again)
    const top = design.heightMm + zOffsetMm;
    const R = design.exitDiameterMm / 2;
    const window: SceneSurface[] = [
      { name: 'optic exit', shape: { kind: 'disc', at: top, normalSign: -1, rInner: 0, rOuter: R }, front: outside, behind: EXIT_WINDOW, behaviour: { kind: 'fresnel' } },
      { name: 'optic exit rim', shape: { kind: 'cylinder', radius: R, z0: top, z1: top + WINDOW_MM }, front: outside, behind: EXIT_WINDOW, behaviour: { kind: 'fresnel' } },
      { name: 'optic exit top', shape: { kind: 'disc', at: top + WINDOW_MM, normalSign: 1, rInner: 0, rOuter: R }, front: outside, behind: EXIT_WINDOW, behaviour: { kind: 'fresnel' } }
    ];
    for (const w of window) roles[w.name] = 'exit';
    surfaces.push(...window);
    return { media: [{ name: EXIT_WINDOW, role: 'outside', n: outsideN, absorptionPerMm: 0 }], surfaces, roles };
  }
  const media: SceneMedium[] = [{ name: OPTIC_MEDIUM, role: 'encapsulant', n: material.n, absorptionPerMm: material.absorptionPerMm }];
  const surfaces: SceneSurface[] = design.surfaces.map((s) => {
    const name = `optic ${s.name}`;
    roles[name] = ROLE_BY_FACE[s.name] ?? 'entry';
    const flat = flatFace(s.r, s.z, zOffsetMm);
    if (flat) return { name, shape: flat, front: outside, behind: OPTIC_MEDIUM, behaviour: { kind: 'fresnel' } };
    return { name, shape: shifted(s.r, s.z, zOffsetMm), front: outside, behind: OPTIC_MEDIUM, behaviour: { kind: 'fresnel' } };
  });
  return { media, surfaces, roles, mediumName: OPTIC_MEDIUM };
}
