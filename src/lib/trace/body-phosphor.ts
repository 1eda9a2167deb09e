/**
 * A phosphor layer as scene parts: a medium of the encapsulant material holding the particles, of
 * thickness T, and the surfaces that bound it, added to a package's body (the chip's and the body's
 * surfaces built already, see package-scene.ts). Its fit is checked first (phosphorFitProblems).
 *
 * - conformal: a box shell around the chip's top and sides, (w + 2T) × (l + 2T) × (H + T): its outer
 *   top and four sides border the encapsulant, its foot is four strips of the base (or cup floor)
 *   around the chip, and the chip's own top and side faces are ONE surface each with the chip behind
 *   and the layer in front (the chip is built with the layer around it).
 * - remote: on a flat fill or a cylinder, the top T of it — a plate whose top is the fill's top face,
 *   whose rim is the upper part of the wall (split at the plate's underside), over an interface disc to
 *   the clear encapsulant below (the same index on both sides: it only marks the region). Under a dome a
 *   plate would not be one, so the layer is a shell of thickness T under the dome's surface (a remote
 *   phosphor cap): the dome bounds it outside, an inner spheroid cap (R − T, h − T) inside, and its foot
 *   is the annulus R − T ≤ r ≤ R of the base (flat body) or an interface to the cup's fill (cup).
 *   For a spheroid that is not a hemisphere the shell is T thick at the top and at the foot and a
 *   little different in between (the inner surface is a spheroid, not a parallel surface).
 * - floor: a settled layer z ≤ T (T below the chip's height) on the cup floor or under a cylinder: the
 *   floor (or base) bounds it below, the lower part of the wall (split at T) outside, a disc at z = T
 *   the encapsulant above, and the lower part of the chip's sides (the chip is built split at T).
 */
import type { Behaviour, FrustumShape, CylinderShape, SceneSurface, Shape } from './scene';

export type PhosphorLayerRegion = 'conformal' | 'remote' | 'floor';

export interface PhosphorLayerBuild {
  region: PhosphorLayerRegion;
  thicknessMm: number;
  /** The layer's medium name (its ledger bins: 'phosphor:<name>', 'medium:<name>'). */
  medium: string;
  /** The clear encapsulant's medium name. */
  host: string;
  chip: { widthMm: number; lengthMm: number; heightMm: number };
  /** The reflector under the layer where it stands on the base or floor (conformal foot, the shell's foot on a flat base). */
  base: { behaviour: Behaviour; absorbedBin: string };
}

/** The medium name of a layer region's phosphor ('conformal phosphor', …). */
export function phosphorLayerName(region: PhosphorLayerRegion): string {
  return `${region} phosphor`;
}

function fresnel(name: string, shape: Shape, front: string, behind: string): SceneSurface {
  return { name, shape, front, behind, behaviour: { kind: 'fresnel' } };
}

/** Radius of a wall (frustum or cylinder) at height z. */
function wallRadius(sh: FrustumShape | CylinderShape, z: number): number {
  return sh.kind === 'cylinder' ? sh.radius : sh.r0 + ((sh.r1 - sh.r0) * (z - sh.z0)) / (sh.z1 - sh.z0);
}

/** The wall cut at height z into its part below and above, each a surface of its own (absorbed and escaped bins kept). */
function splitWall(s: SceneSurface, z: number): [SceneSurface, SceneSurface] {
  const sh = s.shape as FrustumShape | CylinderShape;
  const bins = { absorbedBin: s.absorbedBin ?? s.name, escapedBin: s.escapedBin ?? s.name };
  const r = wallRadius(sh, z);
  const lower: Shape = sh.kind === 'cylinder' ? { ...sh, z1: z } : { ...sh, r1: r, z1: z };
  const upper: Shape = sh.kind === 'cylinder' ? { ...sh, z0: z } : { ...sh, r0: r, z0: z };
  return [
    { ...s, ...bins, shape: lower },
    { ...s, ...bins, shape: upper }
  ];
}

/** The body's wall: the cup wall or the cylinder's side. */
function wallOf(surfaces: SceneSurface[]): SceneSurface {
  const wall = surfaces.find((s) => s.shape.kind === 'frustum' || (s.shape.kind === 'cylinder' && s.legacyEscape === 'escapedCylinderSide'));
  if (!wall) throw new Error('phosphor layer: the body has no wall to bound it');
  return wall;
}

/** The surfaces with `wall` replaced by its two parts at z, the part beside the layer renamed and bordering it. */
function withWallSplit(surfaces: SceneSurface[], wall: SceneSurface, z: number, layerBelow: boolean, layer: string): SceneSurface[] {
  const [lower, upper] = splitWall(wall, z);
  const side = (s: SceneSurface): SceneSurface => ({ ...s, name: `${wall.name} beside the ${layer}`, ...(s.behind === null ? { front: layer } : { behind: layer }) });
  const parts = layerBelow ? [side(lower), upper] : [lower, side(upper)];
  return surfaces.flatMap((s) => (s === wall ? parts : [s]));
}

/** The body's surfaces with the phosphor layer's added and re-bordered (see the file comment). */
export function withPhosphorLayer(surfaces: SceneSurface[], b: PhosphorLayerBuild): SceneSurface[] {
  const T = b.thicknessMm;
  const L = b.medium;
  if (b.region === 'conformal') {
    const a = b.chip.widthMm / 2;
    const c = b.chip.lengthMm / 2;
    const A = a + T;
    const B = c + T;
    const Z = b.chip.heightMm + T;
    const foot = (name: string, uMin: number, uMax: number, vMin: number, vMax: number): SceneSurface => ({
      name,
      shape: { kind: 'rect', axis: 2, at: 0, normalSign: 1, uMin, uMax, vMin, vMax },
      front: L,
      behind: null,
      behaviour: b.base.behaviour,
      absorbedBin: b.base.absorbedBin
    });
    return [
      ...surfaces,
      fresnel(`${L} top`, { kind: 'rect', axis: 2, at: Z, normalSign: 1, uMin: -A, uMax: A, vMin: -B, vMax: B }, b.host, L),
      fresnel(`${L} +x`, { kind: 'rect', axis: 0, at: A, normalSign: 1, uMin: -B, uMax: B, vMin: 0, vMax: Z }, b.host, L),
      fresnel(`${L} −x`, { kind: 'rect', axis: 0, at: -A, normalSign: -1, uMin: -B, uMax: B, vMin: 0, vMax: Z }, b.host, L),
      fresnel(`${L} +y`, { kind: 'rect', axis: 1, at: B, normalSign: 1, uMin: -A, uMax: A, vMin: 0, vMax: Z }, b.host, L),
      fresnel(`${L} −y`, { kind: 'rect', axis: 1, at: -B, normalSign: -1, uMin: -A, uMax: A, vMin: 0, vMax: Z }, b.host, L),
      // the foot around the chip: two strips along y beside ±x, two between them beside ±y
      foot(`base under the ${L} +x`, a, A, -B, B),
      foot(`base under the ${L} −x`, -A, -a, -B, B),
      foot(`base under the ${L} +y`, -a, a, c, B),
      foot(`base under the ${L} −y`, -a, a, -B, -c)
    ];
  }
  if (b.region === 'remote') {
    const dome = surfaces.find((s) => s.shape.kind === 'spheroid-cap');
    if (dome && dome.shape.kind === 'spheroid-cap') {
      const { radius: R, height: h, zCentre } = dome.shape;
      const footShape: Shape = { kind: 'disc', at: zCentre, normalSign: 1, rInner: R - T, rOuter: R };
      // on the flat base the shell stands on the base; on a cup's rim plane it sits on the fill
      const foot: SceneSurface =
        zCentre === 0
          ? { name: `base under the ${L}`, shape: footShape, front: L, behind: null, behaviour: b.base.behaviour, absorbedBin: b.base.absorbedBin }
          : fresnel(`${L} foot`, footShape, L, b.host);
      return [
        ...surfaces.map((s) => (s === dome ? { ...s, behind: L } : s)),
        fresnel(`${L} inner surface`, { kind: 'spheroid-cap', radius: R - T, height: h - T, zCentre }, L, b.host),
        foot
      ];
    }
    const wall = wallOf(surfaces);
    const top = surfaces.find((s) => s.shape.kind === 'disc' && s.behind === b.host && s.shape.normalSign === 1 && s.shape.at > 0);
    if (!top || top.shape.kind !== 'disc') throw new Error('phosphor layer: a remote plate needs a flat top');
    const z = top.shape.at - T;
    const plated = withWallSplit(surfaces, wall, z, false, L).map((s) => (s === top ? { ...s, behind: L } : s));
    const r = wallRadius(wall.shape as FrustumShape | CylinderShape, z);
    return [...plated, fresnel(`${L} underside`, { kind: 'disc', at: z, normalSign: 1, rInner: 0, rOuter: r }, L, b.host)];
  }
  // floor: the settled layer z ≤ T
  const wall = wallOf(surfaces);
  const floor = surfaces.find((s) => s.shape.kind === 'disc' && s.shape.at === 0 && s.front === b.host && s.behind === null);
  if (!floor) throw new Error('phosphor layer: a floor layer needs the floor');
  const settled = withWallSplit(surfaces, wall, T, true, L).map((s) => (s === floor ? { ...s, front: L } : s));
  const r = wallRadius(wall.shape as FrustumShape | CylinderShape, T);
  return [...settled, fresnel(`${L} top`, { kind: 'disc', at: T, normalSign: 1, rInner: 0, rOuter: r }, b.host, L)];
}
