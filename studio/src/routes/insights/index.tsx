import { Button, Field, Input, makeStyles, Select, Spinner, tokens } from '@fluentui/react-components';
import { ArrowDownloadRegular, DataBarVerticalRegular } from '@fluentui/react-icons';
import { useTranslation } from 'react-i18next';
import { useSearchParams } from 'react-router-dom';
import { useDownloadInsightsCsv, useInsights } from '../../api/insights';
import { useGalleries } from '../../api/settings';
import { EmptyState } from '../../components/EmptyState';
import { FormAlert } from '../../components/forms/FormAlert';
import { describeError } from '../../components/forms/describe-error';
import { InsightsFigures } from '../../components/insights/InsightsFigures';
import { CHOICES_BY_NAME, withSearchChanges } from '../../components/lists/list-search';
import { PageHeader } from '../../components/PageHeader';
import { saveFile } from '../../components/save-file';
import { insightsFileName, readInsightsFilter } from './range';

const useStyles = makeStyles({
  toolbar: { display: 'flex', gap: tokens.spacingHorizontalL, alignItems: 'flex-end', flexWrap: 'wrap', marginBottom: tokens.spacingVerticalL },
});

export function InsightsPage() {
  const { t } = useTranslation();
  const styles = useStyles();
  const [search, setSearch] = useSearchParams();
  const galleries = useGalleries(CHOICES_BY_NAME);
  const filter = readInsightsFilter(search, galleries.data?.items[0]?.id);
  const insights = useInsights(filter);
  // The days on show: those chosen, else those the server counted (the venue's last INSIGHTS_DEFAULT_DAYS).
  const shown = filter && insights.data?.galleryId === filter.galleryId
    ? { ...filter, from: filter.from ?? insights.data.from, to: filter.to ?? insights.data.to }
    : null;
  const download = useDownloadInsightsCsv();
  const change = (changes: Record<string, string | undefined>) => setSearch((current) => withSearchChanges(current, changes), { replace: true });

  const downloadButton = shown ? (
    <Button icon={<ArrowDownloadRegular />} disabled={download.isPending} onClick={() => download.mutate(shown, { onSuccess: (blob) => saveFile(blob, insightsFileName(shown)) })}>
      {download.isPending ? t('insights.downloading') : t('insights.download')}
    </Button>
  ) : null;

  if (galleries.isPending) return <Spinner label={t('common.loading')} />;
  if (!filter) {
    return (
      <>
        <PageHeader title={t('insights.title')} intro={t('insights.intro')} />
        <EmptyState icon={<DataBarVerticalRegular />} title={t('insights.noGalleryTitle')}>{t('insights.noGalleryBody')}</EmptyState>
      </>
    );
  }
  return (
    <>
      <PageHeader title={t('insights.title')} intro={t('insights.intro')} actions={downloadButton} />
      {download.isError ? <FormAlert intent="error">{describeError(t, download.error)}</FormAlert> : null}
      <div className={styles.toolbar} role="search">
        <Field label={t('insights.gallery')}>
          <Select value={String(filter.galleryId)} onChange={(_event, data) => change({ galleryId: data.value })}>
            {galleries.data?.items.map((gallery) => <option key={gallery.id} value={String(gallery.id)}>{gallery.name}</option>)}
          </Select>
        </Field>
        <Field label={t('insights.from')} hint={insights.data ? t('insights.daysIn', { timeZone: insights.data.timeZone }) : undefined}>
          <Input type="date" value={shown?.from ?? ''} max={shown?.to} onChange={(_event, data) => change({ from: data.value || undefined })} />
        </Field>
        <Field label={t('insights.to')}>
          <Input type="date" value={shown?.to ?? ''} min={shown?.from} onChange={(_event, data) => change({ to: data.value || undefined })} />
        </Field>
      </div>
      {insights.isPending ? (
        <Spinner label={t('common.loading')} />
      ) : insights.isError ? (
        <EmptyState title={t('insights.loadError')} actions={<Button onClick={() => void insights.refetch()}>{t('common.retry')}</Button>}>
          {describeError(t, insights.error)}
        </EmptyState>
      ) : insights.data.totals.events === 0 ? (
        <EmptyState icon={<DataBarVerticalRegular />} title={t('insights.emptyTitle')}>{t('insights.emptyBody')}</EmptyState>
      ) : (
        <div aria-busy={insights.isFetching}>
          {insights.data.totals.demoEvents > 0 ? <FormAlert intent="info">{t('insights.demoEvents', { count: insights.data.totals.demoEvents })}</FormAlert> : null}
          <InsightsFigures insights={insights.data} />
        </div>
      )}
    </>
  );
}
