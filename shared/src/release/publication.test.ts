import { generateKeyPairSync, sign, type KeyObject } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import {
  checkPublication, laterPublication, parsePublication, PUBLICATION_FORMAT, publicationExpired, serializePublication, type PublicationRecord,
} from './publication.js';
import { sha256HexOfBytes } from './verify.js';

function venueKeys() {
  const { publicKey, privateKey } = generateKeyPairSync('ed25519');
  return { privateKey, spkiB64: publicKey.export({ type: 'spki', format: 'der' }).toString('base64') };
}

// Signed by node:crypto (OpenSSL), as the server signs; checked through WebCrypto, as the kiosk checks.
const signed = (key: KeyObject, record: PublicationRecord) => {
  const text = serializePublication(record);
  return { record: text, signature: sign(null, Buffer.from(text, 'utf8'), key).toString('base64') };
};

const keys = venueKeys();
const manifestJson = '{"format":"mantlepiece-release/1","releaseId":12}';
const manifestSha256 = await sha256HexOfBytes(new TextEncoder().encode(manifestJson));
const record = (fields: Partial<PublicationRecord> = {}): PublicationRecord => ({
  format: PUBLICATION_FORMAT, galleryId: 2, sequence: 5, releaseId: 12, manifestSha256,
  publishedAt: '2025-05-01T09:30:00.000Z', signedAt: '2025-05-01T09:30:00.000Z', expiresAt: '2025-05-31T09:30:00.000Z', ...fields,
});
const now = new Date('2025-05-10T12:00:00.000Z');
const expect5 = { galleryId: 2, highestSequence: 5, now };

describe('publication record check', () => {
  it('accepts a record signed by the venue key for this gallery and this manifest, at the sequence the kiosk follows or above', async () => {
    expect(await checkPublication(signed(keys.privateKey, record()), manifestJson, keys.spkiB64, expect5)).toEqual({ ok: true, record: record(), expired: false });
    expect(await checkPublication(signed(keys.privateKey, record({ sequence: 6 })), manifestJson, keys.spkiB64, expect5)).toMatchObject({ ok: true, record: { sequence: 6 } });
    expect(await checkPublication(signed(keys.privateKey, record({ sequence: 1 })), manifestJson, keys.spkiB64, { ...expect5, highestSequence: null })).toMatchObject({ ok: true });
  });

  it('refuses a record signed by another venue key, or changed after signing', async () => {
    expect(await checkPublication(signed(venueKeys().privateKey, record()), manifestJson, keys.spkiB64, expect5)).toEqual({
      ok: false, reason: 'The publication record is not signed by this venue’s key.',
    });
    const good = signed(keys.privateKey, record());
    const raised = { ...good, record: good.record.replace('"sequence":5', '"sequence":9') };
    expect(raised.record).not.toBe(good.record);
    expect((await checkPublication(raised, manifestJson, keys.spkiB64, expect5)).ok).toBe(false);
  });

  it('refuses a lower sequence than the one the kiosk follows: an old answer sent again', async () => {
    expect(await checkPublication(signed(keys.privateKey, record({ sequence: 4 })), manifestJson, keys.spkiB64, expect5)).toEqual({
      ok: false, reason: 'Publication 4 is older than publication 5, which this kiosk already follows: an old answer sent again is refused.',
    });
  });

  it('says an expired record is expired from its expiresAt on, and still accepts it', async () => {
    const at = (iso: string) => ({ ...expect5, now: new Date(iso) });
    const old = signed(keys.privateKey, record());
    expect(await checkPublication(old, manifestJson, keys.spkiB64, at('2025-05-31T09:29:59.999Z'))).toMatchObject({ ok: true, expired: false });
    expect(await checkPublication(old, manifestJson, keys.spkiB64, at('2025-05-31T09:30:00.000Z'))).toMatchObject({ ok: true, expired: true });
    expect(publicationExpired('2025-05-31T09:30:00.000Z', new Date('2026-01-01T00:00:00Z'))).toBe(true);
  });

  it('refuses a record for another gallery, or vouching for another manifest', async () => {
    expect(await checkPublication(signed(keys.privateKey, record({ galleryId: 3 })), manifestJson, keys.spkiB64, expect5)).toEqual({
      ok: false, reason: 'Publication 5 is for gallery 3, not this kiosk’s gallery 2.',
    });
    expect(await checkPublication(signed(keys.privateKey, record()), manifestJson.replace('12', '13'), keys.spkiB64, expect5)).toEqual({
      ok: false, reason: 'Publication 5 vouches for another manifest than the one sent with it.',
    });
  });

  it('refuses an answer without a record, and a signed record of another shape', async () => {
    expect(await checkPublication(undefined, manifestJson, keys.spkiB64, expect5)).toEqual({ ok: false, reason: 'The answer carries no publication record.' });
    const { format: _format, ...shapeless } = record();
    const text = JSON.stringify(shapeless);
    const result = await checkPublication({ record: text, signature: sign(null, Buffer.from(text), keys.privateKey).toString('base64') }, manifestJson, keys.spkiB64, expect5);
    expect(result).toEqual({ ok: false, reason: expect.stringMatching(/^The publication record does not match mantlepiece-publication\/1: format/) });
    expect(parsePublication('{')).toEqual({ ok: false, reason: 'The publication record is not JSON.' });
  });
});

describe('the publication a kiosk keeps', () => {
  it('is the higher sequence, and of two copies of one publication the later expiry', () => {
    const held = { sequence: 5, releaseId: 12, expiresAt: '2025-05-31T09:30:00.000Z' };
    expect(laterPublication(null, record())).toEqual(held);
    expect(laterPublication(held, record({ sequence: 6, releaseId: 9 }))).toEqual({ sequence: 6, releaseId: 9, expiresAt: held.expiresAt });
    expect(laterPublication(held, record({ expiresAt: '2025-06-15T00:00:00.000Z' }))).toEqual({ ...held, expiresAt: '2025-06-15T00:00:00.000Z' });
    expect(laterPublication(held, record({ expiresAt: '2025-05-20T00:00:00.000Z' }))).toBe(held);
  });
});
