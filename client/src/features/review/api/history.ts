import { useQuery } from '@tanstack/react-query';
import type { RecordKind } from '@breakline/sync-protocol';
import { useSession } from '@/features/auth/use-auth';
import { apiRequest } from '@/lib/api-client';
import { ApiError } from '@/lib/api-error';

export interface RecordVersion {
  version: number;
  hlc: string;
  /** When the server accepted it. */
  at: string;
  user: { id: string; name: string };
  deviceId: string;
  /** How it was taken: applied, merged, settled ... */
  status: string;
  changes: Record<string, { from?: unknown; to?: unknown }>;
}

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

export function parseHistory(body: unknown): RecordVersion[] {
  if (!isObject(body) || !Array.isArray(body.versions)) {
    throw new ApiError(200, 'bad_response', "The server sent a record's history Breakline cannot read. Reload the page.");
  }
  return body.versions
    .filter((v): v is Record<string, unknown> => isObject(v) && typeof v.version === 'number')
    .map((v) => ({
      version: v.version as number,
      hlc: typeof v.hlc === 'string' ? v.hlc : '',
      at: typeof v.at === 'string' ? v.at : '',
      // No name: the writer has left the club (names come from the club's memberships).
      user: isObject(v.user)
        ? { id: String(v.user.id ?? ''), name: typeof v.user.name === 'string' && v.user.name ? v.user.name : 'a former member' }
        : { id: '', name: 'a former member' },
      deviceId: typeof v.deviceId === 'string' ? v.deviceId : '',
      status: typeof v.status === 'string' ? v.status : '',
      changes: isObject(v.changes) ? (v.changes as RecordVersion['changes']) : {},
    }))
    .sort((a, b) => a.version - b.version);
}

export function useRecordHistory(kind: RecordKind, id: string) {
  const { activeClub } = useSession();
  return useQuery({
    queryKey: ['history', activeClub.id, kind, id],
    queryFn: async ({ signal }) =>
      parseHistory(await apiRequest<unknown>(`/api/records/${encodeURIComponent(kind)}/${encodeURIComponent(id)}/history`, { signal })),
  });
}

/** The record as its versions leave it: each version's new values over the last. */
export function fieldsFromVersions(versions: readonly RecordVersion[]): { fields: Record<string, unknown>; deleted: boolean } {
  const fields: Record<string, unknown> = {};
  let deleted = false;
  for (const v of versions) {
    for (const [field, c] of Object.entries(v.changes)) {
      if (field === 'deleted') deleted = c.to === true;
      else fields[field] = c.to;
    }
  }
  return { fields, deleted };
}
