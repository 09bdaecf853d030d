import {
  checkCreate, checkDelete, checkUpdate, deepEqual, validatePatch, validateRecord,
  type FieldError, type KindFields, type RecordKind, type Role,
} from '@breakline/sync-protocol';
import { appendMutation } from './append';
import { localWrites } from './events';
import type { ReplicaDb } from './schema';
import type { RecordRow } from './types';
import { uuid7 } from './uuid7';
import { toLocalView } from './view';
import { LocalWriteError } from './write-error';

/** Who writes, where: the signed-in person's replica and active club. */
export interface WriteContext {
  db: ReplicaDb;
  userId: string;
  clubId: string;
  role: Role;
  now?: () => number;
}

/*
 * Repeated edits of one record are queued in order, one mutation each, never folded together:
 * each carries the base the person saw, so the server's per-field merge and the conflict record
 * see every step (a check item marked failed then passed is still a failure a merge must weigh),
 * and a mutation already on the wire is never rewritten. Screens save on a finished answer or a
 * blur, not on each keystroke, so the queue stays at a few hundred a day.
 */

const invalid = (errors: FieldError[]) =>
  new LocalWriteError('invalid', errors.map((e) => e.message).join(' ') || 'This change is not valid.', errors);

function guard(decision: { ok: true } | { ok: false; reason: string }): void {
  if (!decision.ok) throw new LocalWriteError('forbidden', decision.reason);
}

async function shownRow(ctx: WriteContext, kind: RecordKind, id: string): Promise<RecordRow> {
  const row = await ctx.db.records.get(id);
  if (!row || row.clubId !== ctx.clubId || row.deleted) {
    throw new LocalWriteError('not-found', 'This record is not on this phone any more; it may have been deleted.');
  }
  if (row.kind !== kind) throw new LocalWriteError('invalid', `This record is a ${row.kind}, not a ${kind}.`);
  return row;
}

function transact<T>(ctx: WriteContext, work: () => Promise<T>): Promise<T> {
  const { db } = ctx;
  return db.transaction('rw', db.records, db.outbox, db.syncState, work).then((result) => {
    localWrites.notify(ctx.clubId);
    return result;
  });
}

/** Saves a new record on this phone and queues it; resolves its id (a uuid v7). */
export async function createRecord<K extends RecordKind>(ctx: WriteContext, kind: K, fields: KindFields[K]): Promise<string> {
  const valid = validateRecord(kind, fields);
  if (!valid.ok) throw invalid(valid.errors);
  guard(checkCreate(kind, ctx.role, valid.value, ctx.userId));
  const now = (ctx.now ?? Date.now)();
  const id = uuid7(now);
  await transact(ctx, () =>
    appendMutation(ctx.db, { clubId: ctx.clubId, kind, recordId: id, row: undefined, view: undefined, patch: valid.value, now }),
  );
  return id;
}

/** Changes fields of a record. Fields equal to what is shown are left out; no change, no mutation. */
export async function updateRecord<K extends RecordKind>(
  ctx: WriteContext, kind: K, id: string, patch: Partial<KindFields[K]>,
): Promise<void> {
  const valid = validatePatch(kind, patch);
  if (!valid.ok) throw invalid(valid.errors);
  await transact(ctx, async () => {
    const row = await shownRow(ctx, kind, id);
    const changed = Object.fromEntries(Object.entries(valid.value).filter(([f, v]) => !deepEqual(v, row.fields[f])));
    if (Object.keys(changed).length === 0) return;
    const whole = validateRecord(kind, { ...row.fields, ...changed });
    if (!whole.ok) throw invalid(whole.errors);
    guard(checkUpdate(kind, ctx.role, changed, row.fields, ctx.userId));
    const now = (ctx.now ?? Date.now)();
    await appendMutation(ctx.db, { clubId: ctx.clubId, kind, recordId: id, row, view: toLocalView(row), patch: changed, now });
  });
}

/** Deletes a record (a tombstone on the server, so other phones learn of it). */
export async function deleteRecord(ctx: WriteContext, kind: RecordKind, id: string): Promise<void> {
  await transact(ctx, async () => {
    const row = await shownRow(ctx, kind, id);
    guard(checkDelete(kind, ctx.role, row.fields, ctx.userId));
    const now = (ctx.now ?? Date.now)();
    await appendMutation(ctx.db, { clubId: ctx.clubId, kind, recordId: id, row, view: toLocalView(row), patch: {}, deleted: true, now });
  });
}
