import { DEMO_PASSWORD } from '../src/seed/demo-scenario.js';
import { createTestApp, login } from './support/test-app.js';
import { mailEnv, startSmtpFake, to, tokenIn } from './support/smtp-fake.js';
describe('invitations, password reset and roles', () => {
    let t;
    let mail;
    let admin;
    const auth = (tok) => ({ authorization: `Bearer ${tok}` });
    // Mail is matched by the id in its link, so a mail job left queued by an earlier run against the
    // same database is never taken for this run's.
    const mailFor = (id) => mail.waitFor((m) => m.text.includes(`#token=${id}.`));
    const inviteMail = async (res) => mailFor(res.body.id);
    const resetMail = async (email) => {
        for (let i = 0; i < 100; i++) {
            const [row] = await t.db.query(`SELECT r.id FROM password_resets r JOIN users u ON u.id = r.user_id WHERE u.email = $1 AND r.used_at IS NULL ORDER BY r.created_at DESC LIMIT 1`, [email]);
            if (row)
                return mailFor(row.id);
            await new Promise((r) => setTimeout(r, 100));
        }
        throw new Error(`No password link was made for ${email}.`);
    };
    beforeAll(async () => {
        mail = await startSmtpFake();
        t = await createTestApp({ ...mailEnv(mail), APP_URL: 'https://breakline.gannetbay.example', PASSWORD_RESET_MAX_REQUESTS: '3' });
        admin = await login(t, 'admin@gannetbay.example');
    });
    afterAll(async () => {
        await t?.app.close();
        await mail?.close();
    });
    it('invites by e-mail; the link signs the new member in to the club with the invited role', async () => {
        const res = await t.http().post('/api/invites').set(auth(admin.accessToken)).send({ email: ' New.Crew@Example.org ', role: 'driver' }).expect(201);
        expect(res.body).toMatchObject({ email: 'new.crew@example.org', role: 'driver', status: 'pending', invitedBy: { name: 'Mara Okonkwo-Hale' } });
        expect(JSON.stringify(res.body)).not.toMatch(/token|secret/i);
        const m = await inviteMail(res);
        expect(m.to).toEqual(['new.crew@example.org']);
        expect(m.subject).toBe('Join Gannet Bay Surf Life Saving Club on Breakline');
        expect(m.text).toContain('https://breakline.gannetbay.example/accept-invite#token=');
        expect(m.text).toContain('as a driver');
        const token = tokenIn(m.text);
        // The database keeps a hash, never the secret that was mailed.
        const [row] = await t.db.query('SELECT secret_hash FROM invites WHERE id = $1', [res.body.id]);
        expect(row.secret_hash).not.toContain(token.split('.')[1]);
        const accepted = await t.http().post('/api/invites/accept').send({ token, displayName: 'Noa Kereama', password: 'tide-chart-lantern' }).expect(200);
        expect(accepted.body).toMatchObject({ user: { email: 'new.crew@example.org', displayName: 'Noa Kereama' }, activeClub: { name: 'Gannet Bay Surf Life Saving Club', role: 'driver' } });
        expect(typeof accepted.body.accessToken).toBe('string');
        await t.http().get('/api/auth/me').set(auth(accepted.body.accessToken)).expect(200);
        const signIn = await t.http().post('/api/auth/login').send({ email: 'new.crew@example.org', password: 'tide-chart-lantern' }).expect(200);
        expect(signIn.body.activeClub.role).toBe('driver');
        // The same link a second time is refused in words a person can act on.
        const again = await t.http().post('/api/invites/accept').send({ token, displayName: 'Noa Kereama', password: 'tide-chart-lantern' }).expect(410);
        expect(again.body).toMatchObject({ statusCode: 410, code: 'link_used', message: expect.stringMatching(/already been accepted/) });
        const list = await t.http().get('/api/invites').set(auth(admin.accessToken)).expect(200);
        expect(list.body.find((i) => i.id === res.body.id)).toMatchObject({ status: 'accepted' });
    });
    it('makes the member card of the new membership when an invitation is accepted', async () => {
        const inv = await t.http().post('/api/invites').set(auth(admin.accessToken)).send({ email: 'card.holder@example.org', role: 'crew' }).expect(201);
        const token = tokenIn((await inviteMail(inv)).text);
        const s = await t.http().post('/api/invites/accept').send({ token, displayName: 'Ilse Marchetti', password: 'sandbar-at-dawn' }).expect(200);
        const pulled = await t.http().get('/api/sync/pull?limit=1000').set(auth(s.body.accessToken)).expect(200);
        const card = pulled.body.changes.find((c) => c.kind === 'member' && c.fields.memberId === s.body.user.id);
        expect(card?.fields).toMatchObject({ displayName: 'Ilse Marchetti', awards: [] });
    });
    it('adds a club to a person who already has an account, with that account\'s password', async () => {
        const kelpAdmin = await login(t, 'admin@kelpreef.example');
        const inv = await t.http().post('/api/invites').set(auth(kelpAdmin.accessToken)).send({ email: 'driver@gannetbay.example', role: 'crew' }).expect(201);
        const m = await inviteMail(inv);
        expect(m.subject).toBe('Join Kelp Reef Surf Lifesaving Club on Breakline');
        const token = tokenIn(m.text);
        const wrong = await t.http().post('/api/invites/accept').send({ token, password: 'not-the-password' }).expect(401);
        expect(wrong.body.message).toMatch(/already has a Breakline account/);
        const ok = await t.http().post('/api/invites/accept').send({ token, password: DEMO_PASSWORD }).expect(200);
        expect(ok.body.activeClub).toMatchObject({ name: 'Kelp Reef Surf Lifesaving Club', role: 'crew' });
        expect(ok.body.memberships.map((m) => m.clubName).sort()).toEqual(['Gannet Bay Surf Life Saving Club', 'Kelp Reef Surf Lifesaving Club']);
        // The other club's role is untouched.
        const gannet = await login(t, 'driver@gannetbay.example');
        expect(gannet.activeClub.role).toBe('driver');
    });
    it('refuses an expired, a replaced and a forged invitation, each with its own reason', async () => {
        const one = await t.http().post('/api/invites').set(auth(admin.accessToken)).send({ email: 'late@example.org', role: 'crew' }).expect(201);
        const first = tokenIn((await inviteMail(one)).text);
        const second = await t.http().post('/api/invites').set(auth(admin.accessToken)).send({ email: 'late@example.org', role: 'crew' }).expect(201);
        const replaced = await t.http().post('/api/invites/accept').send({ token: first, displayName: 'Late Comer', password: 'long-enough-pass' }).expect(410);
        expect(replaced.body).toMatchObject({ code: 'link_invalid', message: expect.stringMatching(/replaced by a newer one/) });
        await t.db.query(`UPDATE invites SET expires_at = now() - interval '1 minute' WHERE id = $1`, [second.body.id]);
        const latest = await inviteMail(second);
        const expired = await t.http().post('/api/invites/accept').send({ token: tokenIn(latest.text), displayName: 'Late Comer', password: 'long-enough-pass' }).expect(410);
        expect(expired.body).toMatchObject({ code: 'link_expired', message: 'This invitation has expired. Ask your club admin to send a new one.' });
        expect((await t.http().get('/api/invites').set(auth(admin.accessToken))).body.find((i) => i.id === second.body.id).status).toBe('expired');
        const forged = await t.http().post('/api/invites/accept').send({ token: `${second.body.id}.${'A'.repeat(43)}`, displayName: 'X', password: 'long-enough-pass' }).expect(400);
        expect(forged.body.code).toBe('link_invalid');
        await t.http().post('/api/auth/login').send({ email: 'late@example.org', password: 'long-enough-pass' }).expect(401);
    });
    it('asks a new member for a name and a long enough password, and keeps the link usable', async () => {
        const inv = await t.http().post('/api/invites').set(auth(admin.accessToken)).send({ email: 'short.pass@example.org', role: 'crew' }).expect(201);
        const token = tokenIn((await inviteMail(inv)).text);
        const res = await t.http().post('/api/invites/accept').send({ token, password: 'short' }).expect(400);
        expect(res.body.details.map((d) => d.field).sort()).toEqual(['displayName', 'password']);
        await t.http().post('/api/invites/accept').send({ token, displayName: 'Pat Short', password: 'a-longer-password' }).expect(200);
    });
    it('lets only an admin invite, and refuses inviting an existing member', async () => {
        const captain = await login(t, 'captain@gannetbay.example');
        await t.http().post('/api/invites').set(auth(captain.accessToken)).send({ email: 'x@example.org', role: 'crew' }).expect(403);
        const dup = await t.http().post('/api/invites').set(auth(admin.accessToken)).send({ email: 'crew@gannetbay.example', role: 'crew' }).expect(409);
        expect(dup.body.message).toMatch(/already a member/);
        const bad = await t.http().post('/api/invites').set(auth(admin.accessToken)).send({ email: 'x@example.org', role: 'boss' }).expect(400);
        expect(bad.body.details).toEqual([{ field: 'role', message: 'role must be one of crew, driver, supervisor, admin.' }]);
    });
    it('resets a password by a single-use mailed link, and ends the old sign-ins', async () => {
        const before = await login(t, 'crew@gannetbay.example');
        const res = await t.http().post('/api/auth/password-reset').send({ email: 'crew@gannetbay.example' }).expect(202);
        const unknown = await t.http().post('/api/auth/password-reset').send({ email: 'nobody@gannetbay.example' }).expect(202);
        // The answer does not tell whether the address has an account.
        expect(unknown.body.message.replace('nobody', 'crew')).toBe(res.body.message);
        const m = await resetMail('crew@gannetbay.example');
        expect(m).toMatchObject({ to: ['crew@gannetbay.example'], tag: 'password-reset' });
        expect(m.subject).toBe('Set a new Breakline password');
        expect(m.text).toContain('https://breakline.gannetbay.example/reset-password#token=');
        const token = tokenIn(m.text);
        const short = await t.http().post('/api/auth/password-reset/confirm').send({ token, password: 'short' }).expect(400);
        expect(short.body.details[0].field).toBe('password');
        const done = await t.http().post('/api/auth/password-reset/confirm').send({ token, password: 'new-harbour-light' }).expect(200);
        expect(done.body.user.email).toBe('crew@gannetbay.example');
        await t.http().post('/api/auth/login').send({ email: 'crew@gannetbay.example', password: DEMO_PASSWORD }).expect(401);
        await t.http().post('/api/auth/login').send({ email: 'crew@gannetbay.example', password: 'new-harbour-light' }).expect(200);
        await t.http().post('/api/auth/refresh').send({ refreshToken: before.refreshToken }).expect(401);
        const reused = await t.http().post('/api/auth/password-reset/confirm').send({ token, password: 'another-long-one' }).expect(410);
        expect(reused.body.code).toBe('link_used');
        // No mail was sent for the unknown address.
        expect(mail.messages().some(to('nobody@gannetbay.example'))).toBe(false);
    });
    it('refuses an expired reset link', async () => {
        await t.http().post('/api/auth/password-reset').send({ email: 'captain@gannetbay.example' }).expect(202);
        const token = tokenIn((await resetMail('captain@gannetbay.example')).text);
        await t.db.query(`UPDATE password_resets SET expires_at = now() - interval '1 second' WHERE id = $1`, [token.split('.')[0]]);
        const res = await t.http().post('/api/auth/password-reset/confirm').send({ token, password: 'new-harbour-light' }).expect(410);
        expect(res.body).toMatchObject({ code: 'link_expired', message: expect.stringMatching(/expired/) });
        await t.http().post('/api/auth/login').send({ email: 'captain@gannetbay.example', password: DEMO_PASSWORD }).expect(200);
    });
    it('limits reset requests per address and e-mail with 429', async () => {
        for (let i = 0; i < 3; i++)
            await t.http().post('/api/auth/password-reset').send({ email: 'flood@example.org' }).expect(202);
        const res = await t.http().post('/api/auth/password-reset').send({ email: 'flood@example.org' }).expect(429);
        expect(res.body).toMatchObject({ statusCode: 429, code: 'too_many_attempts' });
        await t.http().post('/api/auth/password-reset').send({ email: 'someone.else@example.org' }).expect(202);
    });
    it('changes roles per club, never leaving a club without an admin', async () => {
        const members = (await t.http().get('/api/members').set(auth(admin.accessToken)).expect(200)).body;
        const crew = members.find((m) => m.email === 'crew@gannetbay.example');
        const me = members.find((m) => m.email === 'admin@gannetbay.example');
        const up = await t.http().patch(`/api/members/${crew.membershipId}`).set(auth(admin.accessToken)).send({ role: 'driver' }).expect(200);
        expect(up.body).toMatchObject({ membershipId: crew.membershipId, email: 'crew@gannetbay.example', role: 'driver' });
        const last = await t.http().patch(`/api/members/${me.membershipId}`).set(auth(admin.accessToken)).send({ role: 'crew' }).expect(409);
        expect(last.body.message).toBe("This is the club's only admin. Make another member an admin first.");
        const captain = await login(t, 'captain@gannetbay.example');
        await t.http().patch(`/api/members/${crew.membershipId}`).set(auth(captain.accessToken)).send({ role: 'admin' }).expect(403);
        // Another club's membership answers like a missing one.
        const kelpAdmin = await login(t, 'admin@kelpreef.example');
        await t.http().patch(`/api/members/${crew.membershipId}`).set(auth(kelpAdmin.accessToken)).send({ role: 'crew' }).expect(404);
        await t.http().patch(`/api/members/${crew.membershipId}`).set(auth(admin.accessToken)).send({ role: 'admin' }).expect(200);
        await t.http().patch(`/api/members/${me.membershipId}`).set(auth(admin.accessToken)).send({ role: 'supervisor' }).expect(200);
        // The role takes effect on the next request with the same token.
        await t.http().post('/api/invites').set(auth(admin.accessToken)).send({ email: 'y@example.org', role: 'crew' }).expect(403);
        // And back, by the new admin.
        const newAdmin = await login(t, 'crew@gannetbay.example', 'new-harbour-light');
        await t.http().patch(`/api/members/${me.membershipId}`).set(auth(newAdmin.accessToken)).send({ role: 'admin' }).expect(200);
        await t.http().patch(`/api/members/${crew.membershipId}`).set(auth(admin.accessToken)).send({ role: 'crew' }).expect(200);
    });
    it('shows an admin the caught mail of their own club only', async () => {
        const res = await t.http().get('/api/dev/mail').set(auth(admin.accessToken)).expect(200);
        expect(res.body.some((m) => m.to.includes('new.crew@example.org') && m.subject.startsWith('Join Gannet Bay'))).toBe(true);
        expect(res.body.every((m) => !m.to.includes('admin@kelpreef.example'))).toBe(true);
        expect(res.body[0]).toEqual({ id: expect.any(String), to: expect.any(Array), subject: expect.any(String), text: expect.any(String), at: expect.any(String), tag: expect.any(String) });
        const kelp = await t.http().get('/api/dev/mail').set(auth((await login(t, 'admin@kelpreef.example')).accessToken)).expect(200);
        expect(kelp.body.some((m) => m.to.includes('new.crew@example.org'))).toBe(false);
        expect(kelp.body.some((m) => m.to.includes('driver@gannetbay.example'))).toBe(true);
        await t.http().get('/api/dev/mail').set(auth((await login(t, 'driver@gannetbay.example')).accessToken)).expect(403);
    });
});
//# sourceMappingURL=invites.e2e-spec.js.map