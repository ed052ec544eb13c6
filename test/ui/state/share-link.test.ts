import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { decodeShareHash, encodeShareHash, fromBase64Url, toBase64Url } from '../../../src/ui/state/share-link';

describe('share-link', () => {
  it('toBase64Url of "Ma" bytes is "TWE" — RFC 4648 §10 test vector (base64 "TWE=" without padding)', () => {
    expect(toBase64Url(new TextEncoder().encode('Ma'))).toBe('TWE');
    expect(toBase64Url(new Uint8Array([0xfb, 0xff]))).toBe('-_8');
  });

  it('decodeShareHash(encodeShareHash(x)) is x for any JSON value, including non-ASCII text (property)', () => {
    fc.assert(
      fc.property(fc.jsonValue(), (v) => {
        const hash = encodeShareHash(v);
        expect(hash.startsWith('#p=')).toBe(true);
        expect(hash).toMatch(/^#p=[A-Za-z0-9_-]*$/);
        expect(decodeShareHash(hash)).toEqual(JSON.parse(JSON.stringify(v)));
      }),
    );
    expect(decodeShareHash(encodeShareHash({ title: 'Grès < 2 m — ü' }))).toEqual({ title: 'Grès < 2 m — ü' });
  });

  it('a hash without #p= is null; a damaged link throws a RangeError', () => {
    expect(decodeShareHash('')).toBeNull();
    expect(decodeShareHash('#section-2')).toBeNull();
    expect(() => decodeShareHash('#p=***')).toThrow(RangeError);
    expect(() => decodeShareHash('#p=' + toBase64Url(new TextEncoder().encode('{not json')))).toThrow(/JSON/);
    expect(() => fromBase64Url('a+b')).toThrow(RangeError);
  });
});
