/**
 * Lifts older scenario layouts to the current version before validation.
 *
 * Version 3 → 4: the package body, the base finish and the chip's structure are new. A version-3
 * package is the flat body with a specular base and a flat-topped single-box chip standing on the base,
 * which is what the new fields say when they are added as { kind: 'flat' }, 'specular' and a top
 * texture of 0 (no layers, no chip mirror): the tracer builds the same scene and every number stays.
 * An optional `phosphor` block came with version 4 too; a version-3 scenario has none (a clear encapsulant).
 *
 * Version 2 → 3: a typed encapsulant index loses its k. Every computation already took the
 * encapsulant's loss from its absorption per mm and ignored that k (the tracer and the closed form use
 * the real index only), so the migrated scenario computes exactly the same numbers.
 *
 * Version 1 differs from version 2 only in what a medium can be (no user materials), so it is read
 * as version 2 unchanged.
 *
 * Version 0 is the short hand-written draft layout (also what a scenario without a `version` field is
 * read as): one `wavelengthNm`; media written as a library id string or a bare index number; the base
 * as a reflectance number or a metal id string; optional fields filled from the demo scenario.
 *
 * Every version: library ids retired since (see materials/retired-ids.ts) are renamed to the entry that
 * replaced them, so an old link opens with the published data set.
 */
import { currentMaterialId } from '../materials/retired-ids';
import { DEMO_SCENARIO } from './defaults';
import { SCENARIO_VERSION } from './schema';

export type MigrateResult = { ok: true; value: unknown; from: number } | { ok: false; message: string };

function isRecord(x: unknown): x is Record<string, unknown> {
  return typeof x === 'object' && x !== null && !Array.isArray(x);
}

/** v0 medium: 'gan' → library material; 2.5 → typed index (k = 0); anything else is passed on for the schema to reject. */
function mediumV0(x: unknown): unknown {
  if (typeof x === 'string') return { kind: 'material', id: x };
  if (typeof x === 'number') return { kind: 'index', n: x, k: 0 };
  return x;
}

function orDefault<T>(x: unknown, fallback: T): unknown {
  return x === undefined ? fallback : x;
}

function fromV0(v0: Record<string, unknown>): Record<string, unknown> {
  const d = DEMO_SCENARIO;
  const chip = isRecord(v0.chip) ? v0.chip : {};
  const enc = isRecord(v0.encapsulant) ? v0.encapsulant : {};
  const base = v0.base;
  return {
    version: 1,
    name: orDefault(v0.name, 'Imported scenario'),
    emission: { kind: 'single', wavelengthNm: v0.wavelengthNm },
    chip: {
      medium: mediumV0(chip.material),
      widthMm: chip.widthMm,
      lengthMm: chip.lengthMm,
      heightMm: chip.heightMm,
      emitterZMm: orDefault(chip.emitterZMm, chip.heightMm),
      absorptionPerMm: orDefault(chip.absorptionPerMm, 0),
      emission: orDefault(chip.emission, 'plane')
    },
    base:
      typeof base === 'number'
        ? { kind: 'reflectance', reflectance: base }
        : typeof base === 'string'
          ? { kind: 'metal', id: base }
          : orDefault(base, d.base),
    encapsulant: {
      medium: mediumV0(orDefault(enc.material, 'air')),
      shape: orDefault(enc.shape, 'none'),
      radiusMm: orDefault(enc.radiusMm, d.encapsulant.radiusMm),
      heightMm: orDefault(enc.heightMm, orDefault(enc.radiusMm, d.encapsulant.heightMm)),
      absorptionPerMm: orDefault(enc.absorptionPerMm, 0)
    },
    outside: mediumV0(orDefault(v0.outside, 'air')),
    trace: {
      rays: orDefault(v0.rays, d.trace.rays),
      seed: orDefault(v0.seed, d.trace.seed),
      polarization: orDefault(v0.polarization, d.trace.polarization)
    }
  };
}

/**
 * Brings a parsed scenario object of any known version to the current version (not yet validated).
 * A version newer than this program reads, or a value that is not an object, gives a message instead.
 */
export function migrateScenario(raw: unknown): MigrateResult {
  if (!isRecord(raw)) return { ok: false, message: 'A scenario must be an object with named fields.' };
  const version = raw.version === undefined ? 0 : raw.version;
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 0) {
    return { ok: false, message: `Scenario version must be a whole number from 0 to ${SCENARIO_VERSION}.` };
  }
  if (version > SCENARIO_VERSION) {
    return {
      ok: false,
      message: `This scenario was made by a newer version of Outcouple (scenario version ${version}); this one reads versions up to ${SCENARIO_VERSION}.`
    };
  }
  if (version === SCENARIO_VERSION) return { ok: true, value: renameRetired(raw), from: version };
  // Version 2 only added user-material media: a version-1 scenario is a version-2 one with its number raised.
  const v2 = version <= 1 ? { ...(version === 0 ? fromV0(raw) : raw), version: 2 } : raw;
  const v3 = version <= 2 ? fromV2(v2) : raw;
  return { ok: true, value: renameRetired(fromV3(v3)), from: version };
}

/** v3 → v4: the flat body, a specular base, a flat-topped single-box chip — today's package, unchanged. */
function fromV3(v3: Record<string, unknown>): Record<string, unknown> {
  const chip = isRecord(v3.chip) ? { ...v3.chip, topTexture: 0 } : v3.chip;
  return { ...v3, version: 4, baseFinish: 'specular', body: { kind: 'flat' }, chip };
}

/** v2 → v3: the typed encapsulant index drops its k (never used: the absorption per mm is the encapsulant's loss). */
function fromV2(v2: Record<string, unknown>): Record<string, unknown> {
  const enc = v2.encapsulant;
  if (!isRecord(enc) || !isRecord(enc.medium) || enc.medium.kind !== 'index') return { ...v2, version: 3 };
  const { k: _unused, ...medium } = enc.medium;
  return { ...v2, version: 3, encapsulant: { ...enc, medium } };
}

/** A library medium `{ kind: 'material', id }` with a retired id gets the id of its replacement. */
function renameMedium(medium: unknown): unknown {
  if (!isRecord(medium) || medium.kind !== 'material' || typeof medium.id !== 'string') return medium;
  const id = currentMaterialId(medium.id);
  return id === medium.id ? medium : { ...medium, id };
}

/** The scenario with retired library ids renamed in chip (and its layers), encapsulant and outside media (copies, never edits). */
function renameRetired(s: Record<string, unknown>): Record<string, unknown> {
  const out: Record<string, unknown> = { ...s, outside: renameMedium(s.outside) };
  for (const part of ['chip', 'encapsulant'] as const) {
    const p = s[part];
    if (isRecord(p)) out[part] = { ...p, medium: renameMedium(p.medium) };
  }
  const chip = out.chip;
  if (isRecord(chip) && Array.isArray(chip.layers)) {
    out.chip = { ...chip, layers: chip.layers.map((l) => (isRecord(l) ? { ...l, medium: renameMedium(l.medium) } : l)) };
  }
  if (s.outside === undefined) delete out.outside;
  return out;
}
