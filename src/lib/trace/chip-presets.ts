/**
 * Chip presets (our own invented examples, round numbers): each returns a TraceChip ready for a
 * package, to be edited afterwards. Indices near 450 nm: GaN ≈ 2.45 (A. S. Barker, M. Ilegems,
 * Phys. Rev. B 7, 743 (1973), spread ±0.05 between sources); sapphire, ordinary ray ≈ 1.78
 * (I. H. Malitson, M. J. Dodge, JOSA 62, 1405 (1972)). Absorption values are illustrative.
 */
import type { TraceBase, TraceChip } from './package-spec';

export interface ChipPresetOptions {
  /** Footprint, mm (default 1 × 1). */
  widthMm?: number;
  lengthMm?: number;
  /** The chip's bottom mirror (default reflectance 0.95). */
  mirror?: TraceBase;
}

const GAN_N = 2.45;
const GAN_ABSORPTION_PER_MM = 0.5;
const SAPPHIRE_N = 1.78;

/**
 * Flip chip on sapphire: a 5 µm GaN film (emitting at its middle) under a sapphire substrate
 * (default 0.15 mm, allowed 0.1–0.2 mm), flipped so the sapphire faces up and a mirror lies below the GaN.
 * @throws RangeError when sapphireMm is outside [0.1, 0.2]
 */
export function flipChipOnSapphire(options: ChipPresetOptions & { sapphireMm?: number } = {}): TraceChip {
  const sapphire = options.sapphireMm ?? 0.15;
  if (!(sapphire >= 0.1 && sapphire <= 0.2)) throw new RangeError(`sapphireMm must be a number in [0.1, 0.2] (got ${sapphire})`);
  const gan = 0.005;
  return {
    widthMm: options.widthMm ?? 1,
    lengthMm: options.lengthMm ?? 1,
    heightMm: gan + sapphire,
    n: GAN_N,
    absorptionPerMm: GAN_ABSORPTION_PER_MM,
    emission: 'plane',
    layers: [
      { name: 'GaN', thicknessMm: gan, n: GAN_N, absorptionPerMm: GAN_ABSORPTION_PER_MM },
      { name: 'sapphire', thicknessMm: sapphire, n: SAPPHIRE_N, absorptionPerMm: 0 }
    ],
    emitLayer: 0,
    mirror: options.mirror ?? { kind: 'reflectance', reflectance: 0.95 }
  };
}

/** Thin-film chip on a mirror: a 6 µm GaN film (emitting at its middle), substrate removed, on its mirror. */
export function thinFilmChip(options: ChipPresetOptions = {}): TraceChip {
  const gan = 0.006;
  return {
    widthMm: options.widthMm ?? 1,
    lengthMm: options.lengthMm ?? 1,
    heightMm: gan,
    n: GAN_N,
    absorptionPerMm: GAN_ABSORPTION_PER_MM,
    emission: 'plane',
    layers: [{ name: 'GaN', thicknessMm: gan, n: GAN_N, absorptionPerMm: GAN_ABSORPTION_PER_MM }],
    emitLayer: 0,
    mirror: options.mirror ?? { kind: 'reflectance', reflectance: 0.95 }
  };
}

/** Today's single box chip: 1 × 1 × 0.15 mm, n 2.45, standing on the base, emitting at 0.1 mm. */
export function singleBoxChip(options: Omit<ChipPresetOptions, 'mirror'> = {}): TraceChip {
  return {
    widthMm: options.widthMm ?? 1,
    lengthMm: options.lengthMm ?? 1,
    heightMm: 0.15,
    n: GAN_N,
    absorptionPerMm: GAN_ABSORPTION_PER_MM,
    emitterZMm: 0.1,
    emission: 'plane'
  };
}
