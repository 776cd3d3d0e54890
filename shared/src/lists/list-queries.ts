/**
 * What the server's paged lists take in their query and the studio asks for: how many rows a page
 * holds, and the keys each list sorts by. The server's DTOs and the studio's lists both read these,
 * so a sort the server offers is one the studio can ask for.
 */

/** Rows in one page of a paged list: when the query names no size, and the most one page holds. */
export const PAGE_SIZE = { fallback: 25, max: 100 } as const;

/**
 * Rows in one page of a list whose rows are short and read in a run (the audit trail, the Fleet,
 * a story's translation units): twice the default, so a reader scans further before turning a page,
 * and still within what one page may hold.
 */
export const LONG_PAGE_SIZE = 50;

/** `?sort=` of a list: a key ascending (`name`) or descending (`-name`). */
export type SortValue<K extends string> = K | `-${K}`;

/** A list's sort keys, every value they allow and the one it sorts by when none is asked for. */
export interface ListSort<K extends string> {
  keys: readonly K[];
  values: readonly SortValue<K>[];
  fallback: SortValue<K>;
}

const listSort = <const K extends string>(keys: readonly K[], fallback: SortValue<K>): ListSort<K> => ({
  keys,
  values: keys.flatMap((key) => [key, `-${key}` as const]),
  fallback,
});

export const STORY_SORT = listSort(['title', 'updatedAt', 'createdAt', 'state'], '-updatedAt');
export type StorySort = (typeof STORY_SORT.values)[number];

export const MEDIA_SORT = listSort(['createdAt', 'filename', 'bytes', 'licenceExpiresOn'], '-createdAt');
export type MediaSort = (typeof MEDIA_SORT.values)[number];

/** The review queue: the oldest submission first by default, as a queue. */
export const QUEUE_SORT = listSort(['submittedAt', 'storyTitle', 'blockers'], 'submittedAt');
export type QueueSort = (typeof QUEUE_SORT.values)[number];

export const USER_SORT = listSort(['name', 'email', 'createdAt', 'lastSignInAt'], 'name');
export type UserSort = (typeof USER_SORT.values)[number];

/** Venues, galleries, stations and exhibits. */
export const SETTINGS_SORT = listSort(['name', 'createdAt'], 'name');
export type SettingsSort = (typeof SETTINGS_SORT.values)[number];
