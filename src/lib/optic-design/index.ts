/** Public API of the optic designers: pure, synchronous; z up from the source plane, mm, radians inside. */
export * from './profile';
export * from './revolution-intersect';
export * from './collimating-surface';
export * from './design-options';
export * from './lambertian-source';
export * from './etendue-limit';
export * from './optic-design';
export * from './paraboloid';
export * from './cpc';
export * from './aspheric-lens';
export * from './plano-convex-lens';
export * from './tir-collimator';
export * from './profile-csv';
export * from './design-optic';
