/**
 * BCP 47 language tags as every app stores, compares and chooses them: one canonical form
 * (`Intl.getCanonicalLocales`, so `pt-br` is `pt-BR` and `iw` is `he`), and RFC 4647 §3.4 lookup
 * wherever text is chosen by language, so a story written in `en-GB` takes alt text in `en`.
 */

/** BCP 47 allows longer tags, but no language we name needs more; the columns hold 35 characters. */
export const MAX_LANGUAGE_TAG_LENGTH = 35;

/** The canonical form of a BCP 47 tag (`pt-br` → `pt-BR`), or null when it is not a well-formed one. */
export function canonicalLanguageTag(value: unknown): string | null {
  if (typeof value !== 'string' || value.length === 0 || value.length > MAX_LANGUAGE_TAG_LENGTH) return null;
  try {
    return Intl.getCanonicalLocales(value)[0] ?? null;
  } catch {
    return null;
  }
}

/** Whether two tags name the same language once both are canonical; a malformed tag equals nothing. */
export function sameLanguageTag(a: string | null | undefined, b: string | null | undefined): boolean {
  const left = canonicalLanguageTag(a);
  return left !== null && left === canonicalLanguageTag(b);
}

/** Canonical tags in their first order, each once; malformed ones are left out. */
export function canonicalLanguageTags(values: readonly unknown[]): string[] {
  return [...new Set(values.map(canonicalLanguageTag).filter((tag): tag is string => tag !== null))];
}

/**
 * The ranges RFC 4647 §3.4 tries for one language range, most specific first: the last subtag
 * goes each time, and a single-letter subtag (an extension or private-use singleton) left at the
 * end goes with it, since it means nothing alone.
 */
export function lookupFallbacks(range: string): string[] {
  const canonical = canonicalLanguageTag(range);
  if (canonical === null) return [];
  const subtags = canonical.split('-');
  const tries: string[] = [];
  while (subtags.length > 0) {
    tries.push(subtags.join('-'));
    subtags.pop();
    if (subtags.length > 0 && subtags[subtags.length - 1]!.length === 1) subtags.pop();
  }
  return tries;
}

/**
 * RFC 4647 §3.4 lookup: the one available tag that best fits the wanted languages, in their
 * priority order, each truncated from the right until one matches (`en-GB` → `en`), compared in
 * canonical form. The available tag is returned as given, so it can key a stored record. The
 * wildcard `*` is skipped, as the RFC lets lookup do. `fallback` is the RFC's default value.
 */
export function lookupLanguage(wanted: readonly (string | null | undefined)[], available: readonly string[], fallback?: string): string | undefined {
  const byCanonical = new Map<string, string>();
  for (const tag of available) {
    const canonical = canonicalLanguageTag(tag);
    if (canonical !== null && !byCanonical.has(canonical)) byCanonical.set(canonical, tag);
  }
  for (const range of wanted) {
    if (!range || range === '*') continue;
    for (const attempt of lookupFallbacks(range)) {
      const found = byCanonical.get(attempt);
      if (found !== undefined) return found;
    }
  }
  return fallback;
}

/**
 * The text, and its tag, that a record of texts per tag (alt text, titles) holds for the wanted
 * languages by lookup; a blank text counts as not written. Undefined when none fits.
 */
export function lookupText(byTag: Readonly<Record<string, string>>, wanted: readonly (string | null | undefined)[]): { tag: string; text: string } | undefined {
  const written = Object.keys(byTag).filter((tag) => byTag[tag]!.trim() !== '');
  const tag = lookupLanguage(wanted, written);
  return tag === undefined ? undefined : { tag, text: byTag[tag]! };
}
