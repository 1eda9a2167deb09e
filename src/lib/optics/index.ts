/** Public API of the optics core: pure, synchronous, radians inside. */
export * from './complex';
export * from './fresnel';
export * from './snell';
export * from './critical-angle';
export * from './brewster';
