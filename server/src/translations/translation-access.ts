import { ForbiddenException, NotFoundException } from '@nestjs/common';
import type { Role } from '@mantlepiece/shared';
import { holdsAny, localesAt, rolesAt, venueScope, type Member, type VenueScope } from '../auth/policy.js';
import { canonicalLocale } from '../common/locale-tag.js';

/** Admins and curators read every locale at their venues; they look after the stories the translations belong to. */
const READS_EVERY_LOCALE: readonly Role[] = ['admin', 'curator'];

const canonical = (locales: readonly string[]) => [...new Set(locales.map((locale) => canonicalLocale(locale) ?? locale))];

/** The locales the member translates into at one venue: those held everywhere and those of their membership there. */
const translatorLocalesAt = (member: Member, venueId: number) => (rolesAt(member, venueId).includes('translator') ? canonical(localesAt(member, venueId)) : []);

/** The locales a person may read at one venue, or null for all of them. */
export function readableLocales(member: Member, venueId: number): string[] | null {
  return holdsAny({ roles: rolesAt(member, venueId) }, READS_EVERY_LOCALE) ? null : translatorLocalesAt(member, venueId);
}

const outsideLocales = (own: readonly string[], locale: string) =>
  new ForbiddenException(own.length > 0 ? `You translate into ${own.join(', ')}, not ${locale}.` : 'You have no translator locales; an admin gives them in People.');

/** Whether the member reads a story's translations into `locale` at its venue. */
export function mayRead(member: Member, venueId: number, locale: string): boolean {
  const readable = readableLocales(member, venueId);
  return readable === null || readable.includes(locale);
}

export function assertMayRead(member: Member, venueId: number, locale: string): void {
  if (!mayRead(member, venueId, locale)) throw outsideLocales(readableLocales(member, venueId) ?? [], locale);
}

/** Only translators write translations, and only into their own locales at the story's venue. */
export const mayWrite = (member: Member, venueId: number, locale: string): boolean => translatorLocalesAt(member, venueId).includes(locale);

export function assertMayWrite(member: Member, venueId: number, locale: string): void {
  if (!mayWrite(member, venueId, locale)) throw outsideLocales(translatorLocalesAt(member, venueId), locale);
}

/**
 * Where a member reads translations, for lists across venues: every locale at the venues of
 * `everyLocale`, and the locales of each grant (`venueId` null: at every venue).
 */
export interface TranslationReach {
  everyLocale: VenueScope;
  translates: { venueId: number | null; locales: string[] }[];
}

export function translationReach(member: Member): TranslationReach {
  const translates = [
    ...(member.roles.includes('translator') ? [{ venueId: null, locales: canonical(member.locales) }] : []),
    ...(member.memberships ?? []).filter((grant) => grant.roles.includes('translator')).map((grant) => ({ venueId: grant.venueId, locales: canonical(grant.locales) })),
  ].filter((grant) => grant.locales.length > 0);
  return { everyLocale: venueScope(member, READS_EVERY_LOCALE), translates };
}

/** Refuses a locale the member reads at no venue, as a story's routes do. */
export function assertReadsSomewhere(reach: TranslationReach, locale: string): void {
  if (reach.everyLocale.every || reach.everyLocale.venueIds.length > 0) return;
  const own = canonical(reach.translates.flatMap((grant) => grant.locales));
  if (!own.includes(locale)) throw outsideLocales(own, locale);
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
