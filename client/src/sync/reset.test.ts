import { describe, expect, it } from 'vitest';
import { encodeHlc, PROTOCOL_VERSION } from '@breakline/sync-protocol';
import { getRecord, listRecords } from '@/db/queries';
import { createRecord, deleteRecord, updateRecord } from '@/db/write';
import { RESET_LOOP } from './pull';
import { FakeBackend } from './test/fake-backend';
import { defectFields, testDevice } from './test/device';

/** A supervisor's desk deletes the record; weeks on, its tombstone is purged. */
function deleteAndPurge(backend: FakeBackend, clubId: string, id: string, seq: number): void {
  const rec = backend.server.record(clubId, id)!;
  const desk = { userId: 'member-sam', role: 'supervisor' as const, clubId };
  const mutation = {
    mutationId: crypto.randomUUID(), seq, recordId: id, kind: rec.kind, baseVersion: rec.version, base: rec.fields,
    hlc: encodeHlc({ l: backend.now, c: seq, node: 'review-desk' }), patch: {}, deleted: true as const,
  };
  const [result] = backend.server.push(desk, { protocolVersion: PROTOCOL_VERSION, deviceId: 'review-desk', mutations: [mutation] }, backend.now).results;
  expect(result!.status).toBe('applied');
  expect(backend.server.purgeTombstones(clubId, Number.MAX_SAFE_INTEGER)).toBe(1);
}

describe('reset after the tombstone purge', () => {
  it('pulls afresh from the start, drops records gone from the server and keeps the outbox', async () => {
    const backend = new FakeBackend();
    const sam = testDevice(backend, 'member-sam', 'supervisor');
    const ana = testDevice(backend, 'member-ana');
    const kept = await createRecord(sam.writer, 'defect', defectFields({ description: 'Bow handle loose' }));
    const gone = await createRecord(sam.writer, 'defect', defectFields({ description: 'Duplicate report of the handle' }));
    await sam.sync();
    await ana.sync();
    expect(await listRecords(ana.db, ana.scope.clubId, 'defect')).toHaveLength(2);

    // Ana is offline for weeks: the report is deleted, the tombstone purged, and she edits meanwhile.
    await deleteRecord(sam.writer, 'defect', gone);
    await updateRecord(sam.writer, 'defect', kept, { actionTaken: 'Handle re-glued' });
    await sam.sync();
    backend.server.purgeTombstones(sam.scope.clubId, Number.MAX_SAFE_INTEGER);
    await updateRecord(ana.writer, 'defect', kept, { severity: 'stand-down' });
    const checkpointBefore = (await ana.db.syncState.get(`club:${ana.scope.clubId}`)) as { checkpoint?: string };

    const pulls: (string | null)[] = [];
    const watching: typeof fetch = (input, init) => {
      const url = new URL(String(input), 'http://phone.test');
      if (url.pathname.endsWith('/pull')) pulls.push(url.searchParams.get('since'));
      return backend.fetch(input, init);
    };
    expect(await ana.sync({ fetch: watching })).toEqual({ ok: true });
    expect(pulls).toEqual([checkpointBefore.checkpoint, null]);
    expect(await getRecord(ana.db, ana.scope.clubId, 'defect', gone)).toBeNull();
    expect(await ana.db.records.get(gone)).toBeUndefined();
    expect(await getRecord(ana.db, ana.scope.clubId, 'defect', kept)).toMatchObject({
      fields: { severity: 'stand-down', actionTaken: 'Handle re-glued' },
    });
    expect(backend.server.record(ana.scope.clubId, kept)!.fields.severity).toBe('stand-down');
  });

  it('keeps a record made here through the fresh pull', async () => {
    const backend = new FakeBackend();
    const sam = testDevice(backend, 'member-sam', 'supervisor');
    const ana = testDevice(backend);
    const id = await createRecord(ana.writer, 'defect', defectFields());
    await ana.sync();
    const mistake = await createRecord(sam.writer, 'defect', defectFields({ description: 'Wrong boat' }));
    await sam.sync();
    await deleteRecord(sam.writer, 'defect', mistake);
    await sam.sync();
    backend.server.purgeTombstones(sam.scope.clubId, Number.MAX_SAFE_INTEGER);
    const mine = await createRecord(ana.writer, 'defect', defectFields({ description: 'Kill cord clip cracked' }));
    expect(await ana.sync()).toEqual({ ok: true });
    expect((await listRecords(ana.db, ana.scope.clubId, 'defect')).map((r) => r.id).sort()).toEqual([id, mine].sort());
    expect(await ana.db.outbox.count()).toBe(0);
  });

  it('pulls afresh page by page after a purge, without being sent back to the start again', async () => {
    const backend = new FakeBackend();
    const sam = testDevice(backend, 'member-sam', 'supervisor');
    const ana = testDevice(backend);
    const kept: string[] = [];
    for (const description of ['Bow handle loose', 'Kill cord clip cracked', 'Fuel line perished', 'Valve cap missing']) {
      kept.push(await createRecord(sam.writer, 'defect', defectFields({ description })));
    }
    const gone = await createRecord(sam.writer, 'defect', defectFields({ description: 'Duplicate report' }));
    await sam.sync();
    await ana.sync();
    await deleteRecord(sam.writer, 'defect', gone);
    await sam.sync();
    expect(backend.server.purgeTombstones(sam.scope.clubId, Number.MAX_SAFE_INTEGER)).toBe(1);

    const pulls: (string | null)[] = [];
    const watching: typeof fetch = (input, init) => {
      const url = new URL(String(input), 'http://phone.test');
      if (url.pathname.endsWith('/pull')) pulls.push(url.searchParams.get('since'));
      return backend.fetch(input, init);
    };
    expect(await ana.sync({ pageSize: 1, fetch: watching })).toEqual({ ok: true });
    // One stale checkpoint, one fresh start, then page after page onward from it.
    expect(pulls.filter((since) => since === null)).toHaveLength(1);
    expect(pulls[1]).toBeNull();
    expect(pulls.length).toBeGreaterThan(4);
    expect((await listRecords(ana.db, ana.scope.clubId, 'defect')).map((r) => r.id).sort()).toEqual([...kept].sort());
  });

  it('stops with a plain message, outbox kept, when the server asks for a fresh start again mid-way', async () => {
    const backend = new FakeBackend();
    const ana = testDevice(backend);
    const first = await createRecord(ana.writer, 'defect', defectFields());
    const second = await createRecord(ana.writer, 'defect', defectFields({ description: 'Second report' }));
    await createRecord(ana.writer, 'defect', defectFields({ description: 'Third report' }));
    await ana.sync();
    deleteAndPurge(backend, ana.scope.clubId, first, 1);
    await createRecord(ana.writer, 'defect', defectFields({ description: 'Fourth report' }));
    backend.offline = true;
    await ana.sync();
    backend.offline = false;
    // While she pulls afresh, another report is deleted and its tombstone purged as well.
    let freshStart = false;
    let purgedAgain = false;
    const watching: typeof fetch = async (input, init) => {
      const url = new URL(String(input), 'http://phone.test');
      const pull = url.pathname.endsWith('/pull');
      if (pull && freshStart && !purgedAgain && url.searchParams.get('since') !== null) {
        deleteAndPurge(backend, ana.scope.clubId, second, 2);
        purgedAgain = true;
      }
      const res = await backend.fetch(input, init);
      if (pull && url.searchParams.get('since') === null) freshStart = true;
      return res;
    };
    const outcome = await ana.sync({ pageSize: 1, fetch: watching });
    expect(purgedAgain).toBe(true);
    expect(outcome).toMatchObject({ ok: false, failure: { reason: 'server', message: expect.stringContaining(RESET_LOOP) } });
    expect(await listRecords(ana.db, ana.scope.clubId, 'defect')).toHaveLength(4);
  });
});
