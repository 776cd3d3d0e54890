import { widgetStrings } from '../i18n/index.js';
import { isWidgetType } from './registry.js';

const lookup = (table: object, key: string): string | undefined => {
  const found: unknown = Object.hasOwn(table, key) ? (table as Record<string, unknown>)[key] : undefined;
  return typeof found === 'string' ? found : undefined;
};

/**
 * A widget setting's name as the studio shows it in this language ("Masse", "Viscosité"), by its param
 * path; undefined for a path the widget does not have, so a caller can fall back to the schema's title.
 */
export function settingName(widgetType: string, path: readonly string[], locale: string): string | undefined {
  if (!isWidgetType(widgetType)) return undefined;
  return lookup(widgetStrings(locale).settings[widgetType], path.join('.'));
}

/** The name of one of a setting's choices in this language; undefined for a setting without named choices (grid sizes are numbers). */
export function settingChoiceName(widgetType: string, path: readonly string[], choice: string | number, locale: string): string | undefined {
  const choices: object = widgetStrings(locale).choices;
  const ofWidget = Object.hasOwn(choices, widgetType) ? (choices as Record<string, object>)[widgetType]! : {};
  const ofSetting = Object.hasOwn(ofWidget, path.join('.')) ? (ofWidget as Record<string, object>)[path.join('.')]! : {};
  return lookup(ofSetting, String(choice));
}
