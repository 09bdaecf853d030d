import { currencyForRole } from '@breakline/sync-protocol';
import { Club } from '../src/clubs/club.entity.js';
import { MemberCardsService } from '../src/clubs/member-cards.service.js';
import { Membership } from '../src/clubs/membership.entity.js';
import { User } from '../src/users/user.entity.js';
import { createTestApp, login } from './support/test-app.js';
import { TestDevice } from './support/sync-fixtures.js';
describe('member cards', () => {
    let t;
    let cards;
    beforeAll(async () => {
        t = await createTestApp();
        cards = t.app.get(MemberCardsService);
    });
    afterAll(async () => { await t.app.close(); });
    const pull = async (email) => {
        const s = await login(t, email);
        const res = await t.http().get('/api/sync/pull?limit=1000').set('authorization', `Bearer ${s.accessToken}`).expect(200);
        return res.body.changes.filter((r) => r.kind === 'member');
    };
    const clubSeq = async () => (await t.db.query('SELECT club_id, last_seq FROM sync_club_state ORDER BY club_id'));
    async function newMembership(email, displayName, slug = 'gannet-bay') {
        const club = await t.db.getRepository(Club).findOneOrFail({ where: { slug } });
        const user = await t.db.getRepository(User).save({ email, displayName, passwordHash: 'not-used-here' });
        return t.db.getRepository(Membership).save({ clubId: club.id, userId: user.id, role: 'crew' });
    }
    it('gives every member of the club a card named like them, keyed by the membership, naming the member by user id', async () => {
        const club = await t.db.getRepository(Club).findOneOrFail({ where: { slug: 'gannet-bay' } });
        const memberships = await t.db.getRepository(Membership).find({ where: { clubId: club.id }, relations: { user: true } });
        const pulled = await pull('crew@gannetbay.example');
        expect(pulled.map((c) => c.id).sort()).toEqual(memberships.map((m) => m.id).sort());
        for (const m of memberships) {
            const card = pulled.find((c) => c.id === m.id);
            expect(card.fields).toMatchObject({ memberId: m.userId, displayName: m.user.displayName });
        }
    });
    it('keeps each club\'s cards to that club', async () => {
        const kelp = await pull('crew@kelpreef.example');
        expect(kelp.map((c) => c.fields.displayName).sort()).toEqual(['Aroha Pennington', 'Declan Moss']);
    });
    it('changes nothing when called again for a card that is up to date', async () => {
        const [m] = await t.db.getRepository(Membership).find({ take: 1 });
        const before = await clubSeq();
        expect(await cards.upsertForMembership(m.id)).toEqual({ recordId: m.id, status: 'unchanged' });
        expect(await clubSeq()).toEqual(before);
    });
    it('makes a card with no awards for a new membership, which phones then pull', async () => {
        const m = await newMembership('new.crew@gannetbay.example', 'Iris Tamaki');
        expect(await cards.upsertForMembership(m.id)).toEqual({ recordId: m.id, status: 'created' });
        const card = (await pull('driver@gannetbay.example')).find((c) => c.id === m.id);
        expect(card).toMatchObject({ version: 1, fields: { memberId: m.userId, displayName: 'Iris Tamaki', awards: [] } });
    });
    it('brings the name up to date and keeps the awards a supervisor entered', async () => {
        const m = await newMembership('renamed@gannetbay.example', 'Jo Parata');
        const award = { id: 'crew-1', name: 'IRB crew award', qualifies: 'crew', awardedOn: '2026-09-01', expiresOn: '2028-08-31' };
        await cards.upsertForMembership(m.id, { awards: [award] });
        await t.db.getRepository(User).update({ id: m.userId }, { displayName: 'Jo Parata-Ngata' });
        expect(await cards.upsertForMembership(m.id, { awards: [] })).toEqual({ recordId: m.id, status: 'updated' });
        const card = (await pull('crew@gannetbay.example')).find((c) => c.id === m.id);
        expect(card).toMatchObject({ version: 2, fields: { displayName: 'Jo Parata-Ngata', awards: [award] } });
    });
    it('makes cards for memberships accepted at the same moment without losing one', async () => {
        const ms = await Promise.all([1, 2, 3].map((n) => newMembership(`together${n}@gannetbay.example`, `Member ${n}`)));
        const results = await Promise.all(ms.map((m) => cards.upsertForMembership(m.id)));
        expect(results.map((r) => r.status)).toEqual(['created', 'created', 'created']);
        const pulled = await pull('crew@gannetbay.example');
        for (const m of ms)
            expect(pulled.some((c) => c.id === m.id)).toBe(true);
    });
    it('refuses an unknown membership with a sentence a person can act on', async () => {
        const id = '00000000-0000-4000-8000-000000000000';
        await expect(cards.upsertForMembership(id)).rejects.toMatchObject({ code: 'not_found', message: `There is no membership ${id}, so no member card was made.` });
    });
    it('lets a supervisor change the awards from a phone, and not a driver', async () => {
        const captain = await login(t, 'captain@gannetbay.example');
        const driver = await login(t, 'driver@gannetbay.example');
        const card = (await pull('captain@gannetbay.example')).find((c) => c.fields.displayName === 'Sam Whitcombe');
        const awards = [...card.fields.awards, { id: 'first-aid', name: 'First aid certificate', qualifies: 'crew', awardedOn: null, expiresOn: '2027-12-01' }];
        const push = (token, device) => t.http().post('/api/sync/push').set('authorization', `Bearer ${token}`)
            .send(device.body([device.mutation('member', card.id, { awards }, { baseVersion: card.version, base: { awards: card.fields.awards } })]));
        const refused = (await push(driver.accessToken, new TestDevice()).expect(200)).body.results[0];
        expect(refused).toMatchObject({ status: 'rejected', error: { code: 'forbidden', message: 'Only a supervisor or admin may change the awards of a member card.' } });
        const applied = (await push(captain.accessToken, new TestDevice()).expect(200)).body.results[0];
        expect(applied.status).toBe('applied');
    });
    it('seeds the demo with one driver\'s award lapsing within 30 days and one expired crew award', async () => {
        const today = new Date().toISOString().slice(0, 10);
        const pulled = await pull('crew@gannetbay.example');
        const of = (name) => pulled.find((c) => c.fields.displayName === name).fields.awards;
        expect(currencyForRole(of('Priya Lindholm'), 'driver', today)).toMatchObject({ status: 'lapsing', current: true });
        expect(currencyForRole(of('Mara Okonkwo-Hale'), 'crew', today)).toMatchObject({ status: 'expired', current: false });
        expect(currencyForRole(of('Tomas Varga'), 'driver', today)).toMatchObject({ status: 'current' });
        expect(currencyForRole(of('Sam Whitcombe'), 'driver', today)).toMatchObject({ status: 'none', current: false });
    });
});
//# sourceMappingURL=member-cards.e2e-spec.js.map