import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { tokenStore } from '../token-store';
import { parseSessionAnswer } from '../api/parse';

/** The token in an e-mailed link sits after `#token=`, so it never reaches a server log. */
export function tokenFromHash(hash: string): string | null {
  const params = new URLSearchParams(hash.startsWith('#') ? hash.slice(1) : hash);
  const token = params.get('token')?.trim();
  return token ? token : null;
}

export interface AcceptInviteInput {
  token: string;
  displayName?: string;
  password: string;
}

export interface ResetConfirmInput {
  token: string;
  password: string;
}

/** Accepting an invitation answers like a sign-in: the session is kept at once. */
export function useAcceptInvite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: AcceptInviteInput) =>
      parseSessionAnswer(await apiRequest<unknown>('/api/invites/accept', { method: 'POST', body: input, auth: false })),
    onSuccess: (answer) => {
      queryClient.clear();
      tokenStore.saveSession(answer);
    },
  });
}

export function useRequestPasswordReset() {
  return useMutation({
    mutationFn: (email: string) => apiRequest<unknown>('/api/auth/password-reset', { method: 'POST', body: { email }, auth: false }),
  });
}

export function useConfirmPasswordReset() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: ResetConfirmInput) =>
      parseSessionAnswer(await apiRequest<unknown>('/api/auth/password-reset/confirm', { method: 'POST', body: input, auth: false })),
    onSuccess: (answer) => {
      queryClient.clear();
      tokenStore.saveSession(answer);
    },
  });
}
