import { useId, useRef, useState, type KeyboardEvent } from 'react';
import { makeStyles, SearchBox, Spinner, Text, tokens } from '@fluentui/react-components';
import { SEARCH_KINDS, SEARCH_TEXT_LENGTH, type SearchKind } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { Link, useNavigate } from 'react-router-dom';
import { canOpen } from '../app/areas';
import { usePersonHere } from '../app/current-venue';
import { useGlobalSearch } from '../api/search';
import { useDebounced } from './use-debounced';

const useStyles = makeStyles({
  root: { position: 'relative', width: 'min(22rem, 40vw)' },
  box: { width: '100%', maxWidth: 'none' },
  panel: {
    position: 'absolute',
    insetInlineStart: 0,
    insetInlineEnd: 0,
    top: 'calc(100% + 4px)',
    zIndex: 20,
    maxHeight: '70vh',
    overflowY: 'auto',
    padding: tokens.spacingVerticalS,
    backgroundColor: tokens.colorNeutralBackground1,
    color: tokens.colorNeutralForeground1,
    borderRadius: tokens.borderRadiusMedium,
    boxShadow: tokens.shadow16,
  },
  group: { margin: 0, padding: 0, listStyle: 'none' },
  heading: { display: 'block', padding: `${tokens.spacingVerticalXS} ${tokens.spacingHorizontalS}`, color: tokens.colorNeutralForeground3 },
  hit: {
    display: 'block',
    padding: `${tokens.spacingVerticalXS} ${tokens.spacingHorizontalS}`,
    borderRadius: tokens.borderRadiusMedium,
    color: tokens.colorNeutralForeground1,
    textDecoration: 'none',
    ':hover': { backgroundColor: tokens.colorNeutralBackground1Hover },
    ':focus-visible': { outline: `2px solid ${tokens.colorStrokeFocus2}`, backgroundColor: tokens.colorNeutralBackground1Hover },
  },
  detail: { display: 'block', color: tokens.colorNeutralForeground3 },
  note: { display: 'block', padding: tokens.spacingVerticalS },
});

/** Where each kind opens in the studio, and its list for every hit. */
const KIND_PLACES: Record<SearchKind, { area: 'stories' | 'media' | 'people'; item: (id: number, label: string) => string; list: (q: string) => string }> = {
  stories: { area: 'stories', item: (id) => `/stories/${id}`, list: (q) => `/stories?q=${encodeURIComponent(q)}` },
  media: { area: 'media', item: (id) => `/media/${id}`, list: (q) => `/media?q=${encodeURIComponent(q)}` },
  // People have no page of their own: the People list opens searched for the name.
  people: { area: 'people', item: (_id, label) => `/people?q=${encodeURIComponent(label)}`, list: (q) => `/people?q=${encodeURIComponent(q)}` },
};

/**
 * The header's search across stories, media and people: hits grouped by kind, only of kinds the
 * person works with (their areas). ↓ from the box enters the hits, ↑/↓ move between them, Escape
 * goes back to the box and closes them.
 */
export function GlobalSearch() {
  const { t } = useTranslation();
  const styles = useStyles();
  const navigate = useNavigate();
  const person = usePersonHere();
  const [text, setText] = useState('');
  const [open, setOpen] = useState(false);
  const q = useDebounced(text, 250).trim();
  const search = useGlobalSearch(q);
  const panelId = useId();
  const root = useRef<HTMLDivElement>(null);
  const input = useRef<HTMLInputElement>(null);

  const kinds = SEARCH_KINDS.filter((kind) => search.data?.[kind] && canOpen(person.roles, KIND_PLACES[kind].area));
  const anyHit = kinds.some((kind) => (search.data?.[kind]?.items.length ?? 0) > 0);
  const shown = open && text.trim().length > 0;

  const hits = () => [...(root.current?.querySelectorAll<HTMLAnchorElement>('[data-search-hit]') ?? [])];
  const move = (event: KeyboardEvent, step: 1 | -1) => {
    const all = hits();
    const at = all.indexOf(document.activeElement as HTMLAnchorElement);
    const next = at + step;
    event.preventDefault();
    if (next < 0) input.current?.focus();
    else all[Math.min(next, all.length - 1)]?.focus();
  };
  const onKeyDown = (event: KeyboardEvent) => {
    if (event.key === 'ArrowDown') move(event, 1);
    else if (event.key === 'ArrowUp') move(event, -1);
    else if (event.key === 'Escape' && shown) {
      event.preventDefault();
      setOpen(false);
      input.current?.focus();
    }
  };
  const close = () => { setOpen(false); setText(''); };

  return (
    <div
      ref={root}
      role="search"
      aria-label={t('search.label')}
      className={styles.root}
      onKeyDown={onKeyDown}
      onBlur={(event) => { if (!root.current?.contains(event.relatedTarget as Node | null)) setOpen(false); }}
    >
      <SearchBox
        ref={input}
        className={styles.box}
        value={text}
        placeholder={t('search.placeholder')}
        maxLength={SEARCH_TEXT_LENGTH.max}
        aria-label={t('search.label')}
        aria-controls={shown ? panelId : undefined}
        onFocus={() => setOpen(true)}
        onChange={(_event, data) => { setText(data.value); setOpen(true); }}
        onKeyDown={(event) => {
          if (event.key === 'Enter' && kinds[0]) void navigate(KIND_PLACES[kinds[0]].list(text.trim()));
        }}
      />
      {shown ? (
        <div id={panelId} className={styles.panel} data-search-results>
          {q.length < SEARCH_TEXT_LENGTH.min ? (
            <Text className={styles.note}>{t('search.tooShort', { min: SEARCH_TEXT_LENGTH.min })}</Text>
          ) : search.isPending || (search.isFetching && search.isPlaceholderData) ? (
            <Spinner size="tiny" label={t('common.loading')} />
          ) : search.isError ? (
            <Text className={styles.note}>{t('search.failed')}</Text>
          ) : !anyHit ? (
            <Text className={styles.note} role="status">{t('search.nothing', { q })}</Text>
          ) : (
            kinds.map((kind) => {
              const page = search.data![kind]!;
              if (page.items.length === 0) return null;
              const headingId = `${panelId}-${kind}`;
              return (
                <section key={kind} aria-labelledby={headingId} data-search-kind={kind}>
                  <Text id={headingId} as="h2" size={200} weight="semibold" className={styles.heading}>{t(`search.kinds.${kind}`)}</Text>
                  <ul className={styles.group}>
                    {page.items.map((hit) => (
                      <li key={hit.id}>
                        <Link to={KIND_PLACES[kind].item(hit.id, hit.label)} className={styles.hit} data-search-hit onClick={close}>
                          {hit.label}
                          {hit.detail ? <Text size={200} className={styles.detail}>{hit.detail}</Text> : null}
                        </Link>
                      </li>
                    ))}
                    {page.total > page.items.length ? (
                      <li>
                        <Link to={KIND_PLACES[kind].list(q)} className={styles.hit} data-search-hit onClick={close}>
                          {t('search.all', { kind: t(`search.kinds.${kind}`) })}
                        </Link>
                      </li>
                    ) : null}
                  </ul>
                </section>
              );
            })
          )}
        </div>
      ) : null}
    </div>
  );
}
