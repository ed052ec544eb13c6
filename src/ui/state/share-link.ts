/**
 * Shareable link: `#p=` + base64url (RFC 4648 §5, no padding) of the project JSON in UTF-8.
 * Decoding returns the parsed JSON (unvalidated): the caller passes it through the model's
 * validation like any other file.
 *     decodeShareHash(encodeShareHash({ a: 'é' })) // { a: 'é' }
 */
export const SHARE_PREFIX = '#p=';

export function toBase64Url(bytes: Uint8Array): string {
  let binary = '';
  for (let i = 0; i < bytes.length; i += 0x8000) {
    binary += String.fromCharCode(...bytes.subarray(i, i + 0x8000));
  }
  return btoa(binary).replace(/\+/g, '-').replace(/\//g, '_').replace(/=+$/, '');
}

export function fromBase64Url(text: string): Uint8Array {
  if (!/^[A-Za-z0-9_-]*$/.test(text)) throw new RangeError('share link: not base64url text');
  const b64 = text.replace(/-/g, '+').replace(/_/g, '/') + '='.repeat((4 - (text.length % 4)) % 4);
  const binary = atob(b64);
  const bytes = new Uint8Array(binary.length);
  for (let i = 0; i < binary.length; i++) bytes[i] = binary.charCodeAt(i);
  return bytes;
}

/** The hash fragment for a project (JSON without indentation). */
export function encodeShareHash(project: unknown): string {
  return SHARE_PREFIX + toBase64Url(new TextEncoder().encode(JSON.stringify(project)));
}

/**
 * The JSON carried by a `#p=` hash, `null` when the hash holds no project link; throws a
 * RangeError with a readable message when the link is damaged.
 */
export function decodeShareHash(hash: string): unknown {
  if (!hash.startsWith(SHARE_PREFIX)) return null;
  const payload = hash.slice(SHARE_PREFIX.length);
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(fromBase64Url(payload));
  } catch {
    throw new RangeError('share link: the project text is damaged (not base64url UTF-8)');
  }
  try {
    return JSON.parse(text) as unknown;
  } catch {
    throw new RangeError('share link: the project text is not valid JSON');
  }
}
