import { useState } from 'react';
import { Button, makeStyles, tokens } from '@fluentui/react-components';
import { AddRegular, RocketRegular } from '@fluentui/react-icons';
import type { ReleaseView } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useSearchParams } from 'react-router-dom';
import { useGalleryReleases, useLiveRelease } from '../../api/releases';
import { EmptyState } from '../../components/EmptyState';
import { ListStates } from '../../components/lists/ListStates';
import { withSearchChanges } from '../../components/lists/list-search';
import { Pager } from '../../components/lists/Pager';
import { PageHeader } from '../../components/PageHeader';
import { BuildProgress } from '../../components/releases/BuildProgress';
import { GalleryPicker, useAllGalleries } from '../../components/releases/GalleryPicker';
import { BuildReleaseDialog } from './BuildReleaseDialog';
import { readReleasesParams } from './list-params';
import { PublishDialog } from './PublishDialog';
import { ReleasesTable } from './ReleasesTable';

const useStyles = makeStyles({
  toolbar: { display: 'flex', gap: tokens.spacingHorizontalL, alignItems: 'flex-end', justifyContent: 'space-between', flexWrap: 'wrap', marginBottom: tokens.spacingVerticalL },
  picker: { minWidth: '18rem' },
});

/** A gallery's releases: build one, follow the build, publish it, roll back to an earlier one. */
export function ReleasesPage() {
  const { t } = useTranslation();
  const styles = useStyles();
  const [search, setSearch] = useSearchParams();
  const params = readReleasesParams(search);
  const galleries = useAllGalleries();
  const galleryId = params.galleryId ?? galleries.items[0]?.id;
  const releases = useGalleryReleases(galleryId, params);
  const live = useLiveRelease(galleryId);
  const [building, setBuilding] = useState(false);
  const [publishing, setPublishing] = useState<ReleaseView | null>(null);
  const change = (changes: Record<string, string | undefined>) => setSearch((current) => withSearchChanges(current, changes), { replace: true });
  const galleryName = galleryId ? galleries.nameOf(galleryId) : '';

  return (
    <>
      <PageHeader
        title={t('releases.title')}
        intro={t('releases.intro')}
        actions={galleryId && releases.data?.can.build ? <Button appearance="primary" icon={<AddRegular />} onClick={() => setBuilding(true)}>{t('releases.build.open')}</Button> : null}
      />
      <div className={styles.toolbar}>
        <div className={styles.picker}>
          <GalleryPicker galleries={galleries.items} value={galleryId} onChange={(id) => change({ gallery: id ? String(id) : undefined, build: undefined })} />
        </div>
      </div>
      {params.buildId ? <BuildProgress key={params.buildId} releaseId={params.buildId} onPublish={setPublishing} /> : null}
      {galleries.isSuccess && !galleryId ? (
        <EmptyState icon={<RocketRegular />} title={t('releases.noGalleryTitle')}>{t('releases.noGalleryBody')}</EmptyState>
      ) : (
        <ListStates
          query={releases}
          loadError={t('releases.loadError')}
          empty={<EmptyState icon={<RocketRegular />} title={t('releases.emptyTitle', { gallery: galleryName })}>{t('releases.emptyBody')}</EmptyState>}
        >
          {(page) => (
            <>
              <ReleasesTable items={page.items} live={live.data} busy={releases.isFetching} onPublish={setPublishing} />
              <Pager page={page} label={t('releases.pagination')} onPage={(next) => change({ page: String(next) })} />
            </>
          )}
        </ListStates>
      )}
      {building && galleryId ? (
        <BuildReleaseDialog
          galleryId={galleryId}
          galleryName={galleryName}
          onClose={() => setBuilding(false)}
          onBuilding={(id) => { setBuilding(false); change({ build: String(id), gallery: String(galleryId) }); }}
        />
      ) : null}
      {publishing ? <PublishDialog release={publishing} live={live.data} galleryName={galleryName} onClose={() => setPublishing(null)} /> : null}
    </>
  );
}
