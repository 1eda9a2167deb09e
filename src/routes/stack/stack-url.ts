/**
 * The stack in a link: query parameter `stack` = "<version>.<base64url of the stack's JSON>", beside the
 * scenario's own `s` parameter. Decoding never throws: a damaged or invalid link gives a message and
 * the stack to show instead.
 */
import { checkStack, defaultStack, STACK_VERSION, type StackDoc } from './stack-doc';
import { fromBase64Url, toBase64Url } from '$lib/scenario/base64url';

export const STACK_PARAM = 'stack';

/** The `stack` parameter's value for a stack: "1.eyJ2ZXJzaW9uIjox…". */
export function encodeStackParam(doc: StackDoc): string {
  return `${doc.version}.${toBase64Url(JSON.stringify(doc))}`;
}

export interface StackDecode {
  doc: StackDoc;
  /** Why the link's stack was not used; null when it was (or there was none). */
  message: string | null;
  fromLink: boolean;
}

/**
 * Reads a `stack` parameter. Missing → `fallback` (default: the starting stack), no message.
 * Damaged, invalid or newer → `fallback` and a message saying why.
 */
export function decodeStackParam(param: string | null | undefined, fallback: StackDoc = defaultStack()): StackDecode {
  if (param === null || param === undefined || param === '') return { doc: fallback, message: null, fromLink: false };
  const unreadable = 'The layer stack in this link could not be read (damaged or cut short); showing your last stack instead.';
  const dot = param.indexOf('.');
  const versionText = dot < 0 ? '' : param.slice(0, dot);
  if (!/^\d{1,6}$/.test(versionText)) return { doc: fallback, message: unreadable, fromLink: false };
  const version = Number(versionText);
  if (version > STACK_VERSION) {
    return {
      doc: fallback,
      message: `This link's layer stack was made by a newer version of Outcouple (stack version ${version}); this one reads version ${STACK_VERSION}.`,
      fromLink: false
    };
  }
  let raw: unknown;
  try {
    raw = JSON.parse(fromBase64Url(param.slice(dot + 1)));
  } catch {
    return { doc: fallback, message: unreadable, fromLink: false };
  }
  const r = checkStack(raw);
  if (!r.ok) return { doc: fallback, message: `The layer stack in this link is not valid: ${r.message} Showing your last stack instead.`, fromLink: false };
  return { doc: r.doc, message: null, fromLink: true };
}
