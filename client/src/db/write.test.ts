import { decodeHlc, validateRecord } from '@breakline/sync-protocol';
import { describe, expect, it } from 'vitest';
import { FakeBackend } from '@/sync/test/fake-backend';
import { defectFields, testDevice, twoPhonesWithOneDefect, type TestDevice } from '@/sync/test/device';
import { listRecords } from './queries';
import { composeRow } from './view';
import { createRecord, deleteRecord, updateRecord } from './write';
import { isLocalWriteError } from './write-error';

/** The stored row beside the one composeRow makes afresh from its pulled copy and every queued change. */
async function storedAndComposed(phone: TestDevice, id: string) {
  const row = await phone.db.records.get(id);
  const entries = await phone.db.outbox.where('recordId').equals(id).toArray();
  return { stored: row, composed: row && composeRow(row, entries) };
}

describe('local writes', () => {
  it('saves a new record and its outbox mutation together', async () => {
    const phone = testDevice(new FakeBackend());
    const id = await createRecord(phone.writer, 'defect', defectFields());
    const [row] = await phone.db.records.toArray();
    const [entry] = await phone.db.outbox.toArray();
    expect(row).toMatchObject({ id, kind: 'defect', version: 0, waiting: 1, boatId: defectFields().boatId, server: null });
    expect(entry!.mutation).toMatchObject({ recordId: id, seq: 1, baseVersion: 0, base: {}, patch: defectFields() });
    expect(validateRecord('defect', row!.fields).ok).toBe(true);
  });

  it('leaves nothing behind when validation fails, and names the field', async () => {
    const phone = testDevice(new FakeBackend());
    const error = await createRecord(phone.writer, 'defect', defectFields({ description: '   ' })).catch((e: unknown) => e);
    expect(isLocalWriteError(error, 'invalid')).toBe(true);
    expect(isLocalWriteError(error) && error.fieldMessage('description')).toMatch(/blank/);
    expect(await phone.db.records.count()).toBe(0);
    expect(await phone.db.outbox.count()).toBe(0);
    expect(await phone.db.syncState.count()).toBe(0);
  });

  it('refuses a whole-record rule broken by an edit, with nothing saved', async () => {
    const phone = testDevice(new FakeBackend(), 'member-sam', 'supervisor');
    const id = await createRecord(phone.writer, 'defect', defectFields());
    const error = await updateRecord(phone.writer, 'defect', id, { status: 'rejected' }).catch((e: unknown) => e);
    expect(isLocalWriteError(error) && error.fieldMessage('rejectedReason')).toBe('Say why the report is not a defect.');
    expect(await phone.db.outbox.count()).toBe(1);
    expect((await phone.db.records.get(id))!.fields.status).toBe('open');
  });

  it('refuses what the role may not do before queueing it', async () => {
    const phone = testDevice(new FakeBackend(), 'member-ana', 'crew');
    const id = await createRecord(phone.writer, 'defect', defectFields());
    await expect(updateRecord(phone.writer, 'defect', id, { status: 'assigned' })).rejects.toMatchObject({
      code: 'forbidden',
      message: expect.stringMatching(/supervisor/),
    });
    expect(await phone.db.outbox.count()).toBe(1);
  });

  it('queues repeated edits in order, each based on what the person saw', async () => {
    const phone = testDevice(new FakeBackend());
    const id = await createRecord(phone.writer, 'defect', defectFields());
    await updateRecord(phone.writer, 'defect', id, { severity: 'stand-down' });
    await updateRecord(phone.writer, 'defect', id, { severity: 'stand-down', actionTaken: 'Strap replaced' });
    const muts = (await phone.db.outbox.orderBy('seq').toArray()).map((e) => e.mutation);
    expect(muts.map((m) => m.seq)).toEqual([1, 2, 3]);
    // Only the changed field is sent; its base is the shown value, the previous edit included.
    expect(muts[2]).toMatchObject({ patch: { actionTaken: 'Strap replaced' }, base: { actionTaken: null }, baseVersion: 0 });
    expect(muts[1]).toMatchObject({ patch: { severity: 'stand-down' }, base: { severity: 'limit' } });
    const clocks = muts.map((m) => m.hlc);
    expect([...clocks].sort()).toEqual(clocks);
    expect(decodeHlc(clocks[0]!).node).toBe(((await phone.db.syncState.get('replica')) as { deviceId: string }).deviceId);
    const [shown] = await listRecords(phone.db, phone.scope.clubId, 'defect');
    expect(shown).toMatchObject({ waiting: 3, fields: { severity: 'stand-down', actionTaken: 'Strap replaced' } });
  });

  it('queues nothing for an edit that changes nothing', async () => {
    const phone = testDevice(new FakeBackend());
    const id = await createRecord(phone.writer, 'defect', defectFields());
    await updateRecord(phone.writer, 'defect', id, { severity: 'limit' });
    expect(await phone.db.outbox.count()).toBe(1);
  });

  it('hides a deleted record from lists and refuses further edits', async () => {
    const phone = testDevice(new FakeBackend(), 'member-sam', 'supervisor');
    const id = await createRecord(phone.writer, 'defect', defectFields());
    await deleteRecord(phone.writer, 'defect', id);
    expect(await listRecords(phone.db, phone.scope.clubId, 'defect')).toEqual([]);
    await expect(updateRecord(phone.writer, 'defect', id, { severity: 'note' })).rejects.toMatchObject({ code: 'not-found' });
    expect((await phone.db.outbox.get(2))!.mutation.deleted).toBe(true);
  });

  it('works a change out from the record as stored, so changes started together each keep the other', async () => {
    const phone = testDevice(new FakeBackend(), 'member-sam', 'supervisor');
    const id = await createRecord(phone.writer, 'defect', defectFields());
    const note = (text: string) => (shown: { notes: { at: string; by: string; text: string }[] }) => ({
      notes: [...shown.notes, { at: '2026-12-01T09:30:00Z', by: 'member-sam', text }],
    });
    // Neither is awaited before the other starts: each reads the notes the one before it saved.
    await Promise.all([
      updateRecord(phone.writer, 'defect', id, note('Strap ordered')),
      updateRecord(phone.writer, 'defect', id, note('Strap fitted')),
    ]);
    const [shown] = await listRecords(phone.db, phone.scope.clubId, 'defect');
    expect(shown!.fields.notes.map((n) => n.text)).toEqual(['Strap ordered', 'Strap fitted']);
    const muts = (await phone.db.outbox.orderBy('seq').toArray()).map((e) => e.mutation);
    expect(muts.map((m) => m.seq)).toEqual([1, 2, 3]);
    expect(muts[2]).toMatchObject({ base: { notes: [{ text: 'Strap ordered' }] } });
  });

  it('refuses a worked-out change that breaks the record, with nothing saved', async () => {
    const phone = testDevice(new FakeBackend(), 'member-sam', 'supervisor');
    const id = await createRecord(phone.writer, 'defect', defectFields());
    // A field of its own that is wrong, and fields right one by one that break a rule across them.
    const blank = await updateRecord(phone.writer, 'defect', id, () => ({ description: '  ' })).catch((e: unknown) => e);
    expect(isLocalWriteError(blank, 'invalid') && blank.fieldMessage('description')).toMatch(/blank/);
    const unexplained = await updateRecord(phone.writer, 'defect', id, (shown) => ({ status: shown.status === 'open' ? ('rejected' as const) : ('open' as const) }))
      .catch((e: unknown) => e);
    expect(isLocalWriteError(unexplained) && unexplained.fieldMessage('rejectedReason')).toBe('Say why the report is not a defect.');
    expect(await phone.db.outbox.count()).toBe(1);
    expect((await phone.db.records.get(id))!.fields).toMatchObject({ status: 'open', description: defectFields().description });
    expect((await phone.db.syncState.get('replica'))).toMatchObject({ seq: 1 });
  });

  it('keeps the row equal to its pulled copy with the queued changes laid on again', async () => {
    const { backend, ana, ben, id } = await twoPhonesWithOneDefect();
    const same = async () => {
      const { stored, composed } = await storedAndComposed(ana, id);
      expect(stored).toEqual(composed);
    };
    await updateRecord(ana.writer, 'defect', id, { severity: 'stand-down' });
    await same();
    // Another phone's change arrives under a change still queued here.
    await updateRecord(ben.writer, 'defect', id, { actionTaken: 'Spare strap fitted' });
    await ben.sync();
    backend.routes['GET /api/sync/pull'] = () => new Response('{}', { status: 503 });
    await ana.sync();
    // Sent and accepted, the pull not in yet: the accepted change stays on top.
    expect((await ana.db.outbox.toArray()).map((e) => e.status)).toEqual(['acked']);
    await updateRecord(ana.writer, 'defect', id, { description: 'Starboard handle strap torn' });
    await same();
    delete backend.routes['GET /api/sync/pull'];
    await ana.sync();
    await updateRecord(ana.writer, 'defect', id, { actionTaken: 'Spare strap fitted and tested' });
    await same();
    expect((await ana.db.records.get(id))!).toMatchObject({
      version: backend.server.record(ana.scope.clubId, id)!.version,
      waiting: 1,
      fields: { severity: 'stand-down', actionTaken: 'Spare strap fitted and tested', description: 'Starboard handle strap torn' },
    });
    const sam = testDevice(backend, 'member-sam', 'supervisor');
    await sam.sync();
    await deleteRecord(sam.writer, 'defect', id);
    const { stored, composed } = await storedAndComposed(sam, id);
    expect(stored).toEqual(composed);
    expect(stored).toMatchObject({ deleted: true, waiting: 1 });
  });

  it('saves several writes in a caller\'s transaction together, or none of them', async () => {
    const phone = testDevice(new FakeBackend(), 'member-sam', 'supervisor');
    const { db } = phone;
    const both = () => db.transaction('rw', db.records, db.outbox, db.syncState, async () => {
      const id = await createRecord(phone.writer, 'defect', defectFields());
      await updateRecord(phone.writer, 'defect', id, { severity: 'stand-down' });
      return id;
    });
    const id = await both();
    expect((await db.outbox.orderBy('seq').toArray()).map((e) => e.mutation.seq)).toEqual([1, 2]);
    expect((await db.records.get(id))!.fields.severity).toBe('stand-down');

    const refused = await db.transaction('rw', db.records, db.outbox, db.syncState, async () => {
      await updateRecord(phone.writer, 'defect', id, { severity: 'note' });
      await updateRecord(phone.writer, 'defect', id, { status: 'rejected' });
    }).catch((e: unknown) => e);
    expect(isLocalWriteError(refused, 'invalid')).toBe(true);
    expect(await db.outbox.count()).toBe(2);
    expect((await db.records.get(id))!.fields.severity).toBe('stand-down');
  });
});
