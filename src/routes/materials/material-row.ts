/**
 * One row of the materials table: a material's index at the scenario wavelength and how it is
 * described. Pure; never throws (a wavelength the model cannot serve gives a reason instead of a number).
 */
import { indexAt } from '$lib/materials';
import type { Material, MaterialCategory } from '$lib/materials/types';

export interface MaterialRow {
  material: Material;
  /** n, k at the wavelength, or null with `reason` when the model gives no value there. */
  n: number | null;
  k: number | null;
  reason: string | null;
  /** True when the wavelength is inside the material's validity range. */
  inRange: boolean;
  model: string;
}

export const CATEGORY_LABELS: Record<MaterialCategory, string> = {
  semiconductor: 'Semiconductor',
  substrate: 'Substrate',
  encapsulant: 'Encapsulant',
  optic: 'Optical glass or plastic',
  layer: 'Thin-film layer',
  metal: 'Metal',
  ambient: 'Surroundings'
};

/** How the dispersion model is named in the table. */
export function modelLabel(m: Material): string {
  const d = m.dispersion;
  switch (d.model) {
    case 'sellmeier':
      return 'Sellmeier (C in µm)';
    case 'sellmeier-glass':
      return 'Sellmeier, glass form (C in µm²)';
    case 'cauchy':
      return 'Cauchy';
    case 'formula':
      return 'Pole sum n² = a₀ + Σ B/(λ² − C)';
    case 'table':
      return `n, k table (${d.rows.length} rows)`;
  }
}

/** The row of `material` at `wavelengthNm`. */
export function materialRow(material: Material, wavelengthNm: number): MaterialRow {
  const inRange = wavelengthNm >= material.validRangeNm.min && wavelengthNm <= material.validRangeNm.max;
  const model = modelLabel(material);
  try {
    const v = indexAt(material, wavelengthNm);
    return { material, n: v.n, k: v.k, reason: null, inRange, model };
  } catch (e) {
    const reason = e instanceof RangeError ? e.message : 'no value at this wavelength';
    return { material, n: null, k: null, reason, inRange, model };
  }
}

/** Whether a material matches the filter text (name, id, aliases, source; case-insensitive) and category. */
export function matchesFilter(m: Material, text: string, category: MaterialCategory | 'all'): boolean {
  if (category !== 'all' && m.category !== category) return false;
  const q = text.trim().toLowerCase();
  if (q === '') return true;
  return [m.name, m.id, m.source, ...m.aliases].some((s) => s.toLowerCase().includes(q));
}
