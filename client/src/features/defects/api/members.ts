import { useQuery } from '@tanstack/react-query';
import { roleAtLeast, type Role } from '@breakline/sync-protocol';
import { apiRequest } from '@/lib/api-client';
import { useSession } from '@/features/auth/use-auth';

export interface Member {
  userId: string;
  displayName: string;
  role: Role;
}

function parseMembers(body: unknown): Member[] {
  if (!Array.isArray(body)) return [];
  return body.flatMap((m) =>
    m && typeof m.userId === 'string' && typeof m.displayName === 'string' ? [{ userId: m.userId, displayName: m.displayName, role: m.role as Role }] : [],
  );
}

/**
 * The club's members, for supervisors choosing whom to assign (the server lists them to
 * supervisors only). Kept for a day: assigning is done at the clubhouse, often offline later.
 */
export function useMembers() {
  const { activeClub } = useSession();
  return useQuery({
    queryKey: ['members', activeClub.id],
    queryFn: async () => parseMembers(await apiRequest<unknown>('/api/members')),
    enabled: roleAtLeast(activeClub.role, 'supervisor'),
    staleTime: 24 * 60 * 60_000,
    retry: false,
  });
}

/** A member's name as the person reading knows it: "you", their name when known, else "a club member". */
export function useMemberName(): (id: string | null) => string {
  const { user } = useSession();
  const { data } = useMembers();
  return (id) => (id === null ? 'nobody' : id === user.id ? 'you' : (data?.find((m) => m.userId === id)?.displayName ?? 'a club member'));
}
