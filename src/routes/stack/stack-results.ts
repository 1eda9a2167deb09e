/**
 * Everything the /stack page shows for one stack, computed with the optics core. Pure and
 * synchronous: R, T, A at normal incidence, extraction through the stack against the bare interface,
 * T against angle, the trapped-light sentences, and R against wavelength for thin films.
 */
import {
  incoherentStack,
  normalReflectance,
  rtVsAngle,
  stackExtraction,
  thinFilm,
  transmissionCurve,
  type StackCurve,
  type StackExtraction,
  type StackResult,
  type TransmissionCurve
} from '$lib/optics';
import type { StackDoc, StackItem } from './stack-doc';
import { describeFate } from './stack-fate';
import { expandStack, type ExpandedLayer, type FindMaterial } from './stack-layers';

/** The chip or the exit medium at the scenario wavelength. */
export interface StackMedium {
  label: string;
  n: number;
  k: number;
}

export interface StackResults {
  mode: StackDoc['mode'];
  wavelengthNm: number;
  chip: StackMedium;
  exit: StackMedium;
  layers: ExpandedLayer[];
  /** R, T, A of the stack at normal incidence. */
  normal: StackResult;
  /** Reflectance of the bare chip → exit interface at normal incidence. */
  bareNormalR: number;
  /** Fresnel-weighted extraction through the stack and bare; gain = stack / bare. */
  extraction: StackExtraction;
  /** Half-angle of the escape cone into the exit medium, degrees; null when the exit is not less dense. */
  escapeConeDeg: number | null;
  /** T(θ) of the stack and of the bare interface, 0–90° every 0.5°. */
  angle: StackCurve;
  bareAngle: TransmissionCurve;
  /** Where the light beyond the escape cone goes, in sentences. */
  fate: string[];
  /** Library warnings (values outside a material's valid range) and model notes. */
  notes: string[];
}

export type StackOutcome = { ok: true; results: StackResults } | { ok: false; problems: { item: number; message: string }[] };

const RAD = 180 / Math.PI;

/**
 * Computes the stack's results at the scenario wavelength. The chip and exit media enter with their
 * real parts n (the core takes lossless outer media); a chip or exit k > 0 is named in `notes`.
 */
export function computeStack(doc: StackDoc, chip: StackMedium, exit: StackMedium, wavelengthNm: number, find: FindMaterial): StackOutcome {
  const ex = expandStack(doc.items, wavelengthNm, find);
  if (!ex.ok) return ex;
  const layers = ex.layers;
  const notes = [...ex.warnings];
  if (chip.k > 0) notes.push(`The chip's extinction k = ${chip.k} is left out at its interface; only its n = ${chip.n} is used.`);
  if (exit.k > 0) notes.push(`The exit medium's extinction k = ${exit.k} is left out; only its n = ${exit.n} is used.`);
  const coreMode = doc.mode === 'thin' ? 'coherent' : 'incoherent';
  if (doc.mode === 'thick') {
    // The incoherent model takes interfaces from n alone and k only as bulk attenuation (k ≪ n).
    const metal = layers.find((l) => l.k > 0.1 * l.n);
    if (metal) {
      notes.push(
        `Layer ${metal.item + 1} has k = ${Number(metal.k.toPrecision(3))}, not small against n = ${Number(metal.n.toPrecision(3))}: thick-layer mode treats it as a bulk absorber with interfaces from n alone. Use thin-film mode for metal or strongly absorbing films.`
      );
    }
  }

  const normal = doc.mode === 'thin' ? thinFilm(chip.n, layers, exit.n, wavelengthNm, 0) : incoherentStack(chip.n, layers, exit.n, wavelengthNm, 0);
  const extraction = stackExtraction(chip.n, layers, exit.n, wavelengthNm, coreMode);
  const open = exit.n < chip.n;
  const escapeConeDeg = open ? extraction.escapeConeRad * RAD : null;
  const fate = describeFate({
    bands: extraction.bands,
    layers,
    chip,
    exit,
    escapeConeDeg: extraction.escapeConeRad * RAD,
    mode: doc.mode
  });
  return {
    ok: true,
    results: {
      mode: doc.mode,
      wavelengthNm,
      chip,
      exit,
      layers,
      normal,
      bareNormalR: normalReflectance(chip.n, 0, exit.n, 0),
      extraction,
      escapeConeDeg,
      angle: rtVsAngle(chip.n, layers, exit.n, wavelengthNm, coreMode, 181),
      bareAngle: transmissionCurve(chip.n, exit.n, 181),
      fate,
      notes
    }
  };
}

export interface Spectrum {
  wavelengthNm: number[];
  /** Stack and bare reflectance at normal incidence; NaN where a material gives no index. */
  R: number[];
  bareR: number[];
}

/**
 * Normal-incidence reflectance of a coherent stack against wavelength, every material (chip, layers,
 * exit) re-evaluated at each wavelength, so dispersion is included. A wavelength where any medium has
 * no index gives NaN (a gap in the chart).
 * @param chipAt, exitAt real index of the chip and the exit medium at a wavelength (throw RangeError when none)
 * @param points number of samples from fromNm to toNm inclusive, ≥ 2
 */
export function reflectanceSpectrum(
  items: readonly StackItem[],
  chipAt: (wavelengthNm: number) => number,
  exitAt: (wavelengthNm: number) => number,
  find: FindMaterial,
  fromNm = 380,
  toNm = 780,
  points = 81
): Spectrum {
  const out: Spectrum = { wavelengthNm: [], R: [], bareR: [] };
  for (let i = 0; i < points; i++) {
    const w = i === points - 1 ? toNm : fromNm + ((toNm - fromNm) * i) / (points - 1);
    out.wavelengthNm.push(w);
    let nChip: number;
    let nExit: number;
    try {
      nChip = chipAt(w);
      nExit = exitAt(w);
    } catch {
      out.R.push(NaN);
      out.bareR.push(NaN);
      continue;
    }
    out.bareR.push(normalReflectance(nChip, 0, nExit, 0));
    const ex = expandStack(items, w, find);
    out.R.push(ex.ok ? thinFilm(nChip, ex.layers, nExit, w, 0).R : NaN);
  }
  return out;
}
