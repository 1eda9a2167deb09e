/**
 * The stack page's results as a JSON file, with the scenario and the stack they were computed from,
 * so the file alone says what was computed. Pure.
 */
import { exportJsonReplacer } from '$lib/export/number-text';
import type { Scenario } from '$lib/scenario/schema';
import type { StackDoc } from './stack-doc';
import type { StackResults } from './stack-results';

export const STACK_RESULTS_FORMAT = 'outcouple-stack-results';

/** JSON text of the results (fractions 0–1, angles in degrees, thicknesses in nm). */
export function stackResultsJson(scenario: Scenario, stack: StackDoc, r: StackResults): string {
  const x = r.extraction;
  return JSON.stringify(
    {
      format: STACK_RESULTS_FORMAT,
      version: 1,
      units: { fractions: '0–1', angles: 'degrees', thickness: 'nm', wavelength: 'nm' },
      scenario,
      stack,
      results: {
        wavelengthNm: r.wavelengthNm,
        mode: r.mode === 'thin' ? 'coherent thin films' : 'incoherent thick layers',
        chip: r.chip,
        exit: r.exit,
        layers: r.layers.map((l) => ({ item: l.item + 1, label: l.label, n: l.n, k: l.k, thicknessNm: l.thicknessNm })),
        normalIncidence: {
          stack: { R: r.normal.R, T: r.normal.T, A: r.normal.A, Rs: r.normal.Rs, Rp: r.normal.Rp },
          bare: { R: r.bareNormalR, T: 1 - r.bareNormalR }
        },
        extraction: {
          stack: { unpolarised: x.fresnel, s: x.fresnelS, p: x.fresnelP },
          bare: { unpolarised: x.bare.fresnel, s: x.bare.fresnelS, p: x.bare.fresnelP },
          gainOverBare: x.gainOverBare
        },
        escapeConeDeg: r.escapeConeDeg,
        trappedBands: x.bands.map((b) => ({ fromDeg: b.fromDeg, toDeg: b.toDeg, fate: b.fate })),
        whereTheLightGoes: r.fate,
        notes: r.notes
      }
    },
    exportJsonReplacer,
    2
  );
}
