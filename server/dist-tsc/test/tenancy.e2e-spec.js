import { createTestApp, login } from './support/test-app.js';
describe('roles and club boundaries', () => {
    let t;
    beforeAll(async () => { t = await createTestApp(); });
    afterAll(async () => { await t.app.close(); });
    const get = (path, token) => t.http().get(path).set('authorization', `Bearer ${token}`);
    it('refuses a crew member on a supervisor route with 403', async () => {
        const crew = await login(t, 'crew@gannetbay.example');
        const res = await get('/api/members', crew.accessToken).expect(403);
        expect(res.body).toMatchObject({ statusCode: 403, code: 'forbidden' });
        expect(res.body.message).toMatch(/supervisor/);
    });
    it('lets a supervisor and an admin list only their own club\'s members', async () => {
        for (const email of ['captain@gannetbay.example', 'admin@gannetbay.example']) {
            const s = await login(t, email);
            const res = await get('/api/members', s.accessToken).expect(200);
            const emails = res.body.map((m) => m.email);
            expect(emails).toContain('crew@gannetbay.example');
            expect(emails.some((e) => e.endsWith('@kelpreef.example'))).toBe(false);
        }
    });
    it('does not let a member of one club read another club', async () => {
        const gannet = await login(t, 'admin@gannetbay.example');
        const kelp = await login(t, 'admin@kelpreef.example');
        await get(`/api/clubs/${gannet.activeClub.id}`, gannet.accessToken).expect(200);
        const res = await get(`/api/clubs/${gannet.activeClub.id}`, kelp.accessToken).expect(404);
        expect(res.body.code).toBe('not_found');
        const own = await get('/api/clubs/current', kelp.accessToken).expect(200);
        expect(own.body.name).toBe('Kelp Reef Surf Lifesaving Club');
    });
    it('refuses to sign in to a club the person does not belong to', async () => {
        const kelp = await login(t, 'admin@kelpreef.example');
        const res = await t.http().post('/api/auth/login')
            .send({ email: 'crew@gannetbay.example', password: 'surf-demo-2026', clubId: kelp.activeClub.id }).expect(403);
        expect(res.body.message).toBe('You are not a member of that club.');
    });
});
//# sourceMappingURL=tenancy.e2e-spec.js.map