import { lazy, type ReactNode } from 'react';
import { createBrowserRouter, Outlet, useParams } from 'react-router-dom';
import { AppShell } from '../components/AppShell';
import { AuthLayout } from '../components/AuthLayout';
import { RequireSession } from '../components/RequireSession';
import { AreaLaterPage, RequireArea } from '../routes/area';
import { HomePage } from '../routes/home';
import { NotFoundPage } from '../routes/not-found';
import { SignInPage } from '../routes/sign-in';
import { BUILT_AREAS, isArea, type Area } from './areas';

// Pages most people never open load on demand, keeping the first download small.
const named = <K extends string>(load: () => Promise<Record<K, () => ReactNode>>, name: K) =>
  lazy(() => load().then((module) => ({ default: module[name] })));
const InvitationPage = named(() => import('../routes/invitation'), 'InvitationPage');
const RequestPasswordResetPage = named(() => import('../routes/reset-password'), 'RequestPasswordResetPage');
const CompletePasswordResetPage = named(() => import('../routes/reset-password/token'), 'CompletePasswordResetPage');
const PeoplePage = named(() => import('../routes/people'), 'PeoplePage');
const CapturedMailPage = named(() => import('../routes/dev/mail'), 'CapturedMailPage');
const WidgetWorkbenchPage = named(() => import('../routes/widgets'), 'WidgetWorkbenchPage');
const StoriesPage = named(() => import('../routes/stories'), 'StoriesPage');
const StoryPage = named(() => import('../routes/stories/story'), 'StoryPage');
const MediaPage = named(() => import('../routes/media'), 'MediaPage');
const MediaAssetPage = named(() => import('../routes/media/asset'), 'MediaAssetPage');
const SettingsPage = named(() => import('../routes/settings'), 'SettingsPage');
const ReviewsPage = named(() => import('../routes/reviews'), 'ReviewsPage');
const RevisionPage = named(() => import('../routes/reviews/revision'), 'RevisionPage');
const NotificationsPage = named(() => import('../routes/notifications'), 'NotificationsPage');
const AuditPage = named(() => import('../routes/audit'), 'AuditPage');
const FleetPage = named(() => import('../routes/fleet'), 'FleetPage');
const FleetKioskPage = named(() => import('../routes/fleet/kiosk'), 'FleetKioskPage');
// Its own chunk, so the charting library is fetched only by those who open Insights.
const InsightsPage = named(() => import('../routes/insights'), 'InsightsPage');
const TranslationsPage = named(() => import('../routes/translations'), 'TranslationsPage');
const TranslationWorkspacePage = named(() => import('../routes/translations/workspace'), 'TranslationWorkspacePage');
const ReleasesPage = named(() => import('../routes/releases'), 'ReleasesPage');
const ReleaseComparePage = named(() => import('../routes/releases/compare'), 'ReleaseComparePage');
const StationsPage = named(() => import('../routes/stations'), 'StationsPage');
const StationPage = named(() => import('../routes/stations/station'), 'StationPage');

/** The pages of one area, behind that area's role check. */
const inArea = (area: Area, element: ReactNode) => <RequireArea area={area}>{element}</RequireArea>;

/** `/:area` for the areas that are planned but not built yet. */
function PlannedArea() {
  const { area } = useParams();
  if (!isArea(area) || BUILT_AREAS.has(area)) return <NotFoundPage />;
  return (
    <RequireArea area={area}>
      <AreaLaterPage area={area} />
    </RequireArea>
  );
}

function AdminOnly() {
  return (
    <RequireArea area="people">
      <Outlet />
    </RequireArea>
  );
}

export const router = createBrowserRouter([
  {
    element: <AuthLayout />,
    children: [
      { path: '/sign-in', element: <SignInPage /> },
      { path: '/invitation/:token', element: <InvitationPage /> },
      { path: '/reset-password', element: <RequestPasswordResetPage /> },
      { path: '/reset-password/:token', element: <CompletePasswordResetPage /> },
    ],
  },
  {
    element: (
      <RequireSession>
        <AppShell />
      </RequireSession>
    ),
    children: [
      { index: true, element: <HomePage /> },
      {
        element: <AdminOnly />,
        children: [
          { path: '/people', element: <PeoplePage /> },
          { path: '/dev/mail', element: <CapturedMailPage /> },
          { path: '/audit', element: <AuditPage /> },
        ],
      },
      { path: '/widgets', element: <WidgetWorkbenchPage /> },
      { path: '/stories', element: inArea('stories', <StoriesPage />) },
      { path: '/stories/:id', element: inArea('stories', <StoryPage />) },
      { path: '/media', element: inArea('media', <MediaPage />) },
      { path: '/media/:id', element: inArea('media', <MediaAssetPage />) },
      { path: '/settings', element: inArea('settings', <SettingsPage />) },
      { path: '/reviews', element: inArea('reviews', <ReviewsPage />) },
      { path: '/reviews/:revisionId', element: inArea('reviews', <RevisionPage />) },
      { path: '/notifications', element: <NotificationsPage /> },
      { path: '/translations', element: inArea('translations', <TranslationsPage />) },
      { path: '/translations/:storyId/:locale', element: inArea('translations', <TranslationWorkspacePage />) },
      { path: '/releases', element: inArea('releases', <ReleasesPage />) },
      { path: '/releases/compare', element: inArea('releases', <ReleaseComparePage />) },
      { path: '/stations', element: inArea('releases', <StationsPage />) },
      { path: '/stations/:id', element: inArea('releases', <StationPage />) },
      { path: '/fleet', element: inArea('fleet', <FleetPage />) },
      { path: '/fleet/:kioskId', element: inArea('fleet', <FleetKioskPage />) },
      { path: '/insights', element: inArea('insights', <InsightsPage />) },
      { path: '/:area', element: <PlannedArea /> },
      { path: '*', element: <NotFoundPage /> },
    ],
  },
]);
