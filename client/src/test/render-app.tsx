import { render } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { AppProviders } from '@/app/providers';
import { createQueryClient } from '@/app/query-client';
import { routes } from '@/app/router';
import type { SessionAnswer } from '@/features/auth/api/types';
import { tokenStore } from '@/features/auth/token-store';

/** Renders the whole app at `path`, optionally signed in, with a fresh query cache. */
export function renderApp(path: string, session?: SessionAnswer) {
  if (session) tokenStore.saveSession(session);
  const router = createMemoryRouter(routes, { initialEntries: [path] });
  const queryClient = createQueryClient();
  queryClient.setDefaultOptions({ queries: { retry: false }, mutations: { retry: false } });
  const view = render(
    <AppProviders queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProviders>,
  );
  return { ...view, router, queryClient };
}
