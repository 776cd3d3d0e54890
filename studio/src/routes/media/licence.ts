import type { MediaLicence } from '@mantlepiece/shared';
import type { TFunction } from 'i18next';

/** An SPDX short identifier: letters, digits, "-", "." and "+", as in "CC-BY-4.0" (SPDX specification, annex A). */
export const isSpdxIdentifier = (value: string) => /^[A-Za-z0-9][A-Za-z0-9.+-]*$/.test(value.trim());

export function licenceLabel(t: TFunction, licence: MediaLicence): string {
  return licence.kind === 'spdx' ? licence.id : t('asset.allRightsReservedBy', { holder: licence.holder });
}
