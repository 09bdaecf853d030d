import { useMemo } from 'react';
import { useLiveQuery } from 'dexie-react-hooks';
import type { RecordKind } from '@breakline/sync-protocol';
import { useSession } from '@/features/auth/use-auth';
import { openReplica } from './open';
import { getRecord, listRecords, type RecordFilter } from './queries';
import type { LocalRecord } from './types';
import type { WriteContext } from './write';

/** The signed-in person's replica and active club: pass it to createRecord / updateRecord / deleteRecord. */
export function useReplica(): WriteContext {
  const { user, activeClub } = useSession();
  return useMemo(
    () => ({ db: openReplica(user.id), userId: user.id, clubId: activeClub.id, role: activeClub.role }),
    [user.id, activeClub.id, activeClub.role],
  );
}

/**
 * A club's records of a kind as shown, updated as soon as a local write or a pull commits.
 * Undefined while the first read runs.
 */
export function useRecords<K extends RecordKind>(kind: K, filter: RecordFilter = {}): LocalRecord<K>[] | undefined {
  const { db, clubId } = useReplica();
  const { boatId, includeDeleted } = filter;
  return useLiveQuery(
    () => listRecords(db, clubId, kind, { boatId, includeDeleted }),
    [db, clubId, kind, boatId, includeDeleted],
  );
}

/** One record as shown; undefined while loading, null when this phone does not have it. */
export function useRecord<K extends RecordKind>(kind: K, id: string | undefined): LocalRecord<K> | null | undefined {
  const { db, clubId } = useReplica();
  return useLiveQuery(() => (id ? getRecord(db, clubId, kind, id) : null), [db, clubId, kind, id]);
}
