import { useEffect, useRef, useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { useDebounced } from '../../routes/people/use-debounced';
import { withSearchChanges } from './list-search';

/**
 * A paged list's URL state with its search box: filters change the URL at once, the search term
 * only once typing pauses, so the server sees one query per pause rather than one per key.
 */
export function useListSearch() {
  const [search, setSearch] = useSearchParams();
  const [query, setQuery] = useState(search.get('q') ?? '');
  const settledQuery = useDebounced(query.trim(), 300);
  const urlQuery = useRef(search.get('q') ?? '');
  urlQuery.current = search.get('q') ?? '';

  useEffect(() => {
    if (settledQuery !== urlQuery.current) setSearch((current) => withSearchChanges(current, { q: settledQuery }), { replace: true });
  }, [settledQuery, setSearch]);

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
