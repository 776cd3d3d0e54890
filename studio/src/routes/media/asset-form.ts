import type { MediaLicence, MediaView } from '@mantlepiece/shared';
import type { TFunction } from 'i18next';
import type { MediaChanges } from '../../api/media';
import type { FieldProblems } from '../../components/forms/validation';
import { isSpdxIdentifier } from './licence';

export interface AssetValues {
  credit: string;
  licenceKind: 'none' | MediaLicence['kind'];
  spdxId: string;
  holder: string;
  licenceExpiresOn: string;
  alt: Record<string, string>;
}

export type AssetField = 'credit' | 'licence' | 'licenceExpiresOn' | 'alt';
export const ASSET_FIELDS: readonly AssetField[] = ['credit', 'licence', 'licenceExpiresOn', 'alt'];

export function assetValues(asset: MediaView): AssetValues {
  return {
    credit: asset.credit ?? '',
    licenceKind: asset.licence?.kind ?? 'none',
    spdxId: asset.licence?.kind === 'spdx' ? asset.licence.id : '',
    holder: asset.licence?.kind === 'all-rights-reserved' ? asset.licence.holder : '',
    licenceExpiresOn: asset.licenceExpiresOn ?? '',
    alt: { ...asset.alt },
  };
}

export function assetProblems(t: TFunction, values: AssetValues): FieldProblems<AssetField | 'spdxId' | 'holder'> {
  return {
    spdxId: values.licenceKind === 'spdx' && !isSpdxIdentifier(values.spdxId) ? t('asset.spdxInvalid') : undefined,
    holder: values.licenceKind === 'all-rights-reserved' && !values.holder.trim() ? t('validation.required') : undefined,
    licenceExpiresOn: values.licenceExpiresOn && !/^\d{4}-\d{2}-\d{2}$/.test(values.licenceExpiresOn) ? t('asset.dateInvalid') : undefined,
  };
}

export function assetChanges(values: AssetValues): MediaChanges {
  const licence: MediaLicence | null =
    values.licenceKind === 'spdx'
      ? { kind: 'spdx', id: values.spdxId.trim() }
      : values.licenceKind === 'all-rights-reserved'
        ? { kind: 'all-rights-reserved', holder: values.holder.trim() }
        : null;
  const alt = Object.fromEntries(Object.entries(values.alt).map(([locale, text]): [string, string] => [locale, text.trim()]).filter(([, text]) => text));
  return { credit: values.credit.trim() || null, licence, licenceExpiresOn: values.licenceExpiresOn || null, alt };
}
