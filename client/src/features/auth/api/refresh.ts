import { apiRequest } from '@/lib/api-client';
import { parseSessionAnswer } from './parse';
import type { SessionAnswer } from './types';

export const refreshPath = '/api/auth/refresh';

/**
 * Trade a refresh token for a new pair. The old refresh token is refused afterwards, so only
 * features/auth/session.ts calls this (it makes sure one refresh runs at a time).
 */
export async function refreshTokens(refreshToken: string): Promise<SessionAnswer> {
  const answer = await apiRequest<unknown>(refreshPath, { method: 'POST', body: { refreshToken }, auth: false });
  return parseSessionAnswer(answer);
}
