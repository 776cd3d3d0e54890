import { Button, Field, makeStyles, SearchBox, Select, tokens, ToggleButton } from '@fluentui/react-components';
import { GridRegular, ImageMultipleRegular, TableRegular } from '@fluentui/react-icons';
import { MEDIA_SORT } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useMediaList } from '../../api/media';
import { EmptyState } from '../../components/EmptyState';
import { ListStates } from '../../components/lists/ListStates';
import { Pager } from '../../components/lists/Pager';
import { useListSearch } from '../../components/lists/use-list-search';
import { MediaDropzone } from '../../components/media/MediaDropzone';
import { PageHeader } from '../../components/PageHeader';
import { MEDIA_FILTERS, readMediaListParams } from './list-params';
import { MediaGrid } from './MediaGrid';
import { MediaTable } from './MediaTable';

const useStyles = makeStyles({
  upload: { marginBottom: tokens.spacingVerticalL },
  toolbar: { display: 'flex', gap: tokens.spacingHorizontalL, alignItems: 'flex-end', flexWrap: 'wrap', marginBottom: tokens.spacingVerticalL },
  search: { minWidth: '18rem' },
  views: { display: 'flex', gap: tokens.spacingHorizontalXS, marginLeft: 'auto' },
});

export function MediaPage() {
  const { t } = useTranslation();
  const styles = useStyles();
  const { search, query, setQuery, change, clear } = useListSearch();
  const { view, ...params } = readMediaListParams(search);
  const media = useMediaList(params);
  const filter = search.get('filter') ?? '';

  const filtered = Boolean(params.q || filter);
  return (
    <>
      <PageHeader title={t('media.title')} intro={t('media.intro')} />
      {media.data?.can.upload ? <div className={styles.upload}><MediaDropzone /></div> : null}
      <div className={styles.toolbar} role="search">
        <Field label={t('media.search')} className={styles.search}>
          <SearchBox value={query} onChange={(_event, data) => setQuery(data.value)} />
        </Field>
        <Field label={t('media.filter')}>
          <Select value={filter} onChange={(_event, data) => change({ filter: data.value || undefined })}>
            <option value="">{t('media.filters.all')}</option>
            {MEDIA_FILTERS.map((value) => <option key={value} value={value}>{t(`media.filters.${value}`)}</option>)}
          </Select>
        </Field>
        <div className={styles.views} role="group" aria-label={t('media.view')}>
          <ToggleButton icon={<GridRegular />} checked={view === 'grid'} onClick={() => change({ view: undefined, page: search.get('page') ?? undefined })}>{t('media.grid')}</ToggleButton>
          <ToggleButton icon={<TableRegular />} checked={view === 'table'} onClick={() => change({ view: 'table', page: search.get('page') ?? undefined })}>{t('media.table')}</ToggleButton>
        </div>
      </div>
      <ListStates
        query={media}
        loadError={t('media.loadError')}
        empty={(
          <EmptyState
            icon={<ImageMultipleRegular />}
            title={filtered ? t('media.noMatchTitle') : t('media.emptyTitle')}
            actions={filtered ? <Button onClick={clear}>{t('lists.clearFilters')}</Button> : null}
          >
            {filtered ? t('media.noMatchBody') : t('media.emptyBody')}
          </EmptyState>
        )}
      >
        {(page) => (
          <>
            {view === 'table' ? (
              <MediaTable assets={page.items} sort={params.sort ?? MEDIA_SORT.fallback} onSort={(sort) => change({ sort, view: 'table' })} busy={media.isFetching} />
            ) : (
              <MediaGrid assets={page.items} />
            )}
            <Pager page={page} label={t('media.pagination')} onPage={(next) => change({ page: String(next) })} />
          </>
        )}
      </ListStates>
    </>
  );
}
