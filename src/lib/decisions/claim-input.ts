/**
 * A claim as a person states it — the same defaults, units and ranges on the page and the command
 * line: extraction and coating in percent (85 means 85 %, −5 means a 5 % decrease), gain as a factor.
 * The ranges are the one limits table's; the core (`checkClaim`) takes fractions.
 */
import { LIMITS, type NumberLimit } from '../scenario/limits';
import type { ChipStructure, ClaimKind } from './claim-check';
import type { ChipFaces } from '../optics/index';

/** What a claim assumes when it does not say: a planar chip on a base, emitting through its top and four sides. */
export const CLAIM_DEFAULTS: { kind: ClaimKind; structure: ChipStructure; faces: ChipFaces } = {
  kind: 'extraction',
  structure: 'planar',
  faces: 5
};

/** A typical claim of each kind, in the units it is stated in. */
export const CLAIM_EXAMPLE: Record<ClaimKind, number> = { extraction: 85, gain: 3.5, coating: 40 };

/** Allowed range of the stated value per kind (the minimum is exclusive: 0 % extraction is no claim). */
export const CLAIM_VALUE_LIMIT: Record<ClaimKind, NumberLimit> = {
  extraction: LIMITS.claimExtractionPercent,
  gain: LIMITS.claimGain,
  coating: LIMITS.claimCoatingPercent
};

/** The name of the stated value in messages and labels. */
export const CLAIM_VALUE_FIELD: Record<ClaimKind, string> = {
  extraction: 'Claimed extraction',
  gain: 'Claimed gain',
  coating: 'Claimed change from the coating'
};

/**
 * Why a stated value cannot be checked, or null when it can: "Claimed extraction must be more than
 * 0 and at most 100 %." Non-numbers and non-finite values get the same message.
 */
export function claimValueProblem(kind: ClaimKind, stated: unknown): string | null {
  const limit = CLAIM_VALUE_LIMIT[kind];
  const unit = limit.unit === '' ? '' : ` ${limit.unit}`;
  const ok = typeof stated === 'number' && Number.isFinite(stated) && stated > limit.min && stated <= limit.max;
  return ok ? null : `${CLAIM_VALUE_FIELD[kind]} must be more than ${limit.min} and at most ${limit.max}${unit}.`;
}

/** The stated value in the core's terms: a fraction for extraction (85 → 0.85), a relative change for coating, a factor for gain. */
export function claimCoreValue(kind: ClaimKind, stated: number): number {
  return kind === 'gain' ? stated : stated / 100;
}

/** The range of the core's value for a kind (the stated range, converted). */
export function claimCoreLimit(kind: ClaimKind): { min: number; max: number } {
  const limit = CLAIM_VALUE_LIMIT[kind];
  return { min: claimCoreValue(kind, limit.min), max: claimCoreValue(kind, limit.max) };
}
