import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { Transaction } from 'sequelize';
import { lookupText, mediaIdsIn, segmentAltText, segmentPanel, segmentStoryTitle, type PanelDocJSON, type RevisionSnapshot, type TranslationUnit } from '@mantlepiece/shared';
import { MediaAltText } from '../media/models/media-alt-text.model.js';
import { PanelDocument } from '../panels/models/panel-document.model.js';
import { Panel } from '../panels/models/panel.model.js';
import { Story } from '../stories/models/story.model.js';
import { Venue } from '../venues/models/venue.model.js';

export interface PanelSource {
  panelId: number;
  position: number;
  /** Counted from 1, as the curator sees it in the panel strip. */
  panelNumber: number;
  /** The source document's compare-and-set version. */
  version: number;
  doc: PanelDocJSON;
  units: TranslationUnit[];
}

export interface AltTextSource {
  mediaId: number;
  /** The first panel that shows the image. */
  panelNumber: number;
  unit: TranslationUnit;
}

/** A story's current source, cut into translation units, with the locales its venue translates into. */
export interface StorySource {
  story: Story;
  venue: Venue;
  targetLocales: string[];
  /** The title's unit: the current title, or the one the revision froze. */
  title: TranslationUnit;
  panels: PanelSource[];
  altTexts: AltTextSource[];
}

/** A revision as the release build holds it: its id and its frozen snapshot. */
export interface FrozenSource {
  id: number;
  storyId: number;
  snapshot: RevisionSnapshot;
}

/** One panel's source document as units are cut from it, and the memo key its units are remembered under. */
interface PanelInput {
  panelId: number;
  position: number;
  version: number;
  doc: PanelDocJSON | null;
  memoKey: string;
}

/** Enough for every panel of a few dozen busy stories; past it the oldest entries are cut again on demand. */
const MEMO_LIMIT = 5000;

/**
 * Units are derived from the source documents on demand rather than stored, so they can never
 * disagree with what the curator last saved, whoever saved it and however. Hashing is the costly
 * part, so each panel's units are remembered under its document's id, version and locale and its
 * position: a save bumps the version, a reorder moves the position, and either misses the memo.
 * A revision's panels never change, so theirs are remembered under the revision and panel.
 * Nothing in the memo is shared state: another server instance simply cuts the units itself.
 */
@Injectable()
export class SourceUnitsService {
  private readonly memo = new Map<string, Promise<TranslationUnit[]>>();

  constructor(
    @InjectModel(Story) private readonly stories: typeof Story,
    @InjectModel(Panel) private readonly panels: typeof Panel,
    @InjectModel(MediaAltText) private readonly altTexts: typeof MediaAltText,
  ) {}

  async sourceOf(storyId: number, transaction?: Transaction): Promise<StorySource> {
    const [source] = await this.sourcesOf([storyId], transaction);
    if (!source) throw new NotFoundException('There is no such story.');
    return source;
  }

  /** The sources of these stories, in the order given, skipping ids that do not exist. */
  async sourcesOf(storyIds: readonly number[], transaction?: Transaction): Promise<StorySource[]> {
    if (storyIds.length === 0) return [];
    const stories = await this.storiesWithVenues(storyIds, transaction);
    const panels = await this.panels.findAll({
      where: { storyId: stories.map((story) => story.id) },
      include: [PanelDocument],
      order: [['position', 'ASC'], ['id', 'ASC']],
      transaction,
    });
    const byId = new Map(stories.map((story) => [story.id, story]));
    return Promise.all(
      storyIds.flatMap((id) => {
        const story = byId.get(id);
        if (!story) return [];
        const inputs = panels.filter((panel) => panel.storyId === id).map((panel): PanelInput => {
          const document = panel.documents?.find((each) => each.locale === story.sourceLocale);
          return {
            panelId: panel.id, position: panel.position, version: document?.version ?? 0, doc: document?.doc ?? null,
            memoKey: document ? `panel:${document.id}:${document.version}:${document.locale}` : '',
          };
        });
        return [this.build(story, story.venue!, story.title, story.sourceLocale, inputs, transaction)];
      }),
    );
  }

  /**
   * The source a revision froze, cut into units the same way, so a release reads the translations
   * made from what was approved even while a newer draft of the story is written.
   */
  async sourceAt(revision: FrozenSource, transaction?: Transaction): Promise<StorySource> {
    const [story] = await this.storiesWithVenues([revision.storyId], transaction);
    if (!story) throw new NotFoundException('There is no such story.');
    const venue = story.venue!;
    const { sourceLocale, title } = revision.snapshot.story;
    const inputs = revision.snapshot.panels.map((panel): PanelInput => ({
      panelId: panel.id, position: panel.position, version: 0, doc: panel.docs[sourceLocale] ?? null, memoKey: `revision:${revision.id}:${panel.id}`,
    }));
    return this.build(story, venue, title, sourceLocale, inputs, transaction);
  }

  private storiesWithVenues(storyIds: readonly number[], transaction?: Transaction): Promise<Story[]> {
    return this.stories.findAll({
      where: { id: [...storyIds] },
      include: [Venue],
      transaction,
    });
  }

  private async build(story: Story, venue: Venue, title: string, sourceLocale: string, panels: PanelInput[], transaction?: Transaction): Promise<StorySource> {
    const panelSources = await Promise.all(
      panels.map(async (panel, index) => {
        const panelNumber = index + 1;
        const units = panel.doc
          ? await this.remember(`${panel.memoKey}:${panelNumber}`, () => segmentPanel(panel.doc!, { panelId: panel.panelId, sourceLocale, panelNumber }))
          : [];
        return { panelId: panel.panelId, position: panel.position, panelNumber, version: panel.version, doc: panel.doc ?? { type: 'doc' as const, content: [] }, units };
      }),
    );
    const [titleUnit] = await this.remember(`title:${story.id}:${sourceLocale}:${title}`, async () => [await segmentStoryTitle(story.id, title, { sourceLocale })]);
    return {
      story,
      venue,
      targetLocales: venue.targetLocales.filter((locale) => locale !== sourceLocale),
      title: titleUnit!,
      panels: panelSources,
      altTexts: await this.altTextSources(panelSources, sourceLocale, transaction),
    };
  }

  /**
   * One unit per image the story shows that has alt text in the source locale, found by RFC 4647
   * lookup (an en-GB story's source is the image's en alt text), in order of first use.
   */
  private async altTextSources(panels: PanelSource[], sourceLocale: string, transaction?: Transaction): Promise<AltTextSource[]> {
    const firstPanel = new Map<number, number>();
    for (const panel of panels) {
      for (const mediaId of mediaIdsIn(panel.doc).map(Number)) if (!firstPanel.has(mediaId)) firstPanel.set(mediaId, panel.panelNumber);
    }
    if (firstPanel.size === 0) return [];
    const texts = await this.altTexts.findAll({ where: { mediaAssetId: [...firstPanel.keys()] }, transaction });
    const sources: AltTextSource[] = [];
    for (const [mediaId, panelNumber] of firstPanel) {
      const byTag = Object.fromEntries(texts.filter((alt) => alt.mediaAssetId === mediaId).map((alt) => [alt.locale, alt.text]));
      const text = lookupText(byTag, [sourceLocale])?.text;
      if (!text) continue;
      const [unit] = await this.remember(`alt:${mediaId}:${sourceLocale}:${panelNumber}:${text}`, async () => [
        await segmentAltText(String(mediaId), text, { sourceLocale, panelNumber }),
      ]);
      sources.push({ mediaId, panelNumber, unit: unit! });
    }
    return sources;
  }

  private remember(key: string, cut: () => Promise<TranslationUnit[]>): Promise<TranslationUnit[]> {
    const known = this.memo.get(key);
    if (known) return known;
    const units = cut();
    if (this.memo.size >= MEMO_LIMIT) this.memo.delete(this.memo.keys().next().value as string);
    this.memo.set(key, units);
    units.catch(() => this.memo.delete(key));
    return units;
  }
}
