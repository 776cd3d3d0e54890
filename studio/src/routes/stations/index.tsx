import { makeStyles, Table, TableBody, TableCell, TableHeader, TableHeaderCell, TableRow, tokens } from '@fluentui/react-components';
import { TvRegular } from '@fluentui/react-icons';
import { PAGE_SIZE } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useSearchParams } from 'react-router-dom';
import { useStations } from '../../api/settings';
import { EmptyState } from '../../components/EmptyState';
import { TextLink } from '../../components/links';
import { ListStates } from '../../components/lists/ListStates';
import { pageFrom, positiveId, withSearchChanges } from '../../components/lists/list-search';
import { Pager } from '../../components/lists/Pager';
import { PageHeader } from '../../components/PageHeader';
import { GalleryPicker, useAllGalleries } from '../../components/releases/GalleryPicker';

const useStyles = makeStyles({
  toolbar: { display: 'flex', gap: tokens.spacingHorizontalL, alignItems: 'flex-end', marginBottom: tokens.spacingVerticalL, minWidth: '18rem' },
  table: { backgroundColor: tokens.colorNeutralBackground1, border: `1px solid ${tokens.colorNeutralStroke2}`, borderRadius: tokens.borderRadiusLarge },
  title: { fontWeight: tokens.fontWeightSemibold },
});

/** The gallery screens a technician pairs kiosks to; each opens its station page. */
export function StationsPage() {
  const { t } = useTranslation();
  const styles = useStyles();
  const [search, setSearch] = useSearchParams();
  const galleryId = positiveId(search.get('gallery'));
  const galleries = useAllGalleries();
  const stations = useStations({ page: pageFrom(search), pageSize: PAGE_SIZE.fallback, sort: 'name', galleryId });
  const change = (changes: Record<string, string | undefined>) => setSearch((current) => withSearchChanges(current, changes), { replace: true });
  return (
    <>
      <PageHeader title={t('stations.title')} intro={t('stations.intro')} />
      <div className={styles.toolbar}>
        <GalleryPicker allowAll galleries={galleries.items} value={galleryId} onChange={(id) => change({ gallery: id ? String(id) : undefined })} />
      </div>
      <ListStates query={stations} loadError={t('stations.loadError')} empty={<EmptyState icon={<TvRegular />} title={t('stations.emptyTitle')}>{t('stations.emptyBody')}</EmptyState>}>
        {(page) => (
          <>
            <Table aria-label={t('stations.title')} aria-busy={stations.isFetching} className={styles.table}>
              <TableHeader>
                <TableRow>
                  <TableHeaderCell>{t('settings.columns.name')}</TableHeaderCell>
                  <TableHeaderCell>{t('settings.columns.galleryId')}</TableHeaderCell>
                  <TableHeaderCell>{t('settings.columns.screen')}</TableHeaderCell>
                  <TableHeaderCell>{t('settings.columns.orientation')}</TableHeaderCell>
                </TableRow>
              </TableHeader>
              <TableBody>
                {page.items.map((station) => (
                  <TableRow key={station.id}>
                    <TableCell><span className={styles.title}><TextLink to={`/stations/${station.id}`}>{station.name}</TextLink></span></TableCell>
                    <TableCell>{galleries.nameOf(station.galleryId)}</TableCell>
                    <TableCell>{`${station.screenWidthPx} × ${station.screenHeightPx} px`}</TableCell>
                    <TableCell>{t(`settings.orientations.${station.orientation}`)}</TableCell>
                  </TableRow>
                ))}
              </TableBody>
            </Table>
            <Pager page={page} label={t('stations.pagination')} onPage={(next) => change({ page: String(next) })} />
          </>
        )}
      </ListStates>
    </>
  );
}
