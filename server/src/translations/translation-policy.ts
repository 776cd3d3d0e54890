import type { Can, TranslationCan } from '@mantlepiece/shared';
import type { Member } from '../auth/policy.js';
import { mayRead, mayWrite, type TranslationReach } from './translation-access.js';

/**
 * The translation policy for one story in one target locale, from the rules the service applies:
 * a unit is saved, and an XLIFF file imported, only by a translator of that locale at the story's
 * venue (`assertMayWrite`); the file is downloaded by whoever reads the locale there (`assertMayRead`).
 */
export function translationCan(member: Member, target: { venueId: number; locale: string }): TranslationCan {
  const writes = mayWrite(member, target.venueId, target.locale);
  return { translate: writes, import: writes, export: mayRead(member, target.venueId, target.locale) };
}

/** The worklist as a whole: whether the caller translates into any locale, at `venueId` when the list is narrowed to one. */
export const translationsCan = (reach: TranslationReach, venueId?: number): Can<'translations'> => ({
  translate: reach.translates.some((grant) => venueId === undefined || grant.venueId === null || grant.venueId === venueId),
});
