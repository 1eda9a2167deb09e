/**
 * A package made white: a phosphor setting (library phosphor by particles, or a coefficient table)
 * put into a traced package, traced, and summarised. (Mixtures of phosphors and the loads for a target
 * colour: src/lib/white.)
 */
import { emissionRows, findPhosphor, type Phosphor } from '../phosphors/index';
import { coefficientsFromParticles, SILICONE_DENSITY_G_PER_CM3, type PhosphorRegion, type TracePhosphor } from './package-phosphor';
import type { TracePackage } from './package-spec';
import { phosphorSummary, type PhosphorSummary } from './phosphor-summary';
import { traceSync } from './trace';
import type { Tally } from './tally';

/** Rows of a Gaussian line of peak and full width at half maximum (nm), ±3 FWHM, at least 61 rows. */
export function gaussianRows(peakNm: number, fwhmNm: number): [number, number][] {
  const sigma = fwhmNm / (2 * Math.sqrt(2 * Math.LN2));
  const rows: [number, number][] = [];
  const n = 60;
  for (let i = 0; i <= n; i++) {
    const nm = peakNm - 3 * fwhmNm + (6 * fwhmNm * i) / n;
    rows.push([nm, Math.exp(-0.5 * ((nm - peakNm) / sigma) ** 2)]);
  }
  return rows;
}

/** The chip's spectrum rows from a scenario emission (one line, a Gaussian or a table). */
export function chipSpectrumRows(
  emission: { kind: 'single'; wavelengthNm: number } | { kind: 'gaussian'; peakNm: number; fwhmNm: number } | { kind: 'table'; rows: [number, number][] }
): [number, number][] {
  if (emission.kind === 'single') return [[emission.wavelengthNm, 1]];
  if (emission.kind === 'gaussian') return gaussianRows(emission.peakNm, emission.fwhmNm);
  return emission.rows.map(([a, b]) => [a, b]);
}

/** Where the phosphor sits: the whole encapsulant (default), or a layer of thickness T mm (body-phosphor.ts). */
export interface PhosphorPlacement {
  region?: PhosphorRegion;
  thicknessMm?: number;
}

/** A phosphor setting: particles of a library (or user) phosphor by load, or a measured coefficient table. */
export type PhosphorSetting = PhosphorPlacement &
  (
  | {
      kind: 'particles';
      phosphor: Phosphor;
      /** Weight percent of phosphor in the mixture, [0, 95]. */
      weightPercent: number;
      /** Particle diameter (single size), µm. */
      diameterUm: number;
      /** Quantum yield; default the phosphor's typical one. */
      quantumYield?: number;
      /** Emission rows; default the phosphor's band model. */
      emission?: [number, number][];
    }
  | { kind: 'table'; coefficients: [number, number, number, number][]; emission: [number, number][]; quantumYield: number }
  );

/** The library phosphor by id, or a RangeError naming the field. */
export function libraryPhosphor(id: string, field = 'phosphor'): Phosphor {
  const p = findPhosphor(id);
  if (!p) throw new RangeError(`${field}: unknown phosphor '${id}'`);
  return p;
}

/** Emission rows of a library phosphor (380–830 nm, 2 nm). */
function emissionOf(p: Phosphor): [number, number][] {
  return emissionRows(p, 380, 830, 2);
}

/** The package with the phosphor in its region (the whole encapsulant, or a layer of it). */
export function withPhosphor(pkg: TracePackage, setting: PhosphorSetting, chipSpectrum: [number, number][]): TracePackage {
  let phosphor: TracePhosphor;
  const placement = {
    region: setting.region ?? 'encapsulant',
    ...(setting.region && setting.region !== 'encapsulant' && setting.thicknessMm !== undefined ? { thicknessMm: setting.thicknessMm } : {})
  };
  if (setting.kind === 'table') {
    phosphor = { ...placement, coefficients: setting.coefficients, emission: setting.emission, quantumYield: setting.quantumYield, chipSpectrum };
  } else {
    const coefficients = coefficientsFromParticles({
      phosphor: setting.phosphor,
      weightFraction: setting.weightPercent / 100,
      size: { kind: 'single', diameterUm: setting.diameterUm },
      hostN: pkg.encapsulant.n,
      hostDensityGPerCm3: SILICONE_DENSITY_G_PER_CM3
    });
    phosphor = {
      ...placement,
      coefficients,
      emission: setting.emission ?? emissionOf(setting.phosphor),
      quantumYield: setting.quantumYield ?? setting.phosphor.quantumYield,
      chipSpectrum
    };
  }
  return { ...pkg, phosphor };
}

export interface WhiteTrace {
  tally: Tally;
  summary: PhosphorSummary;
}

/** Traces a white package (single thread) and summarises it. */
export function traceWhite(pkg: TracePackage, rays: number, seed: number, maxEvents = 10000): WhiteTrace {
  const tally = traceSync(pkg, { rays, seed, maxEvents });
  const summary = phosphorSummary(tally);
  if (!summary) throw new Error('traceWhite: the package holds no phosphor');
  return { tally, summary };
}
