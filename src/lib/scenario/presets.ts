/**
 * Package presets offered in the scenario panel — our own invented examples, round numbers. A user
 * picks one and then edits it; each is a whole scenario that passes the schema (tested).
 *
 * - The demo: a single-box chip on a silvered flat base under a hemispherical silicone dome.
 * - A mid-power cup: a reflector cup 2.6 mm across at the floor, 3.0 mm at the rim, 0.8 mm deep, with a
 *   white diffuse wall (R 0.93) and a silvered floor (R 0.95), a flip chip on sapphire, filled flat.
 * - A chip-scale package: the flip chip in a thin square block of encapsulant (0.1 mm beyond each side,
 *   0.3 mm high) on a white diffuse base, no cup.
 *
 * Indices come from the library at the scenario's wavelength: GaN (the emitting film) and sapphire,
 * ordinary ray (the substrate, flipped up).
 */
import { demoScenario } from './defaults';
import type { Scenario } from './schema';

export interface PackagePreset {
  id: 'demo-dome' | 'mid-power-cup' | 'chip-scale';
  label: string;
  scenario: Scenario;
}

/** GaN film 5 µm thick under a 0.15 mm sapphire substrate, on its own mirror (R 0.95), emitting mid-film. */
function flipChip(s: Scenario): Scenario['chip'] {
  return {
    ...s.chip,
    heightMm: 0.155,
    emitterZMm: 0.0025,
    layers: [
      { name: 'GaN', medium: { kind: 'material', id: 'gan' }, thicknessMm: 0.005, absorptionPerMm: 0.5 },
      { name: 'sapphire', medium: { kind: 'material', id: 'sapphire-o' }, thicknessMm: 0.15, absorptionPerMm: 0 }
    ],
    emitLayer: 0,
    mirror: { kind: 'reflectance', reflectance: 0.95 }
  };
}

function midPowerCup(): Scenario {
  const s = demoScenario();
  s.name = 'Mid-power cup: flip chip, diffuse white wall';
  s.chip = flipChip(s);
  s.base = { kind: 'reflectance', reflectance: 0.95 };
  s.baseFinish = 'specular';
  s.body = { kind: 'cup', floorRadiusMm: 1.3, topRadiusMm: 1.5, depthMm: 0.8, wallFinish: 'diffuse', wallReflectance: 0.93 };
  // a dome chosen later sits on the rim: start it as wide as the rim
  s.encapsulant = { ...s.encapsulant, shape: 'flat', radiusMm: 1.5, heightMm: 1.5 };
  return s;
}

function chipScale(): Scenario {
  const s = demoScenario();
  s.name = 'Chip-scale package: flip chip in a thin layer';
  s.chip = flipChip(s);
  s.base = { kind: 'reflectance', reflectance: 0.8 };
  s.baseFinish = 'diffuse';
  s.body = { kind: 'flat' };
  s.encapsulant = { ...s.encapsulant, shape: 'box', radiusMm: 0.6, heightMm: 0.3 };
  return s;
}

/** Fresh, editable copies of every preset, the demo first. */
export function packagePresets(): PackagePreset[] {
  return [
    { id: 'demo-dome', label: 'Dome demo: single-box chip under a silicone dome', scenario: demoScenario() },
    { id: 'mid-power-cup', label: 'Mid-power cup: flip chip, diffuse wall, flat fill', scenario: midPowerCup() },
    { id: 'chip-scale', label: 'Chip-scale: flip chip in a thin square block, no cup', scenario: chipScale() }
  ];
}
