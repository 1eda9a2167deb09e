/**
 * What the mixture model needs of a phosphor powder, whether from the library (band model) or a user's
 * tables: the particle's complex index n + ik at a wavelength, its density, emission rows, quantum
 * yield and typical size. One shape for both, so the load search, the sweeps and the page never ask
 * which kind they hold.
 */
import { emissionRows, particleIndexAt, type Phosphor } from '../phosphors/index';
import { tableAt, type UserPhosphor } from '../phosphors/user-phosphor';

export interface ParticleOptics {
  id: string;
  name: string;
  /** Complex index of the particle at a vacuum wavelength (nm). */
  indexAt(wavelengthNm: number): { n: number; k: number };
  densityGPerCm3: number;
  /** Emission [wavelength nm, power per nm], sorted. */
  emission: [number, number][];
  quantumYield: number;
  typicalD50Um: number;
  /** True for a user's own phosphor (carried in full in a scenario link). */
  user: boolean;
}

/** A library phosphor: n from its particle material's dispersion, k from its absorption band model. */
export function libraryOptics(p: Phosphor): ParticleOptics {
  return {
    id: p.id,
    name: p.name,
    indexAt: (nm) => {
      const { n, k } = particleIndexAt(p, nm);
      return { n, k };
    },
    densityGPerCm3: p.densityGPerCm3,
    emission: emissionRows(p, 380, 830, 2),
    quantumYield: p.quantumYield,
    typicalD50Um: p.typicalD50Um,
    user: false
  };
}

/** A user phosphor: n constant, k = kPeak × absorption table / its peak (zero outside the table). */
export function userOptics(p: UserPhosphor): ParticleOptics {
  const peak = Math.max(...p.absorption.map((r) => r[1]));
  return {
    id: p.id,
    name: p.name,
    indexAt: (nm) => ({ n: p.n, k: (p.kPeak * tableAt(p.absorption, nm)) / peak }),
    densityGPerCm3: p.densityGPerCm3,
    emission: p.emission.map(([a, b]) => [a, b]),
    quantumYield: p.quantumYield,
    typicalD50Um: p.d50Um,
    user: true
  };
}
