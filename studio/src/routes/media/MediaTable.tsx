import { makeStyles, Table, TableBody, TableCell, TableHeader, TableHeaderCell, TableRow, tokens } from '@fluentui/react-components';
import type { MediaSort, MediaView } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useDateFormat, useDayFormat } from '../../components/formatting';
import { TextLink } from '../../components/links';
import { sortableColumn } from '../../components/lists/list-search';
import { MediaThumb } from '../../components/media/MediaThumb';
import { licenceLabel } from './licence';
import { formatBytes } from './media-facts';
import { MediaBadges } from './MediaBadges';

const useStyles = makeStyles({
  table: { backgroundColor: tokens.colorNeutralBackground1, border: `1px solid ${tokens.colorNeutralStroke2}`, borderRadius: tokens.borderRadiusLarge },
  thumb: { width: '72px' },
  muted: { color: tokens.colorNeutralForeground3 },
});

export function MediaTable({ assets, sort, onSort, busy }: { assets: MediaView[]; sort: MediaSort; onSort: (sort: MediaSort) => void; busy: boolean }) {
  const { t, i18n } = useTranslation();
  const styles = useStyles();
  const formatDate = useDateFormat();
  const formatDay = useDayFormat();
  return (
    <Table sortable aria-label={t('media.title')} aria-busy={busy} className={styles.table}>
      <TableHeader>
        <TableRow>
          <TableHeaderCell className={styles.thumb}><span className={styles.muted}>{t('media.columns.image')}</span></TableHeaderCell>
          <TableHeaderCell {...sortableColumn(sort, 'filename', onSort)}>{t('media.columns.filename')}</TableHeaderCell>
          <TableHeaderCell {...sortableColumn(sort, 'bytes', onSort)}>{t('media.columns.size')}</TableHeaderCell>
          <TableHeaderCell>{t('media.columns.credit')}</TableHeaderCell>
          <TableHeaderCell>{t('media.columns.licence')}</TableHeaderCell>
          <TableHeaderCell {...sortableColumn(sort, 'licenceExpiresOn', onSort)}>{t('media.columns.licenceEnds')}</TableHeaderCell>
          <TableHeaderCell>{t('media.columns.status')}</TableHeaderCell>
          <TableHeaderCell {...sortableColumn(sort, 'createdAt', onSort)}>{t('media.columns.added')}</TableHeaderCell>
        </TableRow>
      </TableHeader>
      <TableBody>
        {assets.map((asset) => (
          <TableRow key={asset.id}>
            <TableCell className={styles.thumb}><MediaThumb asset={asset} alt="" /></TableCell>
            <TableCell><TextLink to={`/media/${asset.id}`}>{asset.filename}</TextLink></TableCell>
            <TableCell>{`${asset.width} × ${asset.height} · ${formatBytes(asset.bytes, i18n.resolvedLanguage ?? 'en')}`}</TableCell>
            <TableCell>{asset.credit ?? <span className={styles.muted}>—</span>}</TableCell>
            <TableCell>{asset.licence ? licenceLabel(t, asset.licence) : <span className={styles.muted}>—</span>}</TableCell>
            <TableCell>{asset.licenceExpiresOn ? formatDay(asset.licenceExpiresOn) : <span className={styles.muted}>—</span>}</TableCell>
            <TableCell><MediaBadges asset={asset} /></TableCell>
            <TableCell>{formatDate(asset.createdAt)}</TableCell>
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}
