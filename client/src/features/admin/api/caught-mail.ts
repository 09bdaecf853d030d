import { useQuery } from '@tanstack/react-query';
import { useSession } from '@/features/auth/use-auth';
import { apiRequest } from '@/lib/api-client';
import { ApiError } from '@/lib/api-error';

export interface CaughtMail {
  id: string;
  to: string[];
  subject: string;
  text: string;
  at: string;
  tag: string | null;
}

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

export function parseCaughtMail(body: unknown): CaughtMail[] {
  if (!Array.isArray(body)) throw new ApiError(200, 'bad_response', 'The server sent caught mail Breakline cannot read. Reload the page.');
  return body.flatMap((m): CaughtMail[] =>
    isObject(m) && typeof m.id === 'string' && Array.isArray(m.to)
      ? [{ id: m.id, to: m.to.map(String), subject: String(m.subject ?? ''), text: String(m.text ?? ''), at: String(m.at ?? ''), tag: typeof m.tag === 'string' ? m.tag : null }]
      : []);
}

/** What the local mail catcher caught for this club's people; only while it runs (development, tests). */
export function useCaughtMail() {
  const { activeClub } = useSession();
  return useQuery({
    queryKey: ['caught-mail', activeClub.id],
    queryFn: async ({ signal }) => parseCaughtMail(await apiRequest<unknown>('/api/dev/mail', { signal })),
    refetchInterval: 10_000,
  });
}

/** Whether this server runs the local mail catcher: its page answers only then. */
export function useCaughtMailOn(): boolean {
  const { activeClub } = useSession();
  const probe = useQuery({
    queryKey: ['caught-mail', activeClub.id, 'on'],
    queryFn: async ({ signal }) => {
      await apiRequest<unknown>('/api/dev/mail', { signal });
      return true;
    },
    staleTime: Infinity,
    retry: false,
    enabled: activeClub.role === 'admin',
  });
  return probe.data === true;
}
