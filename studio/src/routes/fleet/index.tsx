import { Button, Field, makeStyles, Select, Text, tokens } from '@fluentui/react-components';
import { ArrowSyncRegular, DesktopPulseRegular } from '@fluentui/react-icons';
import { useTranslation } from 'react-i18next';
import { useSearchParams } from 'react-router-dom';
import { useFleet } from '../../api/fleet';
import { useGalleries } from '../../api/settings';
import { EmptyState } from '../../components/EmptyState';
import { ListStates } from '../../components/lists/ListStates';
import { CHOICES_BY_NAME, withSearchChanges } from '../../components/lists/list-search';
import { Pager } from '../../components/lists/Pager';
import { PageHeader } from '../../components/PageHeader';
import { FleetTable } from './FleetTable';
import { ACCESS_CHOICES, DEFAULT_ACCESS, readFleetParams } from './list-params';

const useStyles = makeStyles({
  toolbar: { display: 'flex', gap: tokens.spacingHorizontalL, alignItems: 'flex-end', flexWrap: 'wrap', marginBottom: tokens.spacingVerticalL },
  updated: { color: tokens.colorNeutralForeground3, marginLeft: 'auto' },
});

/** "5 minutes", in the studio language, for the offline threshold. */
const silenceText = (seconds: number, language: string) =>
  new Intl.NumberFormat(language, { style: 'unit', unit: seconds % 60 ? 'second' : 'minute', unitDisplay: 'long' }).format(seconds % 60 ? seconds : seconds / 60);

export function FleetPage() {
  const { t, i18n } = useTranslation();
  const styles = useStyles();
  const [search, setSearch] = useSearchParams();
  const params = readFleetParams(search);
  const fleet = useFleet(params);
  const galleries = useGalleries(CHOICES_BY_NAME);
  const change = (changes: Record<string, string | undefined>) => setSearch((current) => withSearchChanges(current, changes), { replace: true });
  // States are the server's; "12 seconds ago" is measured from when the list arrived (shown only once it has).
  const now = new Date(fleet.dataUpdatedAt);

  return (
    <>
      <PageHeader
        title={t('fleet.title')}
        intro={fleet.data ? t('fleet.intro', { offline: silenceText(fleet.data.thresholds.offlineAfterS, i18n.resolvedLanguage ?? 'en') }) : undefined}
      />
      <div className={styles.toolbar} role="search">
        <Field label={t('fleet.gallery')}>
          <Select value={params.galleryId ? String(params.galleryId) : ''} onChange={(_event, data) => change({ galleryId: data.value || undefined })}>
            <option value="">{t('fleet.allGalleries')}</option>
            {galleries.data?.items.map((gallery) => <option key={gallery.id} value={String(gallery.id)}>{gallery.name}</option>)}
          </Select>
        </Field>
        <Field label={t('fleet.access')}>
          <Select value={params.access ?? 'all'} onChange={(_event, data) => change({ access: data.value === DEFAULT_ACCESS ? undefined : data.value })}>
            {ACCESS_CHOICES.map((access) => <option key={access} value={access}>{t(`fleet.accessChoices.${access}`)}</option>)}
          </Select>
        </Field>
        {fleet.dataUpdatedAt ? (
          <Text className={styles.updated} aria-live="polite">
            {t('fleet.updated', { time: new Intl.DateTimeFormat(i18n.resolvedLanguage, { timeStyle: 'medium' }).format(now) })}
          </Text>
        ) : null}
        <Button icon={<ArrowSyncRegular />} disabled={fleet.isFetching} onClick={() => void fleet.refetch()}>{t('common.refresh')}</Button>
      </div>
      <ListStates
        query={fleet}
        loadError={t('fleet.loadError')}
        empty={
          params.galleryId ? (
            <EmptyState icon={<DesktopPulseRegular />} title={t('fleet.noMatchTitle')} actions={<Button onClick={() => change({ galleryId: undefined })}>{t('lists.clearFilters')}</Button>}>
              {t('fleet.noMatchBody')}
            </EmptyState>
          ) : params.access === 'revoked' ? (
            <EmptyState icon={<DesktopPulseRegular />} title={t('fleet.noAccessMatchTitle')} actions={<Button onClick={() => change({ access: 'all' })}>{t('fleet.accessChoices.all')}</Button>}>
              {t('fleet.noAccessMatchBody')}
            </EmptyState>
          ) : <EmptyState icon={<DesktopPulseRegular />} title={t('fleet.emptyTitle')}>{t('fleet.emptyBody')}</EmptyState>
        }
      >
        {(page) => (
          <>
            <FleetTable kiosks={page.items} now={now} busy={fleet.isFetching} />
            <Pager page={page} label={t('fleet.pagination')} onPage={(next) => change({ page: String(next) })} />
          </>
        )}
      </ListStates>
    </>
  );
}
