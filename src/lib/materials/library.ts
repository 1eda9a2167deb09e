/**
 * The shipped material library: the only reader of data/materials.json. Every entry is checked
 * against the schema when the module loads, so a broken data file fails loudly, not as NaN later.
 */
import data from '../../../data/materials.json';
import { materialSchema } from './material-schema';
import type { Material } from './types';

const SUBSCRIPT_DIGITS = '₀₁₂₃₄₅₆₇₈₉';

/** Lookup key: trimmed, lower case, subscript digits as plain digits, runs of spaces as one. */
export function materialKey(text: string): string {
  let out = '';
  for (const ch of text.trim().toLowerCase()) {
    const i = SUBSCRIPT_DIGITS.indexOf(ch);
    out += i >= 0 ? String(i) : ch;
  }
  return out.replace(/\s+/g, ' ');
}

function deepFreeze<T>(value: T): T {
  if (value && typeof value === 'object') {
    for (const child of Object.values(value)) deepFreeze(child);
    Object.freeze(value);
  }
  return value;
}

function load(entries: unknown[]): Material[] {
  const out: Material[] = [];
  const seen = new Set<string>();
  entries.forEach((entry, i) => {
    const result = materialSchema.safeParse(entry);
    if (!result.success) {
      const id = (entry as { id?: unknown })?.id;
      const issues = result.error.issues.map((s) => `${s.path.join('.')}: ${s.message}`).join('; ');
      throw new Error(`data/materials.json entry ${i} (${String(id)}) is invalid: ${issues}`);
    }
    if (seen.has(result.data.id)) throw new Error(`data/materials.json: duplicate id "${result.data.id}"`);
    seen.add(result.data.id);
    out.push(deepFreeze(result.data));
  });
  return out;
}

const MATERIALS: readonly Material[] = Object.freeze(load(data.materials));

const BY_KEY = new Map<string, Material>();
for (const m of MATERIALS) {
  for (const name of [m.id, m.name, ...m.aliases]) {
    const key = materialKey(name);
    const other = BY_KEY.get(key);
    if (other && other !== m) throw new Error(`data/materials.json: "${name}" names both ${other.id} and ${m.id}`);
    BY_KEY.set(key, m);
  }
}

/** Every material of the shipped library, in data-file order (a fresh array of frozen entries). */
export function listMaterials(): Material[] {
  return MATERIALS.slice();
}

/**
 * The material whose id, display name or alias matches `idOrNameOrAlias`, ignoring case, surrounding
 * spaces and subscript digits ("GaN", "gan", "SiO₂"). `userMaterials` are searched after the library.
 * @returns the material, or undefined when nothing matches
 */
export function findMaterial(idOrNameOrAlias: string, userMaterials?: readonly Material[]): Material | undefined {
  if (typeof idOrNameOrAlias !== 'string') return undefined;
  const key = materialKey(idOrNameOrAlias);
  if (key === '') return undefined;
  const hit = BY_KEY.get(key);
  if (hit || !userMaterials) return hit;
  return userMaterials.find((m) => [m.id, m.name, ...m.aliases].some((name) => materialKey(name) === key));
}
