import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { noteSignedIn } from '../members/device';
import { tokenStore } from '../token-store';
import { parseSessionAnswer } from './parse';
import type { SessionAnswer } from './types';

export interface LoginInput {
  email: string;
  password: string;
  clubId?: string;
}

export async function login(input: LoginInput): Promise<SessionAnswer> {
  const answer = await apiRequest<unknown>('/api/auth/login', { method: 'POST', body: input, auth: false });
  return parseSessionAnswer(answer);
}

/** The usual keeping of a sign-in: this person becomes the one signed in on this device. */
function keepSession(answer: SessionAnswer): void {
  tokenStore.saveSession(answer);
  noteSignedIn(answer);
}

/**
 * Signs in and keeps the session; a cache left from another person is dropped first. `keep`
 * replaces how the answer is kept (a member added to a shared device, see members/device.ts).
 */
export function useLogin(keep: (answer: SessionAnswer) => void | Promise<void> = keepSession) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: login,
    onSuccess: async (answer) => {
      queryClient.clear();
      await keep(answer);
    },
  });
}
