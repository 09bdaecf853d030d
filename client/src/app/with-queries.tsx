import { useContext, type ReactNode } from 'react';
import { QueryClientProvider } from '@tanstack/react-query';
import { QueryClientChoice } from './query-client-choice';
import { appQueryClient } from './query-client';

/**
 * The query cache for a screen that asks the server. Every lazy screen gets it through the
 * router (and the account menu through its loader); all share the app's one client. Today and
 * the shell read only the phone's records, so a phone's first screen loads no query code.
 */
export function WithQueries({ children }: { children: ReactNode }) {
  const client = useContext(QueryClientChoice) ?? appQueryClient();
  return <QueryClientProvider client={client}>{children}</QueryClientProvider>;
}
