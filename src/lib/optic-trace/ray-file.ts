/**
 * The ray file: a plain CSV of rays, our own documented format, so a package's escaping light can be
 * saved and any such list (traced or made elsewhere) can feed an optic.
 *
 *   # outcouple ray file v1; scenario: <name>; source plane z_mm: <z>; <note>
 *   x_mm,y_mm,z_mm,dx,dy,dz,wavelength_nm,weight
 *   0.12,-0.3,0.15,0.1,0.2,0.9747,450,1
 *
 * Lines starting with '#' are comments (the first names the scenario, and may give the height an optic's
 * design frame starts at, "source plane z_mm: 0.15"); the header row is required;
 * the direction is normalised on reading (it must not be zero); weight > 0 (relative flux).
 */
import { ESCAPE_RECORD } from '../trace/scene-layout';
import { exportNumber } from '../export/number-text';

export const RAY_FILE_HEADER = 'x_mm,y_mm,z_mm,dx,dy,dz,wavelength_nm,weight';
const FIELDS = RAY_FILE_HEADER.split(',');
/** Largest ray file read, rays (a sanity bound for the browser's memory). */
export const MAX_FILE_RAYS = 2_000_000;

export interface RayList {
  /** 7 doubles per ray: x, y, z (mm), unit direction dx, dy, dz, weight. */
  rays: Float64Array;
  count: number;
  /** Weighted mean wavelength, nm (the optic's material is read there). */
  wavelengthNm: number;
  /** The scenario named in the first comment line, or ''. */
  scenario: string;
  /** The source plane the comment gives, mm, or null (then the highest start of the rays is used). */
  sourcePlaneMm: number | null;
}

/**
 * Writes rays as a ray file.
 * @param positionsDirections ESCAPE_RECORD doubles per ray (x, y, z, dx, dy, dz, wavelength nm or NaN), `count` rays
 * @param wavelengthNm the wavelength written for a ray whose own is NaN
 */
export function formatRayFile(
  positionsDirections: Float64Array,
  count: number,
  wavelengthNm: number,
  scenario: string,
  note = '',
  sourcePlaneMm: number | null = null
): string {
  const plane = sourcePlaneMm === null ? '' : `; source plane z_mm: ${exportNumber(sourcePlaneMm)}`;
  const lines = [`# outcouple ray file v1; scenario: ${scenario.replace(/[\r\n;]/g, ' ')}${plane}${note ? `; ${note.replace(/[\r\n]/g, ' ')}` : ''}`, RAY_FILE_HEADER];
  for (let i = 0; i < count; i++) {
    const o = ESCAPE_RECORD * i;
    const cells: string[] = [];
    for (let k = 0; k < 6; k++) cells.push(exportNumber(positionsDirections[o + k]));
    const own = positionsDirections[o + 6];
    lines.push(`${cells.join(',')},${exportNumber(Number.isNaN(own) ? wavelengthNm : own)},1`);
  }
  return lines.join('\n') + '\n';
}

/**
 * Reads a ray file.
 * @throws RangeError, one line naming the row (1-based line number) and the field: a missing header, a
 *   wrong column count, a cell that is not a finite number, a zero direction, a wavelength outside
 *   [100, 20000] nm, a weight ≤ 0, no rays, more than MAX_FILE_RAYS
 */
export function parseRayFile(text: string): RayList {
  const lines = text.split(/\r?\n/);
  let scenario = '';
  let sourcePlaneMm: number | null = null;
  let headerSeen = false;
  const values: number[] = [];
  let wlSum = 0;
  let wSum = 0;
  for (let li = 0; li < lines.length; li++) {
    const line = lines[li].trim();
    const row = li + 1;
    if (line === '') continue;
    if (line.startsWith('#')) {
      const m = /scenario:\s*([^;]*)/.exec(line);
      if (m && scenario === '') scenario = m[1].trim();
      const plane = /source plane z_mm:\s*([^;\s]+)/.exec(line);
      if (plane) {
        const z = Number(plane[1]);
        if (!Number.isFinite(z)) throw new RangeError(`ray file row ${row}, source plane z_mm: must be a finite number (got "${plane[1].slice(0, 20)}")`);
        sourcePlaneMm = z;
      }
      continue;
    }
    if (!headerSeen) {
      if (line.replace(/\s/g, '') !== RAY_FILE_HEADER) throw new RangeError(`ray file row ${row}: the header must be ${RAY_FILE_HEADER}`);
      headerSeen = true;
      continue;
    }
    const cells = line.split(',');
    if (cells.length !== FIELDS.length) throw new RangeError(`ray file row ${row}: needs ${FIELDS.length} values (${RAY_FILE_HEADER}), got ${cells.length}`);
    const v = cells.map((c, k) => {
      const x = c.trim() === '' ? NaN : Number(c);
      if (!Number.isFinite(x)) throw new RangeError(`ray file row ${row}, field ${FIELDS[k]}: must be a finite number (got "${c.trim().slice(0, 20)}")`);
      return x;
    });
    const len = Math.hypot(v[3], v[4], v[5]);
    if (!(len > 0)) throw new RangeError(`ray file row ${row}, field dx,dy,dz: the direction must not be zero`);
    if (!(v[6] >= 100 && v[6] <= 20000)) throw new RangeError(`ray file row ${row}, field wavelength_nm: must be in [100, 20000] (got ${v[6]})`);
    if (!(v[7] > 0)) throw new RangeError(`ray file row ${row}, field weight: must be > 0 (got ${v[7]})`);
    if (values.length / 7 >= MAX_FILE_RAYS) throw new RangeError(`ray file row ${row}: at most ${MAX_FILE_RAYS} rays`);
    values.push(v[0], v[1], v[2], v[3] / len, v[4] / len, v[5] / len, v[7]);
    wlSum += v[6] * v[7];
    wSum += v[7];
  }
  if (!headerSeen) throw new RangeError(`ray file row 1: the header must be ${RAY_FILE_HEADER}`);
  if (values.length === 0) throw new RangeError('ray file: no rays after the header (at least 1 row)');
  return { rays: Float64Array.from(values), count: values.length / 7, wavelengthNm: wlSum / wSum, scenario, sourcePlaneMm };
}
