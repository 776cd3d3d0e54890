import { ar } from './ar.js';
import { en } from './en.js';
import { es } from './es.js';
import { fr } from './fr.js';
import type { WidgetResource, WidgetStrings } from './types.js';
import { canonicalLanguageTag, lookupLanguage } from '../languages/language-tags.js';

export type { WidgetResource, WidgetStrings } from './types.js';
export * from './plural-forms.js';

/** i18next-shaped resources: `i18n.addResourceBundle(locale, 'widgets', widgetResources[locale].widgets)`. */
export const widgetResources = {
  en: { widgets: en },
  fr: { widgets: fr },
  es: { widgets: es },
  ar: { widgets: ar },
} satisfies Record<string, WidgetResource>;

export type WidgetLocale = keyof typeof widgetResources;
export const WIDGET_LOCALES = Object.keys(widgetResources) as WidgetLocale[];
export const FALLBACK_LOCALE: WidgetLocale = 'en';

/** The best resource for a BCP 47 tag by RFC 4647 lookup (`fr-CA` → `fr`), English when none fits. */
export const resolveWidgetLocale = (tag: string): WidgetLocale => lookupLanguage([tag], WIDGET_LOCALES, FALLBACK_LOCALE) as WidgetLocale;

export const widgetStrings = (locale: string): WidgetStrings => widgetResources[resolveWidgetLocale(locale)].widgets;

/** Fills i18next-style {{name}} placeholders; a missing value stays visible rather than vanishing. */
export const interpolate = (template: string, values: Record<string, string>): string =>
  template.replace(/\{\{\s*(\w+)\s*\}\}/g, (whole, name: string) => values[name] ?? whole);

/** Formats a number for a locale with SI spacing (a no-break space before the unit symbol, none before °). */
export function formatQuantity(value: number, unit: string, locale: string, significantDigits = 3): string {
  const number = new Intl.NumberFormat(canonicalLanguageTag(locale) ?? FALLBACK_LOCALE, { maximumSignificantDigits: significantDigits }).format(value);
  return unit === '°' || unit === '' ? `${number}${unit}` : `${number}\u00a0${unit}`;
}
