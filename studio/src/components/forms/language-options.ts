import { canonicalLanguageTag, canonicalLanguageTags } from '@mantlepiece/shared';

/**
 * Languages a museum is likely to write or translate into, as BCP 47 tags in canonical form: the
 * widely spoken languages, the regional forms venues tell apart, and sign languages a venue may
 * film. Any other well-formed tag that Intl can name is offered once someone types it.
 */
export const COMMON_LANGUAGE_TAGS = [
  'af', 'am', 'ar', 'ar-EG', 'ar-MA', 'ar-SA', 'ase', 'az', 'be', 'bfi', 'bg', 'bn', 'bs', 'ca', 'cs', 'cy', 'da', 'de',
  'de-AT', 'de-CH', 'el', 'en', 'en-AU', 'en-CA', 'en-GB', 'en-IE', 'en-IN', 'en-NZ', 'en-US', 'en-ZA', 'es', 'es-419',
  'es-ES', 'es-MX', 'es-US', 'et', 'eu', 'fa', 'fi', 'fil', 'fr', 'fr-BE', 'fr-CA', 'fr-CH', 'fr-FR', 'ga', 'gd', 'gl',
  'gu', 'ha', 'haw', 'he', 'hi', 'hr', 'hu', 'hy', 'id', 'ig', 'is', 'it', 'ja', 'ka', 'kk', 'km', 'kn', 'ko', 'ku', 'ky',
  'lo', 'lt', 'lv', 'mi', 'mk', 'ml', 'mn', 'mr', 'ms', 'mt', 'my', 'nb', 'ne', 'nl', 'nl-BE', 'nn', 'pa', 'pl', 'ps',
  'pt', 'pt-BR', 'pt-PT', 'ro', 'ru', 'si', 'sk', 'sl', 'sm', 'so', 'sq', 'sr', 'sr-Latn', 'sv', 'sw', 'ta', 'te', 'th',
  'to', 'tr', 'uk', 'ur', 'uz', 'vi', 'xh', 'yo', 'zh', 'zh-Hans', 'zh-Hant', 'zh-HK', 'zh-TW', 'zu',
] as const;

export interface LanguageOption {
  /** Canonical BCP 47 tag: what the field's value holds. */
  tag: string;
  /** The language's name in the studio's language ("Portuguese (Brazil)"), or the tag when Intl has none. */
  name: string;
  /** Its name in itself ("português (Brasil)"), so a translator can find their own language by it. */
  endonym: string;
}

function nameIn(displayLanguage: string, tag: string): string | undefined {
  try {
    return new Intl.DisplayNames([displayLanguage], { type: 'language', fallback: 'none' }).of(tag);
  } catch {
    return undefined;
  }
}

/** One tag as an option, or null when Intl cannot name it (a tag nobody would recognise). */
export function languageOption(tag: string, uiLanguage: string): LanguageOption | null {
  const canonical = canonicalLanguageTag(tag);
  if (canonical === null) return null;
  const name = nameIn(uiLanguage, canonical);
  if (name === undefined) return null;
  return { tag: canonical, name, endonym: nameIn(canonical, canonical) ?? name };
}

/**
 * The options a language field offers: the common languages Intl can name in the UI language and
 * every tag already in use (named if it can be, shown as the tag if not), sorted by name.
 */
export function languageOptions(uiLanguage: string, inUse: readonly string[] = []): LanguageOption[] {
  const options = new Map<string, LanguageOption>();
  for (const tag of COMMON_LANGUAGE_TAGS) {
    const option = languageOption(tag, uiLanguage);
    if (option) options.set(option.tag, option);
  }
  for (const tag of canonicalLanguageTags(inUse)) {
    if (!options.has(tag)) options.set(tag, languageOption(tag, uiLanguage) ?? { tag, name: tag, endonym: tag });
  }
  const collator = new Intl.Collator(uiLanguage);
  return [...options.values()].sort((a, b) => collator.compare(a.name, b.name) || a.tag.localeCompare(b.tag));
}

const folded = (text: string) => text.normalize('NFD').replace(/\p{M}/gu, '').toLocaleLowerCase();

/**
 * The options a search finds: by part of the name in the UI language or in itself (accents
 * and case ignored), or by the start of the tag; a well-formed tag typed in full that Intl can
 * name comes first when it is not on the list, so rarer languages are reachable too.
 */
export function searchLanguages(options: readonly LanguageOption[], query: string, uiLanguage: string): LanguageOption[] {
  const wanted = folded(query.trim());
  if (wanted === '') return [...options];
  const found = options.filter((option) =>
    folded(option.name).includes(wanted) || folded(option.endonym).includes(wanted) || option.tag.toLowerCase().startsWith(wanted));
  const typed = languageOption(query.trim(), uiLanguage);
  return typed && !options.some((option) => option.tag === typed.tag) ? [typed, ...found] : found;
}
