/**
 * A language's name in that language ("français", "العربية"), as a visitor looking for theirs
 * reads it, with the first letter raised by that language's own casing rules.
 */
export function endonym(locale: string): string {
  let name: string | undefined;
  try {
    name = new Intl.DisplayNames([locale], { type: 'language' }).of(locale);
  } catch {
    name = undefined;
  }
  if (!name) return locale;
  const [first = '', ...rest] = name;
  return first.toLocaleUpperCase(locale) + rest.join('');
}
