import { lazy, Suspense, type ComponentType } from 'react';
import { useLocation, useRoutes, type RouteObject } from 'react-router-dom';
import { paths } from './paths';
import { RequireAuth } from './require-auth';
import { ScreenErrorBoundary } from './screen-error-boundary';

// The entry holds the frame every route needs; the signed-in shell with Today is one chunk
// (asked for only once someone is signed in), every other screen, sign-in too, another (the
// service worker precaches every chunk, so on demand works with no signal too). The routes are
// plain elements for <Routes>: the app uses no loaders or actions, and the data router would
// double the router's code on every screen. Navigations run in a transition, so the screen
// being left stays up while the next one's chunk arrives.
const signedIn = () => import('./signed-in');
const AppShell = lazy(() => signedIn().then((m) => ({ default: m.AppShell })));
const TodayPage = lazy(() => signedIn().then((m) => ({ default: m.TodayPage })));

/**
 * The element of a screen in its own chunk: `load` imports the module, `name` is its export.
 * The screen gets the query cache with it (see with-queries.tsx).
 */
function screen<K extends string>(load: () => Promise<Record<K, ComponentType>>, name: K) {
  const Screen = lazy(async (): Promise<{ default: ComponentType }> => {
    const [module, { WithQueries }] = await Promise.all([load(), import('./with-queries')]);
    const Page: ComponentType = module[name];
    return {
      default: () => (
        <WithQueries>
          <Page />
        </WithQueries>
      ),
    };
  });
  return <Screen />;
}

const signIn = screen(() => import('./pages/sign-in-page'), 'SignInPage');
const members = screen(() => import('./pages/members-page'), 'MembersPage');
const memberAdd = screen(() => import('./pages/member-add-page'), 'MemberAddPage');
const checks = screen(() => import('./pages/checks-page'), 'ChecksPage');
const trips = screen(() => import('./pages/trips-page'), 'TripsPage');
const defects = screen(() => import('./pages/defects-page'), 'DefectsPage');
const more = screen(() => import('./pages/more-page'), 'MorePage');
const accountLink = (name: 'AcceptInvitePage' | 'ResetPasswordPage' | 'ForgotPasswordPage') =>
  screen(() => import('./pages/account-link-page'), name);
const notFound = screen(() => import('./pages/not-found-page'), 'NotFoundPage');
const tripFile = screen(() => import('./pages/trip-file-page'), 'TripFilePage');
const incidentNew = screen(() => import('./pages/incident-new-page'), 'IncidentNewPage');
const incidentFile = screen(() => import('./pages/incident-file-page'), 'IncidentFilePage');
const reviewDesk = screen(() => import('./pages/review-desk-page'), 'ReviewDeskPage');
const admin = screen(() => import('./pages/admin-page'), 'AdminPage');
const deskRecord = screen(() => import('./pages/desk-record-page'), 'DeskRecordPage');
const deskDay = screen(() => import('./pages/desk-day-page'), 'DeskDayPage');
const deskConflicts = screen(() => import('./pages/desk-conflicts-page'), 'DeskConflictsPage');
const seasonReport = screen(() => import('./pages/season-report-page'), 'SeasonReportPage');
const crewAwards = screen(() => import('./pages/crew-awards-page'), 'CrewAwardsPage');
const caughtMail = screen(() => import('./pages/caught-mail-page'), 'CaughtMailPage');
const checkStart = screen(() => import('./pages/check-start-page'), 'CheckStartPage');
const checkRun = screen(() => import('./pages/check-run-page'), 'CheckRunPage');
const defectNew = screen(() => import('./pages/defect-new-page'), 'DefectNewPage');
const defectFile = screen(() => import('./pages/defect-file-page'), 'DefectFilePage');
const boatFile = screen(() => import('./pages/boat-file-page'), 'BoatFilePage');
const fleet = screen(() => import('./pages/fleet-page'), 'FleetPage');
const boatEdit = screen(() => import('./pages/boat-edit-page'), 'BoatEditPage');
const motorEdit = screen(() => import('./pages/motor-edit-page'), 'MotorEditPage');
const templates = screen(() => import('./pages/templates-page'), 'TemplatesPage');
const templateEdit = screen(() => import('./pages/template-edit-page'), 'TemplateEditPage');

export const routes: RouteObject[] = [
  { path: paths.signIn.path, element: signIn },
  { path: paths.members.path, element: members },
  { path: paths.memberAdd.path, element: memberAdd },
  { path: paths.acceptInvite.path, element: accountLink('AcceptInvitePage') },
  { path: paths.resetPassword.path, element: accountLink('ResetPasswordPage') },
  { path: paths.forgotPassword.path, element: accountLink('ForgotPasswordPage') },
  {
    path: paths.today.path,
    element: (
      <RequireAuth>
        <Suspense fallback={null}>
          <AppShell />
        </Suspense>
      </RequireAuth>
    ),
    children: [
      { index: true, element: <TodayPage /> }, // in the shell's chunk, so already loaded
      { path: paths.checks.path, element: checks },
      { path: paths.checkStart.path, element: checkStart },
      { path: paths.checkRun.path, element: checkRun },
      { path: paths.trips.path, element: trips },
      { path: paths.tripFile.path, element: tripFile },
      { path: paths.incidentNew.path, element: incidentNew },
      { path: paths.incidentFile.path, element: incidentFile },
      { path: paths.defects.path, element: defects },
      { path: paths.defectNew.path, element: defectNew },
      { path: paths.defectFile.path, element: defectFile },
      { path: paths.boatFile.path, element: boatFile },
      { path: paths.fleet.path, element: fleet },
      { path: paths.boatEdit.path, element: boatEdit },
      { path: paths.motorEdit.path, element: motorEdit },
      { path: paths.templates.path, element: templates },
      { path: paths.templateEdit.path, element: templateEdit },
      { path: paths.more.path, element: more },
      { path: paths.reviewDesk.path, element: reviewDesk },
      { path: paths.admin.path, element: admin },
      { path: paths.deskRecord.path, element: deskRecord },
      { path: paths.deskDay.path, element: deskDay },
      { path: paths.deskConflicts.path, element: deskConflicts },
      { path: paths.seasonReport.path, element: seasonReport },
      { path: paths.crewAwards.path, element: crewAwards },
      { path: paths.caughtMail.path, element: caughtMail },
      { path: '*', element: notFound },
    ],
  },
];

/** The app's screens for the current address, inside a boundary that shows a screen's failure. */
export function AppRoutes() {
  const element = useRoutes(routes);
  const { pathname } = useLocation();
  return (
    <ScreenErrorBoundary resetKey={pathname}>
      <Suspense fallback={null}>{element}</Suspense>
    </ScreenErrorBoundary>
  );
}
