import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { ApiError } from '@/lib/api-error';
import { getFreshAccessToken } from '../session';
import { tokenStore } from '../token-store';
import { parseSessionAnswer } from './parse';
import type { SessionAnswer } from './types';

export async function switchClub(input: { clubId: string; refreshToken: string }): Promise<SessionAnswer> {
  const answer = await apiRequest<unknown>('/api/auth/switch-club', { method: 'POST', body: input });
  return parseSessionAnswer(answer);
}

/** Makes another of the person's clubs the active one; every cached answer was the old club's. */
export function useSwitchClub() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (clubId: string) => {
      // Refresh first if due, so the refresh token in the body is the current one.
      await getFreshAccessToken();
      const refreshToken = tokenStore.getState().session?.refreshToken;
      if (!refreshToken) throw new ApiError(401, 'unauthorized', 'Sign in first, then choose the club.');
      return switchClub({ clubId, refreshToken });
    },
    onSuccess: (answer) => {
      tokenStore.saveSession(answer);
      queryClient.clear();
    },
  });
}
