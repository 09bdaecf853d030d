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

/** Signs in and keeps the session; a cache left from another person is dropped first. */
export function useLogin() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: login,
    onSuccess: (answer) => {
      queryClient.clear();
      tokenStore.saveSession(answer);
      noteSignedIn(answer);
    },
  });
}
