import { Badge, makeStyles, Table, TableBody, TableCell, TableHeader, TableHeaderCell, TableRow, tokens } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';
import type { QueueSort, ReviewQueueItem } from '@mantlepiece/shared';
import { useDateFormat } from '../../components/formatting';
import { TextLink } from '../../components/links';
import { sortableColumn } from '../../components/lists/list-search';

const useStyles = makeStyles({
  table: { backgroundColor: tokens.colorNeutralBackground1, border: `1px solid ${tokens.colorNeutralStroke2}`, borderRadius: tokens.borderRadiusLarge },
  title: { fontWeight: tokens.fontWeightSemibold },
  number: { fontVariantNumeric: 'tabular-nums' },
  muted: { color: tokens.colorNeutralForeground3 },
});

export function ReviewQueueTable({ items, sort, onSort, busy }: { items: ReviewQueueItem[]; sort: QueueSort; onSort: (sort: QueueSort) => void; busy: boolean }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const formatDate = useDateFormat();
  return (
    <Table sortable aria-label={t('reviews.title')} aria-busy={busy} className={styles.table}>
      <TableHeader>
        <TableRow>
          <TableHeaderCell {...sortableColumn(sort, 'storyTitle', onSort)}>{t('reviews.columns.story')}</TableHeaderCell>
          <TableHeaderCell>{t('reviews.columns.number')}</TableHeaderCell>
          <TableHeaderCell>{t('reviews.columns.submittedBy')}</TableHeaderCell>
          <TableHeaderCell {...sortableColumn(sort, 'submittedAt', onSort)}>{t('reviews.columns.submittedAt')}</TableHeaderCell>
          <TableHeaderCell>{t('reviews.columns.blockers')}</TableHeaderCell>
          <TableHeaderCell>{t('reviews.columns.warnings')}</TableHeaderCell>
          <TableHeaderCell>{t('reviews.columns.approvals')}</TableHeaderCell>
        </TableRow>
      </TableHeader>
      <TableBody>
        {items.map((item) => (
          <TableRow key={item.revisionId} data-revision-id={item.revisionId}>
            <TableCell>
              <span className={styles.title}><TextLink to={`/reviews/${item.revisionId}`}>{item.storyTitle}</TextLink></span>
            </TableCell>
            <TableCell className={styles.number}>{t('revision.number', { number: item.number })}</TableCell>
            <TableCell>{item.submittedBy?.name ?? t('revision.formerColleague')}</TableCell>
            <TableCell>{formatDate(item.submittedAt)}</TableCell>
            <TableCell>
              {item.blockers > 0 ? <Badge appearance="filled" color="danger">{t('reviews.blockers', { count: item.blockers })}</Badge> : <span className={styles.muted}>{t('reviews.none')}</span>}
            </TableCell>
            <TableCell>
              {item.warnings > 0 ? <Badge appearance="tint" color="warning">{t('reviews.warnings', { count: item.warnings })}</Badge> : <span className={styles.muted}>{t('reviews.none')}</span>}
            </TableCell>
            <TableCell className={styles.number}>{t('reviews.approvals', { count: item.approvals, required: item.requiredApprovals })}</TableCell>
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}
