import type { Role } from '../auth/roles.js';

/**
 * GET /api/me/work: what is waiting for the signed-in person, one part per role they hold. Each
 * item carries `link`, the studio path where the work is done.
 */
export interface MyWorkView {
  curator?: { drafts: WorkList<StoryWorkItem>; changesRequested: WorkList<StoryWorkItem>; openComments: WorkList<CommentWorkItem> };
  educator?: { reviewQueue: WorkList<ReviewWorkItem> };
  translator?: { translations: WorkList<TranslationWorkItem> };
  technician?: { kiosks: WorkList<KioskWorkItem>; releases: WorkList<ReleaseWorkItem> };
  admin?: { invitations: WorkList<InvitationWorkItem>; licences: WorkList<LicenceWorkItem> };
}

/** The first items of a list, most pressing first, and how many there are in all. */
export interface WorkList<T> {
  items: T[];
  total: number;
}

/** How many items of each list the home page is given; the rest are one link away. */
export const MY_WORK_LIST_LENGTH = 10;

interface WorkItem {
  link: string;
}

export interface StoryWorkItem extends WorkItem {
  storyId: number;
  title: string;
  /** @format date-time */
  updatedAt: string;
}

export interface CommentWorkItem extends WorkItem {
  storyId: number;
  title: string;
  revisionId: number;
  openComments: number;
  /** When the newest of them was written. @format date-time */
  latestAt: string;
}

export interface ReviewWorkItem extends WorkItem {
  revisionId: number;
  storyId: number;
  title: string;
  revisionNumber: number;
  /** @format date-time */
  submittedAt: string;
  submittedBy: string | null;
  /** Seconds since it was submitted, at the server's now. */
  waitingS: number;
}

export interface TranslationWorkItem extends WorkItem {
  storyId: number;
  title: string;
  locale: string;
  untranslated: number;
  stale: number;
}

export interface KioskWorkItem extends WorkItem {
  kioskId: number;
  station: string;
  gallery: string;
  state: 'stale' | 'offline';
  /** @format date-time */
  lastHeartbeatAt: string | null;
  demo: boolean;
}

export interface ReleaseWorkItem extends WorkItem {
  releaseId: number;
  number: number;
  gallery: string;
  state: 'ready' | 'failed';
  /** When it became Ready, or when its build was asked for. */
  at: string;
  failure: string | null;
}

export interface InvitationWorkItem extends WorkItem {
  invitationId: number;
  email: string;
  name: string;
  roles: Role[];
  /** @format date-time */
  expiresAt: string;
}

export interface LicenceWorkItem extends WorkItem {
  mediaId: number;
  filename: string;
  /** YYYY-MM-DD; in the past once it has ended. @format date */
  expiresOn: string;
  daysLeft: number;
}
