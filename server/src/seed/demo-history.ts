// Demo checks and defects: one boat passed today, one failed a critical item, and defects at
// every step of their path.
import type { KindFields } from '@breakline/sync-protocol';
import { DEFAULT_LAUNCH_TEMPLATE } from '@breakline/sync-protocol';
import { BOATS } from './demo-fleet.js';
import { demoId } from './demo-ids.js';
import type { DemoPeople } from './demo-records.js';

type Day = (offset: number) => string;
const at = (date: string, time: string) => `${date}T${time}:00Z`;
/** A whole minute some minutes before `now`: today's demo check is always in the past, whatever the hour. */
const before = (now: Date, minutes: number) => new Date(Math.floor(now.getTime() / 60_000) * 60_000 - minutes * 60_000).toISOString().replace('.000Z', 'Z');

function allPassed(): KindFields['check']['results'] {
  const results: KindFields['check']['results'] = {};
  for (const item of DEFAULT_LAUNCH_TEMPLATE.sections.flatMap((s) => s.items)) {
    if (item.kind === 'reading') results[item.id] = { outcome: 'pass', value: 20 };
    else if (item.kind === 'count') results[item.id] = { outcome: 'pass', value: item.required };
    else results[item.id] = { outcome: 'pass' };
  }
  return results;
}

export function demoChecks(p: DemoPeople, day: Day, now: Date): { id: string; fields: KindFields['check'] }[] {
  const base = { checkType: 'launch' as const, templateId: demoId('template:launch'), templateVersion: 1, signedOffBy: null, signedOffAt: null };
  const failed = { ...allPassed(), 'pressure-bow': { outcome: 'fail' as const, value: 14, note: 'Bow soft; valve hissing when pressed' } };
  return [
    { id: demoId('check:1'), fields: { ...base, boatId: BOATS[0]!.id, motorId: demoId('motor:1'), startedAt: at(day(-1), '20:40'), completedAt: at(day(-1), '20:58'), status: 'complete', results: allPassed(), performedBy: p.crew, signedOffBy: p.captain, signedOffAt: at(day(-1), '22:10') } },
    { id: demoId('check:2'), fields: { ...base, boatId: BOATS[1]!.id, motorId: demoId('motor:2'), startedAt: before(now, 95), completedAt: before(now, 78), status: 'complete', results: failed, performedBy: p.driver } },
  ];
}

export function demoDefects(p: DemoPeople, day: Day, now: Date): { id: string; fields: KindFields['defect'] }[] {
  const none = { motorId: null, checkId: null, itemId: null, photos: [], assignedTo: null, actionTaken: null, repairedAt: null, verifiedBy: null, verifiedAt: null, rejectedReason: null, notes: [] };
  const [b1, b2] = [BOATS[0]!.id, BOATS[1]!.id];
  return [
    { id: demoId('defect:bow-valve'), fields: { ...none, boatId: b2, checkId: demoId('check:2'), itemId: 'pressure-bow', severity: 'stand-down', description: 'Bow chamber at 14 kPa, below range; valve leaks', status: 'open', reportedBy: p.driver, reportedAt: before(now, 77) } },
    { id: demoId('defect:strap'), fields: { ...none, boatId: b1, severity: 'limit', description: 'Starboard foot strap stitching coming apart: crew to use port strap', status: 'assigned', reportedBy: p.crew, reportedAt: at(day(-6), '03:15'), assignedTo: p.captain } },
    { id: demoId('defect:cowling'), fields: { ...none, boatId: b1, motorId: demoId('motor:1'), severity: 'note', description: 'Cowling latch stiff', status: 'repaired', reportedBy: p.crew, reportedAt: at(day(-12), '02:00'), actionTaken: 'Latch cleaned and greased', repairedAt: at(day(-11), '07:30') } },
    { id: demoId('defect:prop'), fields: { ...none, boatId: b2, motorId: demoId('motor:2'), severity: 'stand-down', description: 'Propeller blade chipped after hitting sand', status: 'verified', reportedBy: p.driver, reportedAt: at(day(-30), '01:20'), actionTaken: 'Propeller replaced, new split pin fitted', repairedAt: at(day(-29), '06:00'), verifiedBy: p.captain, verifiedAt: at(day(-29), '08:00') } },
    { id: demoId('defect:radio'), fields: { ...none, boatId: b1, severity: 'limit', description: 'Radio will not transmit', status: 'rejected', reportedBy: p.crew, reportedAt: at(day(-3), '21:00'), rejectedReason: 'Radio was on the wrong channel; works on the patrol channel' } },
  ];
}
