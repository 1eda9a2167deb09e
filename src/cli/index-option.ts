import { findMaterial, indexAt, resolveIndex } from '../lib/materials';
import { CliError } from './cli-error';
import type { ParsedValues } from './options';

export interface ResolvedIndex {
  n: number;
  k: number;
  /** What the user named: a material name or the typed index. */
  label: string;
  warning?: string;
}

/**
 * Reads a medium given either as a typed index (`--n-in 2.45`, `2.4+0.01i`) or a material name
 * (`--in GaN`), at the wavelength. Exactly one of the two may be given; `fallback` is used when neither is.
 */
export function indexOption(values: ParsedValues, numberName: string, materialName: string | null, wavelengthNm: number,
  fallback?: string): ResolvedIndex {
  const typed = values[numberName];
  const named = materialName ? values[materialName] : undefined;
  if (typed !== undefined && named !== undefined) {
    throw new CliError(`give either --${numberName} or --${materialName}, not both`);
  }
  const spec = typed ?? named ?? fallback;
  if (spec === undefined) {
    const either = materialName ? ` or --${materialName} MATERIAL` : '';
    throw new CliError(`--${numberName} is required (an index from 1 to 6, e.g. 2.45${either})`);
  }
  if (typeof spec !== 'string' || spec.trim() === '') throw new CliError(`--${numberName} needs a value`);
  const field = typed !== undefined ? `--${numberName}` : `--${materialName}`;
  try {
    const resolved = resolveIndex(spec.trim(), wavelengthNm);
    return { n: resolved.n, k: resolved.k, label: spec.trim(), warning: resolved.warning };
  } catch (error) {
    throw new CliError(`${field}: ${error instanceof Error ? error.message : String(error)}`);
  }
}

/** Index of a named material at a wavelength, as a CLI error when the name is unknown. */
export function materialIndex(name: string, wavelengthNm: number, field: string): ResolvedIndex {
  const material = findMaterial(name);
  if (!material) throw new CliError(`${field}: unknown material '${name.slice(0, 40)}' ('outcouple material --list' lists them)`);
  const value = indexAt(material, wavelengthNm);
  return { n: value.n, k: value.k, label: material.name, warning: value.warning };
}
