/** Public API of the optic trace: an optic over its source in one scene, its results, the ray file. Pure. */
export * from './optic-source';
export * from './optic-scene';
export * from './optic-results';
export * from './optic-run';
export * from './ray-file';
export * from './package-rays';
export * from './optic-ies';
export * from './ray-paths';
