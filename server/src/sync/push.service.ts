import { Injectable } from '@nestjs/common';
import { DataSource, type EntityManager } from 'typeorm';
import {
  applyMutation, deepEqual, HybridClock, kindSpec, parsePushRequest,
  type ClubState, type Fields, type Mutation, type MutationError, type MutationResult, type PushResponse, type RecordKind, type StoredRecord,
} from '@breakline/sync-protocol';
import { AppError } from '../common/app-error.js';
import type { Principal } from '../auth/principal.js';
import { recordStore } from '../records/record-store.js';
import { insertConflicts, insertRefusals, loadRefusals, writeChanges, type ChangeEntry, type Refusal } from './change-log.js';
import { deviceSeqPart, lockClubAndDevice, saveDeviceSeq } from './club-lock.js';
import { assertProtocol } from './sync-errors.js';

/** The server's own devices: member cards made on joining, and the demo's records. */
export const MEMBER_CARDS_DEVICE = 'member-cards';
export const DEMO_DEVICE = 'demo-seed';
/** Written by several people each, so no phone may push under their names. */
export const SERVER_DEVICES: ReadonlySet<string> = new Set([MEMBER_CARDS_DEVICE, DEMO_DEVICE]);

/** How a push comes in: from a phone over HTTP, or from the server's own work on one of SERVER_DEVICES. */
export interface PushOrigin { serverDevice?: boolean }

const NOT_FOUND = 'This record is not on the server, so the change could not be saved.';
const takenId = (kind: RecordKind) =>
  `This record's id is already taken by ${kindSpec(kind).label}, so it was not saved; make it again as a new record.`;

/**
 * Push: one transaction a batch. The club's records that the batch touches are loaded in one
 * query a kind, every mutation is checked and merged by the same rules the phones' tests use
 * (sync-protocol), and the records, their change log and the club's counter are written back in
 * one statement.
 */
@Injectable()
export class PushService {
  private readonly clock = new HybridClock('server');

  constructor(private readonly db: DataSource) {}

  async push(p: Principal, body: unknown, { serverDevice = false }: PushOrigin = {}): Promise<PushResponse> {
    assertProtocol(body);
    const parsed = parsePushRequest(body);
    if (!parsed.success) {
      const details = parsed.error.issues.map((i) => ({ field: i.path.join('.') || 'body', message: i.message }));
      throw new AppError(400, 'validation_failed', 'The push is not in the sync format.', details);
    }
    const { deviceId, mutations } = parsed.data;
    if (SERVER_DEVICES.has(deviceId) !== serverDevice) {
      throw new AppError(400, 'validation_failed', `The device name "${deviceId}" is kept for the server's own changes; a phone sends under its own id.`);
    }
    return this.db.transaction((em) => this.pushInTransaction(em, p, deviceId, mutations, serverDevice));
  }

  private async pushInTransaction(em: EntityManager, p: Principal, deviceId: string, mutations: Mutation[], serverDevice: boolean): Promise<PushResponse> {
    const locked = await lockClubAndDevice(em, p.clubId, deviceId);
    const { deviceSeq } = locked;
    // A phone's changes count by its own seq, so another member sending under its id could make
    // them read as already sent. A device belongs to the member who first pushed from it.
    if (!serverDevice && locked.ownerId !== null && locked.ownerId !== p.userId) {
      throw new AppError(403, 'forbidden', "This phone's sync id is already used by another member, so its changes were not taken. They stay on this phone; tell your club admin.");
    }
    const owner = serverDevice ? null : p.userId;
    // Duplicates are loaded too, so their answer carries the record's current version.
    const { records, foreign, otherKind } = await this.loadTouched(em, p.clubId, mutations);
    const club: ClubState = { records, changeSeq: locked.lastSeq, deviceSeq: { [deviceId]: deviceSeq }, conflicts: [], purgedThrough: locked.purgedThroughSeq };
    const auth = { userId: p.userId, role: p.role, clubId: p.clubId };
    const ctx = { club, auth, deviceId, pt: Date.now(), clock: this.clock, newId: () => crypto.randomUUID(), validated: new Map<Fields, Fields>() };
    const results: MutationResult[] = [];
    const changes: ChangeEntry[] = [];
    // A replay of a change refused before gets that refusal again: "duplicate" would tell the
    // phone it had been taken, and the phone would drop it.
    const replayed = mutations.filter((m) => m.seq <= deviceSeq).map((m) => m.mutationId);
    const refusedBefore = await loadRefusals(em, p.clubId, replayed);
    const refuse = (m: Mutation, error: MutationError) => results.push({ mutationId: m.mutationId, status: 'rejected', error });
    for (const m of mutations) {
      if (m.seq <= (club.deviceSeq[deviceId] ?? 0)) {
        const error = refusedBefore.get(m.mutationId);
        if (error) {
          refuse(m, error);
          continue;
        }
        const rec = club.records[m.recordId];
        results.push({ mutationId: m.mutationId, status: 'duplicate', ...(rec ? { version: rec.version } : {}) });
        continue;
      }
      club.deviceSeq[deviceId] = m.seq;
      if (foreign.has(m.recordId)) {
        refuse(m, { code: 'not-found', message: NOT_FOUND });
        continue;
      }
      const other = otherKind.get(m.recordId);
      if (other !== undefined && other !== m.kind) {
        refuse(m, { code: 'invalid', message: takenId(other) });
        continue;
      }
      // applyMutation replaces the record rather than changing it, so the old fields stay as they were.
      const before = club.records[m.recordId];
      const prevSeq = club.changeSeq;
      const result = applyMutation(ctx, m);
      results.push(result);
      if (club.changeSeq > prevSeq) changes.push(changeEntry(club.records[m.recordId]!, before?.fields, m, result));
    }
    const lastSeq = club.deviceSeq[deviceId] ?? deviceSeq;
    // Every refusal of the batch is kept; one kept before stays as it was.
    const refusals: Refusal[] = results.flatMap((r) => (r.status === 'rejected' && r.error ? [{ mutationId: r.mutationId, error: r.error }] : []));
    await insertRefusals(em, p.clubId, deviceId, refusals);
    // Each trip to the database waits its turn for the processor on a busy machine: the device's
    // seq goes with the changes when there are any.
    if (changes.length) {
      await this.write(em, p.clubId, club, locked.lastSeq, changes, [(params) => deviceSeqPart(params, deviceId, lastSeq, p.userId, owner)]);
    } else {
      await this.write(em, p.clubId, club, locked.lastSeq, changes);
      await saveDeviceSeq(em, p.clubId, deviceId, lastSeq, p.userId, owner);
    }
    return { results, lastSeq };
  }

  /**
   * The club's current records that the batch names; ids that belong to another club are set
   * apart, and so are the kinds that hold the ids a batch would create under another kind.
   */
  private async loadTouched(em: EntityManager, clubId: string, mutations: Mutation[]) {
    const byKind = new Map<RecordKind, Set<string>>();
    for (const m of mutations) (byKind.get(m.kind) ?? byKind.set(m.kind, new Set()).get(m.kind)!).add(m.recordId);
    const records: Record<string, StoredRecord> = {};
    const foreign = new Set<string>();
    for (const [kind, ids] of byKind) {
      for (const r of await recordStore.loadMany(em, kind, [...ids])) {
        if (r.clubId === clubId) records[r.id] = r;
        else foreign.add(r.id);
      }
    }
    // Only what would be made new needs the look across kinds; a record found is checked by kind in applyMutation.
    const unseen = [...new Set(mutations.filter((m) => m.baseVersion === 0 && !records[m.recordId] && !foreign.has(m.recordId)).map((m) => m.recordId))];
    const otherKind = await recordStore.kindsHolding(em, unseen);
    return { records, foreign, otherKind };
  }

  private async write(em: EntityManager, clubId: string, club: ClubState, startSeq: number, changes: ChangeEntry[], also: ((params: unknown[]) => string)[] = []) {
    if (club.changeSeq === startSeq && !club.conflicts.length) return;
    const changed = new Map<RecordKind, StoredRecord[]>();
    for (const r of Object.values(club.records)) {
      if (r.changeSeq > startSeq) (changed.get(r.kind) ?? changed.set(r.kind, []).get(r.kind)!).push(r);
    }
    // The counter moves only with a change, so a batch of conflicts alone leaves it be.
    if (changes.length) await writeChanges(em, clubId, changed, changes, club.changeSeq, also);
    await insertConflicts(em, club.conflicts);
  }
}

/**
 * What one accepted mutation wrote, for the change log and the record's history: for a new
 * record, all its fields (the very object, which the log then need not be sent twice).
 */
function changeEntry(rec: StoredRecord, prev: Record<string, unknown> | undefined, m: Mutation, result: MutationResult): ChangeEntry {
  let patch: Record<string, unknown> = rec.fields;
  if (prev) {
    patch = {};
    for (const k in rec.fields) if (!deepEqual(prev[k], rec.fields[k])) patch[k] = rec.fields[k];
  }
  return {
    seq: rec.changeSeq, kind: rec.kind, recordId: rec.id, version: rec.version, mutationId: m.mutationId,
    deviceId: rec.lastActor.deviceId, userId: rec.lastActor.userId, hlc: m.hlc, patch, deleted: rec.deleted, status: result.status,
  };
}
