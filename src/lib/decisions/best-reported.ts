/**
 * Published best figures for light extraction, quoted when a claim goes beyond what a planar chip can
 * do. Each names its source; all were recalled, not re-read, so they carry the tag `from memory` and are
 * used only as context and as a loose ceiling, never as exact limits.
 */
import type { Provenance } from '../materials/types';

export interface ReportedFigure {
  id: string;
  /** The device, in the trade's words. */
  device: string;
  /** What the figure measures: light-extraction efficiency or external quantum efficiency. */
  measure: 'light-extraction efficiency' | 'external quantum efficiency';
  /** The figure as a fraction. */
  value: number;
  /** Citation. */
  source: string;
  tag: Provenance;
}

export const REPORTED_FIGURES: readonly ReportedFigure[] = [
  {
    id: 'thin-film-flip-chip',
    device: 'thin-film flip-chip InGaN/GaN LED with a roughened (photonic-textured) surface and a mirror',
    measure: 'light-extraction efficiency',
    value: 0.8,
    source: 'O. B. Shchekin et al., Appl. Phys. Lett. 89, 071109 (2006)',
    tag: 'from memory'
  },
  {
    id: 'truncated-inverted-pyramid',
    device: 'truncated-inverted-pyramid AlGaInP/GaP LED (shaped chip)',
    measure: 'external quantum efficiency',
    value: 0.55,
    source: 'M. R. Krames et al., Appl. Phys. Lett. 75, 2365 (1999)',
    tag: 'from memory'
  },
  {
    id: 'textured-thin-film',
    device: 'surface-textured thin-film LED with photon recycling',
    measure: 'external quantum efficiency',
    value: 0.3,
    source: 'I. Schnitzer, E. Yablonovitch et al., Appl. Phys. Lett. 63, 2174 (1993)',
    tag: 'from memory'
  }
];

/** The highest light-extraction efficiency we cite (the thin-film flip-chip figure). */
export const BEST_REPORTED_EXTRACTION: ReportedFigure = REPORTED_FIGURES[0];
