import { OPEN_DEFECT_STATUSES } from '@breakline/sync-protocol';
import type { LocalRecord } from '@/db/types';

/** Defects that still count against the boat, worst first, then oldest first. */
export function openDefectsOf(defects: readonly LocalRecord<'defect'>[], boatId: string): LocalRecord<'defect'>[] {
  const rank = { 'stand-down': 0, limit: 1, note: 2 } as const;
  return defects
    .filter((d) => d.fields.boatId === boatId && OPEN_DEFECT_STATUSES.includes(d.fields.status))
    .sort((a, b) => rank[a.fields.severity] - rank[b.fields.severity] || a.fields.reportedAt.localeCompare(b.fields.reportedAt));
}
