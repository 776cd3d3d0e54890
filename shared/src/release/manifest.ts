import { z } from '../zod.js';
import type { PanelDocJSON } from '../panel/panel-json.js';
import { canonicalJson } from '../review/revision-snapshot.js';

/** Bumped when the manifest's shape changes, so a kiosk never plays a shape it does not know. */
export const RELEASE_FORMAT = 'mantlepiece-release/1';

/** A SHA-256 as the manifest and the publication record write it. */
export const sha256Schema = z.string().regex(/^[0-9a-f]{64}$/, 'SHA-256 as 64 lower-case hex digits');
const localeText = z.record(z.string(), z.string());
const panelDoc = z.looseObject({ type: z.literal('doc') }) as unknown as z.ZodType<PanelDocJSON>;

const releaseFileSchema = z.object({
  sha256: sha256Schema,
  size: z.number().int().nonnegative(),
  mime: z.string().min(1),
  path: z.string().optional(),
});

const releaseMediaSchema = z.object({
  // The panel document names media by string id, so the manifest does too.
  mediaId: z.union([z.string(), z.number()]).transform(String),
  alt: localeText,
  credit: z.string().nullable(),
  renditions: z.array(z.object({ width: z.number().int().positive(), sha256: sha256Schema })),
});

const releasePanelSchema = z.object({
  id: z.number().int(),
  position: z.number().int(),
  docs: z.record(z.string(), panelDoc),
});

const releaseStorySchema = z.object({
  id: z.number().int(),
  revisionId: z.number().int(),
  /**
   * The language the story is written in, which may differ from the venue's (en-GB in an en
   * venue): what a kiosk shows when lookup finds none of the visitor's. Older releases lack it.
   */
  sourceLocale: z.string().optional(),
  title: localeText,
  audience: z.enum(['family', 'school', 'adult']),
  panels: z.array(releasePanelSchema),
});

export const releaseManifestSchema = z.object({
  format: z.literal(RELEASE_FORMAT),
  releaseId: z.number().int(),
  number: z.number().int(),
  galleryId: z.number().int(),
  venue: z.object({ name: z.string(), sourceLocale: z.string(), locales: z.array(z.string()) }),
  createdAt: z.string(),
  fallbackToSource: z.boolean(),
  stories: z.array(releaseStorySchema),
  media: z.array(releaseMediaSchema),
  files: z.array(releaseFileSchema),
});

/** A release as the kiosk receives it: every story, panel document per locale, and file by SHA-256. */
export type ReleaseManifest = z.output<typeof releaseManifestSchema>;
export type ReleaseStory = ReleaseManifest['stories'][number];
export type ReleasePanel = ReleaseStory['panels'][number];
export type ReleaseMedia = ReleaseManifest['media'][number];
export type ReleaseFile = ReleaseManifest['files'][number];

export type ManifestParse = { ok: true; manifest: ReleaseManifest } | { ok: false; message: string };

/**
 * Reads JSON a signature has already vouched for against its format's schema. Still checked, since
 * a kiosk that plays for months must say "I cannot read this" rather than crash on a server it is
 * newer or older than.
 */
export function readSignedJson<S extends z.ZodType>(json: string, schema: S, what: string, format: string): { ok: true; value: z.output<S> } | { ok: false; message: string } {
  let value: unknown;
  try {
    value = JSON.parse(json);
  } catch {
    return { ok: false, message: `${what} is not JSON.` };
  }
  const parsed = schema.safeParse(value);
  if (parsed.success) return { ok: true, value: parsed.data };
  const first = parsed.error.issues[0];
  return { ok: false, message: `${what} does not match ${format}: ${first ? `${first.path.join('.')} ${first.message}` : 'unknown shape'}.` };
}

export function parseManifest(manifestJson: string): ManifestParse {
  const read = readSignedJson(manifestJson, releaseManifestSchema, 'The manifest', RELEASE_FORMAT);
  return read.ok ? { ok: true, manifest: read.value } : read;
}

/**
 * The manifest as the server signs it: canonical JSON (RFC 8785 key order, no whitespace), so the
 * same release always has the same bytes and the same signature.
 */
export const serializeManifest = (manifest: ReleaseManifest): string => canonicalJson(manifest);

/** What a release shows, without what names one build of it (its id, number, gallery and time). */
export type ReleaseContent = Omit<ReleaseManifest, 'releaseId' | 'number' | 'galleryId' | 'createdAt'>;

export function releaseContentOf(manifest: ReleaseManifest): ReleaseContent {
  const { releaseId: _releaseId, number: _number, galleryId: _galleryId, createdAt: _createdAt, ...content } = manifest;
  return content;
}

/**
 * The content as canonical JSON: two builds whose texts are equal carry the same revisions,
 * documents, alt texts and files (each named by its SHA-256), so their kiosks show the same screens.
 */
export const serializeReleaseContent = (content: ReleaseContent): string => canonicalJson(content);

/** Every file the manifest lists that is not in `stored`, each once. */
export function missingFiles(manifest: ReleaseManifest, stored: ReadonlySet<string>): ReleaseFile[] {
  const seen = new Set<string>();
  return manifest.files.filter((file) => {
    if (stored.has(file.sha256) || seen.has(file.sha256)) return false;
    seen.add(file.sha256);
    return true;
  });
}
