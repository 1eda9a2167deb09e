/** The allowed ranges of the beam optics' inputs, for the page's fields (the command line says the same ranges). */
export const BEAM_LIMITS = {
  exitDiameterMm: { min: 0.5, max: 1000, unit: 'mm' },
  heightMm: { min: 0.5, max: 1000, unit: 'mm' },
  gapMm: { min: 0, max: 100, unit: 'mm' },
  reflectance: { min: 0, max: 1, unit: '' },
  targetBeamDeg: { min: 0.1, max: 180, unit: '°' },
  sourceWidthMm: { min: 0.01, max: 100, unit: 'mm' },
  rays: { min: 1000, max: 2_000_000, unit: '', integer: true }
} as const;
