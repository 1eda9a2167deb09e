/** base64url text for links: UTF-8 safe, no padding. Shared by every query parameter that carries JSON. */

/** Encodes the UTF-8 bytes of a string as base64url without padding. */
export function toBase64Url(text: string): string {
  const bytes = new TextEncoder().encode(text);
  let binary = '';
  for (let i = 0; i < bytes.length; i++) binary += String.fromCharCode(bytes[i]);
  return btoa(binary).replace(/\+/g, '-').replace(/\//g, '_').replace(/=+$/, '');
}

/** Decodes base64url (padding optional) to a UTF-8 string; throws on bad input (callers catch it). */
export function fromBase64Url(code: string): string {
  if (!/^[A-Za-z0-9_-]*$/.test(code)) throw new Error('not base64url');
  const b64 = code.replace(/-/g, '+').replace(/_/g, '/') + '==='.slice((code.length + 3) % 4);
  const binary = atob(b64);
  const bytes = new Uint8Array(binary.length);
  for (let i = 0; i < binary.length; i++) bytes[i] = binary.charCodeAt(i);
  return new TextDecoder('utf-8', { fatal: true }).decode(bytes);
}
