import { createBrowserRouter, type RouteObject } from 'react-router-dom';
import { ChecksPage } from './pages/checks-page';
import { DefectsPage } from './pages/defects-page';
import { MorePage } from './pages/more-page';
import { NotFoundPage } from './pages/not-found-page';
import { SignInPage } from './pages/sign-in-page';
import { TodayPage } from './pages/today-page';
import { TripsPage } from './pages/trips-page';
import { paths } from './paths';
import { RequireAuth } from './require-auth';
import { AppShell } from './shell/app-shell';

// The bottom bar's screens load with the app; the runner, the files and the fleet editor load on
// demand (the service worker caches them all, so on demand works with no signal too).
const reviewDesk = async () => ({ Component: (await import('./pages/review-desk-page')).ReviewDeskPage });
const admin = async () => ({ Component: (await import('./pages/admin-page')).AdminPage });
const checkStart = async () => ({ Component: (await import('./pages/check-start-page')).CheckStartPage });
const checkRun = async () => ({ Component: (await import('./pages/check-run-page')).CheckRunPage });
const defectNew = async () => ({ Component: (await import('./pages/defect-new-page')).DefectNewPage });
const defectFile = async () => ({ Component: (await import('./pages/defect-file-page')).DefectFilePage });
const boatFile = async () => ({ Component: (await import('./pages/boat-file-page')).BoatFilePage });
const fleet = async () => ({ Component: (await import('./pages/fleet-page')).FleetPage });
const boatEdit = async () => ({ Component: (await import('./pages/boat-edit-page')).BoatEditPage });
const motorEdit = async () => ({ Component: (await import('./pages/motor-edit-page')).MotorEditPage });

export const routes: RouteObject[] = [
  { path: paths.signIn.path, element: <SignInPage /> },
  {
    path: paths.today.path,
    element: (
      <RequireAuth>
        <AppShell />
      </RequireAuth>
    ),
    children: [
      { index: true, element: <TodayPage /> },
      { path: paths.checks.path, element: <ChecksPage /> },
      { path: paths.checkStart.path, lazy: checkStart },
      { path: paths.checkRun.path, lazy: checkRun },
      { path: paths.trips.path, element: <TripsPage /> },
      { path: paths.defects.path, element: <DefectsPage /> },
      { path: paths.defectNew.path, lazy: defectNew },
      { path: paths.defectFile.path, lazy: defectFile },
      { path: paths.boatFile.path, lazy: boatFile },
      { path: paths.fleet.path, lazy: fleet },
      { path: paths.boatEdit.path, lazy: boatEdit },
      { path: paths.motorEdit.path, lazy: motorEdit },
      { path: paths.more.path, element: <MorePage /> },
      { path: paths.reviewDesk.path, lazy: reviewDesk },
      { path: paths.admin.path, lazy: admin },
      { path: '*', element: <NotFoundPage /> },
    ],
  },
];

export function createAppRouter() {
  return createBrowserRouter(routes);
}
