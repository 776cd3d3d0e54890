import { createCipheriv, createDecipheriv, hkdfSync, randomBytes } from 'node:crypto';

const VERSION = 'v1';
const INFO = 'mantlepiece venue signing key v1';

/** AES-256 key for sealing private keys, derived from the server secret (HKDF-SHA256, RFC 5869). */
export function sealingKey(secret: string): Buffer {
  return Buffer.from(hkdfSync('sha256', Buffer.from(secret, 'utf8'), Buffer.alloc(0), INFO, 32));
}

/**
 * AES-256-GCM with the venue id as associated data, so a sealed key copied onto another venue's
 * row does not open.
 */
export function seal(key: Buffer, plain: Buffer, venueId: number): string {
  const iv = randomBytes(12);
  const cipher = createCipheriv('aes-256-gcm', key, iv);
  cipher.setAAD(Buffer.from(`venue:${venueId}`));
  const body = Buffer.concat([cipher.update(plain), cipher.final()]);
  return [VERSION, iv, cipher.getAuthTag(), body].map((part) => (typeof part === 'string' ? part : part.toString('base64url'))).join('.');
}

export function unseal(key: Buffer, sealed: string, venueId: number): Buffer {
  const [version, iv, tag, body] = sealed.split('.');
  if (version !== VERSION || !iv || !tag || !body) throw new Error('The venue signing key is not in a form this server reads.');
  const decipher = createDecipheriv('aes-256-gcm', key, Buffer.from(iv, 'base64url'));
  decipher.setAAD(Buffer.from(`venue:${venueId}`));
  decipher.setAuthTag(Buffer.from(tag, 'base64url'));
  return Buffer.concat([decipher.update(Buffer.from(body, 'base64url')), decipher.final()]);
}
