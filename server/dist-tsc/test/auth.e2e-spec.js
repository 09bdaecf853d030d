import { JwtService } from '@nestjs/jwt';
import { createTestApp, login } from './support/test-app.js';
import { DEMO_PASSWORD } from '../src/seed/demo-scenario.js';
describe('auth', () => {
    let t;
    beforeAll(async () => { t = await createTestApp({ LOGIN_MAX_FAILURES: '3' }); });
    afterAll(async () => { await t.app.close(); });
    it('signs in with e-mail and password, case-insensitively', async () => {
        const res = await t.http().post('/api/auth/login').send({ email: ' Captain@GannetBay.example ', password: DEMO_PASSWORD }).expect(200);
        expect(res.body.user.email).toBe('captain@gannetbay.example');
        expect(res.body.activeClub).toMatchObject({ name: 'Gannet Bay Surf Life Saving Club', role: 'supervisor', timeZone: 'Australia/Sydney' });
        expect(typeof res.body.accessToken).toBe('string');
        expect(res.body.refreshToken).toMatch(/^[0-9a-f-]{36}\./);
        expect(new Date(res.body.accessExpiresAt).getTime()).toBeGreaterThan(Date.now());
    });
    it('refuses a wrong password and an unknown user with the same 401 message', async () => {
        const wrong = await t.http().post('/api/auth/login').send({ email: 'driver@gannetbay.example', password: 'nope' }).expect(401);
        const unknown = await t.http().post('/api/auth/login').send({ email: 'nobody@gannetbay.example', password: 'nope' }).expect(401);
        expect(wrong.body).toEqual({ statusCode: 401, code: 'invalid_credentials', message: 'E-mail or password is not right.' });
        expect(unknown.body).toEqual(wrong.body);
    });
    it('answers a malformed body with 400 listing each bad field once', async () => {
        const res = await t.http().post('/api/auth/login').send({ email: 'not-an-email', password: '', role: 'admin' }).expect(400);
        expect(res.body.code).toBe('validation_failed');
        const fields = res.body.details.map((d) => d.field).sort();
        expect(fields).toEqual(['email', 'password', 'role']);
        expect(res.body.details.find((d) => d.field === 'password').message).toBe('Enter your password.');
    });
    it('answers a body that is not JSON with the same error shape', async () => {
        const res = await t.http().post('/api/auth/login').set('content-type', 'application/json').send('{"email":').expect(400);
        expect(res.body).toEqual({ statusCode: 400, code: 'validation_failed', message: 'The request body is not valid JSON.' });
    });
    it('throttles repeated failed sign-ins with 429, while others can still sign in', async () => {
        for (let i = 0; i < 3; i++) {
            await t.http().post('/api/auth/login').send({ email: 'crew@kelpreef.example', password: `guess-${i}` }).expect(401);
        }
        const res = await t.http().post('/api/auth/login').send({ email: 'crew@kelpreef.example', password: DEMO_PASSWORD }).expect(429);
        expect(res.body.code).toBe('too_many_attempts');
        expect(res.body.message).toMatch(/Wait 15 minutes/);
        await login(t, 'admin@kelpreef.example');
    });
    it('rotates the refresh token and refuses the old one, ending that sign-in', async () => {
        const first = await login(t, 'driver@gannetbay.example');
        const second = await t.http().post('/api/auth/refresh').send({ refreshToken: first.refreshToken }).expect(200);
        expect(second.body.refreshToken).not.toBe(first.refreshToken);
        const replay = await t.http().post('/api/auth/refresh').send({ refreshToken: first.refreshToken }).expect(401);
        expect(replay.body.code).toBe('unauthorized');
        // Reuse of a spent token means a copy exists: the newer token of the same family is revoked too.
        await t.http().post('/api/auth/refresh').send({ refreshToken: second.body.refreshToken }).expect(401);
    });
    it('logs out by revoking the refresh token', async () => {
        const s = await login(t, 'driver@gannetbay.example');
        await t.http().post('/api/auth/logout').send({ refreshToken: s.refreshToken }).expect(204);
        await t.http().post('/api/auth/refresh').send({ refreshToken: s.refreshToken }).expect(401);
    });
    it('answers /me with the user, the active club and all memberships', async () => {
        const s = await login(t, 'crew@gannetbay.example');
        const me = await t.http().get('/api/auth/me').set('authorization', `Bearer ${s.accessToken}`).expect(200);
        expect(me.body.user.displayName).toBe('Sam Whitcombe');
        expect(me.body.memberships).toEqual([{ clubId: s.activeClub.id, clubName: 'Gannet Bay Surf Life Saving Club', role: 'crew' }]);
    });
    it('refuses an expired access token with token_expired, and no token with unauthorized', async () => {
        const s = await login(t, 'crew@gannetbay.example');
        const claims = JSON.parse(Buffer.from(s.accessToken.split('.')[1], 'base64url').toString());
        const expired = await t.app.get(JwtService).signAsync({ sub: claims.sub, mid: claims.mid, exp: Math.floor(Date.now() / 1000) - 5 });
        const res = await t.http().get('/api/auth/me').set('authorization', `Bearer ${expired}`).expect(401);
        expect(res.body.code).toBe('token_expired');
        const none = await t.http().get('/api/auth/me').expect(401);
        expect(none.body.code).toBe('unauthorized');
    });
    it('refuses a token signed with another secret', async () => {
        const forged = new JwtService({ secret: 'another-secret-another-secret-another' });
        const s = await login(t, 'crew@gannetbay.example');
        const claims = JSON.parse(Buffer.from(s.accessToken.split('.')[1], 'base64url').toString());
        const token = await forged.signAsync({ sub: claims.sub, mid: claims.mid });
        await t.http().get('/api/auth/me').set('authorization', `Bearer ${token}`).expect(401);
    });
});
//# sourceMappingURL=auth.e2e-spec.js.map