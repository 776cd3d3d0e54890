import { useEffect, useRef, useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { useDebounced } from '../../routes/people/use-debounced';
import { withSearchChanges } from './list-search';

/** How long typing pauses before a search goes to the server. */
const SEARCH_PAUSE_MS = 300;

/**
 * A list's free-text filter: what the box shows as it is typed, written to the URL parameter
 * `key` once typing pauses, so a server-paged table asks once per pause and the view stays shareable.
 */
export function useUrlSearchText(key: string): [text: string, setText: (text: string) => void] {
  const [search, setSearch] = useSearchParams();
  const inUrl = search.get(key) ?? '';
  const [text, setText] = useState(inUrl);
  const settled = useDebounced(text.trim(), SEARCH_PAUSE_MS);
  const urlValue = useRef(inUrl);
  urlValue.current = inUrl;
  useEffect(() => {
    if (settled !== urlValue.current) setSearch((current) => withSearchChanges(current, { [key]: settled }), { replace: true });
  }, [settled, key, setSearch]);
  return [text, setText];
}
