import { Injectable } from '@nestjs/common';
import type { ApiErrorBody, MissingTranslationChoice, TranslationGapView } from '@mantlepiece/shared';
import type { Venue } from '../venues/models/venue.model.js';
import type { ReleaseChoices } from './dto/release.dto.js';
import { releaseRefusal, type ChosenRevision } from './release-content.service.js';
import { ReleaseTranslations } from './release-translations.js';

type FieldError = NonNullable<ApiErrorBody['errors']>[number];

/** One story a release could carry, with what is missing and what becomes of it. */
export interface PlannedStory extends ChosenRevision {
  missing: TranslationGapView[];
  choices: MissingTranslationChoice[];
  /** null: carried as it is, which stops the build when its translations are missing where the venue shows no source text. */
  choice: MissingTranslationChoice | null;
}

export interface ReleasePlan {
  stories: PlannedStory[];
  /** The stories the release carries: every one not left out. */
  kept: ChosenRevision[];
  /** Missing translations of kept stories that nothing answers, each with its path: they stop the build. */
  unanswered: FieldError[];
}

/**
 * The one rule for stories whose translations are missing, which the build and its preview both
 * apply: such a story may always be left out; where the venue lets kiosks show untranslated texts
 * in the source language (its "fall back to source" setting), that is what happens unless it is
 * left out; elsewhere it stops the build until it is left out or translated.
 */
@Injectable()
export class ReleaseChoicesService {
  constructor(private readonly translations: ReleaseTranslations) {}

  /** Refuses (422) choices that name a story the release would not carry, or that the venue does not allow. */
  async plan(venue: Venue, candidates: ChosenRevision[], { leaveOut = [], showInSource = [] }: ReleaseChoices): Promise<ReleasePlan> {
    const byStory = new Map(candidates.map((candidate) => [candidate.story.id, candidate]));
    const errors: FieldError[] = [];
    const outside = (field: string) => (id: number, index: number) => {
      if (!byStory.has(id)) errors.push({ path: [field, index], message: `Story ${id} is not among the stories this release would carry.` });
    };
    leaveOut.forEach(outside('leaveOut'));
    showInSource.forEach(outside('showInSource'));
    showInSource.forEach((id, index) => {
      const title = byStory.get(id)?.story.title;
      if (title === undefined) return;
      if (leaveOut.includes(id)) errors.push({ path: ['showInSource', index], message: `“${title}” is also left out; choose one of the two.` });
      else if (!venue.fallbackToSource) {
        errors.push({
          path: ['showInSource', index],
          message: `“${title}” cannot be shown in ${venue.sourceLocale}: ${venue.name} does not let kiosks show untranslated texts in the source language (its “fall back to source” setting). Leave the story out or finish its translations.`,
        });
      }
    });
    if (errors.length) throw releaseRefusal('Some of these choices cannot be applied.', errors);

    const gaps = await this.translations.gapsFor(candidates.map((c) => c.revision), venue.targetLocales);
    const choices: MissingTranslationChoice[] = venue.fallbackToSource ? ['show-in-source', 'leave-out'] : ['leave-out'];
    const stories = candidates.map((candidate): PlannedStory => {
      const missing = gaps.filter((gap) => gap.revisionId === candidate.revision.id).map(({ locale, total, untranslated, stale }) => ({ locale, total, untranslated, stale }));
      const chosen = leaveOut.includes(candidate.story.id) ? 'leave-out' : missing.length && venue.fallbackToSource ? 'show-in-source' : null;
      return { ...candidate, missing, choices: missing.length ? choices : [], choice: chosen };
    });
    const kept = stories.filter((story) => story.choice !== 'leave-out');
    if (kept.length === 0) throw releaseRefusal('A release needs at least one story.', [{ path: ['leaveOut'], message: 'Every story would be left out; keep at least one.' }]);
    const unanswered = kept.flatMap((story) => (story.choice === null ? story.missing.map((gap) => ({
      path: ['locales', gap.locale, story.story.id],
      message: `“${story.story.title}” in ${gap.locale}: ${missingParts(gap)} of ${gap.total} texts. Leave the story out or finish its translations.`,
    })) : []));
    return { stories, kept: kept.map(({ story, revision }) => ({ story, revision })), unanswered };
  }
}

/** "3 untranslated and 1 stale". */
const missingParts = (gap: TranslationGapView): string =>
  [gap.untranslated && `${gap.untranslated} untranslated`, gap.stale && `${gap.stale} stale`].filter(Boolean).join(' and ');
