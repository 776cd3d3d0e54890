import type { Audience } from '@mantlepiece/shared';
import type { TFunction } from 'i18next';
import { parseLocales, requiredProblem, type FieldProblems } from '../../components/forms/validation';

export interface StoryValues {
  title: string;
  exhibitId: string;
  audience: Audience;
  sourceLocale: string;
}

export type StoryField = keyof StoryValues;
export const STORY_FIELDS: readonly StoryField[] = ['title', 'exhibitId', 'audience', 'sourceLocale'];

export const MAX_TITLE_LENGTH = 200;

/** The same checks the server makes, so most mistakes never make a round trip. */
export function storyProblems(t: TFunction, values: StoryValues): FieldProblems<StoryField> {
  const { locales, invalid } = parseLocales(values.sourceLocale);
  return {
    title: requiredProblem(t, values.title) ?? (values.title.trim().length > MAX_TITLE_LENGTH ? t('storyForm.titleTooLong', { max: MAX_TITLE_LENGTH }) : undefined),
    sourceLocale: invalid || locales.length !== 1 ? t('validation.localeInvalid', { tag: values.sourceLocale.trim() }) : undefined,
  };
}

export function storyToSend(values: StoryValues) {
  return {
    title: values.title.trim(),
    exhibitId: values.exhibitId ? Number(values.exhibitId) : null,
    audience: values.audience,
    sourceLocale: parseLocales(values.sourceLocale).locales[0] ?? values.sourceLocale.trim(),
  };
}
