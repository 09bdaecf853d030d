import { describe, expect, it } from 'vitest';
import { getRecord, listRecords } from '@/db/queries';
import { createRecord, deleteRecord, updateRecord } from '@/db/write';
import { RESET_LOOP } from './pull';
import { FakeBackend } from './test/fake-backend';
import { defectFields, testDevice } from './test/device';

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

  it('stops with a plain message, outbox kept, when the server asks for a fresh start again mid-way', async () => {
    const backend = new FakeBackend();
    const ana = testDevice(backend);
    await createRecord(ana.writer, 'defect', defectFields());
    await createRecord(ana.writer, 'defect', defectFields({ description: 'Second report' }));
    await ana.sync();
    backend.server.purgeTombstones(ana.scope.clubId, Number.MAX_SAFE_INTEGER);
    await createRecord(ana.writer, 'defect', defectFields({ description: 'Third report' }));
    backend.offline = true;
    await ana.sync();
    backend.offline = false;
    const outcome = await ana.sync({ pageSize: 1 });
    expect(outcome).toMatchObject({ ok: false, failure: { reason: 'server', message: expect.stringContaining(RESET_LOOP) } });
    expect(await listRecords(ana.db, ana.scope.clubId, 'defect')).toHaveLength(3);
  });
});
