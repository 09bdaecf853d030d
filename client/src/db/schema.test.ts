import { describe, expect, it } from 'vitest';
import { defectFields } from '@/sync/test/device';
import { clubRows, listRecords } from './queries';
import { LATEST_VERSION, ReplicaDb } from './schema';
import type { RecordRow } from './types';

const BOAT = defectFields().boatId;

function v1Row(id: string, fields: Record<string, unknown>): Omit<RecordRow, 'boatId'> {
  return { id, kind: 'defect', clubId: 'club-saltmarsh', server: null, version: 0, fields, deleted: false, waiting: 1 };
}

describe('schema upgrades', () => {
  it('opens a version 1 database with data and upgrades it to the latest version, keeping the data', async () => {
    const name = 'upgrade-v1-v2';
    const old = new ReplicaDb(name, 1);
    await old.open();
    expect(old.verno).toBe(1);
    await old.table('records').bulkPut([v1Row('r-1', defectFields()), v1Row('r-2', { fleetNumber: 'IRB 2' })]);
    await old.table('outbox').put({ seq: 1, clubId: 'club-saltmarsh', recordId: 'r-1', kind: 'defect', status: 'pending', mutation: { seq: 1 } });
    await old.table('syncState').put({ key: 'club:club-saltmarsh', clubId: 'club-saltmarsh', gen: 1, checkpoint: '42' });
    old.close();

    const db = new ReplicaDb(name);
    await db.open();
    expect(db.verno).toBe(LATEST_VERSION);
    expect(LATEST_VERSION).toBe(4);
    expect(await db.records.count()).toBe(2);
    expect(await db.outbox.count()).toBe(1);
    expect(await db.syncState.get('club:club-saltmarsh')).toMatchObject({ checkpoint: '42' });
    // The upgrade step filled the new index from the version 1 rows.
    const forBoat = await db.records.where('[clubId+kind+boatId]').equals(['club-saltmarsh', 'defect', BOAT]).toArray();
    expect(forBoat.map((r) => r.id)).toEqual(['r-1']);
    // A record with no boat is in the index too, under the empty boat (version 4).
    expect((await db.records.get('r-2'))!.boatId).toBe('');
    // Tables new in version 2 exist and are empty.
    expect(await db.photos.count()).toBe(0);
    expect(await db.rejected.count()).toBe(0);
    db.close();
  });

  it('upgrades version 2 photos to version 3: uploaded ones sent, the others due for the queue', async () => {
    const name = 'upgrade-v2-v3';
    const old = new ReplicaDb(name, 2);
    await old.open();
    const bytes = new Uint8Array([0xff, 0xd8, 0xff, 0xe0]).buffer;
    await old.table('photos').bulkPut([
      { sha256: 'a'.repeat(64), type: 'image/jpeg', bytes, uploaded: 0, clubId: 'club-saltmarsh' },
      { sha256: 'b'.repeat(64), type: 'image/jpeg', bytes, uploaded: 1, clubId: 'club-saltmarsh' },
    ]);
    old.close();

    const db = new ReplicaDb(name);
    await db.open();
    expect(db.verno).toBe(LATEST_VERSION);
    expect(await db.photos.where('[clubId+state]').equals(['club-saltmarsh', 'due']).primaryKeys()).toEqual(['a'.repeat(64)]);
    const sent = await db.photos.get('b'.repeat(64));
    expect(sent).toMatchObject({ state: 'sent', type: 'image/jpeg' });
    expect(sent).not.toHaveProperty('uploaded');
    expect(new Uint8Array(sent!.bytes)).toEqual(new Uint8Array([0xff, 0xd8, 0xff, 0xe0]));
    db.close();
  });

  it('upgrades version 3 rows to version 4: every record in the one boat index, a kind listed through it', async () => {
    const name = 'upgrade-v3-v4';
    const old = new ReplicaDb(name, 3);
    await old.open();
    await old.table('records').bulkPut([
      { ...v1Row('r-1', defectFields()), boatId: BOAT },
      v1Row('r-2', { ...defectFields(), boatId: null }),
      { ...v1Row('r-3', { fleetNumber: 'IRB 2' }), kind: 'boat' },
    ]);
    old.close();

    const db = new ReplicaDb(name);
    await db.open();
    expect(db.verno).toBe(4);
    expect(db.records.schema.indexes.map((i) => i.name)).toEqual(['[clubId+kind+boatId]']);
    expect((await db.records.bulkGet(['r-1', 'r-2', 'r-3'])).map((r) => r!.boatId)).toEqual([BOAT, '', '']);
    expect((await listRecords(db, 'club-saltmarsh', 'defect')).map((r) => r.id)).toEqual(['r-1', 'r-2']);
    expect((await listRecords(db, 'club-saltmarsh', 'defect', { boatId: BOAT })).map((r) => r.id)).toEqual(['r-1']);
    expect((await clubRows(db, 'club-saltmarsh').primaryKeys()).sort()).toEqual(['r-1', 'r-2', 'r-3']);
    expect(await clubRows(db, 'club-other').count()).toBe(0);
    db.close();
  });
});
