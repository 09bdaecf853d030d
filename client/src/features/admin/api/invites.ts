import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { isRole, type Role } from '@breakline/sync-protocol';
import { useSession } from '@/features/auth/use-auth';
import { apiRequest } from '@/lib/api-client';
import { ApiError } from '@/lib/api-error';

export type InviteStatus = 'pending' | 'accepted' | 'expired' | 'withdrawn';
const STATUSES: readonly string[] = ['pending', 'accepted', 'expired', 'withdrawn'];

export interface Invite {
  id: string;
  email: string;
  role: Role;
  status: InviteStatus;
  invitedBy: { id: string; name: string | null };
  createdAt: string;
  expiresAt: string;
  acceptedAt: string | null;
}

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

export function parseInvites(body: unknown): Invite[] {
  if (!Array.isArray(body)) throw new ApiError(200, 'bad_response', 'The server sent a list of invitations Breakline cannot read. Reload the page.');
  return body.flatMap((i): Invite[] => {
    if (!isObject(i) || typeof i.id !== 'string' || typeof i.email !== 'string' || !isRole(i.role) || !STATUSES.includes(String(i.status))) return [];
    const by = isObject(i.invitedBy) ? i.invitedBy : {};
    return [{
      id: i.id, email: i.email, role: i.role, status: i.status as InviteStatus,
      invitedBy: { id: String(by.id ?? ''), name: typeof by.name === 'string' ? by.name : null },
      createdAt: String(i.createdAt ?? ''), expiresAt: String(i.expiresAt ?? ''),
      acceptedAt: typeof i.acceptedAt === 'string' ? i.acceptedAt : null,
    }];
  });
}

export function useInvites() {
  const { activeClub } = useSession();
  return useQuery({
    queryKey: ['invites', activeClub.id],
    queryFn: async ({ signal }) => parseInvites(await apiRequest<unknown>('/api/invites', { signal })),
  });
}

/** Sends the invitation e-mail (the server queues it): a link with a single-use token that expires. */
export function useSendInvite() {
  const qc = useQueryClient();
  const { activeClub } = useSession();
  return useMutation({
    mutationFn: (invite: { email: string; role: Role }) => apiRequest<unknown>('/api/invites', { method: 'POST', body: invite }),
    onSuccess: () => qc.invalidateQueries({ queryKey: ['invites', activeClub.id] }),
  });
}

export function useWithdrawInvite() {
  const qc = useQueryClient();
  const { activeClub } = useSession();
  return useMutation({
    mutationFn: (id: string) => apiRequest<void>(`/api/invites/${encodeURIComponent(id)}`, { method: 'DELETE' }),
    onSettled: () => qc.invalidateQueries({ queryKey: ['invites', activeClub.id] }),
  });
}
