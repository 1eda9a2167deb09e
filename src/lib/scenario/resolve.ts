/**
 * Scenario → numbers: the refractive indices at the scenario's design wavelength (from the material
 * library, with its range warnings) and the package description the Monte Carlo tracer takes.
 */
import { findMaterial, indexAt } from '../materials/index';
import type { Material } from '../materials/types';
import type { TraceBase, TraceBody, TraceChip, TracePackage } from '../trace/package-spec';
import type { AnyMediumSpec, BaseSpec, EmissionSpec, Scenario } from './schema';

/** A medium's complex index n + ik at one wavelength, and where it came from. */
export interface ResolvedMedium {
  n: number;
  k: number;
  /** Short human label: the material's name ("… (user)" for the user's own) or "typed index". */
  label: string;
  /** Library or user-material id, or null for a typed index. */
  materialId: string | null;
  /** The material itself (library or user), or null for a typed index. */
  material: Material | null;
  /** True for one of the user's own materials. */
  user: boolean;
  /** False when the wavelength is outside the material's data range (the value is then a clamp or extrapolation). */
  inRange: boolean;
  /** The library's warning for this wavelength, if any. */
  warning: string | null;
}

export type ResolvedBase =
  | { kind: 'reflectance'; reflectance: number }
  | { kind: 'metal'; n: number; k: number; label: string; materialId: string; inRange: boolean; warning: string | null };

export interface ResolvedScenario {
  /** The wavelength every index is taken at (nm). */
  wavelengthNm: number;
  chip: ResolvedMedium;
  /** Each layer's medium of a layered chip, bottom to top (empty for a single box). */
  chipLayers: ResolvedMedium[];
  /** The chip's own bottom mirror, when it has one. */
  chipMirror: ResolvedBase | null;
  encapsulant: ResolvedMedium;
  outside: ResolvedMedium;
  base: ResolvedBase;
  /** Every library warning, prefixed with the part it concerns. */
  warnings: string[];
}

/**
 * The single wavelength a scenario is evaluated at (nm): the single wavelength, the Gaussian peak,
 * or the row of largest weight of a table (the first such row on ties).
 */
export function designWavelengthNm(emission: EmissionSpec): number {
  if (emission.kind === 'single') return emission.wavelengthNm;
  if (emission.kind === 'gaussian') return emission.peakNm;
  let best = 0;
  for (let i = 1; i < emission.rows.length; i++) if (emission.rows[i][1] > emission.rows[best][1]) best = i;
  return emission.rows[best][0];
}

/**
 * The material behind a medium: the library's entry, the user material the scenario carries, or null
 * for a typed index. A library id that is not in the library throws a RangeError naming the field (a
 * validated scenario never has one).
 */
export function mediumMaterial(spec: AnyMediumSpec, field = 'Medium'): Material | null {
  if (spec.kind === 'index') return null;
  if (spec.kind === 'user') return spec.material;
  const material = findMaterial(spec.id);
  if (!material) throw new RangeError(`${field} material '${spec.id}' is not in the material library.`);
  return material;
}

/**
 * Extinction coefficient equivalent to a bulk absorption coefficient: k = α·λ / (4π), from
 * α = 4πk/λ (Beer–Lambert intensity decay of a wave n + ik; Born & Wolf, Principles of Optics, §14.1).
 * @param absorptionPerMm α, 1/mm, ≥ 0; @param wavelengthNm vacuum wavelength λ, nm, > 0
 * @example encapsulantK(0.001, 450) // 3.58e-8
 */
export function encapsulantK(absorptionPerMm: number, wavelengthNm: number): number {
  return (absorptionPerMm * wavelengthNm * 1e-6) / (4 * Math.PI);
}

/** Index of a medium at a wavelength. A typed index is returned as typed (k = 0 when it has none). */
export function resolveMedium(spec: AnyMediumSpec, wavelengthNm: number, field = 'Medium'): ResolvedMedium {
  if (spec.kind === 'index') {
    const k = 'k' in spec ? spec.k : 0;
    return { n: spec.n, k, label: 'typed index', materialId: null, material: null, user: false, inRange: true, warning: null };
  }
  const material = mediumMaterial(spec, field) as Material;
  const v = indexAt(material, wavelengthNm);
  const user = spec.kind === 'user';
  return {
    n: v.n,
    k: v.k,
    label: user ? `${material.name} (user)` : material.name,
    materialId: material.id,
    material,
    user,
    inRange: v.inRange,
    warning: v.warning ?? null
  };
}

function resolveBase(base: BaseSpec, wavelengthNm: number, field = 'Base metal'): ResolvedBase {
  if (base.kind === 'reflectance') return { kind: 'reflectance', reflectance: base.reflectance };
  const m = resolveMedium({ kind: 'material', id: base.id }, wavelengthNm, field);
  return { kind: 'metal', n: m.n, k: m.k, label: m.label, materialId: base.id, inRange: m.inRange, warning: m.warning };
}

/** All indices of a (validated) scenario at its design wavelength, with the library's warnings gathered. */
export function resolveScenario(scenario: Scenario): ResolvedScenario {
  const wavelengthNm = designWavelengthNm(scenario.emission);
  const chip = resolveMedium(scenario.chip.medium, wavelengthNm, 'Chip');
  const typedEncapsulant = resolveMedium(scenario.encapsulant.medium, wavelengthNm, 'Encapsulant');
  // A typed encapsulant index carries its loss as the absorption per mm: its k is that, converted.
  const encapsulant =
    scenario.encapsulant.medium.kind === 'index'
      ? { ...typedEncapsulant, k: encapsulantK(scenario.encapsulant.absorptionPerMm, wavelengthNm) }
      : typedEncapsulant;
  const outside = resolveMedium(scenario.outside, wavelengthNm, 'Outside medium');
  const base = resolveBase(scenario.base, wavelengthNm);
  const chipLayers = (scenario.chip.layers ?? []).map((l, i) => resolveMedium(l.medium, wavelengthNm, `Chip layer ${i + 1}`));
  const chipMirror = scenario.chip.mirror ? resolveBase(scenario.chip.mirror, wavelengthNm, 'Chip mirror metal') : null;
  const warnings: string[] = [];
  const note = (part: string, w: string | null) => {
    if (w) warnings.push(`${part}: ${w}`);
  };
  if (chipLayers.length === 0) note('Chip', chip.warning);
  chipLayers.forEach((m, i) => note(`Chip layer ${i + 1}`, m.warning));
  if (chipMirror?.kind === 'metal') note('Chip mirror', chipMirror.warning);
  if (scenario.encapsulant.shape !== 'none') note('Encapsulant', encapsulant.warning);
  note('Outside medium', outside.warning);
  if (base.kind === 'metal') note('Base', base.warning);
  return { wavelengthNm, chip, chipLayers, chipMirror, encapsulant, outside, base, warnings };
}

function traceMirror(m: ResolvedBase): TraceBase {
  return m.kind === 'reflectance' ? { kind: 'reflectance', reflectance: m.reflectance } : { kind: 'metal', n: m.n, k: m.k };
}

/** The tracer's body: the flat base, or the cup with its fill taken from the encapsulant's shape. */
function traceBody(scenario: Scenario): TraceBody {
  const b = scenario.body;
  if (b.kind === 'flat') return { kind: 'flat' };
  const shape = scenario.encapsulant.shape;
  return {
    kind: 'cup',
    floorRadiusMm: b.floorRadiusMm,
    topRadiusMm: b.topRadiusMm,
    depthMm: b.depthMm,
    wallFinish: b.wallFinish,
    wallReflectance: b.wallReflectance,
    fill: shape === 'dome' ? 'dome' : shape === 'none' ? 'none' : 'flat'
  };
}

/**
 * The tracer's package description. Real parts of the dielectric indices are used (chip and
 * encapsulant losses are carried by their absorption per mm); a metal base keeps n and k.
 */
export function toTracePackage(scenario: Scenario, resolved: ResolvedScenario = resolveScenario(scenario)): TracePackage {
  const c = scenario.chip;
  const e = scenario.encapsulant;
  const chip: TraceChip = {
    widthMm: c.widthMm,
    lengthMm: c.lengthMm,
    heightMm: c.heightMm,
    n: resolved.chip.n,
    absorptionPerMm: c.absorptionPerMm,
    emitterZMm: c.emitterZMm,
    emission: c.emission
  };
  if (c.layers) {
    chip.layers = c.layers.map((l, i) => ({ name: l.name, thicknessMm: l.thicknessMm, n: resolved.chipLayers[i].n, absorptionPerMm: l.absorptionPerMm }));
    chip.emitLayer = c.emitLayer ?? 0;
  }
  if (resolved.chipMirror) chip.mirror = traceMirror(resolved.chipMirror);
  // 0 stays absent: the flat top face, the scene of version 3 exactly
  if (c.topTexture > 0) chip.topScatter = c.topTexture;
  const body = traceBody(scenario);
  return {
    chip,
    base: traceMirror(resolved.base),
    ...(scenario.baseFinish === 'diffuse' ? { baseFinish: 'diffuse' as const } : {}),
    ...(body.kind === 'cup' ? { body } : {}),
    encapsulant: {
      // a cup's fill is in its body; the flat body's 'flat' never validates
      shape: e.shape === 'flat' ? 'none' : e.shape,
      radiusMm: e.radiusMm,
      heightMm: e.heightMm,
      n: resolved.encapsulant.n,
      absorptionPerMm: e.absorptionPerMm
    },
    outsideN: resolved.outside.n,
    polarization: scenario.trace.polarization
  };
}
