import { Button, makeStyles, Table, TableBody, TableCell, TableHeader, TableHeaderCell, TableRow, tokens } from '@fluentui/react-components';
import type { ReleaseView } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useDateFormat } from '../../components/formatting';
import { LinkButton } from '../../components/links';
import { ReleaseStateBadge } from '../../components/releases/ReleaseStateBadge';
import { formatBytes } from '../media/media-facts';
import { publicationKind } from './publication-kind';

const useStyles = makeStyles({
  table: { backgroundColor: tokens.colorNeutralBackground1, border: `1px solid ${tokens.colorNeutralStroke2}`, borderRadius: tokens.borderRadiusLarge },
  number: { fontVariantNumeric: 'tabular-nums' },
  title: { fontWeight: tokens.fontWeightSemibold },
  actions: { display: 'flex', gap: tokens.spacingHorizontalXS, justifyContent: 'flex-end', whiteSpace: 'nowrap' },
  actionsColumn: { width: '17rem' },
  muted: { color: tokens.colorNeutralForeground3 },
});

/** Newest first. A Ready release can be published; a Superseded one can be made Live again (back or forward). */
export function ReleasesTable({ items, live, busy, onPublish }: {
  items: ReleaseView[];
  live: ReleaseView | undefined;
  busy: boolean;
  onPublish: (release: ReleaseView) => void;
}) {
  const { t, i18n } = useTranslation();
  const styles = useStyles();
  const formatDate = useDateFormat();
  const number = new Intl.NumberFormat(i18n.resolvedLanguage);
  return (
    <Table aria-label={t('releases.tableLabel')} aria-busy={busy} className={styles.table}>
      <TableHeader>
        <TableRow>
          <TableHeaderCell>{t('releases.columns.number')}</TableHeaderCell>
          <TableHeaderCell>{t('releases.columns.state')}</TableHeaderCell>
          <TableHeaderCell>{t('releases.columns.created')}</TableHeaderCell>
          <TableHeaderCell>{t('releases.columns.stories')}</TableHeaderCell>
          <TableHeaderCell>{t('releases.columns.files')}</TableHeaderCell>
          <TableHeaderCell>{t('releases.columns.bytes')}</TableHeaderCell>
          <TableHeaderCell className={styles.actionsColumn}><span className={styles.muted}>{t('releases.columns.actions')}</span></TableHeaderCell>
        </TableRow>
      </TableHeader>
      <TableBody>
        {items.map((release) => {
          const name = t('releases.name', { number: release.number });
          const kind = publicationKind(release, live);
          return (
            <TableRow key={release.id} data-release-id={release.id} data-state={release.state}>
              <TableCell><span className={styles.title}>{name}</span></TableCell>
              <TableCell><ReleaseStateBadge state={release.state} /></TableCell>
              <TableCell>{formatDate(release.createdAt)}</TableCell>
              <TableCell className={styles.number}>{number.format(release.stories.length)}</TableCell>
              <TableCell className={styles.number}>{release.state === 'building' || release.state === 'failed' ? '—' : number.format(release.files)}</TableCell>
              <TableCell className={styles.number}>{release.state === 'building' || release.state === 'failed' ? '—' : formatBytes(release.bytes, i18n.resolvedLanguage ?? 'en')}</TableCell>
              <TableCell>
                <span className={styles.actions}>
                  {kind && release.can.publish ? (
                    <Button size="small" appearance={kind === 'publish' ? 'primary' : 'secondary'} onClick={() => onPublish(release)} aria-label={t(`releases.actions.${kind}Label`, { name })}>
                      {t(`releases.actions.${kind}`)}
                    </Button>
                  ) : null}
                  {live && live.id !== release.id && release.state !== 'failed' && release.state !== 'building' ? (
                    <LinkButton size="small" appearance="subtle" to={`/releases/compare?a=${live.id}&b=${release.id}`} aria-label={t('releases.actions.compareLabel', { name })}>
                      {t('releases.actions.compare')}
                    </LinkButton>
                  ) : null}
                </span>
              </TableCell>
            </TableRow>
          );
        })}
      </TableBody>
    </Table>
  );
}
