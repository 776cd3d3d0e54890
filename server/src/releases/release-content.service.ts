import { Injectable, NotFoundException, UnprocessableEntityException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Op, type Transaction } from 'sequelize';
import {
  lookupText, preflightBlockers, RELEASE_FORMAT, type ApiErrorBody, type ReleaseContent, type ReleaseFile as ManifestFile, type ReleaseMedia, type ReleaseStory as ManifestStory,
} from '@mantlepiece/shared';
import { Exhibit } from '../exhibits/models/exhibit.model.js';
import { MediaAltText } from '../media/models/media-alt-text.model.js';
import { MediaAsset } from '../media/models/media-asset.model.js';
import { MediaRendition } from '../media/models/media-rendition.model.js';
import { Revision } from '../revisions/models/revision.model.js';
import { RevisionsService } from '../revisions/revisions.service.js';
import { Story } from '../stories/models/story.model.js';
import type { Venue } from '../venues/models/venue.model.js';
import { ReleaseTranslations } from './release-translations.js';

type FieldError = NonNullable<ApiErrorBody['errors']>[number];

/** A story a release will carry, with the revision that fixes its content. */
export interface ChosenRevision {
  story: Story;
  revision: Revision;
}

/** A rendition to copy into the release, as the media library stored it. */
export interface RenditionSource {
  sha256: string;
  storeKey: string;
  bytes: number;
}

export const localesOf = (venue: Venue): string[] => [venue.sourceLocale, ...venue.targetLocales];

const MEDIA_ID = /^[1-9]\d{0,9}$/;

/**
 * What goes into a release and whether it may: the revisions chosen, the rules they must pass
 * (translations, preflight on the release date, which covers licences), and the manifest's
 * stories and media built from them.
 */
@Injectable()
export class ReleaseContentService {
  constructor(
    @InjectModel(Revision) private readonly revisions: typeof Revision,
    @InjectModel(Story) private readonly stories: typeof Story,
    @InjectModel(Exhibit) private readonly exhibits: typeof Exhibit,
    @InjectModel(MediaAsset) private readonly media: typeof MediaAsset,
    private readonly revisionRules: RevisionsService,
    private readonly translations: ReleaseTranslations,
  ) {}

  /**
   * The named revisions, or by default the latest approved revision of every story of the
   * gallery's exhibits that is not retired. Stories come in exhibit order, then by title.
   */
  async chooseRevisions(galleryId: number, revisionIds: number[] | undefined, transaction: Transaction): Promise<ChosenRevision[]> {
    const exhibitIds = (await this.exhibits.findAll({ where: { galleryId }, attributes: ['id'], order: [['id', 'ASC']], transaction })).map((e) => e.id);
    const stories = await this.stories.findAll({
      where: { exhibitId: { [Op.in]: exhibitIds.length ? exhibitIds : [0] } },
      order: [['exhibitId', 'ASC'], ['title', 'ASC'], ['id', 'ASC']],
      transaction,
    });
    const storyById = new Map(stories.map((story) => [story.id, story]));
    if (revisionIds) return this.namedRevisions(revisionIds, storyById, transaction);

    const live = stories.filter((story) => story.state !== 'retired');
    const approved = await this.revisions.findAll({
      where: { storyId: { [Op.in]: live.length ? live.map((s) => s.id) : [0] }, state: 'approved' },
      order: [['number', 'DESC']],
      transaction,
    });
    const latest = new Map<number, Revision>();
    for (const revision of approved) if (!latest.has(revision.storyId)) latest.set(revision.storyId, revision);
    const chosen = live.flatMap((story) => (latest.has(story.id) ? [{ story, revision: latest.get(story.id)! }] : []));
    if (chosen.length === 0) throw releaseRefusal('This gallery has no approved story to release.', [{ path: ['revisionIds'], message: 'Approve at least one story of the gallery’s exhibits first.' }]);
    return chosen;
  }

  private async namedRevisions(revisionIds: number[], storyById: Map<number, Story>, transaction: Transaction): Promise<ChosenRevision[]> {
    const found = new Map((await this.revisions.findAll({ where: { id: { [Op.in]: revisionIds } }, transaction })).map((r) => [r.id, r]));
    const errors: FieldError[] = [];
    const seenStories = new Set<number>();
    const chosen: ChosenRevision[] = [];
    revisionIds.forEach((id, index) => {
      const revision = found.get(id);
      const story = revision && storyById.get(revision.storyId);
      if (!revision) errors.push({ path: ['revisionIds', index], message: `There is no revision ${id}.` });
      else if (!story) errors.push({ path: ['revisionIds', index], message: `Revision ${id} is of a story outside this gallery's exhibits.` });
      else if (revision.state !== 'approved') errors.push({ path: ['revisionIds', index], message: `Revision ${id} is not approved.` });
      else if (story.state === 'retired') errors.push({ path: ['revisionIds', index], message: `“${story.title}” is retired.` });
      else if (seenStories.has(story.id)) errors.push({ path: ['revisionIds', index], message: `“${story.title}” is named twice; a release carries one revision of a story.` });
      else {
        seenStories.add(story.id);
        chosen.push({ story, revision });
      }
    });
    if (errors.length) throw releaseRefusal('Some of these revisions cannot be released.', errors);
    if (chosen.length === 0) throw releaseRefusal('A release needs at least one story.', [{ path: ['revisionIds'], message: 'Name at least one approved revision.' }]);
    return [...storyById.values()].flatMap((story) => chosen.filter((c) => c.story.id === story.id));
  }

  /**
   * Everything else that stops the release, each with a path: images not prepared, then preflight
   * blockers as of today (missing translations are the release plan's, `ReleaseChoicesService`).
   */
  async problemsOf(chosen: ChosenRevision[], transaction: Transaction): Promise<FieldError[]> {
    const problems: FieldError[] = [];
    problems.push(...(await this.unpreparedImages(chosen, transaction)));
    for (const { story, revision } of chosen) {
      const blockers = preflightBlockers(await this.revisionRules.preflightOf(revision.snapshot, story, transaction));
      for (const blocker of blockers) {
        const path = ['preflight', blocker.check, story.id, ...(blocker.panelId === undefined ? [] : [blocker.panelId])];
        problems.push({ path, message: `“${story.title}”: ${blocker.message}` });
      }
    }
    return problems;
  }

  /** Images the stories show whose renditions are not made yet, or failed: a kiosk could not show them. */
  private async unpreparedImages(chosen: ChosenRevision[], transaction: Transaction): Promise<FieldError[]> {
    const ids = mediaIdsOf(chosen);
    if (ids.length === 0) return [];
    const assets = await this.media.findAll({
      where: { id: ids, renditionState: { [Op.ne]: 'ready' } }, attributes: ['id', 'originalFilename', 'renditionState', 'renditionFailure'], order: [['id', 'ASC']], transaction,
    });
    return assets.map((asset) => ({
      path: ['media', asset.id],
      message: asset.renditionState === 'pending'
        ? `The image “${asset.originalFilename}” is still preparing; ask for the release once its renditions are made.`
        : `The renditions of the image “${asset.originalFilename}” failed (${asset.renditionFailure ?? 'no reason given'}); retry them in the media library.`,
    }));
  }

  /**
   * What the release shows, as its manifest carries it, and the renditions to copy into it: the
   * build signs this, and its preview compares it with the Live release's.
   */
  async manifestContent(venue: Venue, chosen: ChosenRevision[]): Promise<{ content: ReleaseContent; renditions: RenditionSource[] }> {
    const stories = await this.manifestStories(venue, chosen);
    const { media, renditions } = await this.manifestMedia(venue, chosen);
    const files = [...new Map(renditions.map((r): ManifestFile => ({ sha256: r.sha256, size: r.bytes, mime: 'image/webp' })).map((file) => [file.sha256, file])).values()];
    return {
      content: {
        format: RELEASE_FORMAT,
        venue: { name: venue.name, sourceLocale: venue.sourceLocale, locales: localesOf(venue) },
        fallbackToSource: venue.fallbackToSource,
        stories, media, files,
      },
      renditions,
    };
  }

  /** The manifest's stories: every panel in every venue locale, target locales with their translations applied. */
  private async manifestStories(venue: Venue, chosen: ChosenRevision[]): Promise<ManifestStory[]> {
    const stories: ManifestStory[] = [];
    for (const { revision } of chosen) {
      const { snapshot } = revision;
      const targets = await this.translations.documentsFor(revision, venue.targetLocales);
      stories.push({
        id: snapshot.story.id,
        revisionId: revision.id,
        sourceLocale: snapshot.story.sourceLocale,
        title: { ...targets.titles, [snapshot.story.sourceLocale]: snapshot.story.title },
        audience: snapshot.story.audience,
        panels: snapshot.panels.map((panel) => ({
          id: panel.id,
          position: panel.position,
          docs: { [snapshot.story.sourceLocale]: panel.docs[snapshot.story.sourceLocale]!, ...(targets.docs[panel.id] ?? {}) },
        })),
      });
    }
    return stories;
  }

  /**
   * The images the stories show, with credit, renditions to copy and alt text for each language a
   * kiosk may show them in (the venue's and the stories' own), each chosen by RFC 4647 lookup, so
   * a venue's en-GB takes the image's en alt text.
   */
  private async manifestMedia(venue: Venue, chosen: ChosenRevision[]): Promise<{ media: ReleaseMedia[]; renditions: RenditionSource[] }> {
    const ids = mediaIdsOf(chosen);
    const assets = await this.media.findAll({ where: { id: { [Op.in]: ids.length ? ids : [0] } }, include: [MediaRendition, MediaAltText], order: [['id', 'ASC']] });
    const locales = [...new Set([...localesOf(venue), ...chosen.map((c) => c.revision.snapshot.story.sourceLocale)])];
    const missing = ids.filter((id) => !assets.some((asset) => asset.id === id));
    if (missing.length) throw new NotFoundException(`Media ${missing.join(', ')} shown by these stories is no longer in the library.`);
    const renditions: RenditionSource[] = [];
    const media = assets.map((asset): ReleaseMedia => {
      const sorted = [...(asset.renditions ?? [])].sort((a, b) => a.width - b.width);
      renditions.push(...sorted.map((r) => ({ sha256: r.sha256, storeKey: r.storeKey, bytes: r.bytes })));
      return {
        mediaId: String(asset.id),
        alt: altTextsFor(asset.altTexts ?? [], locales),
        credit: asset.credit,
        renditions: sorted.map((r) => ({ width: r.width, sha256: r.sha256 })),
      };
    });
    return { media, renditions };
  }
}

/** Per language asked for, the alt text lookup finds for it; a language none fits is left out. */
function altTextsFor(altTexts: readonly MediaAltText[], locales: readonly string[]): Record<string, string> {
  const byTag = Object.fromEntries(altTexts.map((alt) => [alt.locale, alt.text]));
  return Object.fromEntries(locales.flatMap((locale) => {
    const found = lookupText(byTag, [locale]);
    return found ? [[locale, found.text]] : [];
  }));
}

/** The library images the chosen revisions show. */
const mediaIdsOf = (chosen: ChosenRevision[]): number[] =>
  [...new Set(chosen.flatMap((c) => c.revision.snapshot.mediaIds))].filter((id) => MEDIA_ID.test(id)).map(Number);

/** 422 listing what stops the release, each problem with its path. */
export function releaseRefusal(message: string, errors: FieldError[]): UnprocessableEntityException {
  return new UnprocessableEntityException({ statusCode: 422, message, errors });
}
