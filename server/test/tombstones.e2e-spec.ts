import { TombstonesService } from '../src/sync/tombstones.service.js';
import { createTestApp, login, type TestApp } from './support/test-app.js';
import { defectFields, TestDevice, uuid } from './support/sync-fixtures.js';

describe('tombstones and the purge horizon', () => {
  let t: TestApp;
  beforeAll(async () => { t = await createTestApp({ TOMBSTONE_RETENTION_DAYS: '30' }); });
  afterAll(async () => { await t.app.close(); });

  it('keeps a delete as a tombstone until the retention passes, then tells old checkpoints to pull afresh', async () => {
    const captain = (await login(t, 'captain@gannetbay.example')) as Awaited<ReturnType<typeof login>> & { user: { id: string } };
    const auth = { authorization: `Bearer ${captain.accessToken}` };
    const phone = new TestDevice();
    const keep = uuid();
    const drop = uuid();
    const fields = defectFields(uuid(), captain.user.id);
    await t.http().post('/api/sync/push').set(auth).send(phone.body([phone.mutation('defect', keep, fields), phone.mutation('defect', drop, fields)])).expect(200);
    const early = (await t.http().get('/api/sync/pull').set(auth).expect(200)).body.checkpoint;
    await t.http().post('/api/sync/push').set(auth).send(phone.body([phone.mutation('defect', drop, {}, { deleted: true, baseVersion: 1, base: fields })])).expect(200);

    const purger = t.app.get(TombstonesService);
    expect(await purger.purgeClub(captain.activeClub.id, new Date(Date.now() + 10 * 86_400_000))).toBe(0);
    const tomb = (await t.http().get(`/api/sync/pull?since=${early}`).set(auth).expect(200)).body;
    expect(tomb.changes).toEqual([expect.objectContaining({ id: drop, deleted: true })]);

    expect(await purger.purgeClub(captain.activeClub.id, new Date(Date.now() + 31 * 86_400_000))).toBe(1);
    const stale = (await t.http().get(`/api/sync/pull?since=${early}`).set(auth).expect(200)).body;
    expect(stale).toMatchObject({ resetRequired: true, changes: [] });
    const fresh = (await t.http().get('/api/sync/pull?since=0').set(auth).expect(200)).body;
    expect(fresh.resetRequired).toBeUndefined();
    const ids = fresh.changes.map((c: { id: string }) => c.id);
    expect(ids).toContain(keep);
    expect(ids).not.toContain(drop);
  });
});
