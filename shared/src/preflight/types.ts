import type { MediaLicence } from '../authoring/views.js';
import type { RevisionSnapshot } from '../review/revision-snapshot.js';

export type PreflightSeverity = 'blocker' | 'warning';

/** A media asset's rights and alt text as preflight reads them; a MediaView fits as it is. */
export interface PreflightMedia {
  /** Panel images refer to the asset by `String(id)`. */
  id: number | string;
  filename?: string;
  credit: string | null;
  licence: MediaLicence | null;
  /** YYYY-MM-DD, the last day the licence covers. @format date */
  licenceExpiresOn: string | null;
  /** Alt text per BCP 47 locale. */
  alt: Readonly<Record<string, string>>;
}

/** Everything the checks read. Dates are given, never read from a clock, so a run can be repeated. */
export interface PreflightContext {
  /** The revision under check; its story carries the audience and source locale. */
  snapshot: RevisionSnapshot;
  /** The assets the snapshot refers to (others are ignored). */
  media: readonly PreflightMedia[];
  /** YYYY-MM-DD, or null when the story is in no exhibit or the exhibit has no planned end. */
  exhibitPlannedEnd: string | null;
  /** YYYY-MM-DD in the venue's time zone. */
  today: string;
}

/** What one rule found: a problem, or a note of what passed so the page can show what was checked. */
export interface PreflightFinding {
  passed: boolean;
  message: string;
  panelId?: number;
}

export interface PreflightRule {
  id: string;
  severity: PreflightSeverity;
  run(context: PreflightContext): PreflightFinding[];
}

/** One line of a revision's preflight, as stored with it and sent in the API. */
export interface PreflightEntry {
  check: string;
  severity: PreflightSeverity;
  passed: boolean;
  message: string;
  panelId?: number;
}
