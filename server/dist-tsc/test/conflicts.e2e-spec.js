import { PROTOCOL_VERSION } from '@breakline/sync-protocol';
import { createTestApp, login } from './support/test-app.js';
import { defectFields, TestDevice, uuid } from './support/sync-fixtures.js';
describe('settling conflicts', () => {
    let t;
    beforeAll(async () => { t = await createTestApp(); });
    afterAll(async () => { await t.app.close(); });
    it('lets a supervisor settle a conflict with a third value that every phone then pulls', async () => {
        const crew = (await login(t, 'crew@gannetbay.example'));
        const captain = await login(t, 'captain@gannetbay.example');
        const a = new TestDevice();
        const b = new TestDevice();
        const id = uuid();
        const fields = defectFields(uuid(), crew.user.id);
        const auth = (tok) => ({ authorization: `Bearer ${tok}` });
        await t.http().post('/api/sync/push').set(auth(crew.accessToken)).send(a.body([a.mutation('defect', id, fields)])).expect(200);
        const start = (await t.http().get('/api/sync/pull').set(auth(crew.accessToken)).expect(200)).body.checkpoint;
        await t.http().post('/api/sync/push').set(auth(crew.accessToken))
            .send(a.body([a.mutation('defect', id, { description: 'A says torn' }, { baseVersion: 1, base: { description: fields.description } })])).expect(200);
        const res = await t.http().post('/api/sync/push').set(auth(crew.accessToken))
            .send(b.body([b.mutation('defect', id, { description: 'B says frayed' }, { baseVersion: 1, base: { description: fields.description } })])).expect(200);
        const conflictId = res.body.results[0].conflictId;
        expect(conflictId).toBeDefined();
        const status = await t.http().get('/api/sync/status').set(auth(crew.accessToken)).expect(200);
        expect(status.body.openConflicts).toBe(1);
        await t.http().get('/api/sync/conflicts').set(auth(crew.accessToken)).expect(403);
        await t.http().post(`/api/sync/conflicts/${conflictId}/settle`).set(auth(crew.accessToken))
            .send({ protocolVersion: PROTOCOL_VERSION, conflictId, choice: 'kept' }).expect(403);
        const settled = await t.http().post(`/api/sync/conflicts/${conflictId}/settle`).set(auth(captain.accessToken))
            .send({ protocolVersion: PROTOCOL_VERSION, conflictId, choice: 'other', value: 'Strap frayed and torn: replace', note: 'Checked in the shed' }).expect(200);
        expect(settled.body).toMatchObject({ status: 'settled', settledValue: 'Strap frayed and torn: replace', note: 'Checked in the shed' });
        const pulled = await t.http().get(`/api/sync/pull?since=${start}`).set(auth(crew.accessToken)).expect(200);
        const rec = pulled.body.changes.find((c) => c.id === id);
        expect(rec.fields.description).toBe('Strap frayed and torn: replace');
        expect(rec.version).toBe(4);
        const again = await t.http().post(`/api/sync/conflicts/${conflictId}/settle`).set(auth(captain.accessToken))
            .send({ protocolVersion: PROTOCOL_VERSION, conflictId, choice: 'kept' }).expect(409);
        expect(again.body.message).toMatch(/already settled/);
        expect((await t.http().get('/api/sync/status').set(auth(crew.accessToken))).body.openConflicts).toBe(0);
    });
});
//# sourceMappingURL=conflicts.e2e-spec.js.map