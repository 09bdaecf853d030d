import { mergeRuleOf } from './kind-rules.js';
import type { Fields } from './wire.js';
import { deepEqual } from './deep-equal.js';
import { compareEncodedHlc } from './hlc.js';
import { mergeCheckResults, resolveDefectStatus, unionLists, type Side } from './merge-rules.js';
import type { FieldConflict, MergeInput, MergeResult, WriteStamp } from './merge-types.js';

export type * from './merge-types.js';

const has = (o: Fields, k: string) => Object.prototype.hasOwnProperty.call(o, k);

/**
 * The server's three-way merge of one mutation into one record, as a pure function.
 *
 * - A new record applies as sent; so does a mutation made against the current version whose
 *   base agrees with the current values. The base can disagree on the current version only when
 *   the device re-applied a change of its own that the server had already taken (its answer was
 *   lost) over a newer pull: then the device did not see the current values, so the mutation is
 *   merged field by field like any stale one rather than trusted.
 * - Otherwise each patched field is compared with `base` (what the device showed): a field
 *   the server did not move since takes the patch; a patch equal to the server's value is a
 *   no-op; a field both sides moved follows its merge rule, and the losing value is returned
 *   as a conflict for a person to settle (union fields lose nothing and raise none).
 * - Delete against a record that changed after the device saw it: the record is kept and a
 *   conflict records the refused delete; deleting what someone else just wrote is never silent.
 *   "Saw" means `base` holds every current field with its current value, so a delete must
 *   carry the whole record as the device showed it, even on the current version.
 * - Edit against a tombstone someone else made: the record comes back with the edit, and a
 *   conflict records the overruled delete. Both rules keep data rather than drop it.
 */
export function mergeMutation(input: MergeInput): MergeResult {
  const { kind, current, mutation: m } = input;
  if (current === null) return { status: 'applied', apply: { ...m.patch }, deleted: m.deleted === true, conflicts: [] };
  const wasDeleted = input.currentDeleted === true;
  const incoming: WriteStamp = { actor: m.actor, hlc: m.hlc };
  const stampOf = (field: string): WriteStamp =>
    input.currentFieldStamps?.[field] ?? {
      actor: input.currentActor ?? { deviceId: 'unknown', userId: 'unknown' },
      hlc: input.currentHlc ?? '',
    };
  // JSON has no undefined: an absent value is stored as null.
  const conflict = (field: string, keptSide: Side, sv: unknown, iv: unknown, server: WriteStamp): FieldConflict => {
    const [serverValue, incomingValue] = [sv === undefined ? null : sv, iv === undefined ? null : iv];
    return keptSide === 'server'
      ? { field, keptSide, keptValue: serverValue, overruledValue: incomingValue, kept: server, overruled: incoming }
      : { field, keptSide, keptValue: incomingValue, overruledValue: serverValue, kept: incoming, overruled: server };
  };

  const agrees = (f: string) => has(m.base, f) && deepEqual(m.base[f], current[f]);
  if (m.deleted) {
    if (wasDeleted) return { status: 'applied', apply: {}, deleted: true, conflicts: [] };
    if (Object.keys(current).every(agrees)) {
      return { status: input.baseIsCurrent ? 'applied' : 'merged', apply: {}, deleted: true, conflicts: [] };
    }
    const c = conflict('deleted', 'server', false, true, stampOf('deleted'));
    return { status: 'conflict', apply: {}, deleted: false, conflicts: [c] };
  }
  if (input.baseIsCurrent && Object.keys(m.patch).every(agrees)) {
    return { status: 'applied', apply: { ...m.patch }, deleted: false, conflicts: [] };
  }

  const apply: Fields = {};
  const conflicts: FieldConflict[] = [];
  if (wasDeleted) conflicts.push(conflict('deleted', 'incoming', true, false, stampOf('deleted')));
  for (const [field, p] of Object.entries(m.patch)) {
    const c = current[field];
    const b = has(m.base, field) ? m.base[field] : undefined;
    if (deepEqual(c, b)) {
      if (!deepEqual(p, c)) apply[field] = p;
      continue;
    }
    if (deepEqual(p, c)) continue;
    const server = stampOf(field);
    const incomingLater = compareEncodedHlc(m.hlc, server.hlc) > 0;
    switch (mergeRuleOf(kind, field)) {
      case 'union': {
        const merged = unionLists(c, p);
        if (!deepEqual(merged, c)) apply[field] = merged;
        break;
      }
      case 'check-results': {
        const r = mergeCheckResults(b, c, p, incomingLater);
        if (!deepEqual(r.value, c)) apply[field] = r.value;
        for (const ic of r.conflicts) {
          const [sv, iv] = ic.keptSide === 'server' ? [ic.keptValue, ic.overruledValue] : [ic.overruledValue, ic.keptValue];
          conflicts.push(conflict(`${field}.${ic.itemId}`, ic.keptSide, sv, iv, server));
        }
        break;
      }
      case 'defect-status':
      case 'lww': {
        const side =
          mergeRuleOf(kind, field) === 'lww'
            ? incomingLater ? 'incoming' : 'server'
            : resolveDefectStatus(c, p, incomingLater, server.actor.role, m.actor.role);
        if (side === 'incoming') apply[field] = p;
        conflicts.push(conflict(field, side, c, p, server));
        break;
      }
    }
  }
  return { status: conflicts.length > 0 ? 'conflict' : 'merged', apply, deleted: false, conflicts };
}
