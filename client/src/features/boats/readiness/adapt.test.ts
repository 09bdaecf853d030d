import { DEFAULT_LAUNCH_TEMPLATE, type BoatState, type PressureUnit } from '@breakline/sync-protocol';
import { describe, expect, it } from 'vitest';
import type { LocalRecord } from '@/db/types';
import {
  BOAT_ID, MOTOR_ID, boatFields, checkFields, defectFields, launchTemplate, local, motorFields, stowTemplate, tripFields,
} from '../testing/records';
import { readinessInput, readinessOf, type FleetRecords } from './adapt';

// 12:00 on 1 December 2026 at a club in Sydney (AEDT, UTC+11).
const NOW = '2026-12-01T01:00:00Z';
const TODAY = '2026-12-01T00:00:00Z';
const YESTERDAY = '2026-11-30T00:00:00Z';
const boat = local('boat', boatFields(), BOAT_ID);

function fleet(over: Partial<FleetRecords> = {}): FleetRecords {
  return {
    checks: [],
    templates: [launchTemplate(), stowTemplate()],
    defects: [],
    motors: [local('motor', motorFields())],
    trips: [],
    serviceRecords: [],
    ...over,
  };
}
const launch = (at: string | null, results = {}, startedAt?: string) => local('check', checkFields('launch', at, results, startedAt));
const stow = (at: string) => local('check', checkFields('stow', at));
const defect = (over = {}) => local('defect', defectFields(over));

interface Row {
  name: string;
  records: FleetRecords;
  unit?: PressureUnit;
  state: BoatState;
  reason: string;
}

const rows: Row[] = [
  { name: 'no check at all', records: fleet(), state: 'unchecked', reason: 'unchecked: no completed launch check on record' },
  { name: 'launch check passed today', records: fleet({ checks: [launch(TODAY)] }), state: 'fit', reason: 'fit: launch check passed at 11:00 today' },
  {
    name: 'stale launch check from yesterday',
    records: fleet({ checks: [launch(YESTERDAY)] }),
    state: 'unchecked',
    reason: 'unchecked: last launch check was on 2026-11-30, none today',
  },
  {
    name: 'port pontoon read below its range, though ticked as passed',
    records: fleet({ checks: [launch(TODAY, { 'pressure-port': { outcome: 'pass', value: 14 } })] }),
    state: 'stood-down',
    reason: 'stood down: Port side pontoon pressure below range at 14.0 kPa (spec 17.0 kPa to 24.0 kPa); launch check 2026-12-01',
  },
  {
    name: 'the same reading shown in a psi club',
    records: fleet({ checks: [launch(TODAY, { 'pressure-port': { outcome: 'fail', value: 14 } })] }),
    unit: 'psi',
    state: 'stood-down',
    reason: 'stood down: Port side pontoon pressure below range at 2.03 psi (spec 2.47 psi to 3.48 psi); launch check 2026-12-01',
  },
  {
    name: 'a minor item failed',
    records: fleet({ checks: [launch(TODAY, { handles: { outcome: 'fail', note: 'foot strap torn' } })] }),
    state: 'limited',
    reason: 'limited: Handles, foot straps and capsize rope secure failed (foot strap torn); launch check 2026-12-01',
  },
  {
    name: 'a failed item this phone has no template for counts as critical',
    records: fleet({ checks: [launch(TODAY, { 'club-extra': { outcome: 'fail' } })], templates: [] }),
    state: 'stood-down',
    reason: 'stood down: Check item "club-extra" failed; launch check 2026-12-01',
  },
  {
    name: 'motor past its hours service',
    records: fleet({ checks: [launch(TODAY)], motors: [local('motor', motorFields({ hourMeter: 205 }))] }),
    state: 'limited',
    reason: 'limited: motor service overdue: 5.0 h past the 200.0 h service; due by 2027-09-01 (274 days)',
  },
  {
    name: 'motor with no service recorded',
    records: fleet({ checks: [launch(TODAY)], motors: [local('motor', motorFields({ lastServiceAt: null }))] }),
    state: 'limited',
    reason: 'limited: motor service history not recorded: record a service on the motor’s page',
  },
  {
    name: 'a service record since the motor record’s service clears the overdue',
    records: fleet({
      checks: [launch(TODAY)],
      motors: [local('motor', motorFields({ hourMeter: 205 }), MOTOR_ID)],
      serviceRecords: [local('serviceRecord', { motorId: MOTOR_ID, servicedAt: '2026-11-20T01:00:00Z', engineHours: 204, work: 'Full service', parts: '', performedBy: 'Gear officer' })],
    }),
    state: 'fit',
    reason: 'fit: launch check passed at 11:00 today',
  },
  {
    name: 'a trip’s closing hour meter beyond the motor record’s takes the motor past its service',
    records: fleet({
      checks: [launch(TODAY)],
      motors: [local('motor', motorFields({ hourMeter: 150 }), MOTOR_ID)],
      trips: [local('trip', tripFields({ launchedAt: '2026-11-28T00:30:00Z', retrievedAt: '2026-11-28T03:30:00Z', engineHoursStart: 199, engineHoursEnd: 201.5 }))],
    }),
    state: 'limited',
    reason: 'limited: motor service overdue: 1.5 h past the 200.0 h service; due by 2027-09-01 (274 days)',
  },
  {
    name: 'a motor on another boat is not this boat’s',
    records: fleet({ checks: [launch(TODAY)], motors: [local('motor', motorFields({ hourMeter: 205, boatId: null }))] }),
    state: 'fit',
    reason: 'fit: launch check passed at 11:00 today',
  },
  {
    name: 'open stand-down defect',
    records: fleet({ checks: [launch(TODAY)], defects: [defect()] }),
    state: 'stood-down',
    reason: 'stood down: defect "Port pontoon seam lifting near the transom" raised 2026-12-01, open',
  },
  {
    name: 'repaired but not yet verified still holds the boat',
    records: fleet({ checks: [launch(TODAY)], defects: [defect({ status: 'repaired', actionTaken: 'Seam glued' })] }),
    state: 'stood-down',
    reason: 'stood down: defect "Port pontoon seam lifting near the transom" raised 2026-12-01, repaired',
  },
  {
    name: 'advisory defect',
    records: fleet({ checks: [launch(TODAY)], defects: [defect({ severity: 'note', description: 'Paint worn on the bow\nno hurry' })] }),
    state: 'limited',
    reason: 'limited: advisory defect "Paint worn on the bow" raised 2026-12-01, open',
  },
  {
    name: 'rejected and other boats’ defects do not count',
    records: fleet({
      checks: [launch(TODAY)],
      defects: [defect({ status: 'rejected', rejectedReason: 'Not a fault' }), defect({ boatId: '0190a000-0000-7000-8000-0000000000ff' })],
    }),
    state: 'fit',
    reason: 'fit: launch check passed at 11:00 today',
  },
  {
    name: 'defect verified after a failed check: the failed check still stands',
    records: fleet({
      checks: [launch(TODAY, { 'drain-bungs': { outcome: 'fail' } })],
      defects: [defect({ status: 'verified', verifiedBy: 'u-2', verifiedAt: '2026-12-01T00:40:00Z' })],
    }),
    state: 'stood-down',
    reason: 'stood down: Drain bungs in and secure failed; launch check 2026-12-01',
  },
  {
    name: 'defect verified, then a new launch check passed',
    records: fleet({
      checks: [launch('2026-11-30T23:00:00Z', { 'drain-bungs': { outcome: 'fail' } }), launch('2026-12-01T00:50:00Z')],
      defects: [defect({ status: 'verified', verifiedBy: 'u-2', verifiedAt: '2026-12-01T00:40:00Z' })],
    }),
    state: 'fit',
    reason: 'fit: launch check passed at 11:50 today',
  },
  {
    name: 'a launch check begun again after one passed',
    records: fleet({ checks: [launch(TODAY), launch(null, {}, '2026-12-01T00:55:00Z')] }),
    state: 'unchecked',
    reason: 'unchecked: launch check in progress',
  },
  {
    name: 'launched and not retrieved',
    records: fleet({ checks: [launch(TODAY)], trips: [local('trip', tripFields())] }),
    state: 'afloat',
    reason: 'afloat: launched 11:30 on 2026-12-01, not yet retrieved',
  },
  {
    name: 'stow check done after the launch check',
    records: fleet({ checks: [launch(TODAY), stow('2026-12-01T00:58:00Z')] }),
    state: 'stowed',
    reason: 'stowed: stow check completed 11:58 today',
  },
];

describe('readiness from the records on this phone', () => {
  it.each(rows)('$name → $state', ({ records, unit = 'kPa', state, reason }) => {
    const result = readinessOf(boat, records, { now: NOW, zone: 'Australia/Sydney', unit });
    expect(result.ok && result.readiness.state).toBe(state);
    expect(result.ok && result.readiness.reasons).toContain(reason);
  });

  it('keys chamber ranges by the chamber id the template items name', () => {
    const input = readinessInput(boat, fleet(), { now: NOW, zone: 'Australia/Sydney', unit: 'kPa' });
    const chamberIds = DEFAULT_LAUNCH_TEMPLATE.sections.flatMap((s) => s.items.flatMap((i) => (i.chamberId ? [i.chamberId] : [])));
    expect(Object.keys(input.boat.chambers ?? {}).sort()).toEqual([...chamberIds].sort());
  });

  it('counts engine hours from trips that logged the meter at both ends', () => {
    const trips: LocalRecord<'trip'>[] = [
      local('trip', tripFields({ retrievedAt: '2026-12-01T00:50:00Z', engineHoursStart: 150, engineHoursEnd: 160 })),
    ];
    // 10 h in the last 30 days and 50 h left: the forecast lands 150 days on, beyond "soon".
    const result = readinessOf(boat, fleet({ checks: [launch(TODAY)], trips, motors: [local('motor', motorFields({ hourMeter: 150 }))] }), {
      now: NOW, zone: 'Australia/Sydney', unit: 'kPa',
    });
    expect(result.ok && result.readiness.state).toBe('fit');
  });

  it('says plainly when the state cannot be worked out', () => {
    const result = readinessOf(boat, fleet(), { now: NOW, zone: 'Mars/Olympus', unit: 'kPa' });
    expect(result).toEqual({ ok: false, message: expect.stringContaining('The state of Gannet could not be worked out') });
  });
});
