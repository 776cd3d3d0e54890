import { widgetStrings } from '@mantlepiece/shared';

/** A state as the shared widget words name it in this language (holds → tient), or its own name. */
export const stateWord = (state: string, locale: string): string => (widgetStrings(locale).states as Readonly<Record<string, string>>)[state] ?? state;
