import { Fragment } from 'react';
import { makeStyles, Table, TableBody, TableCell, TableHeader, TableHeaderCell, TableRow, Text, tokens } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';
import { DemoBadge } from '../../components/fleet/DemoBadge';
import { KioskStateBadge } from '../../components/fleet/KioskStateBadge';
import { LastHeartbeat } from '../../components/fleet/LastHeartbeat';
import { ReleasePlaying } from '../../components/fleet/ReleasePlaying';
import { TextLink } from '../../components/links';
import { byGallery } from './list-params';
import type { Schema } from '../../api/client';

type FleetKioskView = Schema<'FleetKioskView'>;

const COLUMNS = 6;

const useStyles = makeStyles({
  table: { backgroundColor: tokens.colorNeutralBackground1, border: `1px solid ${tokens.colorNeutralStroke2}`, borderRadius: tokens.borderRadiusLarge },
  group: { backgroundColor: tokens.colorNeutralBackground3 },
  station: { fontWeight: tokens.fontWeightSemibold },
  error: { color: tokens.colorPaletteRedForeground1, overflowWrap: 'anywhere', maxWidth: '24rem' },
  muted: { color: tokens.colorNeutralForeground3 },
  code: { fontFamily: tokens.fontFamilyMonospace, fontSize: tokens.fontSizeBase200 },
});

export function FleetTable({ kiosks, now, busy }: { kiosks: FleetKioskView[]; now: Date; busy: boolean }) {
  const { t } = useTranslation();
  const styles = useStyles();
  return (
    <Table aria-label={t('fleet.title')} aria-busy={busy} className={styles.table}>
      <TableHeader>
        <TableRow>
          <TableHeaderCell>{t('fleet.columns.station')}</TableHeaderCell>
          <TableHeaderCell>{t('fleet.columns.state')}</TableHeaderCell>
          <TableHeaderCell>{t('fleet.columns.release')}</TableHeaderCell>
          <TableHeaderCell>{t('fleet.columns.lastHeartbeat')}</TableHeaderCell>
          <TableHeaderCell>{t('fleet.columns.appVersion')}</TableHeaderCell>
          <TableHeaderCell>{t('fleet.columns.lastError')}</TableHeaderCell>
        </TableRow>
      </TableHeader>
      <TableBody>
        {byGallery(kiosks).map(({ gallery, kiosks: inGallery }) => (
          <Fragment key={`${gallery.id}-${inGallery[0]!.id}`}>
            <TableRow className={styles.group}>
              <TableCell colSpan={COLUMNS}>
                <Text weight="semibold">{t('fleet.galleryGroup', { gallery: gallery.name })}</Text>
              </TableCell>
            </TableRow>
            {inGallery.map((kiosk) => (
              <TableRow key={kiosk.id} data-kiosk-id={kiosk.id}>
                <TableCell>
                  <span className={styles.station}><TextLink to={`/fleet/${kiosk.id}`}>{kiosk.station.name}</TextLink></span>
                  {kiosk.demo ? <> <DemoBadge /></> : null}
                  {/* A station keeps its name when its kiosk is replaced: the kiosk's own name tells two rows apart. */}
                  <Text as="p" size={200} className={styles.muted}>{t('stations.kiosks.name', { id: kiosk.id })}</Text>
                </TableCell>
                <TableCell><KioskStateBadge kiosk={kiosk} /></TableCell>
                <TableCell><ReleasePlaying kiosk={kiosk} /></TableCell>
                <TableCell><LastHeartbeat at={kiosk.lastHeartbeatAt} now={now} /></TableCell>
                <TableCell><span className={styles.code}>{kiosk.appVersion ?? '—'}</span></TableCell>
                <TableCell>
                  {kiosk.lastError ? <span className={styles.error}>{kiosk.lastError}</span> : <span className={styles.muted}>{t('fleet.noError')}</span>}
                </TableCell>
              </TableRow>
            ))}
          </Fragment>
        ))}
      </TableBody>
    </Table>
  );
}
