/**
 * One naming rule for every downloaded file, so files from two pages, two scenarios or two variants of
 * one scenario never overwrite each other:
 *   outcouple-<page>-<scenario>[-<variant>]-<what>.<ext>
 * each part slugged (ASCII letters and digits, words joined by '-').
 */

export interface ExportFileNameParts {
  /** Page the file comes from: "dome", "compare". */
  page: string;
  /** Scenario name as the user typed it. */
  scenario: string;
  /** Variant name ("B", "phenyl dome"), when the file belongs to one variant. */
  variant?: string;
  /** What the file holds: "far field", "loss ledger", "results". */
  what: string;
  /** Extension without the dot: "png", "csv", "ies", "json". */
  ext: string;
}

/** Longest slug of one part, characters: keeps whole names within common file-system limits. */
const PART_MAX = 40;

/**
 * Lower-case ASCII slug of free text: accents dropped (é → e), Greek letters and symbols spelled
 * (θ → theta, η → eta, ≈ → approx), other characters as '-' separators, at most `max` characters.
 * @example slug('Methyl silicone (n ≈ 1.41)') // 'methyl-silicone-n-approx-1-41'
 */
export function slug(text: string, max = PART_MAX): string {
  const spelled = String(text ?? '')
    .replace(/[θΘ]/g, ' theta ')
    .replace(/[ηΗ]/g, ' eta ')
    .replace(/[λΛ]/g, ' lambda ')
    .replace(/[Φφ]/g, ' phi ')
    .replace(/[σΣ]/g, ' sigma ')
    .replace(/[µμ]/g, ' u ')
    .replace(/≈/g, ' approx ')
    .replace(/%/g, ' pct ')
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '');
  return spelled.slice(0, max).replace(/-+$/, '');
}

/**
 * The file name of an export (see the file comment). An empty scenario name becomes "scenario";
 * an empty variant is left out.
 * @throws RangeError naming the part when page, what or ext slug to nothing
 * @example exportFileName({ page: 'dome', scenario: 'Demo: blue chip', variant: 'B', what: 'far field', ext: 'png' })
 *          // 'outcouple-dome-demo-blue-chip-b-far-field.png'
 */
export function exportFileName(parts: ExportFileNameParts): string {
  const page = slug(parts.page);
  const what = slug(parts.what);
  const ext = slug(parts.ext, 8).replace(/-/g, '');
  if (!page) throw new RangeError(`page must name the page in letters or digits (got '${String(parts.page)}')`);
  if (!what) throw new RangeError(`what must say what the file holds in letters or digits (got '${String(parts.what)}')`);
  if (!ext) throw new RangeError(`ext must be a file extension of letters or digits (got '${String(parts.ext)}')`);
  const scenario = slug(parts.scenario) || 'scenario';
  const variant = parts.variant === undefined ? '' : slug(parts.variant);
  return ['outcouple', page, scenario, variant, what].filter((p) => p !== '').join('-') + '.' + ext;
}
