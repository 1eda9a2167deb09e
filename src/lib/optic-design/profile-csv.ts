/**
 * Profile export for a mechanical designer: one CSV row per profile point, `r_mm,z_mm,surface`, the surfaces in
 * boundary order (rotate about the z axis; z up from the source plane). Comment lines (#) before the header say
 * what the file is; a reader that skips lines starting with # gets plain CSV (RFC 4180 fields, no quoting needed:
 * surface names are our own [a-z-] words).
 */
import type { OpticDesign } from './optic-design';

/** Formats a length, mm, with 6 decimals (1 nm), no exponent. */
function mm(x: number): string {
  return (Object.is(x, -0) ? 0 : x).toFixed(6);
}

/**
 * The CSV text of a design's profile.
 * @example profileCsv(design) // "# …\nr_mm,z_mm,surface\n0.000000,2.000000,entry\n…"
 */
export function profileCsv(design: OpticDesign): string {
  const lines = [
    `# meridian profile of a ${design.shape} ${design.type}: rotate about the z axis; z up from the source plane; lengths in mm`,
    `# exit diameter ${mm(design.exitDiameterMm)} mm, top ${mm(design.heightMm)} mm, index ${design.n}, chord tolerance ${design.toleranceMm} mm`,
    'r_mm,z_mm,surface'
  ];
  for (const s of design.surfaces) {
    for (let i = 0; i < s.r.length; i++) lines.push(`${mm(s.r[i])},${mm(s.z[i])},${s.name}`);
  }
  return lines.join('\n') + '\n';
}
