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

// Desktop screens load on demand, so the phone's first load carries only what a phone uses.
const reviewDesk = async () => ({ Component: (await import('./pages/review-desk-page')).ReviewDeskPage });
const admin = async () => ({ Component: (await import('./pages/admin-page')).AdminPage });

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
      { path: paths.trips.path, element: <TripsPage /> },
      { path: paths.defects.path, element: <DefectsPage /> },
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
