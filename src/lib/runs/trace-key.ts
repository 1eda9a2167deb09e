/**
 * Keys that name what a trace traced, for the result cache and for "is this result about the current
 * package?". packageKey covers the package only, so a new ray count or seed is not a new package;
 * traceKey adds rays and seed, which fix the result exactly (seeded chunks). Pure.
 */
import type { TracePackage } from '../trace/package-spec';

/** Bump when the tracer's numbers for the same inputs change, so results cached before are not reused. */
export const TRACE_RESULTS_VERSION = 2;

/** JSON with object keys sorted, so two equal packages built in different key orders give one text. */
export function canonicalJson(value: unknown): string {
  if (value === null || typeof value !== 'object') return JSON.stringify(value) ?? 'null';
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(',')}]`;
  const entries = Object.entries(value as Record<string, unknown>)
    .filter(([, v]) => v !== undefined)
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
  return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(',')}}`;
}

/**
 * 64-bit FNV-1a of a text's UTF-16 code units, as 16 hex digits (two 32-bit lanes with different
 * offsets). Not cryptographic: it names cache entries.
 * Source: G. Fowler, L. C. Noll, K.-P. Vo, D. Eastlake, "The FNV Non-Cryptographic Hash Algorithm",
 * IETF draft-eastlake-fnv (FNV-1a, 32-bit prime 16777619, offset basis 2166136261).
 */
export function fnv1a64(text: string): string {
  let h1 = 0x811c9dc5;
  let h2 = 0x050c5d1f;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    h1 = Math.imul(h1 ^ c, 16777619) >>> 0;
    h2 = Math.imul(h2 ^ c, 16777619) >>> 0;
  }
  return h1.toString(16).padStart(8, '0') + h2.toString(16).padStart(8, '0');
}

/** Names the package (geometry, media, base, polarisation), not how many rays traced it. */
export function packageKey(pkg: TracePackage): string {
  return fnv1a64(canonicalJson(pkg));
}

/** Names one trace exactly: the package, rays, seed and the tracer's results version. */
export function traceKey(pkg: TracePackage, rays: number, seed: number): string {
  return `${packageKey(pkg)}-${rays}-${seed}-v${TRACE_RESULTS_VERSION}`;
}
