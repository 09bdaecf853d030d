import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { tokenStore } from '../token-store';
import { parseMe } from './parse';
import type { Me } from './types';

export const meQueryKey = ['auth', 'me'] as const;

/** Fetches who is signed in and keeps the answer, so a changed role or club name shows offline too. */
export async function getMe(): Promise<Me> {
  const me = parseMe(await apiRequest<unknown>('/api/auth/me'));
  tokenStore.saveMe(me);
  return me;
}

export const meQueryOptions = () => queryOptions({ queryKey: meQueryKey, queryFn: getMe, staleTime: 5 * 60_000 });

export function useMe(enabled: boolean) {
  return useQuery({ ...meQueryOptions(), enabled });
}
