/**
 * What the signed-in person may do to an object, action by action, as the server decides it and
 * sends it with every view (`can`). The studio offers an action only when its `can` says true, so
 * it never re-derives a rule of its own; the server's policies fill these from the same functions
 * its guards and services apply.
 */
export const CAN_ACTIONS = {
  /** A story: its panels and details, and its moves through review. */
  story: ['edit', 'delete', 'submit', 'withdraw', 'revise', 'retire'],
  /** The Stories list as a whole; `review` says the caller reviews submissions (the review queue is theirs). */
  stories: ['create', 'review'],
  revision: ['approve', 'requestChanges', 'comment'],
  comment: ['reply', 'resolve'],
  media: ['edit', 'delete'],
  /** The media library as a whole. */
  mediaLibrary: ['upload'],
  release: ['publish'],
  /** A gallery's releases as a whole. */
  releases: ['build'],
  station: ['pair', 'edit'],
  kiosk: ['revoke'],
  /** One story in one target locale: translating its units, by hand or by an XLIFF file, and downloading that file. */
  translation: ['translate', 'import', 'export'],
  /** The translation worklist as a whole: whether the caller translates into any of its locales. */
  translations: ['translate'],
} as const;

export type CanKind = keyof typeof CAN_ACTIONS;
export type Can<K extends CanKind> = Record<(typeof CAN_ACTIONS)[K][number], boolean>;

export type StoryCan = Can<'story'>;
export type RevisionCan = Can<'revision'>;
export type CommentCan = Can<'comment'>;
export type MediaCan = Can<'media'>;
export type ReleaseCan = Can<'release'>;
export type StationCan = Can<'station'>;
export type KioskCan = Can<'kiosk'>;
export type TranslationCan = Can<'translation'>;
