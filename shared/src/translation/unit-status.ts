import type { TranslationUnit } from './translation-unit.js';

export type UnitStatus = 'untranslated' | 'translated' | 'stale';

/** A stored translation: its text in the display form and the hash of the source it was made from. */
export interface StoredTranslation {
  sourceHash: string;
  text: string;
}

/** Stale: translated from a source that has since changed, so old and new source are shown side by side. */
export function unitStatus({ sourceHash, translation }: { sourceHash: string; translation?: StoredTranslation | null }): UnitStatus {
  if (!translation || translation.text === '') return 'untranslated';
  return translation.sourceHash === sourceHash ? 'translated' : 'stale';
}

export interface LocaleCompleteness {
  locale: string;
  total: number;
  translated: number;
  stale: number;
}

export function localeCompleteness(locale: string, units: readonly Pick<TranslationUnit, 'id' | 'sourceHash'>[], translationsById: Readonly<Record<string, StoredTranslation>>): LocaleCompleteness {
  const counts: LocaleCompleteness = { locale, total: units.length, translated: 0, stale: 0 };
  for (const unit of units) {
    const status = unitStatus({ sourceHash: unit.sourceHash, translation: Object.hasOwn(translationsById, unit.id) ? translationsById[unit.id] : undefined });
    if (status === 'translated') counts.translated += 1;
    if (status === 'stale') counts.stale += 1;
  }
  return counts;
}

/**
 * Keys translations to a panel's new units after an edit. A unit keeps the translation under its
 * own id when that was made from its current source; otherwise it takes one made from exactly its
 * current source under another id (a paragraph renumbered by an insertion above it); failing both,
 * it keeps its own, now stale, unless that one moved with its text. Each stored translation goes
 * to one unit at most.
 */
export function carryTranslations<T extends StoredTranslation>(units: readonly Pick<TranslationUnit, 'id' | 'sourceHash'>[], translationsById: Readonly<Record<string, T>>): Record<string, T> {
  const own = (id: string) => (Object.hasOwn(translationsById, id) ? translationsById[id] : undefined);
  const claimed = new Set<string>();
  const carried: Record<string, T> = {};
  for (const unit of units) {
    if (own(unit.id)?.sourceHash === unit.sourceHash) {
      carried[unit.id] = own(unit.id) as T;
      claimed.add(unit.id);
    }
  }
  const unclaimedByHash = new Map<string, string>();
  for (const [id, translation] of Object.entries(translationsById)) {
    if (!claimed.has(id) && !unclaimedByHash.has(translation.sourceHash)) unclaimedByHash.set(translation.sourceHash, id);
  }
  for (const unit of units) {
    if (carried[unit.id]) continue;
    const movedFrom = unclaimedByHash.get(unit.sourceHash);
    if (movedFrom !== undefined && !claimed.has(movedFrom)) {
      carried[unit.id] = translationsById[movedFrom] as T;
      claimed.add(movedFrom);
      unclaimedByHash.delete(unit.sourceHash);
    }
  }
  for (const unit of units) {
    const translation = own(unit.id);
    if (!carried[unit.id] && translation && !claimed.has(unit.id)) {
      carried[unit.id] = translation;
      claimed.add(unit.id);
    }
  }
  return carried;
}
