import { useState } from 'react';
import { useReplica } from '@/db/hooks';
import { isLocalWriteError } from '@/db/write-error';
import { saveAnswer } from '../model/writes';
import type { CheckItemEntry } from '../model/types';

/** Saves an item's answer on this phone at once; a refusal is kept to show beside the item. */
export function useAnswer(checkId: string, itemId: string) {
  const ctx = useReplica();
  const [error, setError] = useState<string | null>(null);
  async function save(entry: CheckItemEntry): Promise<void> {
    // The write is started first: clearing a refusal on show re-renders the item, and the
    // save need not wait behind that.
    const saved = saveAnswer(ctx, checkId, itemId, entry);
    if (error !== null) setError(null);
    try {
      await saved;
    } catch (e) {
      if (!isLocalWriteError(e)) throw e;
      setError(e.message);
    }
  }
  return { save, error, setError };
}
