import { useEffect, useLayoutEffect, useRef, useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { useDebounced } from '../use-debounced';
import { withSearchChanges } from './list-search';

/** How long typing pauses before a search goes to the server. */
const SEARCH_PAUSE_MS = 300;

/**
 * A paged list's URL state with its free-text box (URL parameter `textKey`): filters change the
 * URL at once, the text only once typing pauses, so the server sees one query per pause rather
 * than one per key, and the view stays shareable.
 */
export function useListSearch(textKey = 'q') {
  const [search, setSearch] = useSearchParams();
  const inUrl = search.get(textKey) ?? '';
  const [query, setQuery] = useState(inUrl);
  const settledQuery = useDebounced(query.trim(), SEARCH_PAUSE_MS);
  const urlQuery = useRef(inUrl);
  useLayoutEffect(() => {
    urlQuery.current = inUrl;
  });

  useEffect(() => {
    if (settledQuery !== urlQuery.current) setSearch((current) => withSearchChanges(current, { [textKey]: settledQuery }), { replace: true });
  }, [settledQuery, textKey, setSearch]);

  return {
    search,
    query,
    setQuery,
    change: (changes: Record<string, string | undefined>) => setSearch((current) => withSearchChanges(current, changes), { replace: true }),
    clear: () => {
      setQuery('');
      setSearch(new URLSearchParams(), { replace: true });
    },
  };
}
