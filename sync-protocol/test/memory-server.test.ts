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
});
