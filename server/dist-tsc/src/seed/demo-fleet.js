import { demoId } from './demo-ids.js';
const chambers = (min, max) => [
    { id: 'port', name: 'port side pontoon', valve: 'port valve, aft', minKpa: min, maxKpa: max },
    { id: 'starboard', name: 'starboard side pontoon', valve: 'starboard valve, aft', minKpa: min, maxKpa: max },
    { id: 'bow', name: 'bow chamber', valve: 'bow valve', minKpa: min, maxKpa: max },
];
const gear = [
    { item: 'rescue tube', count: 1 }, { item: 'paddle', count: 2 }, { item: 'tow rope', count: 1 },
    { item: 'knife', count: 1 }, { item: 'whistle', count: 1 }, { item: 'life jacket', count: 2 }, { item: 'waterproof radio', count: 1 },
];
export const BOATS = [
    { id: demoId('boat:1'), fields: { fleetNumber: 'IRB 1', name: 'Shearwater', hullSerial: 'GB-HUL-2209', airChambers: chambers(17, 24), requiredGear: gear, notes: 'Main patrol boat.', inService: true } },
    { id: demoId('boat:2'), fields: { fleetNumber: 'IRB 2', name: 'Petrel', hullSerial: 'GB-HUL-1874', airChambers: chambers(17, 24), requiredGear: gear, notes: 'Training and second boat.', inService: true } },
];
export function motors(today) {
    const base = { powerHp: 25, serviceIntervalHours: 50, serviceIntervalMonths: 12, fuelMode: 'premix', premixRatio: 50 };
    return [
        { id: demoId('motor:1'), fields: { ...base, serial: 'TM25-40117', model: 'demo 25 hp two-stroke', hourMeter: 231.4, lastServiceAt: '2026-08-20T00:00:00Z', lastServiceHours: 190.0, boatId: BOATS[0].id } },
        { id: demoId('motor:2'), fields: { ...base, serial: 'TM25-38842', model: 'demo 25 hp two-stroke', hourMeter: 312.9, lastServiceAt: '2025-11-02T00:00:00Z', lastServiceHours: 262.0, boatId: BOATS[1].id } },
        { id: demoId('motor:3'), fields: { ...base, serial: 'TM25-41930', model: 'demo 25 hp two-stroke (spare)', hourMeter: 88.2, lastServiceAt: `${today}T00:00:00Z`, lastServiceHours: 88.2, boatId: null } },
    ];
}
/** Where the motors have been: IRB 2's motor away for a starter cord, the spare standing in. */
export function motorMoves(people, day) {
    const [m2, m3, b2] = [demoId('motor:2'), demoId('motor:3'), BOATS[1].id];
    const move = (n, motorId, fromBoatId, toBoatId, offset, time, movedBy, reason) => ({ id: demoId(`move:${n}`), fields: { motorId, fromBoatId, toBoatId, movedAt: `${day(offset)}T${time}:00Z`, movedBy, reason } });
    return [
        move(1, m2, b2, null, -45, '06:10', people.captain, 'Off for a new starter cord'),
        move(2, m3, null, b2, -45, '06:25', people.captain, 'Stand-in while TM25-38842 is off'),
        move(3, m3, b2, null, -25, '05:40', people.driver, 'TM25-38842 is back; spare to the store'),
        move(4, m2, null, b2, -25, '05:55', people.driver, 'Back from the starter cord repair'),
    ];
}
//# sourceMappingURL=demo-fleet.js.map