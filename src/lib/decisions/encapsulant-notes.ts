/**
 * The remarks a package designer needs beside an encapsulant's optics: its temperature limit, ageing
 * (yellowing, cracking, moisture) from the library's own notes, and what the closed form assumes of a
 * rigid optic. Each note carries how far it can be trusted.
 */
import type { Material, MaterialNote } from '../materials/types';

/**
 * Notes for one candidate, most important first:
 * 1. the continuous service limit (°C) when the library gives one (tag: the material's provenance or
 *    `common practice`), or a plain statement that none is listed;
 * 2. the library's own notes (tags as given);
 * 3. for rigid optics (category `optic`): the closed form assumes optical contact with the chip, which a
 *    moulded lens or glass needs an index-matching fill for (`common practice`);
 * 4. for user materials: that the data are the user's (`user supplied`).
 */
export function encapsulantNotes(material: Material, source: 'library' | 'user'): MaterialNote[] {
  const notes: MaterialNote[] = [];
  if (material.maxServiceTempC !== undefined) {
    notes.push({ text: `Continuous service up to about ${material.maxServiceTempC} °C.`, tag: 'common practice' });
  } else if (material.category === 'encapsulant' || material.category === 'optic') {
    notes.push({ text: 'No service temperature listed: check the maker’s data sheet.', tag: 'common practice' });
  }
  for (const note of material.notes ?? []) notes.push({ text: note.text, tag: note.tag });
  if (material.category === 'optic') {
    notes.push({
      text: 'A rigid optic, not dispensed onto the chip: the figures assume optical contact, which needs an index-matching fill (an air gap brings the bare-chip escape cone back).',
      tag: 'common practice'
    });
  }
  if (source === 'user') notes.push({ text: 'Your own material: its index data are as you entered them.', tag: 'user supplied' });
  return notes;
}
