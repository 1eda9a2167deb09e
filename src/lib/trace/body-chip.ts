/**
 * The chip as scene parts: one box medium per layer, bottom to top, stacked on the floor (z = 0) and
 * centred on the axis. Each layer's side faces and the top face border the medium around the chip;
 * each interface between two layers is one surface with a layer on either side; the bottom face is
 * the mirror the chip stands on.
 */
import type { Behaviour, SceneMedium, SceneSurface } from './scene';

/** The convex solid the chip's outer faces bound (SceneSurface.convexSolid). */
const CHIP_SOLID = 'chip';

export interface ChipLayerSpec {
  /** Medium name of the layer (unique in the scene). */
  name: string;
  thicknessMm: number;
  n: number;
  absorptionPerMm: number;
}

export interface ChipParts {
  media: SceneMedium[];
  surfaces: SceneSurface[];
  /** Faces bordering the medium around the chip (sides of every layer, then the top). */
  outerFaces: string[];
  /** Total height, mm. */
  heightMm: number;
}

export interface ChipBuild {
  widthMm: number;
  lengthMm: number;
  layers: ChipLayerSpec[];
  /** Medium around the chip. */
  around: string;
  /** The chip's bottom: a mirror (or diffuse reflector), and the ledger bin of what it absorbs. */
  bottom: { name: string; behaviour: Behaviour; absorbedBin: string };
  /** Behaviour of the top face (Fresnel, or textured). */
  top: Behaviour;
  /**
   * A medium bordering the sides below a height (a settled phosphor layer), 0 < heightMm < the chip's
   * height: side faces below it border that medium, a side face crossing it is split in two there (its
   * layer's box then names no faces: the layer finds its exit by its surface list).
   */
  below?: { medium: string; heightMm: number };
}

/** Builds the chip's media and surfaces (inputs checked by the caller; see package-spec.ts). */
export function chipParts(c: ChipBuild): ChipParts {
  const a = c.widthMm / 2;
  const b = c.lengthMm / 2;
  const single = c.layers.length === 1;
  const media: SceneMedium[] = [];
  const surfaces: SceneSurface[] = [];
  const outerFaces: string[] = [];
  surfaces.push({
    name: c.bottom.name,
    shape: { kind: 'rect', axis: 2, at: 0, normalSign: 1, uMin: -a, uMax: a, vMin: -b, vMax: b },
    front: c.layers[0].name,
    behind: null,
    behaviour: c.bottom.behaviour,
    absorbedBin: c.bottom.absorbedBin
  });
  let z0 = 0;
  let below = c.bottom.name;
  c.layers.forEach((layer, i) => {
    const z1 = z0 + layer.thicknessMm;
    const top = i === c.layers.length - 1;
    const label = single ? 'chip' : layer.name;
    const upper = top ? 'chip top' : `${layer.name} / ${c.layers[i + 1].name}`;
    const sides = (['+x', '−x', '+y', '−y'] as const).map((s) => `${label} ${s}`);
    const part = (name: string, axis: 0 | 1, sign: 1 | -1, zLow: number, zHigh: number, front: string): SceneSurface => ({
      name,
      shape:
        axis === 0
          ? { kind: 'rect', axis: 0, at: sign * a, normalSign: sign, uMin: -b, uMax: b, vMin: zLow, vMax: zHigh }
          : { kind: 'rect', axis: 1, at: sign * b, normalSign: sign, uMin: -a, uMax: a, vMin: zLow, vMax: zHigh },
      front,
      behind: layer.name,
      behaviour: { kind: 'fresnel' },
      convexSolid: CHIP_SOLID,
      escapedBin: 'chip sides',
      legacyEscape: 'escapedChipSide'
    });
    // A side face, or its two parts when the medium below a height meets it part-way up
    const zSplit = c.below ? c.below.heightMm : -Infinity;
    const split = zSplit > z0 && zSplit < z1;
    const side = (name: string, axis: 0 | 1, sign: 1 | -1): SceneSurface[] =>
      split
        ? [part(`${name} in ${c.below!.medium}`, axis, sign, z0, zSplit, c.below!.medium), part(name, axis, sign, zSplit, z1, c.around)]
        : [part(name, axis, sign, z0, z1, z1 <= zSplit ? c.below!.medium : c.around)];
    const topFace: SceneSurface = {
      name: upper,
      shape: { kind: 'rect', axis: 2, at: z1, normalSign: 1, uMin: -a, uMax: a, vMin: -b, vMax: b },
      front: top ? c.around : c.layers[i + 1].name,
      behind: layer.name,
      behaviour: top ? c.top : { kind: 'fresnel' },
      ...(top ? { legacyEscape: 'escapedChipTop' as const, convexSolid: CHIP_SOLID } : {})
    };
    // The top face first, then the sides: the order the medium around meets them in a tie
    if (top) surfaces.push(topFace);
    const sideFaces = [...side(sides[0], 0, 1), ...side(sides[1], 0, -1), ...side(sides[2], 1, 1), ...side(sides[3], 1, -1)];
    surfaces.push(...sideFaces);
    if (!top) surfaces.push(topFace);
    media.push({
      name: layer.name,
      role: 'chip',
      n: layer.n,
      absorptionPerMm: layer.absorptionPerMm,
      box: split ? { a, b, z0, z1 } : { a, b, z0, z1, faces: [sides[0], sides[1], sides[2], sides[3], upper, below] }
    });
    outerFaces.push(...sideFaces.map((f) => f.name));
    if (top) outerFaces.unshift(upper);
    below = upper;
    z0 = z1;
  });
  return { media, surfaces, outerFaces, heightMm: z0 };
}
