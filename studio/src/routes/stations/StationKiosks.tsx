import { Fragment, useState } from 'react';
import {
  Badge, Button, makeStyles, Spinner, Table, TableBody, TableCell, TableHeader, TableHeaderCell, TableRow, Text, tokens,
} from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';
import type { Schema } from '../../api/client';
import { useRevokeKiosk } from '../../api/fleet';
import { useStationKiosks } from '../../api/kiosks';
import { ConfirmDialog } from '../../components/ConfirmDialog';
import { EmptyState } from '../../components/EmptyState';
import { useDateFormat } from '../../components/formatting';
import { FormAlert } from '../../components/forms/FormAlert';
import { describeError } from '../../components/forms/describe-error';

const useStyles = makeStyles({
  table: { backgroundColor: tokens.colorNeutralBackground1, border: `1px solid ${tokens.colorNeutralStroke2}`, borderRadius: tokens.borderRadiusLarge },
  // A refusal names file hashes: it gets a row of its own, under its kiosk, and wraps anywhere.
  error: { color: tokens.colorPaletteRedForeground1, overflowWrap: 'anywhere', fontSize: tokens.fontSizeBase200, paddingBottom: tokens.spacingVerticalS },
  access: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalS },
  muted: { color: tokens.colorNeutralForeground3 },
  actions: { display: 'flex', justifyContent: 'flex-end' },
});

const COLUMNS = 6;

/** Every kiosk paired to the station, the active one first, each with what it last reported. */
export function StationKiosks({ station }: { station: Schema<'StationView'> }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const formatDate = useDateFormat();
  const kiosks = useStationKiosks(station);
  const revoke = useRevokeKiosk();
  const [revoking, setRevoking] = useState<Schema<'FleetKioskView'> | null>(null);
  const release = (ref: { number: number } | null) => (ref ? t('releases.name', { number: ref.number }) : '—');

  if (kiosks.isPending) return <Spinner label={t('common.loading')} />;
  if (kiosks.isError) return <FormAlert intent="error">{describeError(t, kiosks.error)}</FormAlert>;
  if (kiosks.items.length === 0) return <EmptyState title={t('stations.kiosks.emptyTitle')} headingLevel={3}>{t('stations.kiosks.emptyBody')}</EmptyState>;
  return (
    <>
      <Table aria-label={t('stations.kiosks.title')} aria-busy={kiosks.isFetching} className={styles.table}>
        <TableHeader>
          <TableRow>
            <TableHeaderCell>{t('stations.kiosks.kiosk')}</TableHeaderCell>
            <TableHeaderCell>{t('stations.kiosks.state')}</TableHeaderCell>
            <TableHeaderCell>{t('stations.kiosks.pairedAt')}</TableHeaderCell>
            <TableHeaderCell>{t('stations.kiosks.lastHeartbeat')}</TableHeaderCell>
            <TableHeaderCell>{t('stations.kiosks.playing')}</TableHeaderCell>
            <TableHeaderCell><span className={styles.muted}>{t('settings.columns.actions')}</span></TableHeaderCell>
          </TableRow>
        </TableHeader>
        <TableBody>
          {kiosks.items.map((kiosk) => {
            const name = t('stations.kiosks.name', { id: kiosk.id });
            return (
              <Fragment key={kiosk.id}>
                <TableRow data-kiosk-id={kiosk.id}>
                  <TableCell>{name}</TableCell>
                  <TableCell>
                    {kiosk.revokedAt ? (
                      <span className={styles.access}>
                        <Badge appearance="tint" color="subtle">{t('stations.kiosks.revoked')}</Badge>
                        <span className={styles.muted}>{formatDate(kiosk.revokedAt)}</span>
                      </span>
                    ) : <Badge appearance="tint" color="success">{t('stations.kiosks.active')}</Badge>}
                  </TableCell>
                  <TableCell>{formatDate(kiosk.pairedAt)}</TableCell>
                  <TableCell>{kiosk.lastHeartbeatAt ? formatDate(kiosk.lastHeartbeatAt) : <span className={styles.muted}>{t('stations.kiosks.never')}</span>}</TableCell>
                  <TableCell>
                    {kiosk.releasePlaying || kiosk.releaseLive
                      ? t('stations.kiosks.playingOf', { playing: release(kiosk.releasePlaying), live: release(kiosk.releaseLive) })
                      : <span className={styles.muted}>{t('fleet.noRelease')}</span>}
                  </TableCell>
                  <TableCell>
                    <span className={styles.actions}>
                      {kiosk.can.revoke ? (
                        <Button size="small" onClick={() => { revoke.reset(); setRevoking(kiosk); }} aria-label={t('stations.kiosks.revokeLabel', { name })}>{t('stations.kiosks.revoke')}</Button>
                      ) : null}
                    </span>
                  </TableCell>
                </TableRow>
                {kiosk.lastError ? (
                  <TableRow data-kiosk-error={kiosk.id}>
                    <TableCell colSpan={COLUMNS} className={styles.error}>{t('stations.kiosks.lastErrorIs', { error: kiosk.lastError })}</TableCell>
                  </TableRow>
                ) : null}
              </Fragment>
            );
          })}
        </TableBody>
      </Table>
      {revoking ? (
        <ConfirmDialog
          title={t('stations.kiosks.revokeTitle', { name: t('stations.kiosks.name', { id: revoking.id }), station: station.name })}
          confirmLabel={t('stations.kiosks.revokeConfirm')}
          pending={revoke.isPending}
          problem={revoke.error ? describeError(t, revoke.error) : null}
          onConfirm={() => revoke.mutate(revoking.id, { onSuccess: () => setRevoking(null) })}
          onCancel={() => setRevoking(null)}
        >
          <Text as="p">{t('stations.kiosks.revokeBody')}</Text>
        </ConfirmDialog>
      ) : null}
    </>
  );
}
