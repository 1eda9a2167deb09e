/** The escape-cone page's results as a JSON document, with the scenario they were computed in. */
import type { ChipEscape, EscapeCone } from '$lib/optics';
import { exportJsonReplacer } from '$lib/export/number-text';
import type { Scenario } from '$lib/scenario/schema';
import type { SideValue } from './sides';

const DEG = 180 / Math.PI;

/** JSON text of the page's inputs, results (fractions 0–1, angles in degrees) and assumptions. */
export function escapeExport(
  scenario: Scenario,
  wavelengthNm: number,
  inside: SideValue,
  surrounding: SideValue,
  cone: EscapeCone,
  cuboid: ChipEscape[]
): string {
  const hasCritical = cone.criticalAngleRad < Math.PI / 2;
  const doc = {
    app: 'Outcouple',
    view: 'escape-cone',
    formatVersion: 1,
    wavelengthNm,
    inside: { label: inside.label, n: inside.n },
    surrounding: { label: surrounding.label, n: surrounding.n },
    results: {
      criticalAngleDeg: hasCritical ? cone.criticalAngleRad * DEG : null,
      criticalAngleNote: hasCritical ? undefined : 'No total internal reflection: the surrounding index is not lower than the inside index.',
      onePlanarFace: {
        geometric: cone.geometric,
        smallAngle: cone.smallAngle,
        fresnelS: cone.fresnelS,
        fresnelP: cone.fresnelP,
        fresnelUnpolarised: cone.fresnel,
        normalReflectance: cone.normalReflectance
      },
      cuboidChip: cuboid.map((c) => ({
        faces: c.faces,
        geometric: c.fractionGeometric,
        fresnel: c.fraction,
        conesOverlap: c.conesOverlap,
        clamped: c.clamped,
        note: c.note || undefined
      }))
    },
    assumptions: [
      'Isotropic point source; each ray meets a face once; reflected light is not recycled.',
      'Real parts of the indices only; absorption is not included.',
      'Fractions are of all light emitted (4π sr).'
    ],
    scenario
  };
  return JSON.stringify(doc, exportJsonReplacer, 2) + '\n';
}
