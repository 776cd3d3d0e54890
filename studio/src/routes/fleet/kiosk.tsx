import { useState, type ReactNode } from 'react';
import { Button, makeStyles, Spinner, Table, TableBody, TableCell, TableHeader, TableHeaderCell, TableRow, Text, tokens } from '@fluentui/react-components';
import { ProhibitedRegular } from '@fluentui/react-icons';
import { useTranslation } from 'react-i18next';
import { useParams, useSearchParams } from 'react-router-dom';
import { ApiError, type Schema } from '../../api/client';
import { useFleetKiosk } from '../../api/fleet';
import { EmptyState } from '../../components/EmptyState';
import { bytesText } from '../../components/fleet/bytes';
import { KioskStateBadge } from '../../components/fleet/KioskStateBadge';
import { LastHeartbeat } from '../../components/fleet/LastHeartbeat';
import { durationText } from '../../components/fleet/relative-time';
import { ReleasePlaying } from '../../components/fleet/ReleasePlaying';
import { RevokeKioskDialog } from '../../components/fleet/RevokeKioskDialog';
import { FormAlert } from '../../components/forms/FormAlert';
import { describeError } from '../../components/forms/describe-error';
import { useDateFormat } from '../../components/formatting';
import { LinkButton } from '../../components/links';
import { pageFrom, withSearchChanges } from '../../components/lists/list-search';
import { Pager } from '../../components/lists/Pager';
import { PageHeader } from '../../components/PageHeader';

type FleetKioskDetail = Schema<'FleetKioskDetail'>;

const HISTORY_PAGE_SIZE = 20;

const useStyles = makeStyles({
  facts: {
    display: 'grid', gridTemplateColumns: 'max-content 1fr', columnGap: tokens.spacingHorizontalXXL, rowGap: tokens.spacingVerticalS,
    margin: `0 0 ${tokens.spacingVerticalXXL}`, padding: tokens.spacingHorizontalL,
    backgroundColor: tokens.colorNeutralBackground1, border: `1px solid ${tokens.colorNeutralStroke2}`, borderRadius: tokens.borderRadiusLarge, maxWidth: '52rem',
  },
  term: { color: tokens.colorNeutralForeground2, fontWeight: tokens.fontWeightSemibold },
  value: { margin: 0, overflowWrap: 'anywhere' },
  error: { color: tokens.colorPaletteRedForeground1 },
  warning: { color: tokens.colorPaletteDarkOrangeForeground1, fontWeight: tokens.fontWeightSemibold },
  table: { backgroundColor: tokens.colorNeutralBackground1, border: `1px solid ${tokens.colorNeutralStroke2}`, borderRadius: tokens.borderRadiusLarge },
  heading: { margin: `0 0 ${tokens.spacingVerticalM}` },
  muted: { color: tokens.colorNeutralForeground3 },
  code: { fontFamily: tokens.fontFamilyMonospace, fontSize: tokens.fontSizeBase200 },
});

export function FleetKioskPage() {
  const { t } = useTranslation();
  const { kioskId } = useParams();
  const [search, setSearch] = useSearchParams();
  const kiosk = useFleetKiosk(Number(kioskId), { page: pageFrom(search), pageSize: HISTORY_PAGE_SIZE });
  if (kiosk.isPending) return <Spinner label={t('common.loading')} />;
  if (kiosk.isError) {
    const missing = kiosk.error instanceof ApiError && (kiosk.error.status === 404 || kiosk.error.status === 400);
    return (
      <EmptyState title={missing ? t('fleetKiosk.notFound') : t('fleetKiosk.loadError')} actions={<LinkButton to="/fleet">{t('fleetKiosk.backToFleet')}</LinkButton>}>
        {missing ? t('fleetKiosk.notFoundBody') : describeError(t, kiosk.error)}
      </EmptyState>
    );
  }
  return (
    <KioskDetail
      kiosk={kiosk.data}
      now={new Date(kiosk.dataUpdatedAt)}
      busy={kiosk.isFetching}
      onPage={(page) => setSearch((current) => withSearchChanges(current, { page: String(page) }), { replace: true })}
    />
  );
}

function KioskDetail({ kiosk, now, busy, onPage }: { kiosk: FleetKioskDetail; now: Date; busy: boolean; onPage: (page: number) => void }) {
  const { t, i18n } = useTranslation();
  const styles = useStyles();
  const formatDate = useDateFormat();
  const [revoking, setRevoking] = useState(false);
  const language = i18n.resolvedLanguage ?? 'en';
  const unknown = <span className={styles.muted}>{t('fleetKiosk.unknown')}</span>;
  const facts: [string, ReactNode][] = [
    [t('fleetKiosk.facts.gallery'), kiosk.gallery.name],
    [t('fleetKiosk.facts.state'), <KioskStateBadge kiosk={kiosk} />],
    [t('fleetKiosk.facts.lastHeartbeat'), <LastHeartbeat at={kiosk.lastHeartbeatAt} now={now} />],
    [t('fleetKiosk.facts.releasePlaying'), <ReleasePlaying kiosk={kiosk} />],
    [t('fleetKiosk.facts.releaseLive'), kiosk.releaseLive ? t('fleet.release', { number: kiosk.releaseLive.number }) : t('fleet.noLive')],
    [t('fleetKiosk.facts.publication'), kiosk.publication === null ? unknown : (
      <span className={kiosk.publication.expired ? styles.warning : undefined} data-publication-expired={kiosk.publication.expired || undefined}>
        {t(kiosk.publication.expired ? 'fleetKiosk.publicationExpired' : 'fleetKiosk.publicationValid', { sequence: kiosk.publication.sequence, date: formatDate(kiosk.publication.expiresAt) })}
      </span>
    )],
    [t('fleetKiosk.facts.appVersion'), kiosk.appVersion ? <span className={styles.code}>{kiosk.appVersion}</span> : unknown],
    [t('fleetKiosk.facts.uptime'), kiosk.uptimeS === null ? unknown : durationText(kiosk.uptimeS)],
    [t('fleetKiosk.facts.storage'), kiosk.storageUsedBytes === null ? unknown : bytesText(kiosk.storageUsedBytes, language)],
    [t('fleetKiosk.facts.lastError'), kiosk.lastError ? <span className={styles.error}>{kiosk.lastError}</span> : t('fleet.noError')],
    [t('fleetKiosk.facts.pairedAt'), formatDate(kiosk.pairedAt)],
  ];
  return (
    <>
      <PageHeader
        title={t('fleetKiosk.title', { station: kiosk.station.name })}
        actions={
          kiosk.can.revoke ? <Button icon={<ProhibitedRegular />} onClick={() => setRevoking(true)}>{t('fleetKiosk.revoke')}</Button> : null
        }
      />
      {kiosk.demo ? <FormAlert intent="info">{t('fleet.demoHint')}</FormAlert> : null}
      {kiosk.revokedAt ? <FormAlert intent="warning">{t('fleetKiosk.revokedNote', { date: formatDate(kiosk.revokedAt) })}</FormAlert> : null}
      <dl className={styles.facts}>
        {facts.map(([term, value]) => (
          <div key={term} style={{ display: 'contents' }}>
            <dt className={styles.term}>{term}</dt>
            <dd className={styles.value}>{value}</dd>
          </div>
        ))}
      </dl>

      <Text as="h2" size={500} weight="semibold" className={styles.heading}>{t('fleetKiosk.history')}</Text>
      {kiosk.heartbeats.items.length === 0 ? (
        <Text as="p" className={styles.muted}>{t('fleetKiosk.historyEmpty')}</Text>
      ) : (
        <>
          <Table aria-label={t('fleetKiosk.history')} aria-busy={busy} className={styles.table} size="small">
            <TableHeader>
              <TableRow>
                <TableHeaderCell>{t('fleetKiosk.historyColumns.receivedAt')}</TableHeaderCell>
                <TableHeaderCell>{t('fleetKiosk.historyColumns.release')}</TableHeaderCell>
                <TableHeaderCell>{t('fleetKiosk.historyColumns.appVersion')}</TableHeaderCell>
                <TableHeaderCell>{t('fleetKiosk.historyColumns.uptime')}</TableHeaderCell>
                <TableHeaderCell>{t('fleetKiosk.historyColumns.storage')}</TableHeaderCell>
                <TableHeaderCell>{t('fleetKiosk.historyColumns.lastError')}</TableHeaderCell>
              </TableRow>
            </TableHeader>
            <TableBody>
              {kiosk.heartbeats.items.map((beat) => (
                <TableRow key={beat.id}>
                  <TableCell>{formatDate(beat.receivedAt)}</TableCell>
                  <TableCell>
                    {beat.release ? t('fleet.release', { number: beat.release.number }) : t('fleet.noRelease')}
                    {beat.publication?.expired ? <span className={styles.warning}> · {t('fleet.publicationExpired', { sequence: beat.publication.sequence })}</span> : null}
                  </TableCell>
                  <TableCell><span className={styles.code}>{beat.appVersion}</span></TableCell>
                  <TableCell>{durationText(beat.uptimeS)}</TableCell>
                  <TableCell>{beat.storageUsedBytes === null ? '—' : bytesText(beat.storageUsedBytes, language)}</TableCell>
                  <TableCell>{beat.lastError ? <span className={styles.error}>{beat.lastError}</span> : '—'}</TableCell>
                </TableRow>
              ))}
            </TableBody>
          </Table>
          <Pager page={kiosk.heartbeats} label={t('fleetKiosk.historyPagination')} onPage={onPage} />
        </>
      )}
      {revoking ? <RevokeKioskDialog kiosk={kiosk} onClose={() => setRevoking(false)} /> : null}
    </>
  );
}
