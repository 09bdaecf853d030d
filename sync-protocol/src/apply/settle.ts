import { encodeHlc, maxEncodedHlc } from '../hlc.js';
import type { HybridClock } from '../hybrid-clock.js';
import { checkDelete, checkUpdate } from '../permissions.js';
import { roleAtLeast } from '../roles.js';
import { validateRecord, describeErrors } from '../validate.js';
import { SettleRequestSchema } from '../wire-schemas.js';
import type { ConflictRecord, SettleRequest } from '../wire.js';
import { SyncRequestError, type AuthContext, type ClubState } from './club-state.js';

interface SettleContext {
  club: ClubState;
  auth: AuthContext;
  pt: number;
  clock: HybridClock;
}

/** The record's fields and deleted flag with `value` written to the conflict's field. */
function withValue(fields: Record<string, unknown>, deleted: boolean, field: string, value: unknown) {
  if (field === 'deleted') return { fields, deleted: value === true };
  const dot = field.indexOf('.');
  if (dot < 0) return { fields: { ...fields, [field]: value }, deleted };
  const [top, item] = [field.slice(0, dot), field.slice(dot + 1)];
  const map = { ...(fields[top] as Record<string, unknown>) };
  if (value === null) delete map[item];
  else map[item] = value;
  return { fields: { ...fields, [top]: map }, deleted };
}

/** A supervisor settles a conflict; writing a value other than the kept one is a new change. */
export function settleConflict(ctx: SettleContext, body: SettleRequest): ConflictRecord {
  const { club, auth, pt } = ctx;
  const req = SettleRequestSchema.safeParse(body);
  if (!req.success) throw new SyncRequestError(400, `Malformed settle request: ${req.error.issues.map((i) => i.message).join('; ')}`);
  if (!roleAtLeast(auth.role, 'supervisor')) throw new SyncRequestError(403, 'Only a supervisor or admin may settle a conflict.');
  const conflict = club.conflicts.find((c) => c.id === req.data.conflictId);
  if (!conflict) throw new SyncRequestError(404, 'That conflict does not exist.');
  if (conflict.status === 'settled') throw new SyncRequestError(409, `That conflict was already settled by ${conflict.settledBy}.`);
  const { choice } = req.data;
  const value = choice === 'kept' ? conflict.keptValue : choice === 'overruled' ? conflict.overruledValue : req.data.value;
  const record = club.records[conflict.recordId];
  if (choice !== 'kept' && record) {
    const next = withValue(record.fields, record.deleted, conflict.field, value);
    const check = validateRecord(record.kind, next.fields);
    if (!check.ok) throw new SyncRequestError(400, `That value cannot be saved: ${describeErrors(check.errors)}`);
    // The settled value is a change like any other: the kind's rules on who may write it still hold.
    const top = conflict.field.split('.')[0]!;
    const allowed = conflict.field === 'deleted'
      ? (next.deleted ? checkDelete(record.kind, auth.role, record.fields, auth.userId) : { ok: true as const })
      : checkUpdate(record.kind, auth.role, { [top]: next.fields[top] }, record.fields, auth.userId);
    if (!allowed.ok) throw new SyncRequestError(403, allowed.reason);
    const hlc = encodeHlc(ctx.clock.now(pt));
    const actor = { deviceId: 'server', userId: auth.userId, role: auth.role };
    club.changeSeq += 1;
    Object.assign(record, {
      ...next,
      version: record.version + 1,
      hlc: maxEncodedHlc(record.hlc, hlc),
      updatedAt: new Date(pt).toISOString(),
      changeSeq: club.changeSeq,
      lastActor: actor,
      fieldStamps: { ...record.fieldStamps, [conflict.field.split('.')[0]!]: { actor, hlc } },
    });
  }
  Object.assign(conflict, {
    status: 'settled',
    settledBy: auth.userId,
    settledAt: new Date(pt).toISOString(),
    settledValue: value,
    ...(req.data.note !== undefined ? { note: req.data.note } : {}),
  });
  return JSON.parse(JSON.stringify(conflict)) as ConflictRecord;
}
