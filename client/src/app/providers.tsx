import { useState, type ReactNode } from 'react';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { bindApiAuth } from '@/lib/api-client';
import { useMe } from '@/features/auth/api/me';
import { apiAuth } from '@/features/auth/session';
import { useAuthState } from '@/features/auth/use-auth';
import { createQueryClient } from './query-client';
import { ThemeModeProvider } from './theme-mode';

// The API client gets its tokens from the auth feature; bound once, before anything renders.
bindApiAuth(apiAuth);

/** Refreshes the stored `me` answer in the background whenever someone is signed in. */
function AuthRefresh({ children }: { children: ReactNode }) {
  const { session } = useAuthState();
  useMe(session !== null);
  return children;
}

export function AppProviders({ children, queryClient }: { children: ReactNode; queryClient?: QueryClient }) {
  const [client] = useState(() => queryClient ?? createQueryClient());
  return (
    <QueryClientProvider client={client}>
      <ThemeModeProvider>
        <AuthRefresh>{children}</AuthRefresh>
      </ThemeModeProvider>
    </QueryClientProvider>
  );
}
