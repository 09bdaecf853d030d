import { TombstonesService } from '../src/sync/tombstones.service.js';
import { createTestApp, login } from './support/test-app.js';
import { defectFields, TestDevice, uuid } from './support/sync-fixtures.js';
describe('tombstones and the purge horizon', () => {
    let t;
    beforeAll(async () => { t = await createTestApp({ TOMBSTONE_RETENTION_DAYS: '30' }); });
    afterAll(async () => { await t.app.close(); });
    it('keeps a delete as a tombstone until the retention passes, then tells old checkpoints to pull afresh', async () => {
        const captain = (await login(t, 'captain@gannetbay.example'));
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
        const ids = fresh.changes.map((c) => c.id);
        expect(ids).toContain(keep);
        expect(ids).not.toContain(drop);
    });
    it('lets a phone that starts afresh after a purge pull page after page, and still resets one that began before it', async () => {
        const captain = (await login(t, 'captain@gannetbay.example'));
        const auth = { authorization: `Bearer ${captain.accessToken}` };
        const pull = async (since, limit = 5) => (await t.http().get('/api/sync/pull').query({ ...(since === undefined ? {} : { since }), limit }).set(auth).expect(200)).body;
        const phone = new TestDevice();
        const fields = defectFields(uuid(), captain.user.id);
        const keep = [uuid(), uuid(), uuid()];
        const drop = uuid();
        await t.http().post('/api/sync/push').set(auth).send(phone.body([...keep, drop].map((id) => phone.mutation('defect', id, fields)))).expect(200);
        // This phone is on its first page when the report is deleted and, weeks on, its tombstone purged.
        const midway = await pull(undefined, 1);
        expect(midway.hasMore).toBe(true);
        await t.http().post('/api/sync/push').set(auth).send(phone.body([phone.mutation('defect', drop, {}, { deleted: true, baseVersion: 1, base: fields })])).expect(200);
        expect(await t.app.get(TombstonesService).purgeClub(captain.activeClub.id, new Date(Date.now() + 31 * 86_400_000))).toBe(1);
        const [{ purged_through_seq: horizon }] = await t.db.query('SELECT purged_through_seq FROM sync_club_state WHERE club_id = $1', [captain.activeClub.id]);
        expect(await pull(midway.checkpoint)).toMatchObject({ resetRequired: true, changes: [] });
        const ids = [];
        let since;
        let pages = 0;
        for (;;) {
            const page = await pull(since);
            expect(page.resetRequired).toBeUndefined();
            ids.push(...page.changes.map((c) => c.id));
            since = page.checkpoint;
            pages += 1;
            if (!page.hasMore)
                break;
        }
        expect(pages).toBeGreaterThan(2);
        expect(ids).toEqual(expect.arrayContaining(keep));
        expect(ids).not.toContain(drop);
        expect(new Set(ids).size).toBe(ids.length);
        expect(since).toMatch(new RegExp(`^${horizon}\\.\\d+$`));
        expect((await pull(since)).changes).toEqual([]);
    });
    it('still reads checkpoints without a horizon, as given out before any purge', async () => {
        const captain = await login(t, 'captain@gannetbay.example');
        const auth = { authorization: `Bearer ${captain.accessToken}` };
        const [{ purged_through_seq: horizon, last_seq: last }] = await t.db.query('SELECT purged_through_seq, last_seq FROM sync_club_state WHERE club_id = $1', [captain.activeClub.id]);
        expect(Number(horizon)).toBeGreaterThan(1);
        const below = (await t.http().get('/api/sync/pull').query({ since: String(Number(horizon) - 1) }).set(auth).expect(200)).body;
        expect(below).toMatchObject({ resetRequired: true, changes: [] });
        const at = (await t.http().get('/api/sync/pull').query({ since: String(horizon) }).set(auth).expect(200)).body;
        expect(at.resetRequired).toBeUndefined();
        expect(at.checkpoint).toBe(`${horizon}.${last}`);
        const bad = (await t.http().get('/api/sync/pull').query({ since: '1.2.3' }).set(auth).expect(400)).body;
        expect(bad).toMatchObject({ code: 'validation_failed', details: [{ field: 'since', message: expect.stringContaining('checkpoint') }] });
    });
});
//# sourceMappingURL=tombstones.e2e-spec.js.map