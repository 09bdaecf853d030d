import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { roster } from '../members/roster';
import { tokenStore } from '../token-store';

export async function logout(refreshToken: string): Promise<void> {
  await apiRequest<void>('/api/auth/logout', { method: 'POST', body: { refreshToken }, auth: false });
}

/**
 * Signs out on this device at once, then tells the server to revoke the refresh token.
 * With no signal the server is not told; the token then lapses at its own expiry.
 */
export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async () => {
      const session = tokenStore.getState().session;
      const refreshToken = session?.refreshToken;
      tokenStore.clear();
      // Signed out is off this device: switching back needs the password, not the PIN.
      if (session) roster.update(session.user.id, () => null);
      queryClient.clear();
      if (!refreshToken) return;
      try {
        await logout(refreshToken);
      } catch {
        // Already signed out here; a failed revoke must not keep the person signed in.
      }
    },
  });
}
