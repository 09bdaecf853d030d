import { describe, expect, it } from 'vitest';
import { createRecord } from '@/db/write';
import { readSyncStatus } from './status';
import { FakeBackend } from './test/fake-backend';
import { defectFields, testDevice } from './test/device';

describe('a member of two clubs', () => {
  it('counts changes queued in another club, which wait until that club is chosen again', async () => {
    const backend = new FakeBackend();
    const ana = testDevice(backend, 'member-ana', 'driver', 'club-saltmarsh');
    await createRecord({ ...ana.writer, clubId: 'club-kelp' }, 'defect', defectFields({ reportedBy: 'member-ana' }));
    await createRecord({ ...ana.writer, clubId: 'club-kelp' }, 'defect', defectFields({ reportedBy: 'member-ana' }));
    expect(await ana.sync()).toEqual({ ok: true });
    const status = await readSyncStatus(ana.db, 'club-saltmarsh');
    expect(status.waiting).toBe(0);
    expect(status.waitingElsewhere).toEqual([{ clubId: 'club-kelp', count: 2 }]);
  });
});
