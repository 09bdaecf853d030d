import { lazy, Suspense } from 'react';
import { createBrowserRouter, type RouteObject } from 'react-router-dom';
import { paths } from './paths';
import { RequireAuth } from './require-auth';

// The entry holds the frame every route needs; the signed-in shell with Today is one chunk
// (asked for only once someone is signed in), every other screen, sign-in too, another (the
// service worker precaches every chunk, so on demand works with no signal too).
const signedIn = () => import('./signed-in');
const AppShell = lazy(() => signedIn().then((m) => ({ default: m.AppShell })));
const TodayPage = lazy(() => signedIn().then((m) => ({ default: m.TodayPage })));
const signIn = async () => ({ Component: (await import('./pages/sign-in-page')).SignInPage });
const members = async () => ({ Component: (await import('./pages/members-page')).MembersPage });
const memberAdd = async () => ({ Component: (await import('./pages/member-add-page')).MemberAddPage });
const checks = async () => ({ Component: (await import('./pages/checks-page')).ChecksPage });
const trips = async () => ({ Component: (await import('./pages/trips-page')).TripsPage });
const defects = async () => ({ Component: (await import('./pages/defects-page')).DefectsPage });
const more = async () => ({ Component: (await import('./pages/more-page')).MorePage });
const accountLink = (name: 'AcceptInvitePage' | 'ResetPasswordPage' | 'ForgotPasswordPage') => async () => ({
  Component: (await import('./pages/account-link-page'))[name],
});
const notFound = async () => ({ Component: (await import('./pages/not-found-page')).NotFoundPage });
const tripFile = async () => ({ Component: (await import('./pages/trip-file-page')).TripFilePage });
const incidentNew = async () => ({ Component: (await import('./pages/incident-new-page')).IncidentNewPage });
const incidentFile = async () => ({ Component: (await import('./pages/incident-file-page')).IncidentFilePage });
const reviewDesk = async () => ({ Component: (await import('./pages/review-desk-page')).ReviewDeskPage });
const admin = async () => ({ Component: (await import('./pages/admin-page')).AdminPage });
const deskRecord = async () => ({ Component: (await import('./pages/desk-record-page')).DeskRecordPage });
const deskDay = async () => ({ Component: (await import('./pages/desk-day-page')).DeskDayPage });
const deskConflicts = async () => ({ Component: (await import('./pages/desk-conflicts-page')).DeskConflictsPage });
const seasonReport = async () => ({ Component: (await import('./pages/season-report-page')).SeasonReportPage });
const crewAwards = async () => ({ Component: (await import('./pages/crew-awards-page')).CrewAwardsPage });
const caughtMail = async () => ({ Component: (await import('./pages/caught-mail-page')).CaughtMailPage });
const checkStart = async () => ({ Component: (await import('./pages/check-start-page')).CheckStartPage });
const checkRun = async () => ({ Component: (await import('./pages/check-run-page')).CheckRunPage });
const defectNew = async () => ({ Component: (await import('./pages/defect-new-page')).DefectNewPage });
const defectFile = async () => ({ Component: (await import('./pages/defect-file-page')).DefectFilePage });
const boatFile = async () => ({ Component: (await import('./pages/boat-file-page')).BoatFilePage });
const fleet = async () => ({ Component: (await import('./pages/fleet-page')).FleetPage });
const boatEdit = async () => ({ Component: (await import('./pages/boat-edit-page')).BoatEditPage });
const motorEdit = async () => ({ Component: (await import('./pages/motor-edit-page')).MotorEditPage });
const templates = async () => ({ Component: (await import('./pages/templates-page')).TemplatesPage });
const templateEdit = async () => ({ Component: (await import('./pages/template-edit-page')).TemplateEditPage });

export const routes: RouteObject[] = [
  { path: paths.signIn.path, lazy: signIn },
  { path: paths.members.path, lazy: members },
  { path: paths.memberAdd.path, lazy: memberAdd },
  { path: paths.acceptInvite.path, lazy: accountLink('AcceptInvitePage') },
  { path: paths.resetPassword.path, lazy: accountLink('ResetPasswordPage') },
  { path: paths.forgotPassword.path, lazy: accountLink('ForgotPasswordPage') },
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
      { path: paths.checks.path, lazy: checks },
      { path: paths.checkStart.path, lazy: checkStart },
      { path: paths.checkRun.path, lazy: checkRun },
      { path: paths.trips.path, lazy: trips },
      { path: paths.tripFile.path, lazy: tripFile },
      { path: paths.incidentNew.path, lazy: incidentNew },
      { path: paths.incidentFile.path, lazy: incidentFile },
      { path: paths.defects.path, lazy: defects },
      { path: paths.defectNew.path, lazy: defectNew },
      { path: paths.defectFile.path, lazy: defectFile },
      { path: paths.boatFile.path, lazy: boatFile },
      { path: paths.fleet.path, lazy: fleet },
      { path: paths.boatEdit.path, lazy: boatEdit },
      { path: paths.motorEdit.path, lazy: motorEdit },
      { path: paths.templates.path, lazy: templates },
      { path: paths.templateEdit.path, lazy: templateEdit },
      { path: paths.more.path, lazy: more },
      { path: paths.reviewDesk.path, lazy: reviewDesk },
      { path: paths.admin.path, lazy: admin },
      { path: paths.deskRecord.path, lazy: deskRecord },
      { path: paths.deskDay.path, lazy: deskDay },
      { path: paths.deskConflicts.path, lazy: deskConflicts },
      { path: paths.seasonReport.path, lazy: seasonReport },
      { path: paths.crewAwards.path, lazy: crewAwards },
      { path: paths.caughtMail.path, lazy: caughtMail },
      { path: '*', lazy: notFound },
    ],
  },
];

export function createAppRouter() {
  return createBrowserRouter(routes);
}
