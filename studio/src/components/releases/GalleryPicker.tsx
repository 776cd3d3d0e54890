import { Field, Select } from '@fluentui/react-components';
import type { GalleryView } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useGalleries } from '../../api/settings';
import { CHOICES_BY_NAME } from '../lists/list-search';

/** Every gallery; a venue has a handful, so one page holds them all. */
export function useAllGalleries() {
  const galleries = useGalleries(CHOICES_BY_NAME);
  const items: GalleryView[] = galleries.data?.items ?? [];
  return { ...galleries, items, nameOf: (id: number) => items.find((gallery) => gallery.id === id)?.name ?? `#${id}` };
}

/** Releases and stations belong to one gallery at a time; this picks it. */
export function GalleryPicker({ galleries, value, onChange, allowAll = false }: {
  galleries: GalleryView[];
  value: number | undefined;
  onChange: (galleryId: number | undefined) => void;
  allowAll?: boolean;
}) {
  const { t } = useTranslation();
  return (
    <Field label={t('releases.gallery')}>
      <Select value={value ? String(value) : ''} onChange={(_event, data) => onChange(data.value ? Number(data.value) : undefined)}>
        {allowAll ? <option value="">{t('settings.all')}</option> : null}
        {galleries.map((gallery) => <option key={gallery.id} value={String(gallery.id)}>{gallery.name}</option>)}
      </Select>
    </Field>
  );
}
