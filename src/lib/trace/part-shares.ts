/**
 * The ledger by package part, read from a summary's named bins and the scene that named them: what
 * the cup wall and the chip's mirror absorb, and what each chip layer absorbs, bottom to top. A part
 * the scene does not have reads 0 (a flat body has no wall).
 */
import type { SceneDescription } from './scene';
import type { TraceSummary } from './summary';

export interface PartShares {
  /** Fraction of launched rays absorbed at the cup wall. */
  wall: number;
  /** Fraction absorbed at the chip's own bottom mirror. */
  mirror: number;
  /** Fraction absorbed in each chip layer (one entry, 'chip', for a single box), bottom to top. */
  chipLayers: { name: string; fraction: number }[];
}

/** Shares of the named parts (the bins are `surface:wall`, `surface:chip mirror`, `medium:<layer>`). */
export function partShares(summary: Pick<TraceSummary, 'parts'>, scene: Pick<SceneDescription, 'media'>): PartShares {
  const share = (bin: string) => summary.parts.find((p) => p.bin === bin)?.fraction ?? 0;
  return {
    wall: share('surface:wall'),
    mirror: share('surface:chip mirror'),
    chipLayers: scene.media.filter((m) => m.role === 'chip').map((m) => ({ name: m.name, fraction: share(`medium:${m.name}`) }))
  };
}
