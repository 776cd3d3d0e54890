import type { Page } from '../auth/views.js';

/** The kinds global search looks through, in the order the studio shows them. */
export const SEARCH_KINDS = ['stories', 'media', 'people'] as const;
export type SearchKind = (typeof SEARCH_KINDS)[number];

/** Bounds of a search: what is typed, trimmed, and how many hits of each kind one page holds. */
export const SEARCH_TEXT_LENGTH = { min: 2, max: 100 } as const;
export const SEARCH_PAGE_SIZE = { fallback: 5, max: 20 } as const;

/** One thing found: what to call it, a line under it, and its id for the studio's link. */
export interface SearchHit {
  id: number;
  label: string;
  detail: string | null;
}

/**
 * GET /api/search: a page of hits per kind the caller may open, each of their venues only; a kind
 * left out is one they may not search (people, for all but admins).
 */
export type SearchView = Partial<Record<SearchKind, Page<SearchHit>>>;
