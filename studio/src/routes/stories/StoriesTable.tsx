import { Badge, makeStyles, Table, TableBody, TableCell, TableHeader, TableHeaderCell, TableRow, tokens } from '@fluentui/react-components';
import type { StorySort, StoryView } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useDateFormat } from '../../components/formatting';
import { TextLink } from '../../components/links';
import { sortableColumn } from '../../components/lists/list-search';
import { useLanguageName } from '../../components/translation/language-name';
import { StoryStateBadge } from './StoryStateBadge';

const useStyles = makeStyles({
  table: { backgroundColor: tokens.colorNeutralBackground1, border: `1px solid ${tokens.colorNeutralStroke2}`, borderRadius: tokens.borderRadiusLarge },
  title: { fontWeight: tokens.fontWeightSemibold },
  titleColumn: { width: '28%' },
  // Counts are short; the change date and its author each keep to one line.
  panelsColumn: { width: '5.5rem' },
  updatedColumn: { width: '11.5rem' },
  date: { display: 'block', whiteSpace: 'nowrap' },
  muted: { color: tokens.colorNeutralForeground3 },
  number: { fontVariantNumeric: 'tabular-nums' },
});

export function StoriesTable({ stories, sort, onSort, busy }: { stories: StoryView[]; sort: StorySort; onSort: (sort: StorySort) => void; busy: boolean }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const formatDate = useDateFormat();
  const languageName = useLanguageName({ standalone: true });
  return (
    <Table sortable aria-label={t('stories.title')} aria-busy={busy} className={styles.table}>
      <TableHeader>
        <TableRow>
          <TableHeaderCell className={styles.titleColumn} {...sortableColumn(sort, 'title', onSort)}>{t('stories.columns.title')}</TableHeaderCell>
          <TableHeaderCell>{t('stories.columns.exhibit')}</TableHeaderCell>
          <TableHeaderCell>{t('stories.columns.audience')}</TableHeaderCell>
          <TableHeaderCell>{t('stories.columns.locale')}</TableHeaderCell>
          <TableHeaderCell {...sortableColumn(sort, 'state', onSort)}>{t('stories.columns.state')}</TableHeaderCell>
          <TableHeaderCell className={styles.panelsColumn}>{t('stories.columns.panels')}</TableHeaderCell>
          <TableHeaderCell className={styles.updatedColumn} {...sortableColumn(sort, 'updatedAt', onSort)}>{t('stories.columns.updated')}</TableHeaderCell>
          <TableHeaderCell className={styles.updatedColumn} {...sortableColumn(sort, 'createdAt', onSort)}>{t('stories.columns.started')}</TableHeaderCell>
        </TableRow>
      </TableHeader>
      <TableBody>
        {stories.map((story) => (
          <TableRow key={story.id}>
            <TableCell>
              <span className={styles.title}>
                <TextLink to={`/stories/${story.id}`}>{story.title}</TextLink>
              </span>
            </TableCell>
            <TableCell>{story.exhibitName ?? <span className={styles.muted}>{t('stories.noExhibit')}</span>}</TableCell>
            <TableCell>
              <Badge appearance="outline" color="informative">{t(`audiences.${story.audience}`)}</Badge>
            </TableCell>
            <TableCell>{languageName(story.sourceLocale)}</TableCell>
            <TableCell><StoryStateBadge state={story.state} approvedRevision={story.approvedRevision} /></TableCell>
            <TableCell className={styles.number}>{story.panelCount}</TableCell>
            <TableCell><span className={styles.date}>{formatDate(story.updatedAt)}</span></TableCell>
            <TableCell>
              <span className={styles.date}>{formatDate(story.createdAt)}</span>
              {story.createdBy ? <span className={styles.muted}>{story.createdBy.name}</span> : null}
            </TableCell>
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}
