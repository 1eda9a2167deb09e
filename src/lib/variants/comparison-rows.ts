/**
 * The side-by-side table of the variants: one row per figure, one cell per variant, each cell a value
 * with its standard error where it has one, already rounded to the precision it carries
 * (precision.ts). The page's table, the CSV and the command line all print these rows. Pure.
 */
import { LEDGER_CATEGORIES } from '../charts/dome-ledger-chart';
import { roundSignificant } from '../export/number-text';
import { roundWithSigma } from './precision';
import { ratioOf, type Estimate, type VariantFigures } from './variant-figures';

export interface ComparisonCell {
  value: number;
  /** Standard error in the row's unit, or null for a figure without one. */
  sigma: number | null;
  /** Decimal places the value and σ are given to (null: significant digits, shortest text). */
  decimals: number | null;
}

export interface ComparisonRow {
  key: string;
  label: string;
  /** Unit of every cell ('%' cells are percentages, '' plain numbers). */
  unit: string;
  /** Which group of the table the row sits in. */
  group: 'traced' | 'closed form' | 'inputs' | 'far field' | 'ledger';
  /** One per variant; null where the figure does not exist yet (trace running) or at all (with `why`). */
  cells: (ComparisonCell | null)[];
  /** Why a cell is empty, per variant (null where it has a value). */
  why: (string | null)[];
}

const TRACE_PENDING = 'trace not finished';

function est(e: Estimate | null | undefined, scale: number): ComparisonCell | null {
  if (!e || !Number.isFinite(e.value)) return null;
  const r = roundWithSigma(e.value * scale, e.sigma * scale);
  return { value: r.value, sigma: r.sigma, decimals: r.decimals };
}

function plain(x: number | null | undefined, digits: number): ComparisonCell | null {
  return x === null || x === undefined || !Number.isFinite(x) ? null : { value: roundSignificant(x, digits), sigma: null, decimals: null };
}

/**
 * The comparison rows for `variants` (first is the reference of the ratio row). Traced shares carry
 * ± one binomial standard error √(p(1 − p)/N); the ratio carries the propagated error of both
 * traces (traceGain).
 */
export function comparisonRows(variants: readonly VariantFigures[]): ComparisonRow[] {
  const rows: ComparisonRow[] = [];
  const add = (
    key: string,
    label: string,
    unit: string,
    group: ComparisonRow['group'],
    cell: (f: VariantFigures, i: number) => ComparisonCell | null,
    whyEmpty: (f: VariantFigures, i: number) => string
  ) => {
    const cells = variants.map(cell);
    rows.push({ key, label, unit, group, cells, why: cells.map((c, i) => (c ? null : whyEmpty(variants[i], i))) });
  };
  const pending = (f: VariantFigures) => (f.traced ? 'not defined' : TRACE_PENDING);
  const first = variants[0]?.traced?.extraction ?? null;

  add('extraction', 'Package extraction, traced', '%', 'traced', (f) => est(f.traced?.extraction, 100), pending);
  add(
    'ratio',
    `Ratio to ${variants[0]?.name ?? 'the first variant'} (traced extraction)`,
    '×',
    'traced',
    (f, i) => (i === 0 && f.traced ? { value: 1, sigma: null, decimals: null } : f.traced && first ? est(ratioOf(f.traced.extraction, first), 1) : null),
    (f) => (!f.traced || !variants[0]?.traced ? TRACE_PENDING : 'first variant extracts nothing')
  );
  add('bare', 'Bare chip on the same base, traced', '%', 'traced', (f) => est(f.traced?.bare, 100), pending);
  add('gain', 'Gain of the encapsulant (package ÷ bare chip)', '×', 'traced', (f) => est(f.traced?.gain, 1), pending);
  add('rays', 'Rays traced (package)', 'rays', 'traced', (f) => (f.traced ? { value: f.traced.rays, sigma: null, decimals: null } : null), pending);

  const cfWhy = (f: VariantFigures) => f.closedFormError ?? 'not defined';
  add('ideal', 'Ideal one-face reference under a dome (closed form)', '%', 'closed form', (f) => plain(f.closedForm && f.closedForm.idealOneFace * 100, 4), cfWhy);
  add('escape', 'Escape through one face into the outside medium (closed form)', '%', 'closed form', (f) => plain(f.closedForm && f.closedForm.escapeOneFaceOutside * 100, 4), cfWhy);
  add('ideal-gain', 'Ideal one-face gain (closed form)', '×', 'closed form', (f) => plain(f.closedForm?.gain, 4), cfWhy);
  add('no-tir', 'Smallest dome radius with no total internal reflection', 'mm', 'closed form', (f) => plain(f.closedForm?.minRadiusNoTirMm, 4), cfWhy);

  add('wavelength', 'Design wavelength', 'nm', 'inputs', (f) => plain(f.wavelengthNm, 5), () => 'not defined');
  add('n-chip', 'Chip index n', '', 'inputs', (f) => plain(f.nChip, 4), () => 'not defined');
  add('n-enc', 'Encapsulant index n', '', 'inputs', (f) => (f.shape === 'none' ? null : plain(f.nEnc, 4)), () => 'no encapsulant');
  add('n-out', 'Outside index n', '', 'inputs', (f) => plain(f.nOut, 4), () => 'not defined');
  add('radius', 'Encapsulant radius', 'mm', 'inputs', (f) => (f.shape === 'none' ? null : plain(f.radiusMm, 4)), () => 'no encapsulant');

  add('beam', 'Beam angle (full width at half maximum)', '°', 'far field', (f) => plain(f.traced?.trace.farField.beamAngleDeg, 4), (f) => (f.traced ? 'intensity never falls to half' : TRACE_PENDING));
  add('on-axis', 'On-axis intensity ÷ Lambertian of the same flux', '×', 'far field', (f) => plain(f.traced?.trace.farField.onAxisVsLambertian, 3), pending);
  add('below', 'Escaped heading below the horizon', '%', 'far field', (f) => {
    const t = f.traced?.trace;
    return t ? est({ value: t.escapedBelowHorizon, sigma: Math.sqrt((t.escapedBelowHorizon * (1 - t.escapedBelowHorizon)) / t.rays) }, 100) : null;
  }, pending);

  for (const c of LEDGER_CATEGORIES) {
    add(`ledger-${c.key}`, `Ledger: ${c.label.toLowerCase()}`, '%', 'ledger', (f) => {
      const t = f.traced?.trace;
      if (!t) return null;
      const p = t.ledger[c.key];
      // binomial standard error √(p(1 − p)/N)
      return est({ value: p, sigma: Math.sqrt((p * (1 - p)) / t.rays) }, 100);
    }, pending);
  }
  return rows;
}
