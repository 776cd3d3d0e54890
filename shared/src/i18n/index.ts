import { ar } from './ar.js';
import { en } from './en.js';
import { es } from './es.js';
import { fr } from './fr.js';
import type { WidgetResource, WidgetStrings } from './types.js';

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

const isWidgetLocale = (tag: string): tag is WidgetLocale => Object.hasOwn(widgetResources, tag);

/** The best resource for a BCP 47 tag: the exact tag, then its language subtag, then English. */
export function resolveWidgetLocale(tag: string): WidgetLocale {
  const lower = tag.toLowerCase();
  if (isWidgetLocale(lower)) return lower;
  const language = lower.split('-')[0] ?? '';
  return isWidgetLocale(language) ? language : FALLBACK_LOCALE;
}

export const widgetStrings = (locale: string): WidgetStrings => widgetResources[resolveWidgetLocale(locale)].widgets;

/** Fills i18next-style {{name}} placeholders; a missing value stays visible rather than vanishing. */
export const interpolate = (template: string, values: Record<string, string>): string =>
  template.replace(/\{\{\s*(\w+)\s*\}\}/g, (whole, name: string) => values[name] ?? whole);

/** Formats a number for a locale with SI spacing (a no-break space before the unit symbol, none before °). */
export function formatQuantity(value: number, unit: string, locale: string, significantDigits = 3): string {
  const number = new Intl.NumberFormat(resolveLocaleTag(locale), { maximumSignificantDigits: significantDigits }).format(value);
  return unit === '°' || unit === '' ? `${number}${unit}` : `${number}\u00a0${unit}`;
}

function resolveLocaleTag(tag: string): string {
  try {
    return Intl.getCanonicalLocales(tag)[0] ?? FALLBACK_LOCALE;
  } catch {
    return FALLBACK_LOCALE;
  }
}
