import type { Page } from '../auth/views.js';
import type { CommentCan, RevisionCan } from '../auth/can.js';
import type { StoryState } from '../authoring/views.js';
import type { PanelDocJSON } from '../panel/panel-json.js';
import type { PreflightEntry } from '../preflight/types.js';
import type { PanelDiff } from './panel-diff.js';

/** The views of issue 5 (review) as the API sends them; studio and server both code against these. */

export interface PersonRef {
  id: number;
  name: string;
}

/**
 * A revision is open while it waits for verdicts; a newer submission supersedes it, and its
 * curator may withdraw it before any verdict. Approved and changes_requested are the verdicts
 * that closed it.
 */
export const REVISION_STATES = ['open', 'approved', 'changes_requested', 'superseded', 'withdrawn'] as const;
export type RevisionState = (typeof REVISION_STATES)[number];

export const VERDICTS = ['approve', 'request_changes'] as const;
export type Verdict = (typeof VERDICTS)[number];

/** POST /api/stories/:id/submit answers this. */
export interface SubmitResult {
  revisionId: number;
  number: number;
  /** The story's state after the submission. */
  state: StoryState;
  preflight: PreflightEntry[];
}

export interface RevisionSummary {
  id: number;
  /** 1, 2, … per story. */
  number: number;
  /** SHA-256 of the snapshot's canonical JSON. */
  hash: string;
  state: RevisionState;
  /** @format date-time */
  submittedAt: string;
  submittedBy: PersonRef | null;
  /** Approvals recorded on this revision. */
  approvals: number;
  /** Preflight blockers that failed. */
  blockers: number;
}

/** One frozen panel of a revision. */
export interface RevisionPanelView {
  panelId: number;
  position: number;
  /** Tiptap JSON per BCP 47 locale, as submitted. */
  docs: { [locale: string]: PanelDocJSON };
  wordBudget: number;
}

export interface ReviewView {
  id: number;
  verdict: Verdict;
  note: string | null;
  reviewer: PersonRef | null;
  /** @format date-time */
  createdAt: string;
}

/** Where a comment points inside its panel's source-locale text. */
export interface CommentRange {
  from: number;
  to: number;
  /** The text selected when the comment was written, so the anchor survives edits. */
  quote: string;
}

export interface CommentView {
  id: number;
  revisionId: number;
  /** Null for a comment on the story as a whole. */
  panelId: number | null;
  range: CommentRange | null;
  body: string;
  author: PersonRef | null;
  parentId: number | null;
  /** @format date-time */
  resolvedAt: string | null;
  resolvedBy: PersonRef | null;
  /** @format date-time */
  createdAt: string;
  /** Set on an unresolved comment copied forward from an earlier revision of the story. */
  carriedFromRevisionId: number | null;
  /**
   * On a carried comment with a range: whether the words it was anchored to are no longer in this
   * revision's panel (edited or deleted). Null when the comment has no range or was not carried.
   */
  anchorChanged: boolean | null;
  can: CommentCan;
}

export interface RevisionView {
  id: number;
  storyId: number;
  storyTitle: string;
  number: number;
  hash: string;
  state: RevisionState;
  /** @format date-time */
  submittedAt: string;
  submittedBy: PersonRef | null;
  /** What the curator told the educators when submitting. */
  note: string | null;
  snapshot: RevisionPanelView[];
  preflight: PreflightEntry[];
  reviews: ReviewView[];
  comments: CommentView[];
  /** The story's last approved revision before this one, the base of /compare. */
  previousApprovedRevisionId: number | null;
  can: RevisionCan;
}

/**
 * What a revision is compared with: the story's last approved revision before it; while none is
 * approved, the last one sent back with changes requested, so the educator sees what the curator
 * changed in answer; none at all on a story's first review.
 */
export type ComparisonBasis = 'approved' | 'changes_requested' | 'first_review';

/** GET /api/revisions/:id/compare. */
export interface RevisionComparison {
  basis: ComparisonBasis;
  base: RevisionView | null;
  diff: PanelDiff[];
}

/** POST /api/stories/:id/submit takes this. */
export interface SubmitRequest {
  /** To the educators, kept with the revision. */
  note?: string;
}

export interface ReviewQueueItem {
  revisionId: number;
  storyId: number;
  storyTitle: string;
  number: number;
  /** @format date-time */
  submittedAt: string;
  submittedBy: PersonRef | null;
  blockers: number;
  warnings: number;
  approvals: number;
  requiredApprovals: number;
}

/** POST /api/revisions/:id/reviews answers this. */
export interface VerdictResult {
  review: ReviewView;
  storyState: StoryState;
}

export const NOTIFICATION_KINDS = ['revision_submitted', 'verdict', 'comment_reply'] as const;
export type NotificationKind = (typeof NOTIFICATION_KINDS)[number];

export interface NotificationView {
  id: number;
  kind: NotificationKind;
  title: string;
  body: string;
  /** A studio path, e.g. /reviews/12. */
  link: string;
  /** @format date-time */
  readAt: string | null;
  /** @format date-time */
  createdAt: string;
}

/** GET /api/notifications: a page, and how many of the person's notifications are unread in all. */
export type NotificationPage = Page<NotificationView> & { unread: number };

/** Which kinds also come by e-mail; a kind left out is mailed. */
export type NotificationPreferences = Record<NotificationKind, { email: boolean }>;

/** One line of the audit trail. */
export interface AuditEventView {
  id: number;
  at: string;
  actor: PersonRef | null;
  action: string;
  target: { type: string; id: string } | null;
  /** The venue the event is about; null for an organisation-wide one (a sign-in, an account). */
  venueId: number | null;
  details: Record<string, unknown> | null;
}
