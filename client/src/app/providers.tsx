import type { ReactNode } from 'react';
import type { QueryClient } from '@tanstack/react-query';
import { bindApiAuth } from '@/lib/api-client';
import { useMeRefresh } from '@/features/auth/api/me';
import { apiAuth } from '@/features/auth/session';
import { useAuthState } from '@/features/auth/use-auth';
import { QueryClientChoice } from './query-client-choice';
import { ThemeModeProvider } from './theme-mode';

// The API client gets its tokens from the auth feature; bound once, before anything renders.
bindApiAuth(apiAuth);

/** Refreshes the stored `me` answer in the background whenever someone is signed in. */
function AuthRefresh({ children }: { children: ReactNode }) {
  const { session } = useAuthState();
  useMeRefresh(session?.user.id ?? null);
  return children;
}

/** `queryClient`: the cache the screens use instead of the app's own (a test's fresh one). */
export function AppProviders({ children, queryClient }: { children: ReactNode; queryClient?: QueryClient }) {
  return (
    <QueryClientChoice.Provider value={queryClient ?? null}>
      <ThemeModeProvider>
        <AuthRefresh>{children}</AuthRefresh>
      </ThemeModeProvider>
    </QueryClientChoice.Provider>
  );
}
