import { useQuery } from '@tanstack/react-query';
import { isRole, type Role } from '@breakline/sync-protocol';
import { useSession } from '@/features/auth/use-auth';
import { apiRequest } from '@/lib/api-client';

export interface DeskMember {
  userId: string;
  displayName: string;
  role: Role;
}

export function parseMembers(body: unknown): DeskMember[] {
  if (!Array.isArray(body)) return [];
  return body.flatMap((m) =>
    m && typeof m.userId === 'string' && typeof m.displayName === 'string' && isRole(m.role)
      ? [{ userId: m.userId, displayName: m.displayName, role: m.role }]
      : [],
  );
}

/** The club's members, to put names to the ids in records (the desk is for supervisors, who may list them). */
export function useDeskMembers() {
  const { activeClub } = useSession();
  return useQuery({
    queryKey: ['members', activeClub.id, 'desk'],
    queryFn: async ({ signal }) => parseMembers(await apiRequest<unknown>('/api/members', { signal })),
    staleTime: 10 * 60_000,
  });
}
