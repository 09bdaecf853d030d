import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  MemorySyncServer, canCreate, canDelete, deepEqual, mergeRuleOf, validateRecord,
  type AuthContext, type Mutation, type MutationResult, type PushResponse,
} from '../src/index.js';
import { SimDevice, type SimTransport } from './support/sim-device.js';
import { Uniq, editsFor, newDefect, newTrip } from './support/sim-ops.js';

const CLUB = 'club-gull-point';
const T0 = 1_796_000_000_000;
const KINDS = ['defect', 'trip'] as const;
const numRuns = Number(process.env.SOAK_RUNS ?? 200);
/** SIM_SEED and SIM_PATH from a failure report replay that exact case. */
const replay = process.env.SIM_SEED ? { seed: Number(process.env.SIM_SEED), path: process.env.SIM_PATH, endOnFailure: true } : {};

type Op =
  | { t: 'create'; dev: number; kind: 0 | 1 }
  | { t: 'edit'; dev: number; kind: 0 | 1; pick: number; edit: number; variant: number }
  | { t: 'delete'; dev: number; kind: 0 | 1; pick: number }
  | { t: 'push'; dev: number; max: number; drop: boolean }
  | { t: 'pull'; dev: number; limit: number; drop: boolean }
  | { t: 'tick'; ms: number };

const dev = fc.integer({ min: 0, max: 2 });
const kind = fc.constantFrom(0 as const, 1 as const);
const drop = fc.constantFrom(false, false, true);
const opArb: fc.Arbitrary<Op> = fc.oneof(
  { weight: 2, arbitrary: fc.record({ t: fc.constant('create' as const), dev, kind }) },
  { weight: 5, arbitrary: fc.record({ t: fc.constant('edit' as const), dev, kind, pick: fc.nat(20), edit: fc.nat(20), variant: fc.nat(20) }) },
  { weight: 1, arbitrary: fc.record({ t: fc.constant('delete' as const), dev, kind, pick: fc.nat(20) }) },
  { weight: 3, arbitrary: fc.record({ t: fc.constant('push' as const), dev, max: fc.integer({ min: 1, max: 4 }), drop }) },
  { weight: 3, arbitrary: fc.record({ t: fc.constant('pull' as const), dev, limit: fc.integer({ min: 1, max: 4 }), drop }) },
  { weight: 2, arbitrary: fc.record({ t: fc.constant('tick' as const), ms: fc.integer({ min: 0, max: 90_000 }) }) },
);

/** The memory server, watched: every push it answers is checked for replay safety and logged. */
class WatchedServer implements SimTransport {
  readonly server = new MemorySyncServer();
  readonly firstResult = new Map<string, MutationResult>();
  readonly sent = new Map<string, { deviceId: string; m: Mutation }>();

  push(auth: AuthContext, body: unknown, pt: number): PushResponse {
    const { deviceId, mutations } = body as { deviceId: string; mutations: Mutation[] };
    const lastBefore = this.server.lastSeq(CLUB, deviceId);
    const before = JSON.stringify([this.server.records(CLUB), this.server.conflicts(CLUB)]);
    const res = this.server.push(auth, body, pt);
    mutations.forEach((m, i) => {
      const r = res.results[i]!;
      if (r.status === 'duplicate') seen.set('duplicate', (seen.get('duplicate') ?? 0) + 1);
      expect(r.mutationId).toBe(m.mutationId);
      expect(r.status === 'duplicate').toBe(m.seq <= lastBefore);
      if (!this.firstResult.has(m.mutationId)) this.firstResult.set(m.mutationId, r);
      this.sent.set(m.mutationId, { deviceId, m });
    });
    if (mutations.every((m) => m.seq <= lastBefore)) {
      expect(JSON.stringify([this.server.records(CLUB), this.server.conflicts(CLUB)])).toBe(before);
    }
    return res;
  }

  pull(auth: AuthContext, query: { since?: string; limit?: number }) {
    return this.server.pull(auth, query);
  }
}

function makeDevices(): SimDevice[] {
  const members: [string, AuthContext['role'], number][] = [
    ['member-sue', 'supervisor', 90_000],
    ['member-ben', 'driver', -60_000],
    ['member-ana', 'crew', 0],
  ];
  return members.map(([userId, role, offset], i) => new SimDevice(`phone-${i}`, { userId, role, clubId: CLUB }, offset, i + 1));
}

function run(ops: Op[]): void {
  const watched = new WatchedServer();
  const devices = makeDevices();
  const u = new Uniq();
  let pt = T0;
  for (const op of ops) {
    if (op.t === 'tick') {
      pt += op.ms;
      continue;
    }
    const d = devices[op.dev]!;
    const { role, userId } = d.auth;
    if (op.t === 'create') {
      const k = KINDS[op.kind];
      if (!canCreate(k, role)) continue;
      d.write(k, d.newRecordId(), k === 'defect' ? newDefect(u, userId, pt) : newTrip(u, userId, pt), pt);
    } else if (op.t === 'edit') {
      const k = KINDS[op.kind];
      const [shown, makers] = [d.visible(k), editsFor(k, role)];
      if (shown.length === 0 || makers.length === 0) continue;
      const v = shown[op.pick % shown.length]!;
      d.write(k, v.id, makers[op.edit % makers.length]!(v, u, userId, pt, op.variant), pt);
    } else if (op.t === 'delete') {
      const k = KINDS[op.kind];
      const shown = d.visible(k);
      if (shown.length === 0 || !canDelete(k, role)) continue;
      d.write(k, shown[op.pick % shown.length]!.id, {}, pt, true);
    } else if (op.t === 'push') {
      d.push(watched, pt, op.max, op.drop);
    } else {
      d.pull(watched, pt, op.limit, op.drop);
      assertPendingOnTop(d);
    }
  }
  pt += 1_000;
  for (const d of devices) d.syncFully(watched, pt);
  for (const d of devices) d.syncFully(watched, pt);
  assertConverged(watched, devices);
  assertNothingLost(watched);
  tally(watched);
}

/** After a pull, each field a queued change touches shows the latest queued value. */
function assertPendingOnTop(d: SimDevice): void {
  const latest = new Map<string, unknown>();
  for (const e of d.outboxEntries()) {
    if (e.ackVersion !== undefined) continue;
    for (const [f, value] of Object.entries(e.mutation.patch)) latest.set(`${e.mutation.recordId}|${f}`, value);
  }
  for (const [key, value] of latest) {
    const [id, f] = key.split('|') as [string, string];
    expect(d.view(id)!.fields[f]).toEqual(value);
  }
}

function assertConverged(w: WatchedServer, devices: SimDevice[]): void {
  const records = w.server.records(CLUB);
  for (const d of devices) {
    expect(d.outboxEntries()).toEqual([]);
    for (const r of records) {
      const v = d.view(r.id);
      expect(v, `${d.id} knows ${r.id}`).toBeDefined();
      expect({ version: v!.version, deleted: v!.deleted, fields: v!.fields }).toEqual({ version: r.version, deleted: r.deleted, fields: r.fields });
    }
    expect(d.visible().length).toBe(records.filter((r) => !r.deleted).length);
  }
  for (const r of records) if (!r.deleted) expect(validateRecord(r.kind, r.fields).ok).toBe(true);
}

/**
 * Every value a device wrote is on the server now, or kept in a conflict record, or was
 * replaced by a later write that knew it: the same device's later write of the field, or
 * any write whose base (what its device showed) held that value. Values are unique, so a
 * base holding one means its writer saw it.
 */
function assertNothingLost(w: WatchedServer): void {
  const accepted = [...w.sent.values()].filter(({ m }) => w.firstResult.get(m.mutationId)!.status !== 'rejected');
  expect([...w.firstResult.values()].filter((r) => r.status === 'rejected')).toEqual([]);
  const conflicts = w.server.conflicts(CLUB);
  for (const { deviceId, m } of accepted) {
    const rec = w.server.record(CLUB, m.recordId)!;
    const others = accepted.filter((x) => x.m !== m && x.m.recordId === m.recordId);
    const fields = Object.entries(m.patch).concat(m.deleted ? [['deleted', true]] : []);
    for (const [f, value] of fields) {
      const now = f === 'deleted' ? rec.deleted : rec.fields[f];
      const laterOwn = others.some((x) => x.deviceId === deviceId && x.m.seq > m.seq && f in x.m.patch);
      if (mergeRuleOf(m.kind, f) === 'union') {
        for (const item of value as unknown[]) {
          const here = !rec.deleted && (now as unknown[]).some((x) => deepEqual(x, item));
          const removedKnowingly = others.some(({ m: x }) =>
            ((x.base[f] as unknown[] | undefined) ?? []).some((y) => deepEqual(y, item)) &&
            (x.deleted || (Array.isArray(x.patch[f]) && !(x.patch[f] as unknown[]).some((y) => deepEqual(y, item)))));
          expect(here || removedKnowingly, `${m.kind}.${f} item ${JSON.stringify(item)} from ${m.mutationId}`).toBe(true);
        }
        continue;
      }
      // A tombstone's fields do not count as kept: only the delete flag is current there.
      const current = deepEqual(now, value) && (f === 'deleted' || !rec.deleted);
      const inConflict = conflicts.some((c) => c.recordId === m.recordId && c.field === f && (deepEqual(c.overruledValue, value) || deepEqual(c.keptValue, value)));
      const replacedKnowingly = others.some(({ m: x }) => f in x.base && deepEqual(x.base[f], value) && (f in x.patch || x.deleted));
      expect(current || inConflict || laterOwn || replacedKnowingly, `${m.kind}.${f}=${JSON.stringify(value)} from ${m.mutationId}`).toBe(true);
    }
  }
}

/** What the runs exercised, so the property cannot pass by never reaching the hard cases. */
const seen = new Map<string, number>();
function tally(w: WatchedServer): void {
  const bump = (k: string) => seen.set(k, (seen.get(k) ?? 0) + 1);
  for (const [id, first] of w.firstResult) {
    bump(first.status);
    if (w.sent.get(id)!.m.deleted) bump(`delete-${first.status}`);
  }
  for (const r of w.server.records(CLUB)) if (r.deleted) bump('tombstone');
  for (const c of w.server.conflicts(CLUB)) bump(`conflict:${c.field}`);
}

describe('sync simulation: three phones, offline edits, dropped answers, replays', () => {
  // A run takes a few ms; the limit scales with SOAK_RUNS so a soak is not cut short.
  it('converges with every replica equal to the server and no write lost silently', { timeout: Math.max(60_000, numRuns * 250) }, () => {
    fc.assert(fc.property(fc.array(opArb, { minLength: 10, maxLength: 80, size: 'max' }), (ops) => run(ops)), { numRuns, ...replay });
    if (numRuns >= 100) {
      for (const k of ['merged', 'conflict', 'duplicate', 'delete-merged', 'delete-conflict', 'conflict:deleted', 'conflict:description']) {
        expect(seen.get(k) ?? 0, `runs reached "${k}"`).toBeGreaterThan(0);
      }
    }
  });
});
