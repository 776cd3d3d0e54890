import { makeStyles, Spinner, Text, tokens } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';
import { useParams } from 'react-router-dom';
import { ApiError } from '../../api/client';
import { useStation } from '../../api/kiosks';
import { EmptyState } from '../../components/EmptyState';
import { describeError } from '../../components/forms/describe-error';
import { LinkButton } from '../../components/links';
import { positiveId } from '../../components/lists/list-search';
import { PageHeader } from '../../components/PageHeader';
import { useAllGalleries } from '../../components/releases/GalleryPicker';
import { PairKioskForm } from './PairKioskForm';
import { StationKiosks } from './StationKiosks';

const useStyles = makeStyles({
  section: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM, marginBottom: tokens.spacingVerticalXXL },
  heading: { margin: 0 },
});

/** One gallery screen: pair a kiosk to it, see the kiosks paired to it, revoke one. */
export function StationPage() {
  const { t, i18n } = useTranslation();
  const styles = useStyles();
  const id = positiveId(useParams().id ?? null) ?? 0;
  const station = useStation(id);
  const galleries = useAllGalleries();
  const back = <LinkButton to="/stations">{t('stations.back')}</LinkButton>;

  if (station.isPending) return <Spinner label={t('common.loading')} />;
  if (station.isError) {
    const missing = station.error instanceof ApiError && station.error.status === 404;
    return (
      <>
        <PageHeader title={t('stations.title')} />
        <EmptyState title={missing ? t('stations.notFound') : t('stations.loadError')} actions={back}>{missing ? null : describeError(t, station.error)}</EmptyState>
      </>
    );
  }
  const view = station.data;
  const number = new Intl.NumberFormat(i18n.resolvedLanguage);
  return (
    <>
      <PageHeader
        title={view.name}
        intro={t('stations.facts', {
          gallery: galleries.nameOf(view.galleryId),
          screen: `${view.screenWidthPx} × ${view.screenHeightPx} px`,
          orientation: t(`settings.orientations.${view.orientation}`),
          height: `${number.format(view.mountingHeightMm)} mm`,
        })}
        actions={back}
      />
      {view.can.pair ? (
        <section className={styles.section} aria-labelledby="pair-heading">
          <Text as="h2" id="pair-heading" size={500} weight="semibold" className={styles.heading}>{t('stations.pair.title')}</Text>
          <PairKioskForm stationId={view.id} stationName={view.name} />
        </section>
      ) : null}
      <section className={styles.section} aria-labelledby="kiosks-heading">
        <Text as="h2" id="kiosks-heading" size={500} weight="semibold" className={styles.heading}>{t('stations.kiosks.title')}</Text>
        <StationKiosks station={view} />
      </section>
    </>
  );
}
