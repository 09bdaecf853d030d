import {
  checkCreate, checkDelete, checkUpdate, deepEqual, validatePatch, validateRecord,
  type FieldError, type KindFields, type RecordKind, type Role,
} from '@breakline/sync-protocol';
import type { Transaction } from 'dexie';
import { appendMutation } from './append';
import { localWrites } from './events';
import { loadReplica } from './replica-state';
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

/**
 * One rw transaction on records, outbox and syncState. `work` is handed `commit`, to call once
 * its last writes are issued: a transaction of this write's own then commits with them, rather
 * than a round trip later, once their answers are back. Inside a caller's transaction (several
 * writes saved as one) it does nothing, and that transaction commits when the caller is done.
 */
function transact<T>(ctx: WriteContext, work: (commit: () => void) => Promise<T>): Promise<T> {
  const { db } = ctx;
  const run = (tx: Transaction) => work(() => {
    if (!tx.parent) tx.idbtrans.commit?.();
  });
  return db.transaction('rw', db.records, db.outbox, db.syncState, run).then((result) => {
    localWrites.notify(ctx.clubId);
    return result;
  });
}

/** Saves a new record on this phone and queues it; resolves its id (a uuid v7). */
export async function createRecord<K extends RecordKind>(ctx: WriteContext, kind: K, fields: KindFields[K]): Promise<string> {
  return createRecordAs(ctx, kind, uuid7((ctx.now ?? Date.now)()), fields);
}

/** createRecord under a given id: a refused new record made again (db/resend.ts) keeps its own. */
export async function createRecordAs<K extends RecordKind>(ctx: WriteContext, kind: K, id: string, fields: KindFields[K]): Promise<string> {
  const valid = validateRecord(kind, fields);
  if (!valid.ok) throw invalid(valid.errors);
  guard(checkCreate(kind, ctx.role, valid.value, ctx.userId));
  const now = (ctx.now ?? Date.now)();
  await transact(ctx, async (commit) => {
    const replica = await loadReplica(ctx.db, now);
    await appendMutation(ctx.db, { clubId: ctx.clubId, kind, recordId: id, row: undefined, view: undefined, patch: valid.value, now, replica }, commit);
  });
  return id;
}

/**
 * The fields to set, or a function that works them out from the record as shown when the write
 * runs, inside its transaction: for a change to part of a field (one answer of a check's
 * results), so two quick changes in a row each build on the other. The function reads the
 * shown fields and returns new values; it must not change what it is handed.
 */
export type RecordChange<K extends RecordKind> = Partial<KindFields[K]> | ((shown: KindFields[K]) => Partial<KindFields[K]>);

function validPatch<K extends RecordKind>(kind: K, patch: unknown): Partial<KindFields[K]> {
  const valid = validatePatch(kind, patch);
  if (!valid.ok) throw invalid(valid.errors);
  return valid.value;
}

/** Changes fields of a record. Fields equal to what is shown are left out; no change, no mutation. */
export async function updateRecord<K extends RecordKind>(
  ctx: WriteContext, kind: K, id: string, change: RecordChange<K>,
): Promise<void> {
  // A fixed patch is refused before a transaction opens; a worked-out one once it is worked out.
  const fixed = typeof change === 'function' ? undefined : validPatch(kind, change);
  await transact(ctx, async (commit) => {
    const now = (ctx.now ?? Date.now)();
    const [row, replica] = await Promise.all([shownRow(ctx, kind, id), loadReplica(ctx.db, now)]);
    const patch = fixed ?? validPatch(kind, (change as (shown: KindFields[K]) => Partial<KindFields[K]>)(row.fields as KindFields[K]));
    const changed = Object.fromEntries(Object.entries(patch).filter(([f, v]) => !deepEqual(v, row.fields[f])));
    if (Object.keys(changed).length === 0) return;
    // The whole record as it would be shown, so a rule across fields is never broken in the queue.
    const whole = validateRecord(kind, { ...row.fields, ...changed });
    if (!whole.ok) throw invalid(whole.errors);
    guard(checkUpdate(kind, ctx.role, changed, row.fields, ctx.userId));
    await appendMutation(ctx.db, { clubId: ctx.clubId, kind, recordId: id, row, view: toLocalView(row), patch: changed, now, replica }, commit);
  });
}

/** Deletes a record (a tombstone on the server, so other phones learn of it). */
export async function deleteRecord(ctx: WriteContext, kind: RecordKind, id: string): Promise<void> {
  await transact(ctx, async (commit) => {
    const now = (ctx.now ?? Date.now)();
    const [row, replica] = await Promise.all([shownRow(ctx, kind, id), loadReplica(ctx.db, now)]);
    guard(checkDelete(kind, ctx.role, row.fields, ctx.userId));
    await appendMutation(ctx.db, { clubId: ctx.clubId, kind, recordId: id, row, view: toLocalView(row), patch: {}, deleted: true, now, replica }, commit);
  });
}
