import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { isRole, type Role } from '@breakline/sync-protocol';
import { useSession } from '@/features/auth/use-auth';
import { apiRequest } from '@/lib/api-client';
import { ApiError } from '@/lib/api-error';

export interface ClubMember {
  membershipId: string;
  userId: string;
  displayName: string;
  email: string;
  role: Role;
}

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

export function parseMember(m: unknown): ClubMember | null {
  if (!isObject(m) || typeof m.membershipId !== 'string' || typeof m.userId !== 'string' || typeof m.displayName !== 'string' || !isRole(m.role)) return null;
  return { membershipId: m.membershipId, userId: m.userId, displayName: m.displayName, email: typeof m.email === 'string' ? m.email : '', role: m.role };
}

export function parseMembers(body: unknown): ClubMember[] {
  if (!Array.isArray(body)) throw new ApiError(200, 'bad_response', 'The server sent a member list Breakline cannot read. Reload the page.');
  return body.map(parseMember).filter((m): m is ClubMember => m !== null);
}

export function useClubMembers() {
  const { activeClub } = useSession();
  return useQuery({
    queryKey: ['members', activeClub.id, 'admin'],
    queryFn: async ({ signal }) => parseMembers(await apiRequest<unknown>('/api/members', { signal })),
  });
}

/** An admin changes a member's role in this club; the server keeps at least one admin. */
export function useChangeRole() {
  const qc = useQueryClient();
  const { activeClub } = useSession();
  return useMutation({
    mutationFn: ({ membershipId, role }: { membershipId: string; role: Role }) =>
      apiRequest<unknown>(`/api/members/${encodeURIComponent(membershipId)}`, { method: 'PATCH', body: { role } }),
    onSettled: () => qc.invalidateQueries({ queryKey: ['members', activeClub.id] }),
  });
}
