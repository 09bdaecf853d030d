import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { PROTOCOL_VERSION, type ConflictRecord } from '@breakline/sync-protocol';
import { useSession } from '@/features/auth/use-auth';
import { apiRequest } from '@/lib/api-client';
import { ApiError } from '@/lib/api-error';
import { syncRunner } from '@/sync';

export type ConflictStatus = 'open' | 'settled';

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);
const isSide = (v: unknown) => isObject(v) && typeof v.deviceId === 'string' && typeof v.userId === 'string' && typeof v.hlc === 'string';

export function parseConflicts(body: unknown): ConflictRecord[] {
  if (!Array.isArray(body)) throw new ApiError(200, 'bad_response', 'The server sent a list of conflicts Breakline cannot read. Reload the page.');
  return body.filter((c): c is ConflictRecord =>
    isObject(c) && typeof c.id === 'string' && typeof c.recordId === 'string' && typeof c.field === 'string' && isSide(c.kept) && isSide(c.overruled));
}

export function useConflicts(status: ConflictStatus) {
  const { activeClub } = useSession();
  return useQuery({
    queryKey: ['conflicts', activeClub.id, status],
    queryFn: async ({ signal }) => parseConflicts(await apiRequest<unknown>(`/api/sync/conflicts?status=${status}`, { signal })),
    refetchInterval: 60_000,
  });
}

export type SettleChoice =
  | { choice: 'kept'; note: string }
  | { choice: 'overruled'; note: string }
  | { choice: 'other'; value: unknown; note: string };

/** Settles on the server (a supervisor's decision is the club's record), then syncs so this computer shows it. */
export function useSettleConflict() {
  const qc = useQueryClient();
  const { activeClub } = useSession();
  return useMutation({
    mutationFn: ({ id, settle }: { id: string; settle: SettleChoice }) =>
      apiRequest<ConflictRecord>(`/api/sync/conflicts/${encodeURIComponent(id)}/settle`, {
        method: 'POST',
        body: { protocolVersion: PROTOCOL_VERSION, ...settle, note: settle.note.trim() },
      }),
    onSettled: () => qc.invalidateQueries({ queryKey: ['conflicts', activeClub.id] }),
    onSuccess: () => void syncRunner.requestSync(),
  });
}
