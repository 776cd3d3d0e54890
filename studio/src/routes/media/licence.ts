import type { MediaLicence } from '@mantlepiece/shared';
import type { TFunction } from 'i18next';

/**
 * SPDX identifiers (spdx.org/licenses) an image in a museum is most often under; the field takes
 * any identifier, this only fills the suggestion list.
 */
export const COMMON_SPDX_IMAGE_LICENCES = ['CC0-1.0', 'CC-BY-4.0', 'CC-BY-SA-4.0', 'CC-BY-NC-4.0', 'CC-BY-NC-SA-4.0', 'CC-BY-ND-4.0', 'CC-BY-NC-ND-4.0', 'CC-BY-3.0', 'CC-BY-SA-3.0', 'CC-PDDC'] as const;

/** An SPDX short identifier: letters, digits, "-", "." and "+", as in "CC-BY-4.0" (SPDX specification, annex A). */
export const isSpdxIdentifier = (value: string) => /^[A-Za-z0-9][A-Za-z0-9.+-]*$/.test(value.trim());

export function licenceLabel(t: TFunction, licence: MediaLicence): string {
  return licence.kind === 'spdx' ? licence.id : t('asset.allRightsReservedBy', { holder: licence.holder });
}
