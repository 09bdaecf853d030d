// The demo club's patrol season: twelve weeks of weekend patrols before the day the demo is
// written, with sign-ons, trips of every purpose with their conditions, and incident notes.
// Everything is decided by the patrol day's place in the season, never by the calendar, so the
// number and order of records (and so each mutation's seq) is the same whenever it is written.
import { addDays, localToUtc, sunTimes, utcToLocal, } from '@breakline/sync-protocol';
import { BOATS } from './demo-fleet.js';
import { demoId } from './demo-ids.js';
const MINUTE = 60_000;
const SEASON_DAYS = 84; // twelve whole weeks: always 24 weekend days
function localAt(date, time, zone) {
    const r = localToUtc(`${date}T${time}`, zone);
    if (r.status !== 'ok')
        throw new Error(`Demo time ${date} ${time} is not a plain local time in ${zone}`);
    return r.instant.replace('.000Z', 'Z');
}
const plus = (iso, minutes) => new Date(Date.parse(iso) + minutes * MINUTE).toISOString().replace('.000Z', 'Z');
/** The 24 weekend days of the season, oldest first. */
export function patrolDays(today) {
    const days = [];
    for (let k = SEASON_DAYS; k >= 1; k--) {
        const d = addDays(today, -k);
        const weekday = new Date(`${d}T00:00:00Z`).getUTCDay();
        if (weekday === 0 || weekday === 6)
            days.push(d);
    }
    return days;
}
const WIND_KN = [6, 9, 12, 15, 8, 18, 22, 11, 4, 14];
const WIND_DEG = [45, 90, 135, 180, 200, 225, 10, 300, 160, 60];
const WAVE_M = [0.6, 0.9, 1.2, 1.6, 0.4, 2.0, 2.6, 1.0, 0.3, 1.4];
const SECOND_TRIP = ['training', 'preventive-action', 'rescue', 'event-support', 'search', 'maintenance-run'];
/** Patrol day i: who drives and crews each boat. Mara crews IRB 2 only early in the season, while her crew award is current. */
function crewOfDay(p, i) {
    const irb1Driver = i % 2 === 0 ? p.driver : p.captain;
    const irb2 = i === 3 || i === 9 ? { driver: i % 2 === 0 ? p.captain : p.driver, crew: p.admin } : null;
    return { irb1: { driver: irb1Driver, crew: p.crew }, irb2 };
}
function planTrips(p, days, place) {
    const trips = [];
    days.forEach((date, i) => {
        const c = crewOfDay(p, i);
        const at = (time) => localAt(date, time, place.timeZone);
        const irb1 = { boat: 0, motor: demoId('motor:1'), driverId: c.irb1.driver, crewIds: [c.irb1.crew], day: i };
        const patrolMinutes = 35 + (i % 4) * 6;
        trips.push({ ...irb1, key: `${i}:a`, purpose: 'patrol', launchedAt: at(i % 2 ? '09:35' : '09:20'), minutes: patrolMinutes,
            ...(i % 3 === 0 ? { fuelAddedL: 10 } : {}), ...(i % 5 === 1 ? { note: 'Rip forming north of the flags; swimmers moved south' } : {}),
            ...(i === 12 ? { edit: { reason: 'Retrieval stamped late: the boat was back on the sand ten minutes earlier', wasMinutes: patrolMinutes + 10 } } : {}) });
        trips.push({ ...irb1, key: `${i}:b`, purpose: SECOND_TRIP[i % SECOND_TRIP.length], launchedAt: at('13:40'), minutes: 20 + (i % 5) * 5 });
        if (i % 4 === 3)
            trips.push({ ...irb1, key: `${i}:c`, purpose: 'patrol', launchedAt: at('15:30'), minutes: 30 });
        if (c.irb2) {
            trips.push({ key: `${i}:irb2`, boat: 1, motor: demoId('motor:2'), purpose: 'training', driverId: c.irb2.driver, crewIds: [c.irb2.crew],
                launchedAt: at('10:30'), minutes: 40, day: i, note: 'Crew pick-up drills outside the break' });
        }
        if (i === 20) {
            // A search called out before dawn: launched before sunrise, so its trip carries the daylight warning.
            const sun = sunTimes(date, place.latitude, place.longitude, place.timeZone);
            const sunrise = sun.status === 'rises-and-sets' ? sun.sunrise : at('05:30');
            trips.push({ ...irb1, key: `${i}:dawn`, purpose: 'search', launchedAt: plus(sunrise, -25).replace(/:\d\d(\.\d+)?Z$/, ':00Z'), minutes: 50,
                note: 'Called out for an overdue paddler; found on the rocks at the south end, walked out with the police' });
        }
    });
    return trips.sort((a, b) => a.launchedAt.localeCompare(b.launchedAt));
}
/** Engine hours at each end of each trip, counted back from each motor's hour meter now. */
function engineHours(trips, meters) {
    const run = (t) => Math.round((t.minutes / 60) * 0.9 * 10) / 10;
    const total = {};
    for (const t of trips)
        total[t.motor] = (total[t.motor] ?? 0) + run(t);
    const reading = {};
    for (const [m, used] of Object.entries(total))
        reading[m] = Math.round(((meters[m] ?? 0) - used) * 10) / 10;
    return trips.map((t) => {
        const start = reading[t.motor];
        const end = Math.round((start + run(t)) * 10) / 10;
        reading[t.motor] = end;
        return { start, end };
    });
}
export function demoPatrol(p, now, place, meters) {
    const today = utcToLocal(now, place.timeZone).date;
    const days = patrolDays(today);
    const trips = planTrips(p, days, place);
    const hours = engineHours(trips, meters);
    const entries = [];
    days.forEach((date, i) => {
        const c = crewOfDay(p, i);
        const on = localAt(date, '08:00', place.timeZone);
        const off = localAt(date, '17:30', place.timeZone);
        const signOn = (n, boat, memberId, role) => ['signOn', demoId(`sign-on:${i}:${n}`), { boatId: BOATS[boat].id, memberId, role, sessionDate: date, signedOnAt: on, signedOffAt: off }];
        entries.push(signOn('irb1-driver', 0, c.irb1.driver, 'driver'), signOn('irb1-crew', 0, c.irb1.crew, 'crew'));
        if (c.irb2)
            entries.push(signOn('irb2-driver', 1, c.irb2.driver, 'driver'), signOn('irb2-crew', 1, c.irb2.crew, 'crew'));
    });
    // Today: the crew member is already signed on to IRB 1, waiting for a driver.
    const midnight = localAt(today, '00:00', place.timeZone);
    const early = localAt(today, '07:30', place.timeZone);
    const onToday = [plus(now.toISOString(), -5), early].sort()[0];
    entries.push(['signOn', demoId('sign-on:today:irb1-crew'), {
            boatId: BOATS[0].id, memberId: p.crew, role: 'crew', sessionDate: today,
            signedOnAt: (onToday < midnight ? midnight : onToday).replace(/\.\d+Z$/, 'Z'), signedOffAt: null,
        }]);
    trips.forEach((t, n) => {
        const retrievedAt = plus(t.launchedAt, t.minutes);
        const fields = {
            boatId: BOATS[t.boat].id, motorId: t.motor, purpose: t.purpose, driverId: t.driverId, crewIds: t.crewIds,
            launchedAt: t.launchedAt, retrievedAt,
            windSpeedKn: WIND_KN[t.day % 10], windDirectionDeg: WIND_DEG[(t.day * 3) % 10], waveHeightM: WAVE_M[t.day % 10],
            engineHoursStart: hours[n].start, engineHoursEnd: hours[n].end, fuelAddedL: t.fuelAddedL ?? null,
            notes: t.note ? [{ at: retrievedAt, by: t.driverId, text: t.note }] : [],
            editReasons: t.edit ? [{ at: plus(retrievedAt, 30), by: t.driverId, text: `${t.edit.reason} (retrieval was ${utcToLocal(plus(t.launchedAt, t.edit.wasMinutes), place.timeZone).time})` }] : [],
        };
        entries.push(['trip', demoId(`trip:${t.key}`), fields]);
    });
    const tripOf = (key) => trips.find((t) => t.key === key);
    const incident = (key, n, kind, after, authorId, rest) => {
        const t = tripOf(key);
        return ['incidentNote', demoId(`incident:${key}`), {
                tripId: demoId(`trip:${t.key}`), boatId: BOATS[t.boat].id, kind, occurredAt: plus(t.launchedAt, after),
                lat: Math.round((place.latitude + 0.0011 * ((n % 5) - 2)) * 1e5) / 1e5, lon: Math.round((place.longitude + 0.0031) * 1e5) / 1e5,
                authorId: authorId ?? t.driverId, ...rest,
            }];
    };
    entries.push(incident('2:b', 0, 'rescue', 8, null, { peopleHelped: 2, actionTaken: 'Two swimmers caught in the rip taken aboard and brought to the beach', outcome: 'Both walked up the beach; handed to the first aid room to be checked', text: '' }), incident('5:a', 1, 'assist', 15, null, { peopleHelped: 1, actionTaken: 'Tired body-boarder towed back between the flags', outcome: 'No further help needed', text: '' }), incident('8:b', 2, 'first-aid', 6, null, { peopleHelped: 1, actionTaken: 'Bluebottle stings: brought ashore, stings rinsed with sea water, handed to the first aid room', outcome: 'Treated on the beach, went home', text: '' }), incident('11:a', 3, 'near-miss', 20, null, { peopleHelped: 0, actionTaken: 'Motor put in neutral and killed when a swimmer surfaced beside the boat', outcome: 'No contact; the driver briefed the crew on keeping a lookout near swimmers', text: 'Swimmer was outside the flags and did not see the boat.' }), incident('14:b', 4, 'rescue', 10, p.crew, { peopleHelped: 1, actionTaken: 'Swimmer caught off the sandbank taken aboard', outcome: 'Conscious and breathing; handed to the patrol on the beach', text: '' }), incident('17:a', 0, 'equipment-failure', 25, null, { peopleHelped: 0, actionTaken: 'Kill cord clip cracked; trip cut short and the boat brought in', outcome: 'Spare kill cord fitted before the next launch', text: '' }), incident('20:dawn', 1, 'assist', 35, null, { peopleHelped: 1, actionTaken: 'Overdue paddler found on the rocks, boat stood off while the police walked him out', outcome: 'Cold but unhurt', text: '' }));
    return entries;
}
//# sourceMappingURL=demo-patrol.js.map