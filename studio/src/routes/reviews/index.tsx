import { Button, Field, makeStyles, SearchBox, tokens } from '@fluentui/react-components';
import { ClipboardTaskListLtrRegular } from '@fluentui/react-icons';
import { QUEUE_SORT } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useReviewQueue } from '../../api/reviews';
import { useStories } from '../../api/stories';
import { EmptyState } from '../../components/EmptyState';
import { ListStates } from '../../components/lists/ListStates';
import { Pager } from '../../components/lists/Pager';
import { useListSearch } from '../../components/lists/use-list-search';
import { PageHeader } from '../../components/PageHeader';
import { readQueueParams } from './list-params';
import { ReviewQueueTable } from './ReviewQueueTable';
import { SubmittedStories } from './SubmittedStories';

const useStyles = makeStyles({
  toolbar: { marginBottom: tokens.spacingVerticalL },
  search: { maxWidth: '24rem' },
});

/** The smallest page of the story list, read for its `can` only. */
const LIST_CAN_ONLY = { page: 1, pageSize: 1 } as const;

/**
 * Reviewers get the queue of revisions waiting for a verdict; everyone else follows their stories
 * through review. Who reviews at the current venue is the server's answer (the story list's `can.review`).
 */
export function ReviewsPage() {
  const { t } = useTranslation();
  const stories = useStories(LIST_CAN_ONLY);
  if (stories.data?.can.review) return <ReviewQueue />;
  if (stories.isPending) return <PageHeader title={t('reviews.title')} />;
  return (
    <>
      <PageHeader title={t('reviews.title')} intro={t('reviews.introCurator')} />
      <SubmittedStories />
    </>
  );
}

function ReviewQueue() {
  const { t } = useTranslation();
  const styles = useStyles();
  const { search, query, setQuery, change, clear } = useListSearch();
  const params = readQueueParams(search);
  const queue = useReviewQueue(params);

  return (
    <>
      <PageHeader title={t('reviews.title')} intro={t('reviews.intro')} />
      <div className={styles.toolbar} role="search">
        <Field label={t('reviews.search')} className={styles.search}>
          <SearchBox value={query} onChange={(_event, data) => setQuery(data.value)} />
        </Field>
      </div>
      <ListStates
        query={queue}
        loadError={t('reviews.loadError')}
        empty={
          params.q ? (
            <EmptyState
              icon={<ClipboardTaskListLtrRegular />}
              title={t('reviews.noMatchTitle')}
              actions={<Button onClick={clear}>{t('lists.clearFilters')}</Button>}
            >
              {t('reviews.noMatchBody')}
            </EmptyState>
          ) : (
            <EmptyState icon={<ClipboardTaskListLtrRegular />} title={t('reviews.emptyTitle')}>
              {t('reviews.emptyBody')}
            </EmptyState>
          )
        }
      >
        {(page) => (
          <>
            <ReviewQueueTable items={page.items} sort={params.sort ?? QUEUE_SORT.fallback} onSort={(sort) => change({ sort })} busy={queue.isFetching} />
            <Pager page={page} label={t('reviews.pagination')} onPage={(next) => change({ page: String(next) })} />
          </>
        )}
      </ListStates>
    </>
  );
}
