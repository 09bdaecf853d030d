import { beaufortForce, seaStateCode, TRIP_PURPOSES, isOutsideDaylight, utcToLocal } from '@breakline/sync-protocol';
import { seedDemo } from '../src/seed/seed.js';
import { DEMO_CLUBS } from '../src/seed/demo-scenario.js';
import { createTestApp, login } from './support/test-app.js';
const GANNET = DEMO_CLUBS.find((c) => c.slug === 'gannet-bay');
describe('the demo patrol season', () => {
    let t;
    let driverView;
    beforeAll(async () => {
        t = await createTestApp();
        driverView = await pullAs('driver@gannetbay.example');
    });
    afterAll(async () => { await t.app.close(); });
    async function pullAs(email) {
        const s = await login(t, email);
        const res = await t.http().get('/api/sync/pull?limit=1000').set('authorization', `Bearer ${s.accessToken}`).expect(200);
        expect(res.body.hasMore).toBe(false);
        return res.body.changes;
    }
    const of = (records, kind) => records.filter((r) => r.kind === kind);
    it('has retrieved trips of every purpose, each with wind, waves and engine hours', () => {
        const trips = of(driverView, 'trip');
        expect(new Set(trips.map((x) => x.fields.purpose))).toEqual(new Set(TRIP_PURPOSES));
        for (const { fields: f } of trips) {
            expect(f.retrievedAt).not.toBeNull();
            expect(Date.parse(f.retrievedAt)).toBeGreaterThan(Date.parse(f.launchedAt));
            expect(f.engineHoursEnd).toBeGreaterThan(f.engineHoursStart);
            expect(beaufortForce(f.windSpeedKn)).toBeGreaterThanOrEqual(1);
            expect(seaStateCode(f.waveHeightM)).toBeGreaterThanOrEqual(2);
        }
    });
    it('counts each motor\'s engine hours up to its hour meter, without gaps running backwards', () => {
        const motors = of(driverView, 'motor');
        for (const motor of motors) {
            const trips = of(driverView, 'trip').filter((x) => x.fields.motorId === motor.id).sort((a, b) => a.fields.launchedAt.localeCompare(b.fields.launchedAt));
            for (let i = 1; i < trips.length; i++)
                expect(trips[i].fields.engineHoursStart).toBeGreaterThanOrEqual(trips[i - 1].fields.engineHoursEnd);
            if (trips.length)
                expect(trips.at(-1).fields.engineHoursEnd).toBeCloseTo(motor.fields.hourMeter, 5);
        }
    });
    it('has one launch before sunrise, so the daylight warning shows in the history', () => {
        const dark = of(driverView, 'trip').filter((x) => isOutsideDaylight(x.fields.launchedAt, GANNET.latitude, GANNET.longitude, GANNET.timeZone));
        expect(dark.map((x) => x.fields.purpose)).toEqual(['search']);
    });
    it('has a trip edited afterwards with the reason kept', () => {
        const edited = of(driverView, 'trip').filter((x) => x.fields.editReasons.length > 0);
        expect(edited).toHaveLength(1);
        expect(edited[0].fields.editReasons[0].text).toMatch(/^Retrieval stamped late/);
    });
    it('signs on a driver and crew for every trip\'s boat and day, and the crew member for today', () => {
        const signOns = of(driverView, 'signOn');
        for (const { fields: trip } of of(driverView, 'trip')) {
            const date = utcToLocal(trip.launchedAt, GANNET.timeZone).date;
            const that = signOns.filter((s) => s.fields.boatId === trip.boatId && s.fields.sessionDate === date);
            expect(that.find((s) => s.fields.role === 'driver')?.fields.memberId).toBe(trip.driverId);
            expect(that.filter((s) => s.fields.role === 'crew').map((s) => s.fields.memberId)).toEqual(trip.crewIds);
        }
        const today = utcToLocal(new Date(), GANNET.timeZone).date;
        expect(signOns.filter((s) => s.fields.sessionDate === today).map((s) => [s.fields.role, s.fields.signedOffAt])).toEqual([['crew', null]]);
    });
    it('links incident notes of every kind to trips, and shows a crew member only the one they wrote', async () => {
        const notes = of(driverView, 'incidentNote');
        expect(new Set(notes.map((n) => n.fields.kind))).toEqual(new Set(['rescue', 'assist', 'first-aid', 'near-miss', 'equipment-failure']));
        const tripIds = new Set(of(driverView, 'trip').map((x) => x.id));
        for (const n of notes)
            expect(tripIds.has(n.fields.tripId)).toBe(true);
        const crew = await pullAs('crew@gannetbay.example');
        const crewUser = of(crew, 'member').find((m) => m.fields.displayName === 'Sam Whitcombe').fields.memberId;
        expect(of(crew, 'incidentNote').map((n) => n.fields.authorId)).toEqual([crewUser]);
        expect(of(crew, 'trip')).toHaveLength(of(driverView, 'trip').length);
    });
    it('writes nothing when seeded again', async () => {
        const before = await t.db.query('SELECT club_id, last_seq FROM sync_club_state ORDER BY club_id');
        expect(await seedDemo(t.db)).toEqual({ created: 0 });
        expect(await t.db.query('SELECT club_id, last_seq FROM sync_club_state ORDER BY club_id')).toEqual(before);
    });
});
//# sourceMappingURL=demo-patrol.e2e-spec.js.map