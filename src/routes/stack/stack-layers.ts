/**
 * Turns the stack's items into the layers the optics core computes with, at one wavelength: library
 * or user materials resolved to n + ik, graded sections expanded into sublayers. Pure; problems come
 * back as messages per item, never as NaN.
 */
import { indexAt } from '$lib/materials';
import type { Material } from '$lib/materials/types';
import { gradedIndexLayers, type StackLayer } from '$lib/optics';
import type { StackItem } from './stack-doc';

/** A computed layer and where it came from. */
export interface ExpandedLayer extends StackLayer {
  /** Position of the stack item it belongs to (0-based). */
  item: number;
  /** Sublayer number within a graded section (0-based) and their count; 0 and 1 for a plain layer. */
  sub: number;
  subCount: number;
  /** Short name for charts: "SiO2 film", "n 1.8", "graded 3/10". */
  label: string;
}

export type Expansion =
  | { ok: true; layers: ExpandedLayer[]; warnings: string[] }
  | { ok: false; problems: { item: number; message: string }[] };

/** Finds a material by id among the library and the user's materials. */
export type FindMaterial = (id: string) => Material | undefined;

/** "n 1.8" or "n 0.05 + 3.6i" for a typed index. */
export function typedLabel(n: number, k: number): string {
  const f = (x: number) => String(Number(x.toPrecision(4)));
  return k === 0 ? `n ${f(n)}` : `n ${f(n)} + ${f(k)}i`;
}

/**
 * The layers of `items` at `wavelengthNm`, from the chip outwards. A material missing from the library
 * and the user's materials, or one whose model gives no index at this wavelength, is a problem of its
 * item; a value outside a material's valid range is a warning.
 */
export function expandStack(items: readonly StackItem[], wavelengthNm: number, find: FindMaterial): Expansion {
  const layers: ExpandedLayer[] = [];
  const warnings: string[] = [];
  const problems: { item: number; message: string }[] = [];
  items.forEach((it, i) => {
    if (it.kind === 'graded') {
      const subs = gradedIndexLayers({ nA: it.fromN, nB: it.toN, thicknessNm: it.thicknessNm, steps: it.sublayers, profile: it.profile });
      subs.forEach((l, j) => layers.push({ ...l, item: i, sub: j, subCount: subs.length, label: `graded ${j + 1}/${subs.length}` }));
      return;
    }
    const m = it.medium;
    if (m.kind === 'index') {
      layers.push({ n: m.n, k: m.k, thicknessNm: it.thicknessNm, item: i, sub: 0, subCount: 1, label: typedLabel(m.n, m.k) });
      return;
    }
    const material = find(m.id);
    if (!material) {
      problems.push({ item: i, message: `Layer ${i + 1}: material '${m.id}' is neither in the library nor among your materials. Pick another.` });
      return;
    }
    try {
      const v = indexAt(material, wavelengthNm);
      if (v.warning) warnings.push(`Layer ${i + 1}: ${v.warning}`);
      layers.push({ n: v.n, k: v.k, thicknessNm: it.thicknessNm, item: i, sub: 0, subCount: 1, label: material.name });
    } catch (e) {
      problems.push({ item: i, message: `Layer ${i + 1}: ${e instanceof RangeError ? e.message : 'no index at this wavelength'}.` });
    }
  });
  return problems.length > 0 ? { ok: false, problems } : { ok: true, layers, warnings };
}
