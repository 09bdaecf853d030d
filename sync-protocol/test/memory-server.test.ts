import { describe, expect, it } from 'vitest';
import { MemorySyncServer, SyncRequestError, type AuthContext } from '../src/index.js';
import { FIXTURES, ID } from './support/fixtures.js';
import { mut, T0 } from './support/mutations.js';

const CLUB = 'club-gull-point';
const ana: AuthContext = { userId: 'member-ana', role: 'crew', clubId: CLUB };
const ben: AuthContext = { userId: 'member-ben', role: 'driver', clubId: CLUB };
const sue: AuthContext = { userId: 'member-sue', role: 'supervisor', clubId: CLUB };
const D1 = '0190f1a0-0000-7000-8000-0000000000d1';
const push = (s: MemorySyncServer, auth: AuthContext, deviceId: string, mutations: unknown[], pt = T0) =>
  s.push(auth, { protocolVersion: 1, deviceId, mutations }, pt);

describe('memory sync server', () => {
  it('creates, versions and pulls records in change order', () => {
    const s = new MemorySyncServer();
    const r = push(s, ana, 'phone-a', [mut('defect', D1, 1, FIXTURES.defect), mut('defect', D1, 2, { description: 'Both tubes gone' }, { baseVersion: 1, base: { description: FIXTURES.defect.description } })]);
    expect(r.results.map((x) => [x.status, x.version])).toEqual([['applied', 1], ['applied', 2]]);
    expect(r.lastSeq).toBe(2);
    const p = s.pull(ben, {});
    expect(p.changes).toHaveLength(1);
    expect(p.changes[0]).toMatchObject({ id: D1, kind: 'defect', clubId: CLUB, version: 2, deleted: false, fields: { description: 'Both tubes gone' } });
    expect(s.pull(ben, { since: p.checkpoint }).changes).toEqual([]);
  });

  it('answers a replayed batch with duplicate and changes nothing', () => {
    const s = new MemorySyncServer();
    const batch = [mut('defect', D1, 1, FIXTURES.defect)];
    push(s, ana, 'phone-a', batch);
    const before = s.records(CLUB);
    const again = push(s, ana, 'phone-a', [...batch, mut('defect', D1, 2, { description: 'later' }, { baseVersion: 1, base: { description: FIXTURES.defect.description } })]);
    expect(again.results.map((x) => x.status)).toEqual(['duplicate', 'applied']);
    expect(again.results[0]!.version).toBe(1);
    expect(before[0]!.version).toBe(1);
    expect(s.pull(ben).checkpoint).toBe('2');
  });

  it('rejects a bad mutation alone, with a readable reason, and still advances seq', () => {
    const s = new MemorySyncServer();
    const r = push(s, ana, 'phone-a', [
      mut('defect', D1, 1, { ...FIXTURES.defect, status: 'fixed' }),
      mut('trip', ID.trip, 2, FIXTURES.trip),
      mut('defect', '0190f1a0-0000-7000-8000-0000000000d2', 3, FIXTURES.defect),
    ]);
    expect(r.results.map((x) => x.status)).toEqual(['rejected', 'rejected', 'applied']);
    expect(r.results[0]!.error).toMatchObject({ code: 'invalid', message: 'Status must be one of: open, assigned, repaired, verified, rejected.' });
    expect(r.results[1]!.error).toEqual({ code: 'forbidden', message: 'Only a driver, supervisor or admin may add a trip.' });
    expect(r.lastSeq).toBe(3);
  });

  it('refuses a change stamped more than five minutes ahead of the server clock', () => {
    const s = new MemorySyncServer();
    const r = push(s, ana, 'phone-a', [mut('defect', D1, 1, FIXTURES.defect, { l: T0 + 12 * 60_000 })]);
    expect(r.results[0]).toMatchObject({ status: 'rejected', error: { code: 'clock-drift' } });
    expect(r.results[0]!.error!.message).toMatch(/12 minutes ahead of the server/);
  });

  it('refuses an outdated protocol and a malformed push as a whole', () => {
    const s = new MemorySyncServer();
    expect(() => s.push(ana, { protocolVersion: 0, deviceId: 'p', mutations: [] }, T0)).toThrow(expect.objectContaining({ httpStatus: 426 }));
    expect(() => s.push(ana, { protocolVersion: 1, deviceId: 'p', mutations: [{}] }, T0)).toThrow(SyncRequestError);
    expect(() => s.push(ana, null, T0)).toThrow(expect.objectContaining({ httpStatus: 400 }));
  });

  it('stores the overruled value of a two-sided change as a conflict, with both writers', () => {
    const s = new MemorySyncServer();
    push(s, ben, 'phone-b', [mut('trip', ID.trip, 1, FIXTURES.trip, { node: 'phone-b' })]);
    push(s, ben, 'phone-b', [mut('trip', ID.trip, 2, { purpose: 'rescue' }, { baseVersion: 1, base: { purpose: 'patrol' }, l: T0 + 2, node: 'phone-b' })]);
    const r = push(s, sue, 'phone-s', [mut('trip', ID.trip, 1, { purpose: 'training' }, { baseVersion: 1, base: { purpose: 'patrol' }, l: T0 + 1, node: 'phone-s' })]);
    expect(r.results[0]).toMatchObject({ status: 'conflict', version: 2 });
    const [c] = s.conflicts(CLUB);
    expect(c).toMatchObject({
      id: r.results[0]!.conflictId, recordId: ID.trip, kind: 'trip', field: 'purpose', keptValue: 'rescue', overruledValue: 'training', status: 'open',
      kept: { deviceId: 'phone-b', userId: 'member-ben' }, overruled: { deviceId: 'phone-s', userId: 'member-sue' },
    });
  });

  it('hides incident notes from other crew but moves their checkpoint past them', () => {
    const s = new MemorySyncServer();
    const note = '0190f1a0-0000-7000-8000-0000000000e1';
    push(s, ana, 'phone-a', [mut('incidentNote', note, 1, FIXTURES.incidentNote), mut('defect', D1, 2, FIXTURES.defect)]);
    const cy: AuthContext = { userId: 'member-cy', role: 'crew', clubId: CLUB };
    const first = s.pull(cy, { limit: 1 });
    expect(first.changes.map((c) => c.id)).toEqual([D1]);
    expect(first).toMatchObject({ checkpoint: '2', hasMore: false });
    expect(s.pull(ana).changes).toHaveLength(2);
    expect(s.pull(ben).changes).toHaveLength(2);
  });

  it('keeps clubs apart', () => {
    const s = new MemorySyncServer();
    push(s, ana, 'phone-a', [mut('defect', D1, 1, FIXTURES.defect)]);
    expect(s.pull({ ...ben, clubId: 'club-other' }).changes).toEqual([]);
  });

  it('asks a replica older than purged tombstones to reset', () => {
    const s = new MemorySyncServer();
    push(s, sue, 'phone-s', [mut('defect', D1, 1, FIXTURES.defect), mut('defect', D1, 2, {}, { deleted: true, baseVersion: 1, base: FIXTURES.defect })]);
    push(s, sue, 'phone-s', [mut('defect', '0190f1a0-0000-7000-8000-0000000000d2', 3, FIXTURES.defect)]);
    expect(s.purgeTombstones(CLUB, 2)).toBe(1);
    expect(s.pull(ana, { since: '1' })).toMatchObject({ resetRequired: true, changes: [] });
    expect(s.pull(ana, {}).changes).toHaveLength(1);
  });

  it('lets a replica that starts afresh after a purge pull every page, and still resets one that pulled before it', () => {
    const s = new MemorySyncServer();
    const ids = [1, 2, 3, 4].map((i) => `0190f1a0-0000-7000-8000-0000000000f${i}`);
    push(s, sue, 'phone-s', ids.map((id, i) => mut('defect', id, i + 1, FIXTURES.defect)));
    // Ana is part-way through her pull when the first record is deleted and its tombstone purged.
    const early = s.pull(ana, { limit: 1 });
    expect(early).toMatchObject({ checkpoint: '1', hasMore: true });
    push(s, sue, 'phone-s', [mut('defect', ids[0]!, 5, {}, { deleted: true, baseVersion: 1, base: FIXTURES.defect })]);
    expect(s.purgeTombstones(CLUB, 5)).toBe(1);
    expect(s.pull(ana, { since: early.checkpoint, limit: 1 })).toMatchObject({ resetRequired: true, changes: [] });

    // Her fresh start goes page by page below the horizon without being sent back to the start.
    const seen: string[] = [];
    let since: string | undefined;
    for (let page = 0; page < 10; page++) {
      const res = s.pull(ana, { since, limit: 1 });
      expect(res.resetRequired).toBeUndefined();
      seen.push(...res.changes.map((c) => c.id));
      since = res.checkpoint;
      if (!res.hasMore) break;
    }
    expect(seen).toEqual(ids.slice(1));
    expect(s.pull(ana, { since }).changes).toEqual([]);
  });

  it('reads a plain-number checkpoint as one given out before any purge', () => {
    const s = new MemorySyncServer();
    push(s, sue, 'phone-s', [mut('defect', D1, 1, FIXTURES.defect), mut('defect', D1, 2, {}, { deleted: true, baseVersion: 1, base: FIXTURES.defect })]);
    push(s, sue, 'phone-s', [mut('defect', '0190f1a0-0000-7000-8000-0000000000d2', 3, FIXTURES.defect)]);
    expect(s.pull(ana, { since: '1' }).checkpoint).toBe('3');
    s.purgeTombstones(CLUB, 2);
    expect(s.pull(ana, { since: '1' }).resetRequired).toBe(true);
    const onward = s.pull(ana, { since: '2' });
    expect(onward).toMatchObject({ checkpoint: '2.3', hasMore: false });
    expect(onward.changes.map((c) => c.id)).toEqual(['0190f1a0-0000-7000-8000-0000000000d2']);
    expect(s.pull(ana, { since: '3' })).toMatchObject({ changes: [], checkpoint: '2.3' });
  });

  it('resets a replica again when a second purge passes its fresh start', () => {
    const s = new MemorySyncServer();
    const [a, b, c] = ['0190f1a0-0000-7000-8000-0000000000a1', '0190f1a0-0000-7000-8000-0000000000a2', '0190f1a0-0000-7000-8000-0000000000a3'];
    push(s, sue, 'phone-s', [mut('defect', a, 1, FIXTURES.defect), mut('defect', a, 2, {}, { deleted: true, baseVersion: 1, base: FIXTURES.defect })]);
    s.purgeTombstones(CLUB, 2);
    push(s, sue, 'phone-s', [mut('defect', b, 3, FIXTURES.defect), mut('defect', c, 4, FIXTURES.defect)]);
    const fresh = s.pull(ana, { limit: 1 });
    expect(fresh).toMatchObject({ checkpoint: '2.3', hasMore: true });
    push(s, sue, 'phone-s', [mut('defect', c, 5, {}, { deleted: true, baseVersion: 1, base: FIXTURES.defect })]);
    s.purgeTombstones(CLUB, 5);
    expect(s.pull(ana, { since: fresh.checkpoint })).toMatchObject({ resetRequired: true });
  });

  it('checks a record changed again in the same batch as strictly as in a batch of its own', () => {
    const later = (seq: number, patch: Record<string, unknown>, baseVersion: number, base: Record<string, unknown>) =>
      mut('defect', D1, seq, patch, { baseVersion, base, l: T0 + seq });
    const edits = [
      later(2, { actionTaken: 'New tube fitted' }, 1, { actionTaken: null }),
      later(3, { status: 'rejected' }, 2, { status: 'open' }), // a rejection needs its reason
      later(4, { photos: ['cd'.repeat(32)] }, 1, { photos: FIXTURES.defect.photos }), // made before the first edit arrived
      later(5, { description: '' }, 3, { description: FIXTURES.defect.description }),
    ];
    const create = mut('defect', D1, 1, FIXTURES.defect);
    const together = new MemorySyncServer();
    const one = push(together, sue, 'phone-s', [create, ...edits]).results;
    const apart = new MemorySyncServer();
    const each = [push(apart, sue, 'phone-s', [create]), ...edits.map((e) => push(apart, sue, 'phone-s', [e]))]
      .flatMap((r) => r.results);
    expect(one.map((r) => r.status)).toEqual(['applied', 'applied', 'rejected', 'merged', 'rejected']);
    expect(one).toEqual(each);
    expect(one[2]!.error!.message).toMatch(/Say why the report is not a defect/);
    expect(together.record(CLUB, D1)).toEqual(apart.record(CLUB, D1));
  });

  it('lets a supervisor settle a conflict by writing the overruled value', () => {
    const s = new MemorySyncServer();
    push(s, ana, 'phone-a', [mut('defect', D1, 1, FIXTURES.defect)]);
    push(s, ana, 'phone-a', [mut('defect', D1, 2, { description: 'A' }, { baseVersion: 1, base: { description: FIXTURES.defect.description }, l: T0 + 5 })]);
    push(s, ben, 'phone-b', [mut('defect', D1, 1, { description: 'B' }, { baseVersion: 1, base: { description: FIXTURES.defect.description }, l: T0 + 1, node: 'phone-b' })]);
    const [c] = s.conflicts(CLUB);
    const req = { protocolVersion: 1, conflictId: c!.id, choice: 'overruled' as const, note: 'B is what we found' };
    expect(() => s.settle(ben, req, T0 + 10)).toThrow(/Only a supervisor or admin may settle/);
    const settled = s.settle(sue, req, T0 + 10);
    expect(settled).toMatchObject({ status: 'settled', settledBy: 'member-sue', settledValue: 'B', note: 'B is what we found' });
    expect(s.record(CLUB, D1)).toMatchObject({ version: 3, fields: { description: 'B' } });
    expect(() => s.settle(sue, req, T0 + 11)).toThrow(expect.objectContaining({ httpStatus: 409 }));
  });

  it('holds a settled value to the rules on who may write the field', () => {
    // Two admins renamed one member card offline; only an admin may write a member's name.
    const adam: AuthContext = { userId: 'member-adam', role: 'admin', clubId: CLUB };
    const ada: AuthContext = { userId: 'member-ada', role: 'admin', clubId: CLUB };
    const s = new MemorySyncServer();
    const name = FIXTURES.member.displayName;
    push(s, adam, 'desk-a', [mut('member', D1, 1, FIXTURES.member)]);
    push(s, adam, 'desk-a', [mut('member', D1, 2, { displayName: 'Ben Arkwright-Hale' }, { baseVersion: 1, base: { displayName: name }, l: T0 + 5 })]);
    push(s, ada, 'desk-b', [mut('member', D1, 1, { displayName: 'Benjamin Arkwright' }, { baseVersion: 1, base: { displayName: name }, l: T0 + 1, node: 'desk-b' })]);
    const [c] = s.conflicts(CLUB);
    const other = { protocolVersion: 1, conflictId: c!.id, choice: 'other' as const, value: 'B. Arkwright' };
    expect(() => s.settle(sue, other, T0 + 10)).toThrow(expect.objectContaining({ httpStatus: 403 }));
    expect(s.conflicts(CLUB)[0]).toMatchObject({ status: 'open' });
    expect(s.settle(adam, other, T0 + 10)).toMatchObject({ status: 'settled', settledValue: 'B. Arkwright' });
    expect(s.record(CLUB, D1)).toMatchObject({ fields: { displayName: 'B. Arkwright' } });
  });
});
