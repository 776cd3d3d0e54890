import { AUDIENCES, PAGE_SIZE, STORY_SORT, STORY_STATES } from '@mantlepiece/shared';
import type { StoryListParams } from '../../api/stories';
import { oneOf, pageFrom, positiveId, sortFrom } from '../../components/lists/list-search';

export function readStoryListParams(search: URLSearchParams): StoryListParams {
  return {
    page: pageFrom(search),
    pageSize: PAGE_SIZE.fallback,
    q: search.get('q')?.trim() || undefined,
    state: oneOf(search.get('state'), STORY_STATES),
    exhibitId: positiveId(search.get('exhibitId')),
    audience: oneOf(search.get('audience'), AUDIENCES),
    sort: sortFrom(search, STORY_SORT),
  };
}
