import { describe, expect, it } from 'vitest';
import { toBase64Url } from '../../../src/lib/scenario/base64url';
import { decodeVariantsParam, encodeVariantsParam } from '../../../src/lib/variants/variants-url';
import { twoVariants } from './fixtures';

describe('variants in the link', () => {
  it('encode then decode gives the same document', () => {
    const doc = twoVariants();
    const param = encodeVariantsParam(doc);
    expect(param.startsWith('1.')).toBe(true);
    expect(decodeVariantsParam(param)).toEqual({ ok: true, doc });
  });

  it('a damaged, cut or newer link gives a message, never a throw', () => {
    const param = encodeVariantsParam(twoVariants());
    expect(decodeVariantsParam(param.slice(0, 40))).toEqual({ ok: false, message: 'The variants in this link could not be read (damaged or cut short).' });
    expect(decodeVariantsParam('x.abc').ok).toBe(false);
    const newer = decodeVariantsParam(`2.${param.slice(2)}`);
    expect(newer.ok).toBe(false);
    if (!newer.ok) expect(newer.message).toMatch(/newer version/);
    const invalid = decodeVariantsParam(`1.${toBase64Url('{"version":1,"variants":[{"name":"","scenario":{}}]}')}`);
    expect(invalid.ok).toBe(false);
    if (!invalid.ok) expect(invalid.message).toMatch(/^The variants in this link are not valid: /);
  });
});
