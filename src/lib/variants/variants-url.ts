/**
 * The kept variants in a link: one query parameter `v` = "<version>.<base64url of the document's
 * JSON>", like the scenario's `s`. Decoding never throws: a damaged, invalid or newer link gives a
 * message and no variants. Pure.
 */
import { fromBase64Url, toBase64Url } from '../scenario/base64url';
import { readVariants, VARIANTS_VERSION, type VariantsDoc } from './variants-doc';

/** Name of the query parameter that carries the variants. */
export const VARIANTS_PARAM = 'v';

/** The value of the `v` parameter for a set of variants: "1.eyJ2…". */
export function encodeVariantsParam(doc: VariantsDoc): string {
  return `${doc.version}.${toBase64Url(JSON.stringify(doc))}`;
}

export type DecodeVariantsResult = { ok: true; doc: VariantsDoc } | { ok: false; message: string };

const DAMAGED = 'The variants in this link could not be read (damaged or cut short).';

/** Reads the `v` parameter (an older version is migrated). */
export function decodeVariantsParam(param: string): DecodeVariantsResult {
  const dot = param.indexOf('.');
  const versionText = dot < 0 ? '' : param.slice(0, dot);
  if (!/^\d{1,6}$/.test(versionText)) return { ok: false, message: DAMAGED };
  const version = Number(versionText);
  if (version > VARIANTS_VERSION) {
    return {
      ok: false,
      message: `The variants in this link were made by a newer version of Outcouple (variants version ${version}); this one reads versions up to ${VARIANTS_VERSION}.`
    };
  }
  let raw: unknown;
  try {
    raw = JSON.parse(fromBase64Url(param.slice(dot + 1)));
  } catch {
    return { ok: false, message: DAMAGED };
  }
  const r = readVariants(raw);
  return r.ok ? { ok: true, doc: r.value } : { ok: false, message: `The variants in this link are not valid: ${r.message}` };
}
