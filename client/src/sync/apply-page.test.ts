import { encodeHlc, type PullResponse, type SyncRecord } from '@breakline/sync-protocol';
import { describe, expect, it } from 'vitest';
import { getRecord } from '@/db/queries';
import { ReplicaDb } from '@/db/schema';
import { updateRecord } from '@/db/write';
import { applyPullPage } from './apply-page';
import { defectFields } from './test/device';
import { T0 } from './test/fake-backend';

const CLUB = 'club-saltmarsh';
const ID = '0190f1a0-0000-7000-8000-00000000d001';
const OTHER = '0190f1a0-0000-7000-8000-00000000d002';

const copy = (id: string, version: number, fields: Record<string, unknown>): SyncRecord => ({
  id, kind: 'defect', clubId: CLUB, version, hlc: encodeHlc({ l: T0 + version, c: 0, node: 'phone-ben' }),
  updatedAt: new Date(T0 + version).toISOString(), deleted: false, fields,
});
const page = (changes: SyncRecord[], seq: number, hasMore: boolean): PullResponse => ({ changes, checkpoint: `0.${seq}`, hasMore });

describe('a pulled page on a phone that started empty', () => {
  it('writes newer copies over this pull\'s older ones and keeps an edit made between pages on top', async () => {
    const db = new ReplicaDb('apply-page-from-empty');
    const fromEmpty = { gen: 1 };
    await applyPullPage(db, CLUB, page([copy(ID, 1, defectFields()), copy(OTHER, 1, defectFields({ description: 'Tiller grip split' }))], 2, true), T0, { fromEmpty });
    // Between pages the person changes the first record; then a later page brings another
    // member's newer copy of it.
    await updateRecord({ db, userId: 'member-ana', clubId: CLUB, role: 'driver', now: () => T0 + 10 }, 'defect', ID, { severity: 'stand-down' });
    await applyPullPage(db, CLUB, page([copy(ID, 2, defectFields({ actionTaken: 'Strap restitched' }))], 3, false), T0 + 20, { fromEmpty });
    expect(await getRecord(db, CLUB, 'defect', ID)).toMatchObject({
      version: 2, waiting: 1, fields: { severity: 'stand-down', actionTaken: 'Strap restitched' },
    });
    expect(await getRecord(db, CLUB, 'defect', OTHER)).toMatchObject({ version: 1, waiting: 0, fields: { description: 'Tiller grip split' } });
    expect(await db.syncState.get(`club:${CLUB}`)).toMatchObject({ checkpoint: '0.3' });
    expect(await db.outbox.count()).toBe(1);
  });
});
