import { describe, expect, it } from 'vitest';
import { kindRules, RECORD_KINDS, SEE_RULES } from '@breakline/sync-protocol';
import { listRecords } from '@/db/queries';
import { loadClubState } from '@/db/replica-state';
import { createRecord } from '@/db/write';
import { incidentFields } from '@/features/patrol/testing/records';
import { FakeBackend } from './test/fake-backend';
import { testDevice, type TestDevice } from './test/device';
import { viewOf } from './pull';

/** The server lets `device` act as `role` from now on, as after an admin changed it. */
async function setRole(backend: FakeBackend, device: TestDevice, role: 'crew' | 'driver'): Promise<void> {
  backend.grant((await device.auth.token(device.scope))!, { userId: device.scope.userId, role, clubId: device.scope.clubId });
  device.scope.role = role;
  device.writer.role = role;
}

const notesOn = async (device: TestDevice) => (await listRecords(device.db, device.scope.clubId, 'incidentNote')).map((r) => r.fields.authorId).sort();

describe('a member whose role changes', () => {
  it('sees by role: crew see all but other members\' incident notes', () => {
    expect(viewOf('crew')).toBe('');
    expect(viewOf('driver')).toBe('incidentNote');
    expect(viewOf('supervisor')).toBe(viewOf('admin'));
    // The short list agrees with every kind's own rules.
    for (const kind of RECORD_KINDS) expect(SEE_RULES[kind]).toBe(kindRules(kind).access.see);
  });

  it('gets the incident notes a driver sees once promoted, and loses them again when the role is lowered', async () => {
    const backend = new FakeBackend();
    const ben = testDevice(backend, 'member-ben', 'driver');
    await createRecord(ben.writer, 'incidentNote', incidentFields({ authorId: 'member-ben' }));
    await ben.sync();
    const ana = testDevice(backend, 'member-ana', 'crew');
    await createRecord(ana.writer, 'incidentNote', incidentFields({ authorId: 'member-ana', actionTaken: 'Her own note' }));
    expect(await ana.sync()).toEqual({ ok: true });
    expect(await notesOn(ana)).toEqual(['member-ana']);

    await setRole(backend, ana, 'driver');
    expect(await ana.sync()).toEqual({ ok: true });
    expect(await notesOn(ana)).toEqual(['member-ana', 'member-ben']);

    await setRole(backend, ana, 'crew');
    expect(await ana.sync()).toEqual({ ok: true });
    // The note she wrote stays; the one she may no longer see is gone from the phone.
    expect(await notesOn(ana)).toEqual(['member-ana']);
    expect((await ana.db.records.toArray()).filter((r) => r.kind === 'incidentNote').map((r) => r.fields.authorId)).toEqual(['member-ana']);
  });

  it('starts afresh once a copy pulled before views were kept, whose role is not known', async () => {
    const backend = new FakeBackend();
    const ben = testDevice(backend, 'member-ben', 'driver');
    await createRecord(ben.writer, 'incidentNote', incidentFields({ authorId: 'member-ben' }));
    await ben.sync();
    const ana = testDevice(backend, 'member-ana', 'driver');
    await ana.sync();
    expect(await notesOn(ana)).toEqual(['member-ben']);
    // As an older app left it: a checkpoint, and no view. She is crew by now.
    const state = await loadClubState(ana.db, ana.scope.clubId);
    await ana.db.syncState.put({ ...state, view: undefined });
    await setRole(backend, ana, 'crew');
    expect(await ana.sync()).toEqual({ ok: true });
    expect(await notesOn(ana)).toEqual([]);
    expect((await loadClubState(ana.db, ana.scope.clubId)).view).toBe(viewOf('crew'));
  });
});
