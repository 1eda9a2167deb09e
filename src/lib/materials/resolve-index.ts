/**
 * Reads a refractive index as a user types it: a real number ("1.41"), a complex index n + ki
 * ("2.4+0.01i", "0.05 + 3.6i", j also accepted), or the id, name or alias of a material.
 */
import { indexAt } from './dispersion';
import { findMaterial } from './library';
import { MATERIAL_LIMITS } from './limits';
import type { Material, ResolvedIndex } from './types';

const NUM = String.raw`(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?`;
const REAL_RE = new RegExp(`^\\+?(${NUM})$`);
const COMPLEX_RE = new RegExp(`^\\+?(${NUM})([+-])(${NUM})?\\*?[ij]$`);
const COMPLEX_PREFIX_RE = new RegExp(`^\\+?(${NUM})([+-])[ij]\\*?(${NUM})$`);

/**
 * The complex index N = n + ik that `spec` stands for at `wavelengthNm`.
 * - number: n, k = 0; complex: n + ki (k ≥ 0: absorption); the typed n must be in (0, 10] and k in [0, 50];
 * - a material id, name or alias (library first, then `userMaterials`): its `indexAt` value, with
 *   `materialId` and any out-of-range `warning`.
 * @param wavelengthNm vacuum wavelength, nm, in [100, 20000] (checked for every kind of spec)
 * @throws RangeError with the allowed forms and ranges when the text cannot be read
 * @example resolveIndex('2.4+0.01i', 450) // { n: 2.4, k: 0.01 }
 */
export function resolveIndex(spec: string, wavelengthNm: number, userMaterials?: readonly Material[]): ResolvedIndex {
  const { min: wMin, max: wMax } = MATERIAL_LIMITS.wavelengthNm;
  if (typeof wavelengthNm !== 'number' || !(wavelengthNm >= wMin && wavelengthNm <= wMax)) {
    throw new RangeError(`wavelengthNm must be a number between ${wMin} and ${wMax} nm (got ${String(wavelengthNm)})`);
  }
  if (typeof spec !== 'string' || spec.trim() === '') {
    throw new RangeError('index is empty: give a number (1.41), a complex index n+ki (2.4+0.01i) or a material name (GaN)');
  }
  const compact = spec.replace(/\s+/g, '');

  const real = REAL_RE.exec(compact);
  if (real) return typed(spec, Number(real[1]), 0);

  const cx = COMPLEX_RE.exec(compact) ?? COMPLEX_PREFIX_RE.exec(compact);
  if (cx) {
    const k = cx[3] === undefined ? 1 : Number(cx[3]);
    if (cx[2] === '-' && k !== 0) {
      throw new RangeError(
        `index "${quoted(spec)}": k must be ≥ 0 — write absorption as n + ki with k ≥ 0 (e.g. 2.4+0.01i)`
      );
    }
    return typed(spec, Number(cx[1]), k);
  }

  const material = findMaterial(spec, userMaterials);
  if (material) {
    const value = indexAt(material, wavelengthNm);
    const out: ResolvedIndex = { n: value.n, k: value.k, materialId: material.id };
    if (value.warning) out.warning = value.warning;
    return out;
  }
  if (/^[-+]?[\d.]/.test(compact) && /\d/.test(compact)) {
    throw new RangeError(
      `index "${quoted(spec)}" is not a number > 0 or a complex index n+ki (e.g. 1.41, 2.4+0.01i, 0.05+3.6i)`
    );
  }
  throw new RangeError(
    `index "${quoted(spec)}" is not a number, a complex index n+ki or a known material (e.g. 1.41, 2.4+0.01i, GaN, sapphire-o)`
  );
}

function typed(spec: string, n: number, k: number): ResolvedIndex {
  const N = MATERIAL_LIMITS.typedN;
  const K = MATERIAL_LIMITS.k;
  if (!(n > N.min && n <= N.max)) {
    throw new RangeError(`index "${quoted(spec)}": n must be > ${N.min} and ≤ ${N.max} (got ${n})`);
  }
  if (!(k >= K.min && k <= K.max)) {
    throw new RangeError(`index "${quoted(spec)}": k must be in [${K.min}, ${K.max}] (got ${k})`);
  }
  return { n, k };
}

/** The user's text for a message: trimmed and cut to 40 characters, so a pasted essay stays out of it. */
function quoted(spec: string): string {
  const t = spec.trim();
  return t.length > 40 ? `${t.slice(0, 40)}…` : t;
}
