import { Injectable, type OnModuleInit } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Op, QueryTypes, UniqueConstraintError, type Transaction } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import { localesAt } from '../auth/policy.js';
import { Clock } from '../clock/clock.service.js';
import { ConfigService } from '../config/config.service.js';
import { BackgroundJobs } from '../jobs/background-jobs.service.js';
import { MailService } from '../mail/mail.service.js';
import type { User } from '../users/models/user.model.js';
import { UsersService } from '../users/users.service.js';
import { Venue } from '../venues/models/venue.model.js';
import { canonicalLocale } from '../common/locale-tag.js';
import { Translation } from './models/translation.model.js';
import { TranslatorAssignment } from './models/translator-assignment.model.js';
import { SourceUnitsService } from './source-units.service.js';
import { TranslationsService } from './translations.service.js';

/**
 * How long a story's source must rest before its newly stale units are told: a curator saves a
 * panel many times while writing, and translators should get one digest for the session, not one
 * per keystroke the autosave sent.
 */
export const STALE_DIGEST_QUIET_MS = 10 * 60_000;

const WORKLIST_PATH = '/translations';

/**
 * Stories with a translation whose source moved since it was saved, where the change has settled:
 * a panel's source document at another version (and no source save in the story during the quiet
 * time), or a source alt text saved since, of an image the story shows. Timestamps are kept to the
 * second, so an alt text saved in the same second counts too; cutting the units then tells.
 */
const STORIES_WITH_MOVED_SOURCE = `
  SELECT DISTINCT t.story_id AS storyId FROM translations t
  JOIN stories s ON s.id = t.story_id
  JOIN panel_documents d ON d.panel_id = t.panel_id AND d.locale = s.source_locale
  WHERE t.text <> '' AND d.version <> t.source_version
    AND NOT EXISTS (
      SELECT 1 FROM panels p2 JOIN panel_documents d2 ON d2.panel_id = p2.id AND d2.locale = s.source_locale
      WHERE p2.story_id = s.id AND d2.updated_at > :cutoff)
  UNION
  SELECT DISTINCT p.story_id AS storyId FROM translations t
  JOIN media_alt_texts a ON a.media_asset_id = t.media_asset_id AND a.locale <> t.locale
  JOIN panel_media_usages u ON u.media_asset_id = t.media_asset_id
  JOIN panels p ON p.id = u.panel_id
  WHERE t.text <> '' AND a.updated_at >= t.updated_at AND a.updated_at <= :cutoff`;

const canonicalLocales = (locales: readonly string[]) => [...new Set(locales.map((locale) => canonicalLocale(locale) ?? locale))];

interface DigestLine {
  title: string;
  locale: string;
  units: number;
}

/**
 * Translation mail, through the outbox: an assignment message when a translator is given a locale
 * (the trigger is the person's locales as an admin left them, compared with what was announced,
 * so invitations, People edits and the seed all count), and a digest of newly stale units per
 * translator. Paced by the clock, so tests move time instead of waiting. Runs on one instance at a
 * time (a singleton background job); each message is still claimed on its rows, so a run that
 * overlaps a lease handover sends nothing twice.
 */
@Injectable()
export class TranslationNoticesJob implements OnModuleInit {
  constructor(
    @InjectModel(Venue) private readonly venues: typeof Venue,
    private readonly people: UsersService,
    @InjectModel(Translation) private readonly translations: typeof Translation,
    @InjectModel(TranslatorAssignment) private readonly assignments: typeof TranslatorAssignment,
    private readonly sources: SourceUnitsService,
    private readonly translationsService: TranslationsService,
    private readonly mail: MailService,
    private readonly clock: Clock,
    private readonly config: ConfigService,
    private readonly sequelize: Sequelize,
    private readonly jobs: BackgroundJobs,
  ) {}

  onModuleInit(): void {
    this.jobs.register({
      name: 'translation-notices',
      intervalMs: this.config.translationNoticeIntervalMs,
      singleton: true,
      run: async () => {
        const { assignments, digests } = await this.runDue();
        return assignments + digests;
      },
    });
  }

  async runDue(): Promise<{ assignments: number; digests: number }> {
    return { assignments: await this.announceAssignments(), digests: await this.sendStaleDigests() };
  }

  /** Mails each translator the locales they hold (at any venue) and have not been told about; returns the messages queued. */
  async announceAssignments(): Promise<number> {
    const translators = await this.translatorsWithLocales();
    await this.assignments.destroy({ where: { userId: { [Op.notIn]: [0, ...translators.keys()] } } });
    let queued = 0;
    for (const { translator, locales } of translators.values()) {
      try {
        if (await this.announceTo(translator, locales)) queued += 1;
      } catch (error) {
        // Another server instance announced the same locale first.
        if (!(error instanceof UniqueConstraintError)) throw error;
      }
    }
    return queued;
  }

  /**
   * One digest per translator of the units that went stale since the last one, in the locales they
   * translate into at each story's venue; returns the messages queued.
   */
  async sendStaleDigests(): Promise<number> {
    const cutoff = new Date(this.clock.now().getTime() - STALE_DIGEST_QUIET_MS);
    const candidates = await this.sequelize.query<{ storyId: number }>(STORIES_WITH_MOVED_SOURCE, { replacements: { cutoff }, type: QueryTypes.SELECT });
    if (candidates.length === 0) return 0;
    const sources = await this.sources.sourcesOf(candidates.map((candidate) => candidate.storyId));
    return this.sequelize.transaction(async (transaction) => {
      const linesByVenue = new Map<number, Map<string, DigestLine[]>>();
      for (const source of sources) {
        const linesByLocale = linesByVenue.get(source.story.venueId) ?? new Map<string, DigestLine[]>();
        linesByVenue.set(source.story.venueId, linesByLocale);
        for (const locale of source.targetLocales) {
          const states = await this.translationsService.statesOf(source, locale, transaction);
          let units = 0;
          for (const state of states) {
            if (state.status !== 'stale' || !state.own || state.own.staleNotifiedHash === state.unit.sourceHash) continue;
            if (await this.claim(state.own, state.unit.sourceHash, transaction)) units += 1;
          }
          if (units > 0) linesByLocale.set(locale, [...(linesByLocale.get(locale) ?? []), { title: source.story.title, locale, units }]);
        }
      }
      const digests = new Map<number, { translator: User; stories: DigestLine[] }>();
      for (const [venueId, linesByLocale] of linesByVenue) {
        for (const translator of await this.people.holdingAt(venueId, 'translator', transaction)) {
          const stories = canonicalLocales(localesAt(translator, venueId)).flatMap((locale) => linesByLocale.get(locale) ?? []);
          if (stories.length === 0) continue;
          const digest = digests.get(translator.id) ?? { translator, stories: [] };
          digests.set(translator.id, { translator, stories: [...digest.stories, ...stories] });
        }
      }
      for (const { translator, stories } of digests.values()) {
        await this.mail.enqueue(translator.email, translator.uiLanguage, { kind: 'stale-digest', name: translator.name, stories, link: this.mail.studioLink(WORKLIST_PATH) }, transaction);
      }
      return digests.size;
    });
  }

  /** Every active translator, by id, with the locales they translate into at any venue. */
  private async translatorsWithLocales(): Promise<Map<number, { translator: User; locales: string[] }>> {
    const translators = new Map<number, { translator: User; locales: string[] }>();
    for (const venue of await this.venues.findAll({ attributes: ['id'], order: [['id', 'ASC']] })) {
      for (const translator of await this.people.holdingAt(venue.id, 'translator')) {
        const held = translators.get(translator.id)?.locales ?? [];
        translators.set(translator.id, { translator, locales: canonicalLocales([...held, ...localesAt(translator, venue.id)]) });
      }
    }
    return translators;
  }

  private async announceTo(translator: User, held: readonly string[]): Promise<boolean> {
    return this.sequelize.transaction(async (transaction) => {
      const told = await this.assignments.findAll({ where: { userId: translator.id }, transaction, lock: transaction.LOCK.UPDATE });
      const withdrawn = told.filter((assignment) => !held.includes(assignment.locale)).map((assignment) => assignment.id);
      if (withdrawn.length > 0) await this.assignments.destroy({ where: { id: withdrawn }, transaction });
      const fresh = held.filter((locale) => !told.some((assignment) => assignment.locale === locale));
      if (fresh.length === 0) return false;
      await this.assignments.bulkCreate(fresh.map((locale) => ({ userId: translator.id, locale, notifiedAt: this.clock.now() })), { transaction });
      await this.mail.enqueue(
        translator.email, translator.uiLanguage,
        { kind: 'translator-assignment', name: translator.name, locales: fresh, link: this.mail.studioLink(WORKLIST_PATH) },
        transaction,
      );
      return true;
    });
  }

  /** Marks the row as told about this source; false when another instance told first. */
  private async claim(row: Translation, sourceHash: string, transaction: Transaction): Promise<boolean> {
    const [claimed] = await this.translations.update(
      { staleNotifiedHash: sourceHash },
      { where: { id: row.id, version: row.version, [Op.or]: [{ staleNotifiedHash: null }, { staleNotifiedHash: { [Op.ne]: sourceHash } }] }, transaction, silent: true },
    );
    return claimed === 1;
  }
}
