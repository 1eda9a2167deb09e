/**
 * Library ids that were retired when their data were replaced by published data sets, and the entry
 * that now stands in for each. Saved scenarios and links still name the old ids; the scenario
 * migration renames them, and the old id stays an alias of the new entry so a typed name finds it.
 */
export const RETIRED_MATERIAL_IDS: Readonly<Record<string, string>> = Object.freeze({
  /** A maker's catalogue glass, replaced by soda-lime glass from a scientific source (Rubin 1985). */
  'borosilicate-crown': 'soda-lime-glass',
  /** Recalled InGaN values; for ray optics a blue chip is its GaN (no open InGaN data set). */
  ingan: 'gan',
  /** Recalled AlGaInP values; a transparent-substrate red chip is mostly its GaP window (Aspnes & Studna 1983). */
  algainp: 'gap'
});

/** The current library id for `id`: its replacement if it was retired, else `id` itself. */
export function currentMaterialId(id: string): string {
  return Object.hasOwn(RETIRED_MATERIAL_IDS, id) ? RETIRED_MATERIAL_IDS[id] : id;
}
