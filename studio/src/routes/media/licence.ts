import type { MediaLicence } from '@mantlepiece/shared';
import type { TFunction } from 'i18next';

/** An SPDX short identifier: letters, digits, "-", "." and "+", as in "CC-BY-4.0" (SPDX specification, annex A). */
export const isSpdxIdentifier = (value: string) => /^[A-Za-z0-9][A-Za-z0-9.+-]*$/.test(value.trim());

export function licenceLabel(t: TFunction, licence: MediaLicence): string {
  return licence.kind === 'spdx' ? licence.id : t('asset.allRightsReservedBy', { holder: licence.holder });
}

/**
 * The identifiers to suggest for what has been typed: those that start with it first (so "MIT" offers
 * MIT before FSL-1.1-MIT, and Tab or Enter picks what was typed), then those that contain it, each
 * part in the server's order (the common image licences first).
 */
export function licenceSuggestions(ids: readonly string[], typed: string, limit: number): string[] {
  const wanted = typed.trim().toLowerCase();
  const matching = ids.filter((id) => id.toLowerCase().includes(wanted));
  const starting = matching.filter((id) => id.toLowerCase().startsWith(wanted));
  return [...starting, ...matching.filter((id) => !id.toLowerCase().startsWith(wanted))].slice(0, limit);
}
