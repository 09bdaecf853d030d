import { describe, expect, it } from 'vitest';
import type { KindFields, RecordKind } from '@breakline/sync-protocol';
import type { LocalRecord } from '@/db/types';
import { boatTimeline, type BoatRecords } from './timeline';
import { BOAT_ID, MOTOR_ID, incidentFields, motorFields, tripFields } from '../testing/records';

let n = 0;
const rec = <K extends RecordKind>(kind: K, fields: KindFields[K]): LocalRecord<K> =>
  ({ id: `0190c000-0000-7000-8000-${String(++n).padStart(12, '0')}`, kind, clubId: 'c-1', version: 1, deleted: false, waiting: 0, fields });
const OTHER = '0190c000-0000-7000-8000-0000000000ff';

function records(over: Partial<BoatRecords> = {}): BoatRecords {
  return { checks: [], trips: [], incidents: [], defects: [], moves: [], motors: [{ ...rec('motor', motorFields()), id: MOTOR_ID }], ...over };
}

describe('the boat log', () => {
  it('lists checks, trips, incidents, defects with their repair and return, and motor moves, newest first', () => {
    const check = rec('check', {
      boatId: BOAT_ID, motorId: MOTOR_ID, checkType: 'launch', templateId: OTHER, templateVersion: 1, startedAt: '2026-12-05T20:00:00Z',
      completedAt: '2026-12-05T20:20:00Z', status: 'complete', results: { a: { outcome: 'fail' } }, performedBy: 'u-sam', signedOffBy: null, signedOffAt: null,
    });
    const trip = rec('trip', tripFields({ launchedAt: '2026-12-05T23:20:00Z', retrievedAt: '2026-12-06T00:05:00Z' }));
    const note = rec('incidentNote', incidentFields({ tripId: trip.id, occurredAt: '2026-12-05T23:40:00Z' }));
    const defect = rec('defect', {
      boatId: BOAT_ID, motorId: null, checkId: null, itemId: null, severity: 'limit', description: 'Foot strap torn\nsecond line', photos: [], status: 'verified',
      reportedBy: 'u-sam', reportedAt: '2026-12-01T01:00:00Z', assignedTo: null, actionTaken: 'Strap replaced', repairedAt: '2026-12-02T03:00:00Z',
      verifiedBy: 'u-cap', verifiedAt: '2026-12-02T05:00:00Z', rejectedReason: null, notes: [],
    });
    const fitted = rec('motorMove', { motorId: MOTOR_ID, fromBoatId: null, toBoatId: BOAT_ID, movedAt: '2026-11-20T02:00:00Z', movedBy: 'u-cap', reason: 'Back from service' });
    const elsewhere = rec('motorMove', { motorId: MOTOR_ID, fromBoatId: OTHER, toBoatId: null, movedAt: '2026-11-19T02:00:00Z', movedBy: 'u-cap', reason: '' });
    const log = boatTimeline(BOAT_ID, records({ checks: [check], trips: [trip], incidents: [note], defects: [defect], moves: [fitted, elsewhere] }), { role: 'driver', userId: 'u-ana' });
    expect(log.map((e) => [e.kind, e.title])).toEqual([
      ['incident', 'Incident note · Assist'],
      ['trip', 'Trip · Patrol'],
      ['check', 'Launch check'],
      ['return', 'Returned to service'],
      ['repair', 'Repair'],
      ['defect', 'Defect reported · Limit'],
      ['motor', 'Motor fitted'],
    ]);
    expect(log[0]).toMatchObject({ detail: '1 person helped · No further help needed', link: { to: 'trip', id: trip.id } });
    expect(log[2]).toMatchObject({ detail: '1 item failed', link: { to: 'check', id: check.id } });
    expect(log[5]!.detail).toBe('Foot strap torn');
    expect(log[6]!.detail).toBe('25 hp two-stroke · TM-25-55120 · Back from service');
  });

  it('leaves out incident notes the viewer may not see, and other boats\' records', () => {
    const own = rec('incidentNote', incidentFields({ authorId: 'u-sam' }));
    const theirs = rec('incidentNote', incidentFields({ authorId: 'u-ana' }));
    const otherBoat = rec('trip', tripFields({ boatId: OTHER }));
    const log = boatTimeline(BOAT_ID, records({ incidents: [own, theirs], trips: [otherBoat] }), { role: 'crew', userId: 'u-sam' });
    expect(log.map((e) => e.key)).toEqual([`incident:${own.id}`]);
  });

  it('orders a whole season by instant, whatever the precision of the stamps', () => {
    const trips = Array.from({ length: 600 }, (_, i) => rec('trip', tripFields({ launchedAt: new Date(Date.UTC(2026, 8, 1) + i * 3_600_000 * 3).toISOString() })));
    const precise = rec('trip', tripFields({ launchedAt: '2026-12-31T00:00:00.500Z' }));
    const plain = rec('trip', tripFields({ launchedAt: '2026-12-31T00:00:00Z' }));
    const log = boatTimeline(BOAT_ID, records({ trips: [...trips, plain, precise] }), { role: 'crew', userId: 'u-sam' });
    expect(log).toHaveLength(602);
    expect(log.slice(0, 2).map((e) => e.key)).toEqual([`trip:${precise.id}`, `trip:${plain.id}`]);
    for (let i = 1; i < log.length; i++) expect(Date.parse(log[i - 1]!.at)).toBeGreaterThanOrEqual(Date.parse(log[i]!.at));
  });
});
