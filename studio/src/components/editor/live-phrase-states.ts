import { isWidgetType, widgetModule, widgetStrings, type PanelWidgetRef } from '@mantlepiece/shared';

/** The states a widget declares for live phrases; empty for a widget that has none. */
export const phraseStatesOf = (widget: Pick<PanelWidgetRef, 'widgetType'>): readonly string[] =>
  (isWidgetType(widget.widgetType) ? widgetModule(widget.widgetType).states?.values : undefined) ?? [];

/** A state as the shared widget words name it in this language (holds → tient), or its own name. */
export const stateWord = (state: string, locale: string): string => (widgetStrings(locale).states as Readonly<Record<string, string>>)[state] ?? state;
