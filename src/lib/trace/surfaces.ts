/**
 * Names for the surfaces a ray can meet, as small integers so the ray loop can switch on them
 * without strings. Chip faces first (as seen from inside the chip), then the encapsulant's outer
 * surfaces, then the base plane.
 */
export const SURFACE_NONE = -1;
/** Chip face z = H. */
export const CHIP_TOP = 0;
/** Chip face x = +w/2. */
export const CHIP_X_POS = 1;
/** Chip face x = −w/2. */
export const CHIP_X_NEG = 2;
/** Chip face y = +l/2. */
export const CHIP_Y_POS = 3;
/** Chip face y = −l/2. */
export const CHIP_Y_NEG = 4;
/** Chip face z = 0, which lies on the base plane: a hit here is a base reflection under the chip. */
export const CHIP_BOTTOM = 5;
/** The dome's spheroidal surface. */
export const DOME = 6;
/** The cylinder's flat top z = h. */
export const CYLINDER_TOP = 7;
/** The cylinder's vertical wall x² + y² = R². */
export const CYLINDER_SIDE = 8;
/** The base plane z = 0 outside the chip's footprint. */
export const BASE = 9;
