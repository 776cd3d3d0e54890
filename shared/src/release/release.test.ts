import { generateKeyPairSync, sign, type KeyObject } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { examplePanelDoc } from '../panel/example-panel.js';
import { missingFiles, parseManifest, RELEASE_FORMAT, serializeManifest, type ReleaseManifest } from './manifest.js';
import { base64ToBytes, bytesToBase64, sha256HexOfBytes, verifyManifest } from './verify.js';

const manifest: ReleaseManifest = {
  format: RELEASE_FORMAT,
  releaseId: 12,
  number: 3,
  galleryId: 2,
  venue: { name: 'Basalt Point Earth Science Centre', sourceLocale: 'en', locales: ['en', 'fr'] },
  createdAt: '2025-05-01T09:30:00.000Z',
  fallbackToSource: false,
  stories: [{ id: 7, revisionId: 31, title: { en: 'Why rock slides', fr: 'Pourquoi la roche glisse' }, audience: 'family', panels: [{ id: 70, position: 0, docs: { en: examplePanelDoc() } }] }],
  media: [{ mediaId: '5', alt: { en: 'Basalt cliff' }, credit: 'Photo: Tomás Reyes', renditions: [{ width: 640, sha256: 'a'.repeat(64) }] }],
  files: [{ sha256: 'a'.repeat(64), size: 1024, mime: 'image/webp' }],
};

// A general-purpose implementation (OpenSSL under node:crypto) signs, as the server will.
function signed(key: KeyObject, text: string): string {
  return sign(null, Buffer.from(text, 'utf8'), key).toString('base64');
}

function venueKeys() {
  const { publicKey, privateKey } = generateKeyPairSync('ed25519');
  return { privateKey, spkiB64: publicKey.export({ type: 'spki', format: 'der' }).toString('base64') };
}

describe('release manifest signature', () => {
  const keys = venueKeys();
  const text = serializeManifest(manifest);
  const signature = signed(keys.privateKey, text);

  it('accepts a manifest signed with node:crypto Ed25519 by the venue key', async () => {
    expect(await verifyManifest(text, signature, keys.spkiB64)).toBe(true);
  });

  it('refuses a manifest changed by one character after signing', async () => {
    const tampered = text.replace('"number":3', '"number":4');
    expect(tampered).not.toBe(text);
    expect(await verifyManifest(tampered, signature, keys.spkiB64)).toBe(false);
  });

  it('refuses a signature made with another venue key', async () => {
    expect(await verifyManifest(text, signature, venueKeys().spkiB64)).toBe(false);
  });

  it('refuses rather than throws on a signature or key that is not base64 Ed25519', async () => {
    expect(await verifyManifest(text, 'not base64!', keys.spkiB64)).toBe(false);
    expect(await verifyManifest(text, signature, bytesToBase64(new Uint8Array([1, 2, 3])))).toBe(false);
    const rsa = generateKeyPairSync('rsa', { modulusLength: 2048 }).publicKey.export({ type: 'spki', format: 'der' }).toString('base64');
    expect(await verifyManifest(text, signature, rsa)).toBe(false);
  });
});

describe('canonical manifest', () => {
  it('writes keys in RFC 8785 order without whitespace, whatever order they were built in', () => {
    const reordered = Object.fromEntries(Object.entries(manifest).reverse()) as unknown as ReleaseManifest;
    expect(serializeManifest(reordered)).toBe(serializeManifest(manifest));
    expect(serializeManifest(manifest).startsWith('{"createdAt":"2025-05-01T09:30:00.000Z","fallbackToSource":false,"files":[')).toBe(true);
  });

  it('reads back what it wrote', () => {
    expect(parseManifest(serializeManifest(manifest))).toEqual({ ok: true, manifest });
  });

  it('names what is wrong with a manifest of another shape', () => {
    const result = parseManifest(JSON.stringify({ ...manifest, format: 'mantlepiece-release/2' }));
    expect(result.ok).toBe(false);
    expect(!result.ok && result.message).toMatch(/^The manifest does not match mantlepiece-release\/1: format/);
    expect(parseManifest('{')).toEqual({ ok: false, message: 'The manifest is not JSON.' });
  });

  it('lists each missing file once and skips those already stored', () => {
    const b = { sha256: 'b'.repeat(64), size: 2, mime: 'image/webp' };
    const withRepeats = { ...manifest, files: [...manifest.files, b, b] };
    expect(missingFiles(withRepeats, new Set(['a'.repeat(64)]))).toEqual([b]);
  });
});

describe('file hashes', () => {
  // FIPS 180-4 example "abc" (NIST CSRC example values, SHA-256).
  it('hashes bytes as FIPS 180-4 does', async () => {
    expect(await sha256HexOfBytes(new TextEncoder().encode('abc'))).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
  });

  it('round-trips base64', () => {
    const bytes = new Uint8Array([0, 255, 128, 7]);
    expect(base64ToBytes(bytesToBase64(bytes))).toEqual(bytes);
  });
});
