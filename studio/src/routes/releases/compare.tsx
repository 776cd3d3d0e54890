import { Badge, makeStyles, Spinner, Table, TableBody, TableCell, TableHeader, TableHeaderCell, TableRow, Text, tokens } from '@fluentui/react-components';
import type { ReleaseComparison, ReleaseStoryView } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useSearchParams } from 'react-router-dom';
import { useRelease, useReleaseComparison } from '../../api/releases';
import { EmptyState } from '../../components/EmptyState';
import { describeError } from '../../components/forms/describe-error';
import { LinkButton } from '../../components/links';
import { positiveId } from '../../components/lists/list-search';
import { PageHeader } from '../../components/PageHeader';

const useStyles = makeStyles({
  table: { backgroundColor: tokens.colorNeutralBackground1, border: `1px solid ${tokens.colorNeutralStroke2}`, borderRadius: tokens.borderRadiusLarge, marginBottom: tokens.spacingVerticalL },
  summary: { display: 'flex', gap: tokens.spacingHorizontalS, flexWrap: 'wrap', marginBottom: tokens.spacingVerticalL },
  muted: { color: tokens.colorNeutralForeground3 },
});

type Change = 'added' | 'removed' | 'changed' | 'unchanged';

const COLOURS = { added: 'success', removed: 'danger', changed: 'warning', unchanged: 'informative' } as const;

interface Row {
  storyId: number;
  title: string;
  change: Change;
  from: ReleaseStoryView | null;
  to: ReleaseStoryView | null;
}

/** One row per story of either release, the changes first. */
const rowsOf = (comparison: ReleaseComparison): Row[] => [
  ...comparison.added.map((story) => ({ storyId: story.storyId, title: story.title, change: 'added' as const, from: null, to: story })),
  ...comparison.removed.map((story) => ({ storyId: story.storyId, title: story.title, change: 'removed' as const, from: story, to: null })),
  ...comparison.changed.map((story) => ({ storyId: story.storyId, title: story.title, change: 'changed' as const, from: story.from, to: story.to })),
  ...comparison.unchanged.map((story) => ({ storyId: story.storyId, title: story.title, change: 'unchanged' as const, from: story, to: story })),
];

/** Stories and revisions added, removed and changed from release `a` to release `b`. */
export function ReleaseComparePage() {
  const { t } = useTranslation();
  const styles = useStyles();
  const [search] = useSearchParams();
  const a = positiveId(search.get('a'));
  const b = positiveId(search.get('b'));
  const comparison = useReleaseComparison(a, b);
  const before = useRelease(a);
  const back = <LinkButton to={before.data ? `/releases?gallery=${before.data.galleryId}` : '/releases'}>{t('releases.compare.back')}</LinkButton>;

  if (!a || !b || a === b) {
    return (
      <>
        <PageHeader title={t('releases.compare.title')} />
        <EmptyState title={t('releases.compare.pickTitle')} actions={back}>{t('releases.compare.pickBody')}</EmptyState>
      </>
    );
  }
  if (comparison.isPending) return <Spinner label={t('common.loading')} />;
  if (comparison.isError) {
    return (
      <>
        <PageHeader title={t('releases.compare.title')} />
        <EmptyState title={t('releases.compare.loadError')} actions={back}>{describeError(t, comparison.error)}</EmptyState>
      </>
    );
  }
  const data = comparison.data;
  const revision = (story: ReleaseStoryView | null) => (story ? t('revision.number', { number: story.revisionNumber }) : '—');
  const from = t('releases.name', { number: data.a.number });
  const to = t('releases.name', { number: data.b.number });
  return (
    <>
      <PageHeader title={t('releases.compare.heading', { from, to })} intro={t('releases.compare.intro')} actions={back} />
      <div className={styles.summary} aria-label={t('releases.compare.summary')}>
        {(['added', 'removed', 'changed', 'unchanged'] as const).map((change) => (
          <Badge key={change} appearance="tint" color={COLOURS[change]}>{t(`releases.compare.counts.${change}`, { count: data[change].length })}</Badge>
        ))}
      </div>
      <Table aria-label={t('releases.compare.heading', { from, to })} className={styles.table}>
        <TableHeader>
          <TableRow>
            <TableHeaderCell>{t('releases.compare.story')}</TableHeaderCell>
            <TableHeaderCell>{t('releases.compare.change')}</TableHeaderCell>
            <TableHeaderCell>{from}</TableHeaderCell>
            <TableHeaderCell>{to}</TableHeaderCell>
          </TableRow>
        </TableHeader>
        <TableBody>
          {rowsOf(data).map((row) => (
            <TableRow key={row.storyId} data-change={row.change}>
              <TableCell>{row.title}</TableCell>
              <TableCell><Badge appearance={row.change === 'unchanged' ? 'tint' : 'filled'} color={COLOURS[row.change]}>{t(`releases.compare.status.${row.change}`)}</Badge></TableCell>
              <TableCell>{revision(row.from)}</TableCell>
              <TableCell>{revision(row.to)}</TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
      {rowsOf(data).length === 0 ? <Text className={styles.muted}>{t('releases.compare.empty')}</Text> : null}
    </>
  );
}
