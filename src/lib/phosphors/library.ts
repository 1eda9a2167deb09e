/**
 * The shipped phosphor library: the only reader of data/phosphors.json. Every entry is checked against
 * the schema when the module loads, so a damaged file fails loudly instead of turning into NaN later.
 */
import data from '../../../data/phosphors.json';
import { phosphorSchema, type Phosphor } from './phosphor-schema';

function load(entries: unknown[]): readonly Phosphor[] {
  const seen = new Set<string>();
  return entries.map((entry, i) => {
    const result = phosphorSchema.safeParse(entry);
    if (!result.success) {
      const issues = result.error.issues.map((s) => `${s.path.join('.')}: ${s.message}`).join('; ');
      throw new Error(`data/phosphors.json entry ${i} is invalid: ${issues}`);
    }
    if (seen.has(result.data.id)) throw new Error(`data/phosphors.json: duplicate id "${result.data.id}"`);
    seen.add(result.data.id);
    return Object.freeze(result.data);
  });
}

const PHOSPHORS = load(data.phosphors);

/** Every shipped phosphor, in file order. */
export function listPhosphors(): readonly Phosphor[] {
  return PHOSPHORS;
}

/** A phosphor by id (exact, lower case), or undefined. */
export function findPhosphor(id: string): Phosphor | undefined {
  return PHOSPHORS.find((p) => p.id === id.trim().toLowerCase());
}

/** The band model's description from the data file, for display beside phosphor spectra. */
export const PHOSPHOR_BAND_MODEL: string = data.bandModel;
