/**
 * Packs a scene description (scene.ts) into flat typed arrays for the ray loop, once per run: a
 * medium table, a surface table (layouts in scene-layout.ts), each medium's list of bounding
 * surfaces, and the ledger's named bins.
 *
 * Ledger bins, in order: 'lost:event cap', 'lost:geometry error', then 'medium:<name>' for each
 * medium that absorbs (the outside never does), 'surface:<bin>' for each surface that can absorb
 * (mirror, diffuse, absorber; surfaces naming the same bin share it) and 'escaped:<bin>' for each
 * surface bordering the outside medium. A ray's escape is credited to the last surface it met.
 */
import {
  BEHAVIOUR_ABSORBER,
  BEHAVIOUR_DIFFUSE,
  BEHAVIOUR_FRESNEL,
  BEHAVIOUR_MIRROR,
  BEHAVIOUR_TEXTURED,
  BOUNDARY_BOX,
  BOUNDARY_LIST,
  COUNTER_TIR_CHIP,
  COUNTER_TIR_OUTER,
  MEDIUM_STRIDE,
  M_ABSORPTION,
  M_ASYMMETRY,
  M_BIN,
  M_BOUNDARY,
  M_BOX_A,
  M_BOX_B,
  M_BOX_FACES,
  M_BOX_Z0,
  M_BOX_Z1,
  M_CONVEX_COUNT,
  M_CONVEX_REST,
  M_CONVEX_SPHERE,
  M_INDEX,
  M_IS_CHIP,
  M_LIST_COUNT,
  M_LIST_START,
  M_PHOSPHOR,
  M_SCATTERING,
  NONE,
  SHAPE_CYLINDER,
  SHAPE_DISC,
  SHAPE_FRUSTUM,
  SHAPE_RECT,
  SHAPE_REVOLUTION,
  SHAPE_SPHEROID_CAP,
  EMIT_LAMBERTIAN_DISC,
  EMIT_LAMBERTIAN_RECT,
  EMIT_PLANE,
  EMIT_RAYS,
  EMIT_RAY_STRIDE,
  EMIT_VOLUME,
  DIRECTION_DOWN,
  DIRECTION_ISOTROPIC,
  DIRECTION_LAMBERTIAN_DOWN,
  SIDE_BEHIND,
  SIDE_FRONT,
  SURFACE_STRIDE,
  S_B,
  S_BEHAVIOUR,
  S_BEHIND,
  S_BIN_ABSORBED,
  S_BIN_ESCAPED,
  S_FRONT,
  S_P,
  S_SHAPE,
  S_TIR_BEHIND,
  S_TIR_FRONT
} from './scene-layout';
import { buildRevolutionProfile, type RevolutionProfile } from '../optic-design/revolution-intersect';
import { buildSpectralTables, type SpectralTables } from './phosphor-tables';
import type { LegacyEscape, ScenePhosphor, SceneDescription, SceneSurface, Shape } from './scene';

/** Which count of the older fixed ledger (Tally fields) a bin also adds to. */
export type LedgerGroup = 'escaped' | 'absorbedChip' | 'absorbedEncapsulant' | 'absorbedBase' | 'lost';

export interface CompiledScene {
  /** Medium records, MEDIUM_STRIDE doubles each. */
  media: Float64Array;
  /** Surface records, SURFACE_STRIDE doubles each. */
  surfaces: Float64Array;
  /** Bounds entries (surface·2 + side), each medium's run at [M_LIST_START, + M_LIST_COUNT). */
  bounds: Int32Array;
  outside: number;
  emitterMedium: number;
  emitterVolume: boolean;
  /** EMIT_* (scene-layout.ts). */
  emitterKind: number;
  emitterZ: number;
  /** DIRECTION_ISOTROPIC, DIRECTION_DOWN or DIRECTION_LAMBERTIAN_DOWN (scene-layout.ts), for a chip emitter. */
  emitterDirection: number;
  /** Lambertian source: half width (disc radius) and half length, mm. */
  emitterHalfWidth: number;
  emitterHalfLength: number;
  /** 'rays' emitter: EMIT_RAY_STRIDE doubles per ray, the last the cumulative weight (the final one = 1). */
  emitterRays: Float64Array;
  /** Surface a launched ray counts as last met (NONE for a chip: it meets the chip's faces). */
  emitterSurface: number;
  /** Prepared profiles of the revolution surfaces, by the index packed in their records. */
  profiles: RevolutionProfile[];
  track: boolean;
  /**
   * Spectral rays and phosphor tables when some medium holds a phosphor; null otherwise (no wavelength
   * is drawn). In a spectral scene the ray loop rewrites the index slot of each dispersive medium in
   * `media` whenever the ray's wavelength changes (medium-events.ts): after a run it holds the last ray's.
   */
  spectral: SpectralTables | null;
  /** Ledger bin of each phosphor's heat (absorbed, not re-emitted), by phosphor index. */
  phosphorBins: number[];
  /** 1 for each surface whose escapes are final (SceneSurface.finalExit), by surface index. */
  finalExit: Uint8Array;
  /**
   * By surface index: the medium whose list starts with this surface among the M_CONVEX_COUNT faces of
   * a convex solid (SceneSurface.convexSolid), or NONE.
   */
  convexOf: Int32Array;
  /** True when some medium absorbs (each ray then draws an optical depth). */
  absorbing: boolean;
  binNames: string[];
  binGroups: LedgerGroup[];
  binLegacyEscape: (LegacyEscape | null)[];
  /** Medium and surface names by index, for messages and the drawing. */
  mediumNames: string[];
  surfaceNames: string[];
}

/**
 * Writes a shape's kind and parameters into a surface record at offset o (layouts in scene-layout.ts).
 * @returns out
 */
export function packShape(sh: Shape, out: Float64Array, o: number, profileIndex = 0, surfaceIndex = 0): Float64Array {
  const p = o + S_P;
  switch (sh.kind) {
    case 'rect':
      out[o + S_SHAPE] = SHAPE_RECT;
      out.set([sh.axis, sh.at, sh.normalSign, sh.uMin, sh.uMax, sh.vMin, sh.vMax], p);
      break;
    case 'disc':
      out[o + S_SHAPE] = SHAPE_DISC;
      out.set([sh.at, sh.normalSign, sh.rInner * sh.rInner, sh.rOuter * sh.rOuter], p);
      break;
    case 'cylinder':
      out[o + S_SHAPE] = SHAPE_CYLINDER;
      out.set([sh.radius, sh.z0, sh.z1], p);
      break;
    case 'frustum':
      out[o + S_SHAPE] = SHAPE_FRUSTUM;
      out.set([sh.r0, sh.z0, sh.r1, sh.z1, (sh.r1 - sh.r0) / (sh.z1 - sh.z0)], p);
      break;
    case 'spheroid-cap':
      out[o + S_SHAPE] = SHAPE_SPHEROID_CAP;
      out.set([sh.radius, sh.height, sh.zCentre, 1 / (sh.radius * sh.radius), 1 / (sh.height * sh.height)], p);
      break;
    case 'revolution':
      out[o + S_SHAPE] = SHAPE_REVOLUTION;
      out.set([profileIndex, surfaceIndex], p);
      break;
  }
  return out;
}

function absorbs(s: SceneSurface): boolean {
  const k = s.behaviour.kind;
  return k === 'mirror' || k === 'diffuse' || k === 'absorber';
}

/**
 * Compiles a scene description. Throws an Error naming the problem when the description is not
 * consistent (unknown medium, duplicate name, a box face that does not bound its box medium): those
 * are builder mistakes, not user input.
 */
/**
 * [x, y, z, r²] of a sphere around rect faces: the centre and half diagonal of their corners' bounding
 * box, the radius raised by 1e-9 of itself so that roundoff never puts a face outside; r² = ∞ when there
 * are none or one is not a rect.
 */
function boundingSphere(shapes: Shape[]): [number, number, number, number] {
  const lo = [Infinity, Infinity, Infinity];
  const hi = [-Infinity, -Infinity, -Infinity];
  for (const sh of shapes) {
    if (sh.kind !== 'rect') return [0, 0, 0, Infinity];
    // the rect's plane coordinate, then its two in-plane axes in order (as intersectRect reads them)
    const iu = sh.axis === 0 ? 1 : 0;
    const iv = sh.axis === 2 ? 1 : 2;
    for (const [k, a, b] of [
      [sh.axis, sh.at, sh.at],
      [iu, sh.uMin, sh.uMax],
      [iv, sh.vMin, sh.vMax]
    ]) {
      lo[k] = Math.min(lo[k], a);
      hi[k] = Math.max(hi[k], b);
    }
  }
  if (!shapes.length) return [0, 0, 0, Infinity];
  const r = Math.hypot((hi[0] - lo[0]) / 2, (hi[1] - lo[1]) / 2, (hi[2] - lo[2]) / 2) * (1 + 1e-9);
  return [(lo[0] + hi[0]) / 2, (lo[1] + hi[1]) / 2, (lo[2] + hi[2]) / 2, r * r];
}

export function compileScene(scene: SceneDescription): CompiledScene {
  const mediumIndex = new Map<string, number>();
  scene.media.forEach((m, i) => {
    if (mediumIndex.has(m.name)) throw new Error(`scene: duplicate medium name '${m.name}'`);
    mediumIndex.set(m.name, i);
  });
  const surfaceIndex = new Map<string, number>();
  scene.surfaces.forEach((s, i) => {
    if (surfaceIndex.has(s.name)) throw new Error(`scene: duplicate surface name '${s.name}'`);
    surfaceIndex.set(s.name, i);
  });
  const mediumOf = (name: string | null, where: string): number => {
    if (name === null) return NONE;
    const i = mediumIndex.get(name);
    if (i === undefined) throw new Error(`scene: ${where} names unknown medium '${name}'`);
    return i;
  };
  const outside = mediumOf(scene.outside, 'outside');

  // Ledger bins; the first two are BIN_EVENT_CAP and BIN_GEOMETRY_ERROR (scene-layout.ts)
  const binNames: string[] = ['lost:event cap', 'lost:geometry error'];
  const binGroups: LedgerGroup[] = ['lost', 'lost'];
  const binLegacyEscape: (LegacyEscape | null)[] = [null, null];
  const binOf = (name: string, group: LedgerGroup, legacy: LegacyEscape | null = null): number => {
    const found = binNames.indexOf(name);
    if (found >= 0) return found;
    binNames.push(name);
    binGroups.push(group);
    binLegacyEscape.push(legacy);
    return binNames.length - 1;
  };

  // Media
  const nm = scene.media.length;
  const media = new Float64Array(nm * MEDIUM_STRIDE);
  let absorbing = false;
  const phosphors: ScenePhosphor[] = [];
  const phosphorBins: number[] = [];
  scene.media.forEach((m, i) => {
    const o = i * MEDIUM_STRIDE;
    media[o + M_INDEX] = m.n;
    media[o + M_ABSORPTION] = i === outside ? 0 : m.absorptionPerMm;
    media[o + M_SCATTERING] = 0;
    media[o + M_ASYMMETRY] = 0;
    media[o + M_PHOSPHOR] = NONE;
    if (m.phosphor && i !== outside) {
      media[o + M_PHOSPHOR] = phosphors.length;
      phosphors.push(m.phosphor);
      phosphorBins.push(binOf(`phosphor:${m.name}`, 'absorbedEncapsulant'));
    }
    media[o + M_IS_CHIP] = m.role === 'chip' ? 1 : 0;
    if (i !== outside && m.absorptionPerMm > 0) {
      absorbing = true;
      media[o + M_BIN] = binOf(`medium:${m.name}`, m.role === 'chip' ? 'absorbedChip' : 'absorbedEncapsulant');
    } else {
      media[o + M_BIN] = NONE;
    }
    media[o + M_BOUNDARY] = m.box?.faces ? BOUNDARY_BOX : BOUNDARY_LIST;
  });

  // Surfaces
  const ns = scene.surfaces.length;
  const surfaces = new Float64Array(ns * SURFACE_STRIDE);
  const lists: number[][] = scene.media.map(() => []);
  const profiles: RevolutionProfile[] = [];
  scene.surfaces.forEach((s, i) => {
    const o = i * SURFACE_STRIDE;
    if (s.shape.kind === 'revolution') {
      profiles.push(buildRevolutionProfile([{ name: s.name, r: s.shape.r, z: s.shape.z }]));
    }
    packShape(s.shape, surfaces, o, profiles.length - 1, i);
    const front = mediumOf(s.front, `surface '${s.name}'`);
    const behind = mediumOf(s.behind, `surface '${s.name}'`);
    surfaces[o + S_FRONT] = front;
    surfaces[o + S_BEHIND] = behind;
    const b = s.behaviour;
    const q = o + S_B;
    switch (b.kind) {
      case 'fresnel':
        surfaces[o + S_BEHAVIOUR] = BEHAVIOUR_FRESNEL;
        break;
      case 'textured':
        surfaces[o + S_BEHAVIOUR] = BEHAVIOUR_TEXTURED;
        surfaces[q] = b.scatteredFraction;
        break;
      case 'mirror':
        surfaces[o + S_BEHAVIOUR] = BEHAVIOUR_MIRROR;
        if (b.mirror.kind === 'metal') surfaces.set([-1, b.mirror.n, b.mirror.k, 0], q);
        else surfaces.set([b.mirror.reflectance, 1, 0, Math.sqrt(b.mirror.reflectance)], q);
        break;
      case 'diffuse':
        surfaces[o + S_BEHAVIOUR] = BEHAVIOUR_DIFFUSE;
        surfaces[q] = b.reflectance;
        break;
      case 'absorber':
        surfaces[o + S_BEHAVIOUR] = BEHAVIOUR_ABSORBER;
        break;
    }
    const dielectric = b.kind === 'fresnel' || b.kind === 'textured';
    if (dielectric && (front === NONE || behind === NONE)) {
      throw new Error(`scene: surface '${s.name}' is an interface and needs a medium on both sides`);
    }
    surfaces[o + S_BIN_ABSORBED] = absorbs(s) ? binOf(`surface:${s.absorbedBin ?? s.name}`, 'absorbedBase') : NONE;
    surfaces[o + S_BIN_ESCAPED] =
      front === outside || behind === outside ? binOf(`escaped:${s.escapedBin ?? s.name}`, 'escaped', s.legacyEscape ?? null) : NONE;
    // Debug TIR counters: from inside a chip layer, or from the encapsulant into the outside
    const tirFrom = (from: number, to: number) =>
      from === NONE ? NONE : media[from * MEDIUM_STRIDE + M_IS_CHIP] === 1 ? COUNTER_TIR_CHIP : to === outside ? COUNTER_TIR_OUTER : NONE;
    surfaces[o + S_TIR_FRONT] = tirFrom(front, behind);
    surfaces[o + S_TIR_BEHIND] = tirFrom(behind, front);
    if (front !== NONE && !scene.media[front].box?.faces) lists[front].push(2 * i + SIDE_FRONT);
    if (behind !== NONE && !scene.media[behind].box?.faces) lists[behind].push(2 * i + SIDE_BEHIND);
  });

  // Box media: their six faces, by the side the box lies on
  scene.media.forEach((m, i) => {
    if (!m.box) return;
    const o = i * MEDIUM_STRIDE;
    media[o + M_BOX_A] = m.box.a;
    media[o + M_BOX_B] = m.box.b;
    media[o + M_BOX_Z0] = m.box.z0;
    media[o + M_BOX_Z1] = m.box.z1;
    m.box.faces?.forEach((faceName, f) => {
      const s = surfaceIndex.get(faceName);
      if (s === undefined) throw new Error(`scene: box medium '${m.name}' names unknown face '${faceName}'`);
      const front = surfaces[s * SURFACE_STRIDE + S_FRONT];
      const behind = surfaces[s * SURFACE_STRIDE + S_BEHIND];
      if (front !== i && behind !== i) throw new Error(`scene: face '${faceName}' does not bound box medium '${m.name}'`);
      media[o + M_BOX_FACES + f] = 2 * s + (front === i ? SIDE_FRONT : SIDE_BEHIND);
    });
  });

  // Bounds lists, one run per medium; first in each, the faces of the first convex solid it sees from
  // without (SceneSurface.convexSolid), each marked with the medium whose search may skip it
  const flat: number[] = [];
  const convexOf = new Int32Array(ns).fill(NONE);
  lists.forEach((list, i) => {
    const solidOf = (entry: number) => ((entry & 1) === SIDE_FRONT ? (scene.surfaces[entry >> 1].convexSolid ?? null) : null);
    const solid = list.map(solidOf).find((name) => name !== null) ?? null;
    const faces = solid === null ? [] : list.filter((entry) => solidOf(entry) === solid);
    for (const entry of faces) convexOf[entry >> 1] = i;
    media[i * MEDIUM_STRIDE + M_LIST_START] = flat.length;
    media[i * MEDIUM_STRIDE + M_LIST_COUNT] = list.length;
    media[i * MEDIUM_STRIDE + M_CONVEX_COUNT] = faces.length;
    media[i * MEDIUM_STRIDE + M_CONVEX_REST] = faces.length > 0 && scene.media[i].convexAroundSolid === true ? 1 : 0;
    media.set(boundingSphere(faces.map((entry) => scene.surfaces[entry >> 1].shape)), i * MEDIUM_STRIDE + M_CONVEX_SPHERE);
    // Around a convex solid in a convex region the first of the rest met is the exit (SceneMedium.convexAroundSolid):
    // the flat pieces first (the cheapest tests), then the curved ones, and a plane reaching beyond the
    // region (the base) last, where it is met only when nothing else is
    const rest = list.filter((entry) => !faces.includes(entry));
    const rank = (entry: number) => {
      const shape = scene.surfaces[entry >> 1].shape;
      if (shape.kind === 'disc' && shape.rOuter === Infinity) return 2;
      return shape.kind === 'disc' || shape.kind === 'rect' ? 0 : 1;
    };
    const ordered = scene.media[i].convexAroundSolid === true ? [0, 1, 2].flatMap((r) => rest.filter((e) => rank(e) === r)) : rest;
    flat.push(...faces, ...ordered);
  });

  const em = scene.emitter;
  const surfaceOf = (name: string): number => {
    const i = surfaceIndex.get(name);
    if (i === undefined) throw new Error(`scene: the emitter names unknown surface '${name}'`);
    return i;
  };
  const emitterMedium = mediumOf(em.medium, 'emitter');
  const boxEmitter = em.mode === 'plane' || em.mode === 'volume';
  if (boxEmitter && !scene.media[emitterMedium].box) throw new Error(`scene: the emitter's medium '${em.medium}' must be a box`);
  if (em.mode === 'lambertian' && !em.source) throw new Error("scene: a 'lambertian' emitter needs its source");
  if (em.mode === 'rays' && !(em.rays && em.rays.length >= EMIT_RAY_STRIDE)) throw new Error("scene: a 'rays' emitter needs at least one ray");
  const emitterKind =
    em.mode === 'plane'
      ? EMIT_PLANE
      : em.mode === 'volume'
        ? EMIT_VOLUME
        : em.mode === 'rays'
          ? EMIT_RAYS
          : em.source?.shape === 'disc'
            ? EMIT_LAMBERTIAN_DISC
            : EMIT_LAMBERTIAN_RECT;
  // The ray table with cumulative weights, normalised so the last is 1 (drawn by bisection)
  let emitterRays = new Float64Array(0);
  if (em.mode === 'rays' && em.rays) {
    emitterRays = Float64Array.from(em.rays);
    let sum = 0;
    for (let i = EMIT_RAY_STRIDE - 1; i < emitterRays.length; i += EMIT_RAY_STRIDE) {
      sum += emitterRays[i];
      emitterRays[i] = sum;
    }
    for (let i = EMIT_RAY_STRIDE - 1; i < emitterRays.length; i += EMIT_RAY_STRIDE) emitterRays[i] /= sum;
  }
  if (phosphors.length && !scene.chipSpectrum) throw new Error('scene: a phosphor medium needs the chip spectrum');
  const direction = em.direction ?? 'isotropic';
  return {
    media,
    surfaces,
    bounds: Int32Array.from(flat),
    outside,
    emitterMedium,
    emitterVolume: em.mode === 'volume',
    emitterKind,
    emitterZ: em.z,
    emitterDirection: direction === 'down' ? DIRECTION_DOWN : direction === 'lambertian-down' ? DIRECTION_LAMBERTIAN_DOWN : DIRECTION_ISOTROPIC,
    emitterHalfWidth: em.source ? em.source.widthMm / 2 : 0,
    emitterHalfLength: em.source ? (em.source.shape === 'disc' ? em.source.widthMm : em.source.lengthMm) / 2 : 0,
    emitterRays,
    emitterSurface: em.surface === undefined ? NONE : surfaceOf(em.surface),
    profiles,
    spectral:
      phosphors.length && scene.chipSpectrum
        ? buildSpectralTables(
            scene.chipSpectrum,
            phosphors,
            scene.media.flatMap((m, i) => (m.indexRows ? [{ medium: i, rows: m.indexRows }] : []))
          )
        : null,
    phosphorBins,
    track: scene.polarization === 'track',
    finalExit: Uint8Array.from(scene.surfaces, (s) => (s.finalExit === true ? 1 : 0)),
    convexOf,
    absorbing,
    binNames,
    binGroups,
    binLegacyEscape,
    mediumNames: scene.media.map((m) => m.name),
    surfaceNames: scene.surfaces.map((s) => s.name)
  };
}
