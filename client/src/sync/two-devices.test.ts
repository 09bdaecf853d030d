import { describe, expect, it } from 'vitest';
import { getRecord } from '@/db/queries';
import { updateRecord } from '@/db/write';
import { readSyncStatus } from './status';
import { twoPhonesWithOneDefect } from './test/device';

describe('two phones editing one field offline', () => {
  it('raise a conflict, and both end equal to the server after syncing', async () => {
    const { backend, ana, ben, id } = await twoPhonesWithOneDefect();

    await updateRecord(ana.writer, 'defect', id, { description: 'Starboard handle strap torn through' });
    backend.now += 1_000;
    await updateRecord(ben.writer, 'defect', id, { description: 'Starboard handle strap frayed, still holds' });
    await ana.sync();
    await ben.sync();
    await ana.sync();

    const server = backend.server.record(ana.scope.clubId, id)!;
    const [conflict] = backend.server.conflicts(ana.scope.clubId);
    expect(conflict).toMatchObject({ recordId: id, field: 'description', status: 'open' });
    // Neither value is lost: one is on the record, the other in the conflict.
    expect([conflict!.keptValue, conflict!.overruledValue].sort()).toEqual(
      ['Starboard handle strap frayed, still holds', 'Starboard handle strap torn through'],
    );
    for (const phone of [ana, ben]) {
      expect(await getRecord(phone.db, phone.scope.clubId, 'defect', id)).toMatchObject({
        version: server.version, waiting: 0, fields: server.fields,
      });
      expect(await phone.db.outbox.count()).toBe(0);
      expect((await readSyncStatus(phone.db, phone.scope.clubId)).openConflicts).toBe(1);
    }
    // The phone whose change raised the conflict remembers it for its status.
    expect(await ben.db.conflictsSeen.toArray()).toMatchObject([{ id: conflict!.id, recordId: id }]);
  });

  it('merge changes to different fields without a conflict', async () => {
    const { backend, ana, ben, id } = await twoPhonesWithOneDefect();
    await updateRecord(ana.writer, 'defect', id, { severity: 'stand-down' });
    await updateRecord(ben.writer, 'defect', id, { actionTaken: 'Spare strap fitted' });
    await ana.sync();
    await ben.sync();
    await ana.sync();
    const expected = { severity: 'stand-down', actionTaken: 'Spare strap fitted' };
    expect(backend.server.conflicts(ana.scope.clubId)).toEqual([]);
    expect((await getRecord(ana.db, ana.scope.clubId, 'defect', id))!.fields).toMatchObject(expected);
    expect((await getRecord(ben.db, ben.scope.clubId, 'defect', id))!.fields).toMatchObject(expected);
  });
});
