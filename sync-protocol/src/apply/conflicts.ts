import type { FieldConflict } from '../merge-types.js';
import type { ConflictRecord, Mutation } from '../wire.js';
import type { ApplyContext } from './apply-mutation.js';

/** Store each overruled value as an open conflict; returns the new conflicts' ids. */
export function recordConflicts(ctx: ApplyContext, m: Mutation, conflicts: readonly FieldConflict[]): string[] {
  return conflicts.map((c) => {
    const record: ConflictRecord = {
      id: ctx.newId(),
      clubId: ctx.auth.clubId,
      recordId: m.recordId,
      kind: m.kind,
      field: c.field,
      keptValue: c.keptValue,
      overruledValue: c.overruledValue,
      kept: { deviceId: c.kept.actor.deviceId, userId: c.kept.actor.userId, hlc: c.kept.hlc },
      overruled: { deviceId: c.overruled.actor.deviceId, userId: c.overruled.actor.userId, hlc: c.overruled.hlc },
      status: 'open',
      createdAt: new Date(ctx.pt).toISOString(),
    };
    ctx.club.conflicts.push(JSON.parse(JSON.stringify(record)) as ConflictRecord);
    return record.id;
  });
}
