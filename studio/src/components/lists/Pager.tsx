import { Button, makeStyles, Text, tokens } from '@fluentui/react-components';
import type { Page } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { BackArrow, ForwardArrow } from '../ReadingArrows';

const useStyles = makeStyles({
  pager: { display: 'flex', alignItems: 'center', justifyContent: 'flex-end', gap: tokens.spacingHorizontalM, marginTop: tokens.spacingVerticalM },
});

/** "26–50 of 112" with previous and next, under every server-paged table. */
export function Pager({ page, label, onPage }: { page: Page<unknown>; label: string; onPage: (page: number) => void }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const from = (page.page - 1) * page.pageSize + 1;
  return (
    <nav className={styles.pager} aria-label={label}>
      <Text aria-live="polite">{t('lists.range', { from, to: from + page.items.length - 1, total: page.total })}</Text>
      <Button icon={<BackArrow />} disabled={page.page <= 1} onClick={() => onPage(page.page - 1)}>
        {t('lists.previousPage')}
      </Button>
      <Button icon={<ForwardArrow />} iconPosition="after" disabled={page.page * page.pageSize >= page.total} onClick={() => onPage(page.page + 1)}>
        {t('lists.nextPage')}
      </Button>
    </nav>
  );
}
