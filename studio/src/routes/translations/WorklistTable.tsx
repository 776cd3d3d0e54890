import { Badge, makeStyles, Table, TableBody, TableCell, TableHeader, TableHeaderCell, TableRow, tokens } from '@fluentui/react-components';
import type { TranslationWorklistItem } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { LinkButton } from '../../components/links';
import { useLanguageName } from '../../components/translation/language-name';
import { ProgressMeter } from '../../components/translation/ProgressMeter';

const useStyles = makeStyles({
  table: { backgroundColor: tokens.colorNeutralBackground1, border: `1px solid ${tokens.colorNeutralStroke2}`, borderRadius: tokens.borderRadiusLarge },
  story: { fontWeight: tokens.fontWeightSemibold, verticalAlign: 'top', paddingTop: tokens.spacingVerticalS, paddingBottom: tokens.spacingVerticalS },
  storyCell: { verticalAlign: 'top', paddingTop: tokens.spacingVerticalS, paddingBottom: tokens.spacingVerticalS, borderRight: `1px solid ${tokens.colorNeutralStroke3}` },
  muted: { color: tokens.colorNeutralForeground3 },
});

interface StoryGroup {
  storyId: number;
  storyTitle: string;
  rows: TranslationWorklistItem[];
}

/** Rows of one story sit together (the server sorts by title, then locale), so the story's cells span them. */
function byStory(items: readonly TranslationWorklistItem[]): StoryGroup[] {
  const groups: StoryGroup[] = [];
  for (const item of items) {
    const last = groups.at(-1);
    if (last?.storyId === item.storyId) last.rows.push(item);
    else groups.push({ storyId: item.storyId, storyTitle: item.storyTitle, rows: [item] });
  }
  return groups;
}

const sum = (rows: readonly TranslationWorklistItem[], field: 'total' | 'translated') => rows.reduce((total, row) => total + row[field], 0);

/** Stories × their target locales, each story's progress over the locales shown, each locale's on its own row. */
export function WorklistTable({ items, busy }: { items: TranslationWorklistItem[]; busy: boolean }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const languageName = useLanguageName({ standalone: true });
  return (
    <Table aria-label={t('translations.title')} aria-busy={busy} className={styles.table}>
      <TableHeader>
        <TableRow>
          <TableHeaderCell>{t('translations.columns.story')}</TableHeaderCell>
          <TableHeaderCell>{t('translations.columns.storyProgress')}</TableHeaderCell>
          <TableHeaderCell>{t('translations.columns.locale')}</TableHeaderCell>
          <TableHeaderCell>{t('translations.columns.progress')}</TableHeaderCell>
          <TableHeaderCell>{t('translations.columns.stale')}</TableHeaderCell>
          <TableHeaderCell>{t('translations.columns.actions')}</TableHeaderCell>
        </TableRow>
      </TableHeader>
      <TableBody>
        {byStory(items).flatMap((group) =>
          group.rows.map((row, index) => (
            <TableRow key={`${row.storyId}-${row.locale}`} data-worklist-story={row.storyId} data-worklist-locale={row.locale}>
              {index === 0 ? (
                <>
                  <TableCell rowSpan={group.rows.length} className={styles.story}>{group.storyTitle}</TableCell>
                  <TableCell rowSpan={group.rows.length} className={styles.storyCell}>
                    <ProgressMeter progress={{ total: sum(group.rows, 'total'), translated: sum(group.rows, 'translated') }} />
                  </TableCell>
                </>
              ) : null}
              <TableCell>
                <span>{languageName(row.locale)}</span> <span className={styles.muted}>({row.locale})</span>
              </TableCell>
              <TableCell><ProgressMeter progress={row} /></TableCell>
              <TableCell>
                {row.stale > 0 ? <Badge appearance="tint" color="warning">{t('translations.stale', { count: row.stale })}</Badge> : <span className={styles.muted}>{t('translations.noStale')}</span>}
              </TableCell>
              <TableCell>
                <LinkButton to={`/translations/${row.storyId}/${encodeURIComponent(row.locale)}`} size="small" aria-label={t('translations.openLabel', { story: row.storyTitle, language: languageName(row.locale) })}>
                  {t('translations.open')}
                </LinkButton>
              </TableCell>
            </TableRow>
          )),
        )}
      </TableBody>
    </Table>
  );
}
