import { utcToLocal } from '@breakline/sync-protocol';
import type { LocalRecord } from '@/db/types';

/**
 * An unfinished check of the boat begun today (the club's date), to carry on with. One begun on
 * an earlier day is not resumed: yesterday's pressures say nothing about this morning's boat.
 */
export function resumableCheck(
  checks: readonly LocalRecord<'check'>[], boatId: string, type: 'launch' | 'stow', now: string, zone: string,
): LocalRecord<'check'> | undefined {
  const today = utcToLocal(now, zone).date;
  return checks
    .filter((c) => c.fields.boatId === boatId && c.fields.checkType === type && c.fields.status === 'in-progress')
    .filter((c) => utcToLocal(c.fields.startedAt, zone).date === today)
    .sort((a, b) => b.fields.startedAt.localeCompare(a.fields.startedAt))[0];
}
