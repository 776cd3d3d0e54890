import type { ReactNode } from 'react';
import type { Page, StorySort, StoryView } from '@mantlepiece/shared';
import type { UseQueryResult } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { ListStates } from '../../components/lists/ListStates';
import { Pager } from '../../components/lists/Pager';
import { StoriesTable } from './StoriesTable';

/** A server-paged list of stories (the Stories page, a curator's submissions): its states, the table and the pager. */
export function StoryList({ stories, sort, empty, onChange }: {
  stories: UseQueryResult<Page<StoryView>>;
  sort: StorySort;
  empty: ReactNode;
  onChange: (changes: { sort?: string; page?: string }) => void;
}) {
  const { t } = useTranslation();
  return (
    <ListStates query={stories} loadError={t('stories.loadError')} empty={empty}>
      {(page) => (
        <>
          <StoriesTable stories={page.items} sort={sort} onSort={(next) => onChange({ sort: next })} busy={stories.isFetching} />
          <Pager page={page} label={t('stories.pagination')} onPage={(next) => onChange({ page: String(next) })} />
        </>
      )}
    </ListStates>
  );
}
