import { describe, expect, it } from 'vitest';
import { boatReadiness, type BoatState, type CheckInput, type CheckItemResult, type DefectInput, type ReadinessInput } from '../../src/derive/readiness.js';

// States and meanings from names.md (boat states); the rest is hand-computed. Invented demo boat.
// The club is in Australia/Sydney (AEDT, UTC+11 in December): 2026-12-01T01:00Z is noon on 1 December.
const NOW = '2026-12-01T01:00:00Z';
const boat = { name: 'Gull 2', chambers: { 'port pontoon': { minKpa: 17, maxKpa: 20 }, 'starboard pontoon': { minKpa: 17, maxKpa: 20 } } };

const ok = (label: string, critical = true): CheckItemResult => ({ label, outcome: 'pass', critical });
const chamber = (label: string, kpa: number, outcome: CheckItemResult['outcome'] = 'pass'): CheckItemResult => ({ label, chamber: label, pressureKpa: kpa, outcome, critical: true });
const launch = (completedAt: string | null, extra: CheckItemResult[] = [], port = 18.5): CheckInput => ({
  type: 'launch', status: completedAt ? 'complete' : 'in-progress', completedAt,
  results: [chamber('port pontoon', port), chamber('starboard pontoon', 18.2), ok('kill cord'), ok('paddle', false), ...extra],
});
const stow = (completedAt: string, extra: CheckItemResult[] = []): CheckInput => ({
  type: 'stow', status: 'complete', completedAt, results: [ok('motor flushed'), ok('fuel made safe'), ...extra],
});
const defect = (severity: DefectInput['severity'], status: DefectInput['status'], summary: string, reportedAt = '2026-11-30T06:00:00Z', limitation?: string): DefectInput =>
  ({ severity, status, summary, reportedAt, ...(limitation ? { limitation } : {}) });

const TODAY_0700 = '2026-11-30T20:00:00Z'; // 07:00 on 1 Dec, local
const TODAY_1830 = '2026-12-01T07:30:00Z'; // 18:30 on 1 Dec, local
const YESTERDAY = '2026-11-30T05:00:00Z'; // 16:00 on 30 Nov, local
const LOW_PORT = 'port pontoon below range at 14.0 kPa (spec 17.0 kPa to 20.0 kPa)';

const base: ReadinessInput = { boat, launchCheck: null, stowCheck: null, defects: [], motorService: null, trips: [], now: NOW, zone: 'Australia/Sydney' };

const rows: Array<[string, Partial<ReadinessInput>, BoatState, string[]]> = [
  ['no checks at all', {}, 'unchecked', ['unchecked: no completed launch check on record']],
  ['launch check passed this morning', { launchCheck: launch(TODAY_0700) }, 'fit', ['fit: launch check passed at 07:00 today']],
  ['"today" is the club\'s date: 14:00Z on 30 Nov is 01:00 on 1 Dec', { launchCheck: launch('2026-11-30T14:00:00Z') }, 'fit', ['fit: launch check passed at 01:00 today']],
  ['launch check yesterday, none today', { launchCheck: launch(YESTERDAY) }, 'unchecked', ['unchecked: last launch check was on 2026-11-30, none today']],
  ['a new local day on the same UTC day', { launchCheck: launch('2026-12-01T01:00:00Z'), now: '2026-12-01T13:30:00Z' }, 'unchecked', ['unchecked: last launch check was on 2026-12-01, none today']],
  ['stow check after today\'s launch check', { launchCheck: launch(TODAY_0700), stowCheck: stow(TODAY_1830), now: '2026-12-01T08:00:00Z' }, 'stowed', ['stowed: stow check completed 18:30 today']],
  ['stowed yesterday, no launch check since', { launchCheck: launch('2026-11-29T20:00:00Z'), stowCheck: stow(YESTERDAY) }, 'unchecked', ['unchecked: no launch check since the stow check on 2026-11-30']],
  ['stowed yesterday, launch check passed today', { stowCheck: stow(YESTERDAY), launchCheck: launch(TODAY_0700) }, 'fit', ['fit: launch check passed at 07:00 today']],
  ['launch check in progress after yesterday\'s stow', { stowCheck: stow(YESTERDAY), launchCheck: launch(null) }, 'unchecked',
    ['unchecked: launch check in progress', 'unchecked: no launch check since the stow check on 2026-11-30']],
  ['a soft chamber ticked as passed still stands the boat down', { launchCheck: launch(TODAY_0700, [], 14) }, 'stood-down', [`stood down: ${LOW_PORT}; launch check 2026-12-01`]],
  ['an over-pressure chamber', { launchCheck: launch(TODAY_0700, [], 21.5) }, 'stood-down',
    ['stood down: port pontoon above range at 21.5 kPa (spec 17.0 kPa to 20.0 kPa); launch check 2026-12-01']],
  ['a soft chamber and an open stand-down defect', { launchCheck: launch(TODAY_0700, [], 14), defects: [defect('stand-down', 'open', 'port pontoon losing air')] }, 'stood-down',
    [`stood down: ${LOW_PORT}; launch check 2026-12-01`, 'stood down: defect "port pontoon losing air" raised 2026-11-30, open']],
  ['a critical failure found in a check still in progress', { launchCheck: launch(null, [{ label: 'kill cord', outcome: 'fail', critical: true, note: 'lanyard frayed' }]) }, 'stood-down',
    ['stood down: kill cord failed (lanyard frayed); launch check in progress', 'unchecked: launch check in progress', 'unchecked: no completed launch check on record']],
  ['a repaired stand-down defect holds until verified', { launchCheck: launch(TODAY_0700), defects: [defect('stand-down', 'repaired', 'propeller guard cracked')] }, 'stood-down',
    ['stood down: defect "propeller guard cracked" raised 2026-11-30, repaired']],
  ['verified and rejected defects no longer count', { launchCheck: launch(TODAY_0700), defects: [defect('stand-down', 'verified', 'a'), defect('limit', 'rejected', 'b')] }, 'fit',
    ['fit: launch check passed at 07:00 today']],
  ['a minor item failed', { launchCheck: launch(TODAY_0700, [{ label: 'spare paddle', outcome: 'fail', critical: false, note: 'cracked blade' }]) }, 'limited',
    ['limited: spare paddle failed (cracked blade); launch check 2026-12-01']],
  ['an open limit defect', { launchCheck: launch(TODAY_0700), defects: [defect('limit', 'assigned', 'steering stiff', '2026-11-28T22:00:00Z', 'flat water only')] }, 'limited',
    ['limited: defect "steering stiff" raised 2026-11-29, assigned; limit: flat water only']],
  ['an advisory defect', { launchCheck: launch(TODAY_0700), defects: [defect('note', 'open', 'foot strap worn')] }, 'limited',
    ['limited: advisory defect "foot strap worn" raised 2026-11-30, open']],
  ['motor service due soon', { launchCheck: launch(TODAY_0700), motorService: { status: 'due-soon', reason: 'service due soon: 4.0 h left before the 180.0 h service' } }, 'limited',
    ['limited: motor service due soon: 4.0 h left before the 180.0 h service']],
  ['motor service overdue limits (it is neither a failed item nor a stand-down defect)', { launchCheck: launch(TODAY_0700), motorService: { status: 'overdue', reason: 'service overdue: 3.0 h past the 180.0 h service' } }, 'limited',
    ['limited: motor service overdue: 3.0 h past the 180.0 h service']],
  ['motor service ok', { launchCheck: launch(TODAY_0700), motorService: { status: 'ok', reason: 'service not yet due' } }, 'fit', ['fit: launch check passed at 07:00 today']],
  ['afloat, still carrying the stand-down', { launchCheck: launch(TODAY_0700), defects: [defect('stand-down', 'open', 'transom crack')],
    trips: [{ launchedAt: '2026-11-30T22:12:00Z', retrievedAt: '2026-11-30T23:00:00Z' }, { launchedAt: '2026-12-01T00:40:00Z', retrievedAt: null }] }, 'afloat',
    ['afloat: launched 11:40 on 2026-12-01, not yet retrieved', 'stood down: defect "transom crack" raised 2026-11-30, open']],
  ['retrieved trips only: not afloat', { launchCheck: launch(TODAY_0700), trips: [{ launchedAt: '2026-11-30T22:12:00Z', retrievedAt: '2026-11-30T23:00:00Z' }] }, 'fit',
    ['fit: launch check passed at 07:00 today']],
  ['stood down beats stowed', { launchCheck: launch(TODAY_0700), stowCheck: stow(TODAY_1830, [{ label: 'floor', outcome: 'fail', critical: true, note: 'gash near drain bung' }]), now: '2026-12-01T08:00:00Z' }, 'stood-down',
    ['stood down: floor failed (gash near drain bung); stow check 2026-12-01']],
  ['stowed with a limitation keeps it in the reasons', { launchCheck: launch(TODAY_0700), stowCheck: stow(TODAY_1830), now: '2026-12-01T08:00:00Z', defects: [defect('limit', 'open', 'tiller loose')] }, 'stowed',
    ['limited: defect "tiller loose" raised 2026-11-30, open', 'stowed: stow check completed 18:30 today']],
  ['a stand-down beats unchecked', { defects: [defect('stand-down', 'open', 'fuel line split')] }, 'stood-down',
    ['stood down: defect "fuel line split" raised 2026-11-30, open', 'unchecked: no completed launch check on record']],
  ['a launch check\'s fault stays until a newer launch check', { launchCheck: launch('2026-11-29T20:00:00Z', [], 14), stowCheck: stow(YESTERDAY) }, 'stood-down',
    [`stood down: ${LOW_PORT}; launch check 2026-11-30`, 'unchecked: no launch check since the stow check on 2026-11-30']],
  ['a newer launch check supersedes a stow check\'s fault', { stowCheck: stow(YESTERDAY, [{ label: 'motor leg', outcome: 'fail', critical: true }]), launchCheck: launch(TODAY_0700) }, 'fit',
    ['fit: launch check passed at 07:00 today']],
  ['pressures in the club\'s unit', { launchCheck: launch(TODAY_0700, [], 14), pressureUnit: 'psi' }, 'stood-down',
    ['stood down: port pontoon below range at 2.03 psi (spec 2.47 psi to 2.90 psi); launch check 2026-12-01']],
];

describe('boatReadiness (names.md boat states)', () => {
  it.each(rows)('%s', (_what, input, state, reasons) => {
    expect(boatReadiness({ ...base, ...input })).toEqual({ state, reasons });
  });

  it('refuses a complete check with no completion time', () => {
    const check: CheckInput = { ...launch(TODAY_0700), completedAt: null, status: 'complete' };
    expect(() => boatReadiness({ ...base, launchCheck: check })).toThrow('A complete launch check needs the time it was completed');
  });
});
