import { ForbiddenException, NotFoundException } from '@nestjs/common';
import type { User } from '../users/models/user.model.js';
import { canonicalLocale } from '../common/locale-tag.js';

/** Admins and curators read every locale; they look after the stories the translations belong to. */
const readsEveryLocale = (user: User) => user.roles.includes('admin') || user.roles.includes('curator');

const translatorLocales = (user: User) =>
  user.roles.includes('translator') ? user.locales.map((locale) => canonicalLocale(locale) ?? locale) : [];

/** The locales a person may read, or null for all of them. */
export function readableLocales(user: User): string[] | null {
  return readsEveryLocale(user) ? null : translatorLocales(user);
}

const outsideLocales = (user: User, locale: string) =>
  new ForbiddenException(
    translatorLocales(user).length > 0
      ? `You translate into ${translatorLocales(user).join(', ')}, not ${locale}.`
      : 'You have no translator locales; an admin gives them in People.',
  );

export function assertMayRead(user: User, locale: string): void {
  const readable = readableLocales(user);
  if (readable !== null && !readable.includes(locale)) throw outsideLocales(user, locale);
}

/** Only translators write translations, and only into their own locales. */
export function assertMayWrite(user: User, locale: string): void {
  if (!translatorLocales(user).includes(locale)) throw outsideLocales(user, locale);
}

export function assertTargetLocale(targetLocales: readonly string[], locale: string): void {
  if (!targetLocales.includes(locale)) throw new NotFoundException(`This story's venue is not translated into ${locale}.`);
}

/** A `:locale` path parameter in canonical form; anything that is not a BCP 47 tag has no translations. */
export function localeParam(value: string): string {
  const locale = canonicalLocale(value);
  if (!locale) throw new NotFoundException(`${value} is not a BCP 47 language tag.`);
  return locale;
}
