/**
 * The readable description of a traced scene: named media (each a solid region of one material),
 * named surfaces (a shape, the medium on each side, an optical behaviour) and the emitter. Builders
 * (body-*.ts, package-scene.ts) make it from a package and own its fit checks; compile-scene.ts packs
 * it into flat typed arrays for the ray loop; the drawing and the JSON echo read it as it is.
 *
 * Units mm, z up, the floor (or base plane) at z = 0, every body centred on the z axis.
 * A surface's normal defines its two sides: `front` is the medium the normal points into, `behind`
 * the other; null means no medium (an opaque body behind a mirror, diffuse reflector or absorber).
 * A face shared by two bodies (two chip layers, chip and encapsulant) is one surface with a
 * different medium on each side.
 */

/** Axis-aligned rectangle in the plane x_axis = at, normal along ±axis, bounds on the two other axes in order (x, y, z without `axis`). */
export interface RectShape {
  kind: 'rect';
  axis: 0 | 1 | 2;
  at: number;
  /** +1: the normal points along +axis; −1: along −axis. */
  normalSign: 1 | -1;
  uMin: number;
  uMax: number;
  vMin: number;
  vMax: number;
}

/** Annulus rInner ≤ r ≤ rOuter in the plane z = at (a disc for rInner = 0, a whole plane for rOuter = ∞), normal ±z. */
export interface DiscShape {
  kind: 'disc';
  at: number;
  normalSign: 1 | -1;
  rInner: number;
  rOuter: number;
}

/** Cylinder wall x² + y² = r², z0 ≤ z ≤ z1; normal points away from the axis. */
export interface CylinderShape {
  kind: 'cylinder';
  radius: number;
  z0: number;
  z1: number;
}

/** Cone frustum wall from radius r0 at z0 to r1 at z1 (z1 > z0, r0, r1 > 0); normal points away from the axis. */
export interface FrustumShape {
  kind: 'frustum';
  r0: number;
  z0: number;
  r1: number;
  z1: number;
}

/**
 * Upper cap z ≥ zCentre of the spheroid x²/R² + y²/R² + (z − zCentre)²/h² = 1; normal points outward.
 */
export interface SpheroidCapShape {
  kind: 'spheroid-cap';
  radius: number;
  height: number;
  zCentre: number;
}

/**
 * Surface of revolution about the z axis from a sampled meridian polyline (r_i, z_i), linear between
 * points (each segment a cone frustum, a flat annulus or a cylinder). The normal of segment i is
 * (Δz, −Δr)/|Δ| in the (r, z) plane: walking along the polyline with r to the right and z up, the
 * front is on the right (the optic-design profile convention). Intersection: revolution-shape.ts.
 */
export interface RevolutionShape {
  kind: 'revolution';
  r: Float64Array;
  z: Float64Array;
}

export type Shape = RectShape | DiscShape | CylinderShape | FrustumShape | SpheroidCapShape | RevolutionShape;

/** A specular mirror: fixed reflectance R, or a metal by its n + ik (R at the angle from the medium in front). */
export type MirrorSpec = { kind: 'reflectance'; reflectance: number } | { kind: 'metal'; n: number; k: number };

export type Behaviour =
  /** Dielectric interface between `front` and `behind`: Fresnel reflection or refraction. */
  | { kind: 'fresnel' }
  /**
   * Textured (partly diffuse) dielectric interface: the Fresnel decision, then with probability
   * `scatteredFraction` the new direction is replaced by a cosine-weighted one about the normal, in
   * the half-space the ray goes into.
   */
  | { kind: 'textured'; scatteredFraction: number }
  | { kind: 'mirror'; mirror: MirrorSpec }
  /** Lambertian reflector: reflects with probability R into a cosine-weighted direction, else absorbs. */
  | { kind: 'diffuse'; reflectance: number }
  | { kind: 'absorber' };

/** What a medium is in the package, for the summary's grouped ledger (chip, encapsulant) and the drawing. */
export type MediumRole = 'chip' | 'encapsulant' | 'outside';

export interface SceneMedium {
  /** Unique name: the ledger bin of what it absorbs, the drawing's label. */
  name: string;
  role: MediumRole;
  /** Real refractive index at the run's wavelength. */
  n: number;
  /** Bulk absorption coefficient, 1/mm. */
  absorptionPerMm: number;
  /**
   * When set, the medium is exactly this axis-aligned box [−a, a] × [−b, b] × [z0, z1] (a chip layer, where
   * the emitter draws its points). With `faces` (its six bounding surfaces +x, −x, +y, −y, +z, −z) the ray
   * loop finds the exit by the slab method; without (a side split in two by a settled layer) by its
   * surface list, like any other medium.
   */
  box?: { a: number; b: number; z0: number; z1: number; faces?: [string, string, string, string, string, string] };
  /**
   * Real index over wavelength [wavelength nm, n], sorted (linear between rows, ends held): in a scene
   * of spectral rays each ray sees the index at its own wavelength; otherwise `n` is used. Absent: n at
   * every wavelength.
   */
  indexRows?: [number, number][];
  /** Phosphor particles dispersed in this medium: scattering, absorption and conversion (medium-events.ts). */
  phosphor?: ScenePhosphor;
  /**
   * The builder's promise that, but for the faces of the convex solid it sees from without
   * (SceneSurface.convexSolid: the chip), the medium's surfaces bound one convex region (a dome or a
   * cylinder on the base, a cup filled flat). A ray in the medium is inside that region and crosses its
   * boundary exactly once ahead: the first of those surfaces it meets is the region's exit, so the search
   * (having tested the solid's faces first) stops there. A speed hint only. Default false.
   */
  convexAroundSolid?: boolean;
}

/**
 * A phosphor as a medium property, per wavelength. Rows sorted by wavelength; linear between rows,
 * the first and last rows held beyond the ends.
 */
export interface ScenePhosphor {
  /** [wavelength nm, μs 1/mm, μa 1/mm, Henyey–Greenstein g]. */
  coefficients: [number, number, number, number][];
  /** Emission spectrum [wavelength nm, power per nm] (any scale). */
  emission: [number, number][];
  /** Probability that an absorbed photon is re-emitted, [0, 1]. */
  quantumYield: number;
  /**
   * Other particle kinds mixed into the same medium (a yellow and a red phosphor together), each with
   * its own coefficients, emission and quantum yield; the medium's coefficients are the sums, and an
   * event is credited to a kind by its share of μs or μa at the ray's wavelength (medium-events.ts).
   */
  mixedWith?: ScenePhosphorPart[];
}

/** One particle kind of a phosphor mixture. */
export type ScenePhosphorPart = Omit<ScenePhosphor, 'mixedWith'>;

/** Which summary count of the older fixed ledger an escape through this surface also adds to. */
export type LegacyEscape = 'escapedChipTop' | 'escapedChipSide' | 'escapedDome' | 'escapedCylinderTop' | 'escapedCylinderSide';

export interface SceneSurface {
  /** Unique name (drawing label). */
  name: string;
  shape: Shape;
  /** Medium name on the normal's side, or null (opaque). */
  front: string | null;
  /** Medium name on the other side, or null (opaque). */
  behind: string | null;
  behaviour: Behaviour;
  /** Ledger bin for rays absorbed here (several surfaces may share one, e.g. 'base'); default `name`. */
  absorbedBin?: string;
  /** Ledger bin for rays whose last surface before the bounding sphere was this one; default `name`. */
  escapedBin?: string;
  legacyEscape?: LegacyEscape;
  /**
   * The builder's promise that a ray in the outside medium whose last surface was this one meets no
   * surface again: every surface bounding the outside is a face of one convex solid seen from without
   * (a dome, a closed cylinder, a bare chip's box, a lone flat top), and a ray that has left a convex
   * solid does not re-enter it. The tracer then counts the escape without searching the outside's
   * surfaces. Default false (the search decides).
   */
  finalExit?: boolean;
  /**
   * The name of a convex solid this surface is a face of, the solid lying behind it (the normal points
   * out of it), e.g. 'chip' on the chip's outer faces. A ray that has just met one of its faces from the
   * front heads away from the solid — each face's plane supports it — and meets none of its faces before
   * another surface, so the tracer skips them in that search (compileScene lists them first), as it does
   * when the ray's line misses a sphere around rect faces. A speed hint only: it never changes a result.
   * Default: none.
   */
  convexSolid?: string;
}

export interface SceneEmitter {
  /** Medium the rays start in (a box medium for 'plane' and 'volume'). */
  medium: string;
  /**
   * 'plane': uniform over the box's footprint at height z; 'volume': uniform in the box (both send the
   * directions of `direction`); 'lambertian': cosine-weighted about +z from a flat source at height z
   * (`source`); 'rays': each ray drawn from `rays` with probability ∝ its weight.
   */
  mode: 'plane' | 'volume' | 'lambertian' | 'rays';
  /**
   * Directions of a chip emitter ('plane', 'volume'): 'isotropic' (default); 'down': a collimated beam
   * along −z; 'lambertian-down': a diffuse (cosine-weighted) beam into the lower half space — the two
   * incidences of slab references.
   */
  direction?: 'isotropic' | 'down' | 'lambertian-down';
  /** Emitting plane height, mm (used in 'plane' and 'lambertian' mode). */
  z: number;
  /** 'lambertian': a disc of diameter w or a w × l rectangle centred on the axis, mm. */
  source?: { shape: 'disc' | 'rect'; widthMm: number; lengthMm: number };
  /** 'rays': stride 7 per ray: x, y, z (mm), unit direction dx, dy, dz, weight (> 0). */
  rays?: Float64Array;
  /** 'lambertian', 'rays': the surface a ray's escape is credited to until it meets another (the source's own). */
  surface?: string;
}

export interface SceneDescription {
  media: SceneMedium[];
  surfaces: SceneSurface[];
  /** Name of the outside medium: reaching the scene's bounding sphere in it is an escape. */
  outside: string;
  emitter: SceneEmitter;
  /** 'average': reflect with probability (Rs + Rp)/2; 'track': carry each ray's field. */
  polarization: 'average' | 'track';
  /**
   * The chip's emission [wavelength nm, power per nm] (one row: a line). Needed when a medium holds a
   * phosphor: rays then carry their wavelength (spectral rays); absent otherwise.
   */
  chipSpectrum?: [number, number][];
}
