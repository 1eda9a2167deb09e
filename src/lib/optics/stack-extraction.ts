import { escapeCone } from './escape-cone';
import { thinFilmInto } from './thin-film';
import { incoherentStackInto } from './incoherent-stack';
import { integrateSmoothEnds } from './quadrature';
import { trappedBands, type TrappedBand } from './trapped-bands';
import { validateStack, type StackLayer } from './layer';

/** How a stack is computed: thin films with interference, or thick layers with intensities adding. */
export type StackMode = 'coherent' | 'incoherent';

/** Result of {@link stackExtraction}; fractions are of all light of an isotropic source in the chip. */
export interface StackExtraction {
  mode: StackMode;
  /** ½∫ T(θ) sin θ dθ through the stack, unpolarised */
  fresnel: number;
  fresnelS: number;
  fresnelP: number;
  /** the same for the bare chip → outside interface (no layers) */
  bare: { fresnel: number; fresnelS: number; fresnelP: number };
  /** fresnel / bare.fresnel */
  gainOverBare: number;
  /**
   * half-angle of the escape cone inside the chip, asin(nOut/nIn) (π/2 when nOut ≥ nIn). It is the same
   * with or without the stack: n sin θ is conserved through parallel layers.
   */
  escapeConeRad: number;
  /** where light is trapped, band by band (ray picture); see {@link trappedBands} */
  bands: TrappedBand[];
}

const buf = new Float64Array(6);

/**
 * Extraction of an isotropic point source inside the chip (index nIn) into the outside (nOut) through a
 * planar stack, single pass (no recycling of reflected light):
 *   η = ½ ∫₀^θe T(θ) sin θ dθ,   θe = asin(nOut/nIn)
 * per polarisation and unpolarised, with T from the coherent (thin-film) or incoherent (thick-layer)
 * model. T = 0 beyond θe in both models, so the stack changes only the losses inside the same cone.
 * Integrated by adaptive Gauss–Kronrod over sub-intervals split at every layer's critical angle, each
 * with an end-smoothing change of variable (T has square-root kinks there); accuracy ~1e-10 or better.
 * @param nIn chip index (> 0); @param layers from the chip outward; @param nOut outside index (> 0)
 * @param wavelengthNm vacuum wavelength in nm (> 0); @param mode 'coherent' (default) or 'incoherent'
 * @example stackExtraction(2.5, [], 1, 450).fresnel // ≈ 0.03243, the bare escape cone
 * @see Macleod, Thin-Film Optical Filters, ch. 2; Schubert, Light-Emitting Diodes, 2nd ed., ch. 5
 */
export function stackExtraction(
  nIn: number,
  layers: readonly StackLayer[],
  nOut: number,
  wavelengthNm: number,
  mode: StackMode = 'coherent'
): StackExtraction {
  validateStack(nIn, layers, nOut, wavelengthNm);
  if (mode !== 'coherent' && mode !== 'incoherent') {
    throw new RangeError(`mode must be 'coherent' or 'incoherent' (got ${String(mode)})`);
  }
  const escapeConeRad = nOut < nIn ? Math.asin(nOut / nIn) : Math.PI / 2;

  // Split points: critical angles of layers inside the escape cone (T has kinks there)
  const cuts = [0, escapeConeRad];
  for (const l of layers) {
    if (l.n < nIn) {
      const c = Math.asin(l.n / nIn);
      if (c > 0 && c < escapeConeRad) cuts.push(c);
    }
  }
  cuts.sort((a, b) => a - b);

  const run = mode === 'coherent' ? thinFilmInto : incoherentStackInto;
  const integrand = (pol: 0 | 1) => (theta: number) => {
    run(buf, nIn, layers, nOut, wavelengthNm, theta);
    return buf[2 + pol] * Math.sin(theta);
  };
  const fS = integrand(0);
  const fP = integrand(1);
  let sumS = 0;
  let sumP = 0;
  for (let i = 0; i + 1 < cuts.length; i++) {
    if (!(cuts[i + 1] > cuts[i])) continue;
    sumS += integrateSmoothEnds(fS, cuts[i], cuts[i + 1], { absTol: 1e-13, relTol: 1e-11 });
    sumP += integrateSmoothEnds(fP, cuts[i], cuts[i + 1], { absTol: 1e-13, relTol: 1e-11 });
  }
  const fresnelS = 0.5 * sumS;
  const fresnelP = 0.5 * sumP;
  const fresnel = 0.5 * (fresnelS + fresnelP);
  const cone = escapeCone(nIn, nOut);
  return {
    mode,
    fresnel,
    fresnelS,
    fresnelP,
    bare: { fresnel: cone.fresnel, fresnelS: cone.fresnelS, fresnelP: cone.fresnelP },
    gainOverBare: fresnel / cone.fresnel,
    escapeConeRad,
    bands: trappedBands(nIn, layers, nOut)
  };
}
