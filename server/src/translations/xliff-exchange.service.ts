import { BadRequestException, HttpStatus, Injectable, UnprocessableEntityException } from '@nestjs/common';
import { Sequelize } from 'sequelize-typescript';
import { exportXliff, parseXliff, planXliffImport, type XliffImportResult, type XliffProblem } from '@mantlepiece/shared';
import type { Member } from '../auth/policy.js';
import { assertMayRead, assertMayWrite, assertTargetLocale } from './translation-access.js';
import { TranslationsService } from './translations.service.js';

/** Bodies above this are refused with 413 before they are read: a story's file is a few hundred kilobytes at most. */
export const XLIFF_MAX_BYTES = 2 * 1024 * 1024;

/** Media types an XLIFF upload may come as: its own, and the generic XML ones a file picker may give. */
export const XLIFF_MEDIA_TYPES = ['application/xliff+xml', 'application/xml', 'text/xml'];

const problemPath = (problem: XliffProblem) => (problem.unitId === undefined ? ['xliff'] : ['xliff', problem.unitId]);

/** XLIFF 2.1 files in and out of translation tools, one per story and locale. */
@Injectable()
export class XliffExchangeService {
  constructor(
    private readonly translations: TranslationsService,
    private readonly sequelize: Sequelize,
  ) {}

  async exportStory(member: Member, storyId: number, locale: string): Promise<{ filename: string; xml: string }> {
    const source = await this.translations.reachableSource(member, storyId);
    assertMayRead(member, source.story.venueId, locale);
    assertTargetLocale(source.targetLocales, locale);
    const states = await this.translations.statesOf(source, locale);
    const xml = exportXliff({
      storyId,
      srcLang: source.story.sourceLocale,
      trgLang: locale,
      units: states.map((state) => state.unit),
      translations: Object.fromEntries(states.flatMap((state) => (state.translation ? [[state.unit.id, state.translation]] : []))),
    });
    return { filename: `story-${storyId}.${locale}.xlf`, xml };
  }

  /**
   * Takes a translated file whole or not at all, in one transaction: a malformed file, other
   * languages, an unknown unit, a broken placeholder or a unit whose source changed since the
   * export refuses the whole file with every problem listed, and nothing is written. A file from
   * another story is refused with 422 naming it. A target over its length budget is taken, with a
   * warning for that unit in the answer, as a save in the workspace is.
   */
  async importStory(translator: Member, storyId: number, locale: string, xml: string): Promise<XliffImportResult> {
    const parsed = parseXliff(xml);
    return this.sequelize.transaction(async (transaction) => {
      const source = await this.translations.reachableSource(translator, storyId, transaction);
      assertMayWrite(translator, source.story.venueId, locale);
      assertTargetLocale(source.targetLocales, locale);
      const states = await this.translations.statesOf(source, locale, transaction);
      const plan = planXliffImport({
        parsed,
        expected: { storyId, srcLang: source.story.sourceLocale, trgLang: locale },
        currentUnits: states.map((state) => state.unit),
        currentTranslations: Object.fromEntries(states.flatMap((state) => (state.translation ? [[state.unit.id, state.translation]] : []))),
      });
      if (!plan.ok && plan.otherStory) {
        throw new UnprocessableEntityException({
          statusCode: HttpStatus.UNPROCESSABLE_ENTITY,
          message: 'The file is from another story.',
          errors: plan.problems.map((problem) => ({ path: ['file', plan.otherStory!.attribute], message: problem.message })),
        });
      }
      if (!plan.ok) {
        throw new BadRequestException({
          statusCode: HttpStatus.BAD_REQUEST,
          message: 'The file was not imported, and nothing was changed.',
          errors: plan.problems.map((problem) => ({ path: problemPath(problem), message: problem.message })),
        });
      }
      const byId = new Map(states.map((state) => [state.unit.id, state]));
      for (const update of plan.updates) {
        const state = byId.get(update.unitId)!;
        await this.translations.writeTranslation(
          state,
          { storyId, locale, text: update.text, translatorId: translator.id, expectedVersion: state.own?.version ?? 0 },
          transaction,
        );
      }
      const updated = new Set(plan.updates.map((update) => update.unitId));
      const stale = states.filter((state) => state.status === 'stale' && !updated.has(state.unit.id)).length;
      return { updated: plan.updates.length, unchanged: plan.unchanged.length, stale, warnings: plan.warnings };
    });
  }
}
