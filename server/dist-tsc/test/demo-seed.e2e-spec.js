import { seedDemo } from '../src/seed/seed.js';
import { createTestApp, login } from './support/test-app.js';
describe('the demo scenario', () => {
    let t;
    beforeAll(async () => { t = await createTestApp(); });
    afterAll(async () => { await t.app.close(); });
    const pullAll = async (token) => (await t.http().get('/api/sync/pull?limit=1000').set('authorization', `Bearer ${token}`).expect(200)).body.changes;
    it('gives the first club two boats, three motors, both templates, passed and failed checks, and defects at every step', async () => {
        const s = await login(t, 'crew@gannetbay.example');
        const records = await pullAll(s.accessToken);
        const of = (kind) => records.filter((r) => r.kind === kind);
        expect(of('boat')).toHaveLength(2);
        expect(of('motor')).toHaveLength(3);
        expect(of('checkTemplate').map((r) => r.fields.checkType).sort()).toEqual(['launch', 'stow']);
        const outcomes = of('check').map((c) => Object.values(c.fields.results).some((r) => r.outcome === 'fail'));
        expect(outcomes.sort()).toEqual([false, true]);
        expect(of('defect').map((d) => d.fields.status).sort()).toEqual(['assigned', 'open', 'rejected', 'repaired', 'verified']);
    });
    // Common practice, no source: three inflation valves (two side pontoons and the bow); a rescue tube,
    // two paddles, a tow rope, a knife and a whistle; two life jackets and a waterproof radio.
    it('fits the demo boats with three air chambers and the carried gear of an IRB', async () => {
        const s = await login(t, 'crew@gannetbay.example');
        for (const boat of (await pullAll(s.accessToken)).filter((r) => r.kind === 'boat')) {
            expect(boat.fields.airChambers.map((c) => c.id)).toEqual(['port', 'starboard', 'bow']);
            const gear = Object.fromEntries(boat.fields.requiredGear.map((g) => [g.item, g.count]));
            expect(gear).toEqual({ 'rescue tube': 1, paddle: 2, 'tow rope': 1, knife: 1, whistle: 1, 'life jacket': 2, 'waterproof radio': 1 });
        }
    });
    it('gives each motor a history of moves that ends on the boat it is fitted to now', async () => {
        const s = await login(t, 'crew@gannetbay.example');
        const records = await pullAll(s.accessToken);
        const moves = records.filter((r) => r.kind === 'motorMove').map((r) => r.fields);
        expect(moves.length).toBeGreaterThan(0);
        for (const motor of records.filter((r) => r.kind === 'motor')) {
            const own = moves.filter((m) => m.motorId === motor.id).sort((a, b) => a.movedAt.localeCompare(b.movedAt));
            for (let i = 1; i < own.length; i++)
                expect(own[i].fromBoatId).toBe(own[i - 1].toBoatId);
            if (own.length)
                expect(own.at(-1).toBoatId).toBe(motor.fields.boatId);
            for (const m of own)
                expect(m.movedBy).toEqual(expect.any(String));
        }
    });
    // Common practice, no source: the launch check reads the three chambers the demo boats have.
    it('reads in the launch check the air chambers the demo boats have', async () => {
        const s = await login(t, 'crew@gannetbay.example');
        const records = await pullAll(s.accessToken);
        const launch = records.find((r) => r.kind === 'checkTemplate' && r.fields.checkType === 'launch');
        const read = launch.fields.sections.flatMap((sec) => sec.items.flatMap((i) => (i.chamberId ? [i.chamberId] : [])));
        for (const boat of records.filter((r) => r.kind === 'boat')) {
            expect(boat.fields.airChambers.map((c) => c.id)).toEqual(read);
        }
    });
    it('writes nothing the second time', async () => {
        const before = await t.db.query('SELECT last_seq FROM sync_club_state');
        expect(await seedDemo(t.db)).toEqual({ created: 0 });
        expect(await t.db.query('SELECT last_seq FROM sync_club_state')).toEqual(before);
    });
    it('leaves the second club with only its members\' cards, as a new club starts', async () => {
        const s = await login(t, 'admin@kelpreef.example');
        expect((await pullAll(s.accessToken)).map((r) => r.kind)).toEqual(['member', 'member']);
    });
});
//# sourceMappingURL=demo-seed.e2e-spec.js.map