import { useLiveQuery } from 'dexie-react-hooks';
import type { RecordKind } from '@breakline/sync-protocol';
import { useReplica } from '@/db/hooks';
import { toLocalRecord } from '@/db/queries';
import type { LocalRecord } from '@/db/types';

/**
 * This computer's copies of the records on a page of a server table. A sign-off made here shows
 * at once, before the server has it; a record not synced here yet is simply missing.
 */
export function useLocalCopies<K extends RecordKind>(kind: K, ids: readonly string[]): Map<string, LocalRecord<K>> | undefined {
  const { db, clubId } = useReplica();
  const key = ids.join(',');
  return useLiveQuery(async () => {
    const rows = await db.records.bulkGet([...ids]);
    const out = new Map<string, LocalRecord<K>>();
    for (const row of rows) if (row && row.clubId === clubId && row.kind === kind && !row.deleted) out.set(row.id, toLocalRecord<K>(row));
    return out;
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [db, clubId, kind, key]);
}
