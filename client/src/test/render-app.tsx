import { act, render } from '@testing-library/react';
import { useLayoutEffect } from 'react';
import { MemoryRouter, useLocation, useNavigate, type Location, type NavigateFunction } from 'react-router-dom';
import { AppProviders } from '@/app/providers';
import { createQueryClient } from '@/app/query-client';
import { AppRoutes } from '@/app/router';
import type { SessionAnswer } from '@/features/auth/api/types';
import { tokenStore } from '@/features/auth/token-store';

/** A test's handle on the app's address: where it is now, and a way to go elsewhere. */
export interface TestRouter {
  state: { location: Location };
  navigate: (to: string) => Promise<void>;
}

/** Keeps `router` up to date with the address the app shows. */
function RouterProbe({ into }: { into: { location?: Location; navigate?: NavigateFunction } }) {
  const location = useLocation();
  const navigate = useNavigate();
  useLayoutEffect(() => {
    into.location = location;
    into.navigate = navigate;
  });
  return null;
}

/** Renders the whole app at `path`, optionally signed in, with a fresh query cache. */
export function renderApp(path: string, session?: SessionAnswer) {
  if (session) tokenStore.saveSession(session);
  const queryClient = createQueryClient();
  queryClient.setDefaultOptions({ queries: { retry: false }, mutations: { retry: false } });
  const probe: { location?: Location; navigate?: NavigateFunction } = {};
  const router: TestRouter = {
    state: {
      get location() {
        if (!probe.location) throw new Error('The app has not rendered yet.');
        return probe.location;
      },
    },
    navigate: async (to) => {
      if (!probe.navigate) throw new Error('The app has not rendered yet.');
      const go = probe.navigate;
      await act(async () => {
        await go(to);
      });
    },
  };
  const view = render(
    <AppProviders queryClient={queryClient}>
      <MemoryRouter initialEntries={[path]}>
        <AppRoutes />
        <RouterProbe into={probe} />
      </MemoryRouter>
    </AppProviders>,
  );
  return { ...view, router, queryClient };
}
