/**
 * Named offsets and kinds of the compiled scene's packed records (see compile-scene.ts). Every record
 * is a fixed-stride run of doubles in one Float64Array; small integers (kinds, indices) are stored
 * as doubles too, exact below 2⁵³.
 */

// Shape kinds
export const SHAPE_RECT = 0;
export const SHAPE_DISC = 1;
export const SHAPE_CYLINDER = 2;
export const SHAPE_FRUSTUM = 3;
export const SHAPE_SPHEROID_CAP = 4;
/** Surface of revolution from a sampled profile (scene.ts, revolution-shape.ts). */
export const SHAPE_REVOLUTION = 5;

// Behaviour kinds
export const BEHAVIOUR_FRESNEL = 0;
export const BEHAVIOUR_TEXTURED = 1;
export const BEHAVIOUR_MIRROR = 2;
export const BEHAVIOUR_DIFFUSE = 3;
export const BEHAVIOUR_ABSORBER = 4;

// Medium boundary kinds
/** The nearest of the medium's surface list. */
export const BOUNDARY_LIST = 0;
/** An axis-aligned box: the slab method picks one of six face surfaces. */
export const BOUNDARY_BOX = 1;

/** No medium on this side (opaque), or no surface / bin. */
export const NONE = -1;

// Medium record
export const M_INDEX = 0;
export const M_ABSORPTION = 1;
/** Reserved for volume scattering: scattering coefficient μs, 1/mm (0 for now). */
export const M_SCATTERING = 2;
/** Reserved: Henyey–Greenstein asymmetry g. */
export const M_ASYMMETRY = 3;
/** Reserved: phosphor table index (NONE for now). */
export const M_PHOSPHOR = 4;
/** Ledger bin of rays absorbed in this medium. */
export const M_BIN = 5;
export const M_BOUNDARY = 6;
/** First entry and entry count of this medium's run in the bounds list. */
export const M_LIST_START = 7;
export const M_LIST_COUNT = 8;
/** Box media: half width a, half length b, z0, z1 (mm). */
export const M_BOX_A = 9;
export const M_BOX_B = 10;
export const M_BOX_Z0 = 11;
export const M_BOX_Z1 = 12;
/** Box media: bounds entries of the faces +x, −x, +y, −y, +z, −z (6 slots). */
export const M_BOX_FACES = 13;
/** 1 when the medium is a chip layer (its faces' total internal reflections count as chip TIR). */
export const M_IS_CHIP = 19;
/**
 * List media: how many entries, at the start of the list, are faces of one convex solid seen from
 * without (SceneSurface.convexSolid); the search skips them right after the ray met one of them.
 */
export const M_CONVEX_COUNT = 20;
/** 1 when the rest of the list bounds a convex region around the medium (SceneMedium.convexAroundSolid). */
export const M_CONVEX_REST = 21;
/**
 * A sphere holding that convex solid: centre x, y, z and radius² (mm; ∞ when its faces are not all
 * rects): a ray whose line misses it meets none of the solid's faces.
 */
export const M_CONVEX_SPHERE = 22;
export const MEDIUM_STRIDE = 26;

// Surface record
export const S_SHAPE = 0;
/** Shape parameters, 7 slots from here (layout per kind below). */
export const S_P = 1;
export const S_FRONT = 8;
export const S_BEHIND = 9;
export const S_BEHAVIOUR = 10;
/** Behaviour parameters, 4 slots from here (layout per kind below). */
export const S_B = 11;
export const S_BIN_ABSORBED = 15;
export const S_BIN_ESCAPED = 16;
/** Debug counter for a total internal reflection met from the front / from behind (a COUNTER_* or NONE). */
export const S_TIR_FRONT = 17;
export const S_TIR_BEHIND = 18;
export const SURFACE_STRIDE = 19;

/*
 * Shape parameters (offsets from S_P):
 *   rect:          axis, at, normalSign, uMin, uMax, vMin, vMax
 *   disc:          at, normalSign, rInner², rOuter² (∞ for a whole plane)
 *   cylinder:      radius, z0, z1
 *   frustum:       r0, z0, r1, z1, slope (r1 − r0)/(z1 − z0)
 *   spheroid cap:  R, h, zCentre, 1/R², 1/h²
 *   revolution:    index into the compiled scene's `profiles`, its surface index (slot for its last normal)
 * Behaviour parameters (offsets from S_B):
 *   textured:      scattered fraction s
 *   mirror:        R (or −1 for a metal), metal n, metal k, √R (for the tracked mirror)
 *   diffuse:       R
 */

/**
 * A bounds entry names a surface and the side the medium lies on: surface·2 + side, side 0 when
 * the medium is in front of the surface (the normal points into it), 1 when behind.
 */
export const SIDE_FRONT = 0;
export const SIDE_BEHIND = 1;

// Debug counters kept beside the ledger
export const COUNTER_ESCAPED_BELOW = 0;
export const COUNTER_EVENTS = 1;
/** Total internal reflections at chip faces and layer interfaces, from inside the chip. */
export const COUNTER_TIR_CHIP = 2;
/** Total internal reflections at the encapsulant's outer surfaces. */
export const COUNTER_TIR_OUTER = 3;
export const COUNTERS = 4;

// Fixed ledger bins, before the scene's own
export const BIN_EVENT_CAP = 0;
export const BIN_GEOMETRY_ERROR = 1;

// Emitter kinds (CompiledScene.emitterKind)
export const EMIT_PLANE = 0;
export const EMIT_VOLUME = 1;
export const EMIT_LAMBERTIAN_RECT = 2;
export const EMIT_LAMBERTIAN_DISC = 3;
export const EMIT_RAYS = 4;
/** Doubles per ray of an emitter ray table: x, y, z, dx, dy, dz, cumulative weight. */
export const EMIT_RAY_STRIDE = 7;

// Directions of the rays a chip emitter sends (CompiledScene.emitterDirection, SceneEmitter.direction)
export const DIRECTION_ISOTROPIC = 0;
export const DIRECTION_DOWN = 1;
export const DIRECTION_LAMBERTIAN_DOWN = 2;

/** Doubles per recorded escape (recordEscapes): x, y, z, dx, dy, dz, wavelength (nm; NaN when the rays carry none). */
export const ESCAPE_RECORD = 7;
