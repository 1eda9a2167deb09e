/**
 * The two media of the escape-cone page: where the light starts and what it escapes into. Each is a
 * part of the scenario (chip, encapsulant, outside), a library material, or a typed real index.
 * Pure; kept in the link as `from=` and `into=` ("chip", "mat:sapphire-o", "n:1.5").
 */
import { findMaterial } from '$lib/materials';
import { checkNumber, LIMITS } from '$lib/scenario/limits';
import { resolveMedium, type ResolvedScenario } from '$lib/scenario/resolve';

export type ScenarioPart = 'chip' | 'encapsulant' | 'outside';

export type Side =
  | { kind: 'scenario'; part: ScenarioPart }
  | { kind: 'material'; id: string }
  | { kind: 'index'; n: number };

/** The real index used on one side, what to call it, and any library warning. */
export interface SideValue {
  n: number;
  label: string;
  warning: string | null;
}

export const PART_NAMES: Record<ScenarioPart, string> = {
  chip: 'Scenario chip',
  encapsulant: 'Scenario encapsulant',
  outside: 'Scenario outside medium'
};

export function sideToParam(side: Side): string {
  if (side.kind === 'scenario') return side.part;
  if (side.kind === 'material') return `mat:${side.id}`;
  return `n:${side.n}`;
}

/** Reads a side from the link; anything unknown or out of range gives `fallback`. */
export function sideFromParam(text: string | null, fallback: Side): Side {
  if (!text) return fallback;
  if (text === 'chip' || text === 'encapsulant' || text === 'outside') return { kind: 'scenario', part: text };
  if (text.startsWith('mat:')) {
    const m = findMaterial(text.slice(4));
    return m && m.id === text.slice(4) && m.category !== 'metal' ? { kind: 'material', id: m.id } : fallback;
  }
  if (text.startsWith('n:')) {
    const n = Number(text.slice(2));
    return checkNumber('n', LIMITS.indexN, n) === null ? { kind: 'index', n } : fallback;
  }
  return fallback;
}

/** The real index of a side at the scenario wavelength (the extinction k plays no part in these formulas). */
export function sideValue(side: Side, r: ResolvedScenario): SideValue {
  if (side.kind === 'index') return { n: side.n, label: 'typed index', warning: null };
  const m = side.kind === 'scenario' ? r[side.part] : resolveMedium({ kind: 'material', id: side.id }, r.wavelengthNm);
  return { n: m.n, label: m.label, warning: m.warning };
}

/**
 * The side's value, or — when a library formula gives no index at this wavelength (a pole between it
 * and the data range) — the value of a scenario part instead and the reason, so the page shows a
 * message and keeps computing instead of failing.
 */
export function sideValueOr(side: Side, fallback: ScenarioPart, r: ResolvedScenario): { value: SideValue; error: string | null } {
  try {
    return { value: sideValue(side, r), error: null };
  } catch (error) {
    const why = error instanceof Error ? error.message : String(error);
    return {
      value: sideValue({ kind: 'scenario', part: fallback }, r),
      error: `${why.replace(/\.?$/, '')}; the ${PART_NAMES[fallback].toLowerCase()} is used instead.`
    };
  }
}
