import { makeStyles, Text, tokens } from '@fluentui/react-components';
import { CheckmarkCircleRegular, ArrowUndoRegular } from '@fluentui/react-icons';
import { useTranslation } from 'react-i18next';
import type { ReviewView } from '@mantlepiece/shared';
import { useDateFormat } from '../formatting';
import { useReviewStyles } from './review-styles';

const useStyles = makeStyles({
  list: { listStyle: 'none', margin: 0, padding: 0, display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  item: { display: 'grid', gridTemplateColumns: 'auto 1fr', columnGap: tokens.spacingHorizontalS, rowGap: '2px' },
  icon: { fontSize: '20px', gridRow: 'span 2' },
  approve: { color: tokens.colorStatusSuccessForeground1 },
  changes: { color: tokens.colorStatusDangerForeground1 },
  note: { margin: 0, gridColumn: 2, whiteSpace: 'pre-wrap' },
});

/** The verdicts recorded on a revision, oldest first, each with its note. */
export function VerdictHistory({ reviews }: { reviews: ReviewView[] }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const shared = useReviewStyles();
  const formatDate = useDateFormat();
  if (reviews.length === 0) return <Text className={shared.muted}>{t('verdict.none')}</Text>;
  return (
    <ul className={styles.list} data-verdicts>
      {reviews.map((review) => (
        <li key={review.id} className={styles.item} data-verdict={review.verdict}>
          {review.verdict === 'approve'
            ? <CheckmarkCircleRegular className={`${styles.icon} ${styles.approve}`} aria-hidden="true" />
            : <ArrowUndoRegular className={`${styles.icon} ${styles.changes}`} aria-hidden="true" />}
          <Text>
            <Text weight="semibold">{t(review.verdict === 'approve' ? 'verdict.approvedBy' : 'verdict.changesBy', { name: review.reviewer?.name ?? t('revision.formerColleague') })}</Text>
            <span className={shared.muted}> · {formatDate(review.createdAt)}</span>
          </Text>
          {review.note ? <p className={styles.note} dir="auto">{review.note}</p> : null}
        </li>
      ))}
    </ul>
  );
}
