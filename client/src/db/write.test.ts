import { decodeHlc, validateRecord } from '@breakline/sync-protocol';
import { describe, expect, it } from 'vitest';
import { FakeBackend } from '@/sync/test/fake-backend';
import { defectFields, testDevice } from '@/sync/test/device';
import { listRecords } from './queries';
import { createRecord, deleteRecord, updateRecord } from './write';
import { isLocalWriteError } from './write-error';

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
});
