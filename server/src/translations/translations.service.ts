import { BadRequestException, HttpStatus, Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { QueryTypes, UniqueConstraintError, type Transaction } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import {
  applyTranslations, checkPlaceholders, directionOf, lengthBudgetWarning, runsFromText, unitStatus,
  type LocaleCompleteness, type PanelDocJSON, type SavedTranslationUnit, type StoryTranslationsView, type TranslationConflictBody, type TranslationPreviewView,
  type TranslationUnitPage, type TranslationWorklistPage, type UnitStatus,
} from '@mantlepiece/shared';
import type { Member } from '../auth/policy.js';
import { likePattern } from '../common/list-query.js';
import { pageWindow, toPage } from '../common/page.js';
import { VersionConflictException } from '../common/version-conflict.js';
import { withinReach } from '../common/venue-boundary.js';
import { MediaAltText } from '../media/models/media-alt-text.model.js';
import { NO_SUCH_STORY } from '../stories/story-policy.js';
import { User } from '../users/models/user.model.js';
import type { ListUnitsQuery, ListWorklistQuery, SaveTranslationUnitDto } from './dto/translation.dto.js';
import { Translation } from './models/translation.model.js';
import { SourceUnitsService, type FrozenSource, type StorySource } from './source-units.service.js';
import { assertMayRead, assertMayWrite, assertReadsSomewhere, assertTargetLocale, readableLocales, translationReach, type TranslationReach } from './translation-access.js';
import { translationCan, translationsCan } from './translation-policy.js';
import { completenessOf, currentTranslationsOf, unitStates, type UnitState } from './translation-state.js';
import { toTranslationUnitView } from './translations.presenter.js';

/** What a release build needs to know of one story in one locale. */
export interface ReleaseCompleteness extends LocaleCompleteness {
  storyId: number;
  /** True when every unit is translated from the current source. */
  complete: boolean;
  /** Each unit that is not: where it is and why, for the build's 422. */
  missing: { unitId: string; panelId: number | null; mediaId: number | null; status: Exclude<UnitStatus, 'translated'> }[];
}

/** A story drawn in one locale, each unit without a current translation in the source language. */
export interface TargetDocuments {
  dir: 'ltr' | 'rtl';
  /** The title in the locale; null while it has no current translation (the kiosk then shows the source's, by the venue's rule). */
  title: string | null;
  panels: { panelId: number; position: number; doc: PanelDocJSON; fallbackUnitIds: string[] }[];
  alt: Record<string, string>;
}

/**
 * (story, target locale) pairs in SQL, so the worklist is filtered, counted and paged by the
 * database: one row per target locale of the story's venue other than the story's own language.
 * Retired stories are off the worklist.
 */
const WORKLIST_FROM = `
  FROM stories s
  JOIN venues v ON v.id = s.venue_id
  JOIN JSON_TABLE(v.target_locales, '$[*]' COLUMNS (locale VARCHAR(35) PATH '$')) AS jt
  WHERE s.state <> 'retired' AND jt.locale <> s.source_locale`;

/** The pairs a member may read, as one SQL condition and its replacements; null when there are none. */
function reachCondition({ everyLocale, translates }: TranslationReach): { sql: string; replacements: Record<string, unknown> } | null {
  if (everyLocale.every) return { sql: 'TRUE', replacements: {} };
  const clauses: string[] = [];
  const replacements: Record<string, unknown> = {};
  if (everyLocale.venueIds.length > 0) {
    clauses.push('s.venue_id IN (:readVenues)');
    replacements.readVenues = everyLocale.venueIds;
  }
  translates.forEach(({ venueId, locales }, index) => {
    replacements[`locales${index}`] = locales;
    if (venueId === null) clauses.push(`jt.locale IN (:locales${index})`);
    else {
      clauses.push(`(s.venue_id = :venue${index} AND jt.locale IN (:locales${index}))`);
      replacements[`venue${index}`] = venueId;
    }
  });
  return clauses.length === 0 ? null : { sql: `(${clauses.join(' OR ')})`, replacements };
}

@Injectable()
export class TranslationsService {
  constructor(
    @InjectModel(Translation) private readonly translations: typeof Translation,
    @InjectModel(MediaAltText) private readonly altTexts: typeof MediaAltText,
    private readonly sources: SourceUnitsService,
    private readonly sequelize: Sequelize,
  ) {}

  /** The translator's worklist: every story in each locale they translate into at its venue, with its progress. */
  async worklist(member: Member, query: ListWorklistQuery): Promise<TranslationWorklistPage> {
    const reach = translationReach(member);
    if (query.locale) assertReadsSomewhere(reach, query.locale);
    const can = translationsCan(reach, query.venueId);
    const readable = reachCondition(reach);
    if (!readable) return { ...toPage([], 0, query), can, locales: [] };
    const venue = query.venueId ? ' AND s.venue_id = :venueId' : '';
    const conditions = [
      ...(query.locale ? ['jt.locale = :locale'] : []),
      ...(query.q ? ['s.title LIKE :q'] : []),
    ].map((condition) => ` AND ${condition}`).join('');
    const within = `${WORKLIST_FROM} AND ${readable.sql}${venue}`;
    const replacements = { ...readable.replacements, locale: query.locale, venueId: query.venueId, q: query.q ? likePattern(query.q) : undefined, ...pageWindow(query) };
    const [[{ total }], locales, pairs] = await Promise.all([
      this.sequelize.query<{ total: number }>(`SELECT COUNT(*) AS total ${within}${conditions}`, { replacements, type: QueryTypes.SELECT }) as Promise<[{ total: number }]>,
      this.sequelize.query<{ locale: string }>(`SELECT DISTINCT jt.locale AS locale ${within} ORDER BY jt.locale`, { replacements, type: QueryTypes.SELECT }),
      this.sequelize.query<{ storyId: number; storyTitle: string; venueId: number; locale: string }>(
        `SELECT s.id AS storyId, s.title AS storyTitle, s.venue_id AS venueId, jt.locale AS locale ${within}${conditions} ORDER BY s.title, s.id, jt.locale LIMIT :limit OFFSET :offset`,
        { replacements, type: QueryTypes.SELECT },
      ),
    ]);
    const sources = new Map((await this.sources.sourcesOf([...new Set(pairs.map((pair) => pair.storyId))])).map((source) => [source.story.id, source]));
    const states = await this.statesOfEach(pairs.map(({ storyId, locale }) => ({ source: sources.get(storyId)!, locale })));
    const items = pairs.map(({ storyId, storyTitle, venueId, locale }, index) => ({
      storyId, storyTitle, ...completenessOf(locale, states[index]!), can: translationCan(member, { venueId, locale }),
    }));
    return { ...toPage(items, Number(total), query), can, locales: locales.map((row) => row.locale) };
  }

  /** Progress per target locale of the story's venue; a translator sees their own locales. */
  async storyTranslations(member: Member, storyId: number): Promise<StoryTranslationsView> {
    const source = await this.reachableSource(member, storyId);
    const venueId = source.story.venueId;
    const readable = readableLocales(member, venueId);
    const locales = source.targetLocales.filter((locale) => readable === null || readable.includes(locale));
    return Promise.all(locales.map(async (locale) => ({ ...completenessOf(locale, await this.statesOf(source, locale)), can: translationCan(member, { venueId, locale }) })));
  }

  async listUnits(member: Member, storyId: number, locale: string, query: ListUnitsQuery): Promise<TranslationUnitPage> {
    const source = await this.reachableSource(member, storyId);
    assertMayRead(member, source.story.venueId, locale);
    assertTargetLocale(source.targetLocales, locale);
    const states = (await this.statesOf(source, locale)).filter((state) => !query.status || state.status === query.status);
    // Units are cut from the documents, not stored, so the page is cut from the story's list here.
    const { limit, offset } = pageWindow(query);
    const can = translationCan(member, { venueId: source.story.venueId, locale });
    return { ...toPage(states.slice(offset, offset + limit).map((state) => toTranslationUnitView(state, locale)), states.length, query), can };
  }

  /**
   * Saves one unit by compare-and-set on its version: of two translators who started from the same
   * version, the second gets a 409 with what the first saved. A translation that breaks a
   * placeholder is refused with each problem named; one over its length budget is saved with a
   * warning, as in an XLIFF import.
   */
  async saveUnit(translator: Member, storyId: number, locale: string, unitId: string, dto: SaveTranslationUnitDto): Promise<SavedTranslationUnit> {
    return this.sequelize.transaction(async (transaction) => {
      const source = await this.reachableSource(translator, storyId, transaction);
      assertMayWrite(translator, source.story.venueId, locale);
      assertTargetLocale(source.targetLocales, locale);
      const state = (await this.statesOf(source, locale, transaction)).find((each) => each.unit.id === unitId);
      if (!state) throw new NotFoundException(`Unit ${unitId} is not in this story; the source may have changed. Reload the units.`);
      const runs = runsFromText(state.unit, dto.text);
      const problems = dto.text === '' ? [] : checkPlaceholders(state.unit, runs);
      if (problems.length > 0) {
        throw new BadRequestException({
          statusCode: HttpStatus.BAD_REQUEST,
          message: 'The placeholders of this translation do not match the source.',
          errors: problems.map((problem) => ({ path: ['text'], message: problem.message })),
        });
      }
      const version = await this.writeTranslation(state, { storyId, locale, text: dto.text, translatorId: translator.id, expectedVersion: dto.version }, transaction);
      const warning = lengthBudgetWarning(state.unit, runs, { targetLocale: locale });
      return {
        version,
        status: unitStatus({ sourceHash: state.unit.sourceHash, translation: { text: dto.text, sourceHash: state.unit.sourceHash } }),
        warnings: warning ? [warning] : [],
      };
    });
  }

  async preview(member: Member, storyId: number, locale: string): Promise<TranslationPreviewView> {
    const source = await this.reachableSource(member, storyId);
    assertMayRead(member, source.story.venueId, locale);
    assertTargetLocale(source.targetLocales, locale);
    return { storyId, locale, ...(await this.draw(source, locale)) };
  }

  /** The story's current source, if the member may reach its venue; another venue's answers as a missing story. */
  async reachableSource(member: Member, storyId: number, transaction?: Transaction): Promise<StorySource> {
    const source = await this.sources.sourceOf(storyId, transaction);
    withinReach(member, source.story, NO_SUCH_STORY);
    return source;
  }

  /**
   * For the release build: a revision's panels and alt texts in `locale`, from the translations
   * made from its own source (so a newer draft being written does not take them away), the source
   * shown where a translation is missing or stale.
   */
  async targetDocumentsAt(revision: FrozenSource, locale: string): Promise<TargetDocuments> {
    return this.draw(await this.sources.sourceAt(revision), locale);
  }

  /** For the release build: how complete each revision is in each locale, and what is missing. */
  async completenessForRelease(revisions: readonly FrozenSource[], locales: readonly string[]): Promise<ReleaseCompleteness[]> {
    const sources = await Promise.all(revisions.map((revision) => this.sources.sourceAt(revision)));
    const figures = await Promise.all(
      sources.flatMap((source) =>
        locales.map(async (locale) => {
          const states = await this.statesOf(source, locale);
          const missing = states.flatMap((state) =>
            state.status === 'translated' ? [] : [{ unitId: state.unit.id, panelId: state.panelId, mediaId: state.mediaId, status: state.status }],
          );
          return { storyId: source.story.id, ...completenessOf(locale, states), complete: missing.length === 0, missing };
        }),
      ),
    );
    return figures;
  }

  /** Every unit of the story in the locale with the translation it shows. */
  async statesOf(source: StorySource, locale: string, transaction?: Transaction): Promise<UnitState[]> {
    return (await this.statesOfEach([{ source, locale }], transaction))[0]!;
  }

  /**
   * The unit states of many stories in many locales from four queries in all, not four per story and
   * locale: a worklist of a hundred rows made four hundred, and the translator's home waited on them.
   */
  async statesOfEach(targets: readonly { source: StorySource; locale: string }[], transaction?: Transaction): Promise<UnitState[][]> {
    if (targets.length === 0) return [];
    const locale = [...new Set(targets.map((target) => target.locale))];
    const titleIds = [...new Set(targets.map((target) => target.source.title.id))];
    const panelIds = [...new Set(targets.flatMap((target) => target.source.panels.map((panel) => panel.panelId)))];
    const mediaIds = [...new Set(targets.flatMap((target) => target.source.altTexts.map((alt) => alt.mediaId)))];
    const include = [{ model: User, attributes: ['id', 'name'] }];
    const [titleRows, panelRows, altRows, targetAltTexts] = await Promise.all([
      this.translations.findAll({ where: { unitId: titleIds, locale }, include, transaction }),
      panelIds.length ? this.translations.findAll({ where: { panelId: panelIds, locale }, include, transaction }) : [],
      mediaIds.length ? this.translations.findAll({ where: { mediaAssetId: mediaIds, locale }, include, transaction }) : [],
      mediaIds.length ? this.altTexts.findAll({ where: { mediaAssetId: mediaIds, locale }, transaction }) : [],
    ]);
    return targets.map(({ source, locale: wanted }) => {
      const panels = new Set(source.panels.map((panel) => panel.panelId));
      const media = new Set(source.altTexts.map((alt) => alt.mediaId));
      const inMedia = (id: number | null) => id !== null && media.has(id);
      const rows = [
        ...titleRows.filter((row) => row.locale === wanted && row.unitId === source.title.id),
        ...panelRows.filter((row) => row.locale === wanted && row.panelId !== null && panels.has(row.panelId)),
        ...altRows.filter((row) => row.locale === wanted && inMedia(row.mediaAssetId)),
      ];
      return unitStates(source, rows, targetAltTexts.filter((alt) => alt.locale === wanted && inMedia(alt.mediaAssetId)));
    });
  }

  /**
   * Writes one unit's translation, made from the unit's current source, under the unit's own id;
   * an alt text also goes to the media library, where everything else reads it. Returns the new version.
   */
  async writeTranslation(
    state: UnitState,
    { storyId, locale, text, translatorId, expectedVersion }: { storyId: number; locale: string; text: string; translatorId: number; expectedVersion: number },
    transaction: Transaction,
  ): Promise<number> {
    const values = { text, sourceHash: state.unit.sourceHash, sourceText: state.unit.display, sourceVersion: state.sourceVersion, translatorId, staleNotifiedHash: null };
    const where = { unitId: state.unit.id, locale };
    if (expectedVersion === 0) {
      try {
        await this.translations.create(
          { ...where, ...values, version: 1, storyId: state.mediaId === null ? storyId : null, panelId: state.panelId, mediaAssetId: state.mediaId },
          { transaction },
        );
      } catch (error) {
        if (error instanceof UniqueConstraintError) await this.conflict(where, transaction);
        throw error;
      }
    } else {
      const [saved] = await this.translations.update({ ...values, version: expectedVersion + 1 }, { where: { ...where, version: expectedVersion }, transaction });
      if (saved === 0) await this.conflict(where, transaction);
    }
    if (state.mediaId !== null) await this.writeAltText(state, locale, text, transaction);
    return expectedVersion + 1;
  }

  private async draw(source: StorySource, locale: string): Promise<TargetDocuments> {
    const states = await this.statesOf(source, locale);
    const translations = currentTranslationsOf(states);
    const panels = source.panels.map((panel) => {
      const applied = applyTranslations(panel.doc, panel.units, translations);
      return { panelId: panel.panelId, position: panel.position, doc: applied.doc, fallbackUnitIds: [...applied.untranslated, ...applied.refused.map((each) => each.unitId)] };
    });
    const alt = Object.fromEntries(
      source.altTexts.map(({ mediaId, unit }) => [String(mediaId), plainText(unit, translations[unit.id] ?? unit.display)]),
    );
    const title = Object.hasOwn(translations, source.title.id) ? plainText(source.title, translations[source.title.id]!) : null;
    return { dir: directionOf(locale), title, panels, alt };
  }

  private async writeAltText(state: UnitState, locale: string, text: string, transaction: Transaction): Promise<void> {
    const mediaAssetId = state.mediaId!;
    if (text === '') await this.altTexts.destroy({ where: { mediaAssetId, locale }, transaction });
    else await this.altTexts.bulkCreate([{ mediaAssetId, locale, text: plainText(state.unit, text) }], { updateOnDuplicate: ['text', 'updatedAt'], transaction });
  }

  /** A locking read: a plain one would answer from this transaction's snapshot, which may predate the winning save. */
  private async conflict(where: { unitId: string; locale: string }, transaction: Transaction): Promise<never> {
    const current = await this.translations.findOne({ where, transaction, lock: transaction.LOCK.UPDATE });
    throw new VersionConflictException<Omit<TranslationConflictBody, 'statusCode' | 'message'>>('Someone else saved this unit after you started translating it.', {
      currentVersion: current?.version ?? 0,
      text: current?.text ?? null,
    });
  }
}

/** A unit without placeholders (alt text, a title) from the display form back to plain text. */
const plainText = (unit: UnitState['unit'], display: string) =>
  runsFromText(unit, display).map((run) => (run.type === 'text' ? run.text : '')).join('');
