import { fieldLabel, kindRules } from '@breakline/sync-protocol';
import type { RejectedRow } from '@/db/types';

// Apart from the status words: only the sync details show it, and it needs every kind's rules
// for the kind's name, which the top bar's status line does not.

/** "Your change to a defect (status, notes) was not saved." */
export function rejectedTitle(r: RejectedRow): string {
  const what = kindRules(r.kind).label;
  if (r.deleted) return `Deleting ${what} was not done.`;
  const fields = Object.keys(r.patch).map((f) => fieldLabel([f]));
  const list = fields.length > 0 && fields.length <= 4 ? ` (${fields.join(', ')})` : '';
  return `Your change to ${what}${list} was not saved.`;
}
