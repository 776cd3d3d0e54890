import type {
  ApiErrorBody, AuditEventView, CommentView, EventsResponse, ExhibitView, FleetKioskDetail, FleetKioskView, FleetPage, GalleryView, InsightsView,
  KioskCredential, KioskManifestResponse, LicenceIdsView, ManifestResponse, MediaPage, MediaView, MyWorkView, NotificationPage,
  NotificationPreferences, Page, PairCompleteWaiting, PairStartResponse, PanelView, PreflightEntry, ReleaseComparison, ReleasePage,
  ReleasePreview, ReleaseView, RenditionStatus, ReviewQueueItem, RevisionComparison, RevisionSummary, RevisionView, Role, SearchView,
  SessionView, StationView, StoryDetailView, StoryPage, StoryTranslationsView, StoryView, SubmitResult, SavedTranslationUnit,
  TranslationPreviewView, TranslationUnitPage, TranslationWorklistPage, UserView, VenueView, VerdictResult, WidgetDescriptor,
  XliffImportResult,
} from '@mantlepiece/shared';
import type { CapturedMail, CapturedMailSummary } from '../dev-mail/dev-mail.service.js';
import type { Health } from '../health/health.service.js';
import type { WidgetCheckView } from '../widgets/widgets.service.js';

/*
 * The bodies the API answers with, each by the name its schema carries in the OpenAPI document.
 * `npm run api:types` turns these types into JSON Schema (response-schemas.json); `@ApiAnswer`
 * attaches one to a route and the compiler checks that the route's method returns that type.
 */

/** An invitation as its admin sees it. */
export interface InvitationView {
  id: number;
  email: string;
  name: string;
  venueId: number | null;
  roles: Role[];
  locales: string[];
  /** @format date-time */
  expiresAt: string;
}

/** What the invitation page shows to the person who opened the link. */
export type InvitationPreview = Omit<InvitationView, 'id' | 'venueId'>;

/** The venue a kiosk shows before and after pairing: its name and languages. */
export interface KioskVenueView {
  name: string;
  locales: string[];
}

export interface PairedStationView {
  kioskId: number;
}

export interface SavedPanelVersion {
  version: number;
}

export interface ReleaseRequested {
  id: number;
  state: 'building';
}

export interface SigningKeyView {
  venueId: number;
  algorithm: string;
  /** Ed25519, base64 SPKI DER. */
  publicKey: string;
}

export interface WidgetTypeList {
  items: WidgetDescriptor[];
}

export interface ApiAnswerBodies {
  /** Not an answer of its own: the body of every 4xx and 5xx. */
  ApiErrorBody: ApiErrorBody;
  AuditEventPage: Page<AuditEventView>;
  CapturedMail: CapturedMail;
  CapturedMailPage: Page<CapturedMailSummary>;
  CommentView: CommentView;
  EventsResponse: EventsResponse;
  ExhibitPage: Page<ExhibitView>;
  ExhibitView: ExhibitView;
  FleetKioskDetail: FleetKioskDetail;
  FleetKioskView: FleetKioskView;
  FleetPage: FleetPage;
  GalleryPage: Page<GalleryView>;
  GalleryView: GalleryView;
  Health: Health;
  InsightsView: InsightsView;
  InvitationPreview: InvitationPreview;
  InvitationView: InvitationView;
  KioskCredential: KioskCredential;
  KioskManifestResponse: KioskManifestResponse;
  KioskVenueView: KioskVenueView;
  LicenceIdsView: LicenceIdsView;
  ManifestResponse: ManifestResponse;
  MediaList: MediaView[];
  MediaPage: MediaPage;
  MediaView: MediaView;
  MyWorkView: MyWorkView;
  NotificationPage: NotificationPage;
  NotificationPreferences: NotificationPreferences;
  PairCompleteWaiting: PairCompleteWaiting;
  PairedStationView: PairedStationView;
  PairStartResponse: PairStartResponse;
  PanelList: PanelView[];
  PanelView: PanelView;
  PreflightEntryList: PreflightEntry[];
  ReleaseComparison: ReleaseComparison;
  ReleasePage: ReleasePage;
  ReleasePreview: ReleasePreview;
  ReleaseRequested: ReleaseRequested;
  ReleaseView: ReleaseView;
  RenditionStatus: RenditionStatus;
  ReviewQueuePage: Page<ReviewQueueItem>;
  RevisionComparison: RevisionComparison;
  RevisionSummaryList: RevisionSummary[];
  RevisionView: RevisionView;
  SavedPanelVersion: SavedPanelVersion;
  SavedTranslationUnit: SavedTranslationUnit;
  SearchView: SearchView;
  SessionView: SessionView;
  SigningKeyView: SigningKeyView;
  StationPage: Page<StationView>;
  StationView: StationView;
  StoryDetailView: StoryDetailView;
  StoryPage: StoryPage;
  StoryTranslationsView: StoryTranslationsView;
  StoryView: StoryView;
  SubmitResult: SubmitResult;
  TranslationPreviewView: TranslationPreviewView;
  TranslationUnitPage: TranslationUnitPage;
  TranslationWorklistPage: TranslationWorklistPage;
  UserPage: Page<UserView>;
  UserView: UserView;
  VenuePage: Page<VenueView>;
  VenueView: VenueView;
  VerdictResult: VerdictResult;
  WidgetCheckView: WidgetCheckView;
  WidgetTypeList: WidgetTypeList;
  XliffImportResult: XliffImportResult;
}

export type ApiAnswerName = keyof ApiAnswerBodies;
