import { fieldLabel, kindRules } from '@breakline/sync-protocol';
import type { ConflictSeenRow, RejectedRow } from '@/db/types';

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

/** "Your change to a defect met another phone's change to the same field: ..." for the conflicts this phone's changes raised. */
export function raisedText(rows: readonly ConflictSeenRow[]): string | null {
  if (rows.length === 0) return null;
  const kinds = [...new Set(rows.map((r) => kindRules(r.kind).label))];
  const what = kinds.length <= 3 ? kinds.join(', ') : `${kinds.length} kinds of record`;
  const many = rows.length === 1 ? 'Your change' : `${rows.length} of your changes`;
  return `${many} to ${what} met another phone's change to the same field. Both values are kept, and a supervisor chooses one at the Review desk.`;
}
