import type { RecordKind } from './kinds.js';
import type { Fields, Mutation, SyncRecord } from './wire.js';
import { cloneJson } from './deep-equal.js';

/** A change the device made that the server has not yet reflected back in a pull. */
export interface PendingChange {
  patch: Fields;
  deleted?: boolean;
}

/** What a device shows for one record: the server's copy with its own pending changes on top. */
export interface LocalView {
  id: string;
  kind: RecordKind;
  /** The server version the view is based on; 0 for a record the server has not sent yet. */
  version: number;
  fields: Fields;
  deleted: boolean;
  pending: number;
}

/**
 * Pending local edits stay on top of what is pulled: when a pull brings a record the device
 * still has changes queued for, the device shows the pulled record with those changes
 * reapplied in order, so an edit never seems to vanish while it waits for the server.
 */
export function overlayPending(
  id: string,
  kind: RecordKind,
  shadow: SyncRecord | undefined,
  pending: readonly PendingChange[],
): LocalView | undefined {
  if (!shadow && pending.length === 0) return undefined;
  const view: LocalView = {
    id,
    kind,
    version: shadow?.version ?? 0,
    fields: cloneJson(shadow?.fields ?? {}),
    deleted: shadow?.deleted ?? false,
    pending: pending.length,
  };
  // As the server's merge has it: a delete deletes, and an edit of a record someone else deleted
  // brings it back (the delete is kept in a conflict for a supervisor).
  for (const change of pending) {
    Object.assign(view.fields, cloneJson(change.patch));
    view.deleted = change.deleted === true;
  }
  return view;
}

export interface NewMutation {
  mutationId: string;
  seq: number;
  hlc: string;
  /** The record as the device shows it now (undefined for a new record). */
  view: LocalView | undefined;
  kind: RecordKind;
  recordId: string;
  patch: Fields;
  deleted?: boolean;
}

/**
 * A mutation with the base the merge needs: the shown value of each patched field (for a
 * delete, of every field), and the server version the shown record is based on.
 */
export function buildMutation(n: NewMutation): Mutation {
  const shown = n.view?.fields ?? {};
  const baseFields = n.deleted ? Object.keys(shown) : Object.keys(n.patch);
  const base: Fields = {};
  for (const f of baseFields) if (f in shown) base[f] = cloneJson(shown[f]);
  const m: Mutation = {
    mutationId: n.mutationId,
    seq: n.seq,
    recordId: n.recordId,
    kind: n.kind,
    baseVersion: n.view?.version ?? 0,
    base,
    hlc: n.hlc,
    patch: cloneJson(n.patch),
  };
  if (n.deleted) m.deleted = true;
  return m;
}
