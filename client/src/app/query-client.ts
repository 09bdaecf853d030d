import { QueryClient } from '@tanstack/react-query';
import { isApiError } from '@/lib/api-error';

/** Answers 4xx are final (retrying does not change them); network and server errors get two more tries. */
export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: {
        retry: (failures, error) => failures < 2 && !(isApiError(error) && error.status >= 400 && error.status < 500),
      },
      mutations: { retry: false },
    },
  });
}

let shared: QueryClient | null = null;

/** The app's one query cache, made when the first screen that asks the server opens. */
export function appQueryClient(): QueryClient {
  return (shared ??= createQueryClient());
}
