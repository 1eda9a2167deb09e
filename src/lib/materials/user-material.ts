/**
 * Checks a material the user supplies as JSON (a file, a pasted object, or a table wrapped by the
 * page) and returns it ready for `indexAt`, or a list of field errors naming the allowed ranges.
 */
import { z } from 'zod';
import { listMaterials } from './library';
import { materialSchema } from './material-schema';
import type { FieldError, Material } from './types';

export type UserMaterialResult = { ok: true; material: Material } | { ok: false; errors: FieldError[] };

/**
 * Validates a user material. Required: id, name, category, dispersion; optional with defaults:
 * aliases ([]), source and provenance ("user supplied"), validRangeNm (the table's span for
 * tables; required for formulas). The id must not be one of the library's ids. The dispersion is
 * evaluated at 50 points across the range and must give finite n > 0 and k ≥ 0 everywhere, with
 * no pole inside the range.
 * @returns `{ ok: true, material }` or `{ ok: false, errors }`, each error `{ path, message }`
 */
export function validateUserMaterial(json: unknown): UserMaterialResult {
  if (json === null || typeof json !== 'object' || Array.isArray(json)) {
    return { ok: false, errors: [{ path: '', message: 'a material must be a JSON object with id, name, category and dispersion' }] };
  }
  const input: Record<string, unknown> = { ...(json as Record<string, unknown>) };
  input.aliases ??= [];
  input.source ??= 'user supplied';
  input.provenance ??= 'user supplied';
  if (input.validRangeNm === undefined) {
    const span = tableSpan(input.dispersion);
    if (span) input.validRangeNm = span;
  }

  const result = materialSchema.safeParse(input);
  const errors: FieldError[] = result.success
    ? []
    : result.error.issues.map((issue) => {
        const path = issue.path.map(String).join('.');
        if (issue.code === 'unrecognized_keys') {
          const keys = issue.keys.map((key) => `"${key}"`).join(', ');
          return { path, message: `${path === '' ? 'material' : path} has unknown field${issue.keys.length > 1 ? 's' : ''} ${keys}` };
        }
        return { path, message: path === '' ? issue.message : `${path} ${issue.message}` };
      });
  if (typeof input.id === 'string' && listMaterials().some((m) => m.id === input.id)) {
    errors.unshift({ path: 'id', message: `id "${input.id}" belongs to a library material; choose another id` });
  }
  if (!result.success || errors.length > 0) return { ok: false, errors };
  return { ok: true, material: result.data };
}

function tableSpan(dispersion: unknown): { min: number; max: number } | undefined {
  if (!dispersion || typeof dispersion !== 'object') return undefined;
  const d = dispersion as { model?: unknown; rows?: unknown };
  if (d.model !== 'table' || !Array.isArray(d.rows) || d.rows.length < 2) return undefined;
  const first = Array.isArray(d.rows[0]) ? d.rows[0][0] : undefined;
  const last = Array.isArray(d.rows[d.rows.length - 1]) ? d.rows[d.rows.length - 1][0] : undefined;
  if (typeof first !== 'number' || typeof last !== 'number') return undefined;
  return { min: first, max: last };
}

/**
 * A schema field holding a user material carried inside another document (a scenario, a stack),
 * checked by {@link validateUserMaterial}; the first problem is reported as "<where>: <problem>.".
 * @param where names the field in the message, e.g. "Encapsulant user material"
 */
export function userMaterialField(where: string) {
  return z.unknown().transform((raw, ctx) => {
    const r = validateUserMaterial(raw);
    if (r.ok) return r.material;
    ctx.addIssue({ code: 'custom', message: `${where}: ${r.errors[0].message}.` });
    return z.NEVER;
  });
}
