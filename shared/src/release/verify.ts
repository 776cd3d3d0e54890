/** Base64 (RFC 4648, standard alphabet) to bytes; null when the text is not base64. */
export function base64ToBytes(base64: string): Uint8Array<ArrayBuffer> | null {
  try {
    const binary = atob(base64.trim());
    return Uint8Array.from(binary, (char) => char.charCodeAt(0));
  } catch {
    return null;
  }
}

export function bytesToBase64(bytes: Uint8Array): string {
  let binary = '';
  for (const byte of bytes) binary += String.fromCharCode(byte);
  return btoa(binary);
}

/** SHA-256 of raw bytes (a downloaded file) as lower-case hex, through WebCrypto. */
export async function sha256HexOfBytes(bytes: BufferSource): Promise<string> {
  const digest = await crypto.subtle.digest('SHA-256', bytes);
  return Array.from(new Uint8Array(digest), (byte) => byte.toString(16).padStart(2, '0')).join('');
}

/**
 * True only when `signatureB64` is the venue key's Ed25519 signature over the text's UTF-8 bytes.
 * Any malformed input (bad base64, a key that is not Ed25519 SPKI) is a refusal, not an
 * exception: to a kiosk an unreadable signature and a wrong one mean the same thing.
 */
export async function verifySignedText(text: string, signatureB64: string, publicKeySpkiB64: string): Promise<boolean> {
  const signature = base64ToBytes(signatureB64);
  const spki = base64ToBytes(publicKeySpkiB64);
  if (!signature || !spki) return false;
  try {
    const key = await crypto.subtle.importKey('spki', spki, { name: 'Ed25519' }, false, ['verify']);
    return await crypto.subtle.verify({ name: 'Ed25519' }, key, signature, new TextEncoder().encode(text));
  } catch {
    return false;
  }
}

/** A release manifest's signature check; the manifest and the publication record share the venue key. */
export const verifyManifest = verifySignedText;
