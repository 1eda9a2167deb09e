/**
 * A few rays drawn through an optic for its cross-section: a small sampled walk in the meridian plane
 * (y = 0), not the Monte Carlo loop. Each ray starts on the source plane, spread over its width, at
 * angles spread over the upper half plane; at a solid's face it refracts when it can and reflects
 * totally when it cannot (the main path, no Fresnel branching); at the mirror it reflects. Each path
 * is named by what happened to it: through the lens part, by TIR, off the metal, straight out of the
 * opening, leaked through the side, or missed the optic.
 * Sources: vector Snell's law and the law of reflection (E. Hecht, Optics, 4th ed., §4.4, §4.7).
 */
import { reflectDirection, refractDirection } from '../optics/snell';
import { buildRevolutionProfile, intersectRevolution } from '../optic-design/revolution-intersect';
import type { OpticDesign } from '../optic-design/optic-design';

export type RayPathKind = 'lens' | 'tir' | 'metal' | 'direct' | 'leaked' | 'missed';

export interface RayPath {
  kind: RayPathKind;
  /** Points (x, z) in the scene, mm: the start, each event, and a last point beyond the optic. */
  points: [number, number][];
}

/**
 * Walks `count` rays (about half to each side of the axis) through the design placed with its source
 * plane at z = zOffsetMm, from a source of half width `halfWidthMm`.
 */
export function samplePaths(design: OpticDesign, zOffsetMm: number, halfWidthMm: number, count = 50): RayPath[] {
  const profile = buildRevolutionProfile(design.surfaces);
  const reach = 1.5 * Math.max(design.exitDiameterMm, design.heightMm);
  const paths: RayPath[] = [];
  const ray = new Float64Array(6);
  const hit = new Float64Array(4);
  const nrm = new Float64Array(3);
  const d = new Float64Array(3);
  for (let i = 0; i < count; i++) {
    // angles from −88° to 88°, start points across the source (the source in the design's frame: z = 0)
    const f = (i + 0.5) / count;
    const theta = ((f * 2 - 1) * 88 * Math.PI) / 180;
    const x0 = halfWidthMm * (((i * 7) % count) / count * 2 - 1);
    ray.set([x0, 0, 0, Math.sin(theta), 0, Math.cos(theta)]);
    const points: [number, number][] = [[x0, zOffsetMm]];
    let tir = false;
    let metal = false;
    let leaked = false;
    let events = 0;
    let exited = false;
    for (; events < 30; events++) {
      const t = intersectRevolution(profile, ray, 1e-7, hit);
      if (t === Infinity) break;
      for (let k = 0; k < 3; k++) ray[k] += t * ray[3 + k];
      points.push([ray[0], ray[2] + zOffsetMm]);
      d[0] = ray[3];
      d[1] = ray[4];
      d[2] = ray[5];
      const face = profile.names[profile.surfaceOfSegment[hit[3]]];
      if (design.type === 'reflector') {
        reflectDirection(d, d, hit);
        metal = true;
      } else {
        const facing = d[0] * hit[0] + d[1] * hit[1] + d[2] * hit[2] < 0;
        for (let k = 0; k < 3; k++) nrm[k] = facing ? hit[k] : -hit[k];
        const inside = !facing;
        if (refractDirection(d, d, nrm, inside ? design.n : 1, inside ? 1 : design.n)) {
          if (inside) {
            exited = face === 'exit';
            leaked = face === 'tir-wall' || face === 'edge';
          }
        } else {
          reflectDirection(d, d, nrm);
          if (face === 'tir-wall') tir = true;
        }
      }
      ray[3] = d[0];
      ray[4] = d[1];
      ray[5] = d[2];
    }
    // a last stretch beyond the optic
    points.push([ray[0] + reach * ray[3], ray[2] + zOffsetMm + reach * ray[5]]);
    const throughOpening = design.type === 'reflector' && ray[5] > 0;
    const kind: RayPathKind =
      design.type === 'reflector'
        ? metal && throughOpening
          ? 'metal'
          : !metal && throughOpening && Math.abs(ray[0] + ((design.heightMm - ray[2]) / ray[5]) * ray[3]) <= design.exitDiameterMm / 2
            ? 'direct'
            : 'missed'
        : events === 0
          ? 'missed'
          : leaked
            ? 'leaked'
            : exited
              ? tir
                ? 'tir'
                : 'lens'
              : 'missed';
    paths.push({ kind, points });
  }
  return paths;
}
