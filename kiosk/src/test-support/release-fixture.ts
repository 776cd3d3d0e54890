/// <reference types="node" />
import { createHash, generateKeyPairSync, sign } from 'node:crypto';
import {
  PUBLICATION_FORMAT, RELEASE_FORMAT, serializeManifest, serializePublication, type KioskCredential, type KioskManifestResponse, type ReleaseManifest, type ReleaseStory,
} from '@mantlepiece/shared/kiosk';

/** A venue key pair made with node:crypto, as the server makes and signs with it. */
export function venueKey() {
  const { publicKey, privateKey } = generateKeyPairSync('ed25519');
  return {
    publicKeySpkiB64: publicKey.export({ type: 'spki', format: 'der' }).toString('base64'),
    sign: (text: string) => sign(null, Buffer.from(text, 'utf8'), privateKey).toString('base64'),
  };
}

export type VenueKey = ReturnType<typeof venueKey>;

export const sha256Of = (bytes: Uint8Array) => createHash('sha256').update(bytes).digest('hex');

/** Bytes standing in for an image rendition: distinct per seed, `size` long. */
export function fakeImage(seed: number, size = 700_000): Uint8Array {
  const bytes = new Uint8Array(size);
  for (let i = 0; i < size; i += 1) bytes[i] = (i * 31 + seed * 17) % 251;
  return bytes;
}

const paragraph = (text: string) => ({ type: 'paragraph', content: [{ type: 'text', text }] });

export function fixtureStory(id: number, titles: Record<string, string>, mediaId?: string): ReleaseStory {
  const docs = (n: number) =>
    Object.fromEntries(
      Object.entries(titles).map(([locale, title]) => [
        locale,
        {
          type: 'doc' as const,
          content: [
            { type: 'heading', attrs: { level: 2 }, content: [{ type: 'text', text: `${title} ${n}` }] },
            paragraph(`${locale} panel ${n} of story ${id}.`),
            ...(mediaId && n === 1 ? [{ type: 'panelImage', attrs: { mediaId } }] : []),
          ],
        },
      ]),
    );
  return { id, revisionId: id * 10, title: titles, audience: 'family', panels: [1, 2, 3].map((n) => ({ id: id * 100 + n, position: n - 1, docs: docs(n) })) };
}

export interface FixtureRelease {
  manifest: ReleaseManifest;
  response: KioskManifestResponse;
  files: Map<string, Uint8Array>;
  /** What the server tags this answer with: it changes with the publication record. */
  etag: string;
}

export interface PublicationOptions {
  /** The publication's sequence; by default the release id, as when each release is published once in turn. */
  sequence?: number;
  expiresAt?: string;
}

/** The same release under a publication record of its own, as a technician's publish or rollback (or a re-signing) gives it. */
export function published(key: VenueKey, release: FixtureRelease, { sequence = release.manifest.releaseId, expiresAt = '2099-01-01T00:00:00.000Z' }: PublicationOptions = {}): FixtureRelease {
  const record = serializePublication({
    format: PUBLICATION_FORMAT, galleryId: release.manifest.galleryId, sequence, releaseId: release.manifest.releaseId,
    manifestSha256: sha256Of(Buffer.from(release.response.manifest, 'utf8')),
    publishedAt: '2025-05-01T09:30:00.000Z', signedAt: '2025-05-01T09:30:00.000Z', expiresAt,
  });
  return { ...release, response: { ...release.response, publication: { record, signature: key.sign(record) } }, etag: `"${sha256Of(Buffer.from(record, 'utf8'))}"` };
}

/** A signed release of the demo venue's gallery 2 with one image in two renditions, published. */
export function fixtureRelease(key: VenueKey, releaseId: number, options: { imageSeed?: number; storyTitle?: string; locales?: string[] } & PublicationOptions = {}): FixtureRelease {
  const seed = options.imageSeed ?? 1;
  const small = fakeImage(seed, 300_000);
  const large = fakeImage(seed + 1000);
  const files = new Map([[sha256Of(small), small], [sha256Of(large), large]]);
  const locales = options.locales ?? ['en', 'fr'];
  const title = options.storyTitle ?? 'Why rock slides';
  const titles = Object.fromEntries(locales.map((locale) => [locale, locale === 'en' ? title : `${title} (${locale})`]));
  const manifest: ReleaseManifest = {
    format: RELEASE_FORMAT,
    releaseId,
    number: releaseId,
    galleryId: 2,
    venue: { name: 'Basalt Point Earth Science Centre', sourceLocale: 'en', locales },
    createdAt: '2025-05-01T09:30:00.000Z',
    fallbackToSource: true,
    stories: [fixtureStory(7, titles, 'm1'), fixtureStory(8, Object.fromEntries(locales.map((l) => [l, `Mantle overturn (${l})`])))],
    media: [{ mediaId: 'm1', alt: { en: 'A basalt cliff above the sea', fr: 'Une falaise de basalte au-dessus de la mer' }, credit: 'Photo: Tomás Reyes', renditions: [{ width: 640, sha256: sha256Of(small) }, { width: 1920, sha256: sha256Of(large) }] }],
    files: [...files].map(([sha256, bytes]) => ({ sha256, size: bytes.byteLength, mime: 'image/webp' })),
  };
  const text = serializeManifest(manifest);
  const unpublished = { manifest, files, response: { manifest: text, signature: key.sign(text), publication: { record: '', signature: '' } }, etag: '' };
  return published(key, unpublished, options);
}

export const fixtureCredential = (key: VenueKey): KioskCredential => ({ deviceToken: 'device-token-1', kioskId: 3, galleryId: 2, stationId: 5, publicKey: key.publicKeySpkiB64 });
