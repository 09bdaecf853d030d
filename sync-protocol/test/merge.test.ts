import { describe, expect, it } from 'vitest';
import { encodeHlc, mergeMutation, type Actor, type MergeInput, type RecordKind } from '../src/index.js';
import { FIXTURES } from './support/fixtures.js';

const EARLY = encodeHlc({ l: 1_000, c: 0, node: 'phone-a' });
const MID = encodeHlc({ l: 2_000, c: 0, node: 'server' });
const LATE = encodeHlc({ l: 3_000, c: 0, node: 'phone-b' });
const server: Actor = { deviceId: 'phone-s', userId: 'member-s', role: 'crew' };
const crew: Actor = { deviceId: 'phone-b', userId: 'member-b', role: 'crew' };
const sup: Actor = { deviceId: 'phone-c', userId: 'member-c', role: 'supervisor' };

function input(kind: RecordKind, current: Record<string, unknown>, base: Record<string, unknown>, patch: Record<string, unknown>, o: Partial<MergeInput> & { hlc?: string; actor?: Actor; deleted?: boolean } = {}): MergeInput {
  return {
    kind,
    current,
    currentHlc: o.currentHlc ?? MID,
    currentActor: o.currentActor ?? server,
    currentDeleted: o.currentDeleted,
    currentFieldStamps: o.currentFieldStamps,
    mutation: { base, patch, hlc: o.hlc ?? LATE, actor: o.actor ?? crew, deleted: o.deleted },
    baseIsCurrent: o.baseIsCurrent ?? false,
  };
}

describe('three-way merge: per field against base', () => {
  const trip = { ...FIXTURES.trip, purpose: 'training' };
  const table: [string, Record<string, unknown>, Record<string, unknown>, string, Record<string, unknown>, number][] = [
    // name, base, patch, expected status, expected apply, expected conflicts
    ['server unchanged since base: takes the patch', { purpose: 'training' }, { purpose: 'rescue' }, 'merged', { purpose: 'rescue' }, 0],
    ['patch equals server: nothing to do', { purpose: 'patrol' }, { purpose: 'training' }, 'merged', {}, 0],
    ['both changed, incoming later: incoming wins', { purpose: 'patrol' }, { purpose: 'rescue' }, 'conflict', { purpose: 'rescue' }, 1],
    ['base lacks the field: treated as two-sided', {}, { purpose: 'rescue' }, 'conflict', { purpose: 'rescue' }, 1],
    ['untouched field next to a conflicting one', { purpose: 'patrol', windSpeedKn: 12 }, { purpose: 'search', windSpeedKn: 15 }, 'conflict', { purpose: 'search', windSpeedKn: 15 }, 1],
  ];
  it.each(table)('%s', (_n, base, patch, status, apply, conflicts) => {
    const r = mergeMutation(input('trip', trip, base, patch));
    expect(r.status).toBe(status);
    expect(r.apply).toEqual(apply);
    expect(r.conflicts).toHaveLength(conflicts);
  });

  it('applies the patch as sent when the base version is current', () => {
    const r = mergeMutation(input('trip', trip, { purpose: 'training' }, { purpose: 'rescue' }, { baseIsCurrent: true, hlc: EARLY }));
    expect(r).toEqual({ status: 'applied', apply: { purpose: 'rescue' }, deleted: false, conflicts: [] });
  });

  it('merges field by field when the base disagrees although the version is current', () => {
    // The device showed its own earlier change, already taken by the server, over a newer pull.
    const r = mergeMutation(input('trip', trip, { purpose: 'patrol' }, { purpose: 'rescue' }, { baseIsCurrent: true, hlc: EARLY }));
    expect(r.status).toBe('conflict');
    expect(r.apply).toEqual({});
    expect(r.conflicts[0]).toMatchObject({ field: 'purpose', keptValue: 'training', overruledValue: 'rescue' });
  });

  it('applies a new record as sent', () => {
    const r = mergeMutation({ ...input('trip', {}, {}, trip), current: null, currentHlc: null, currentActor: null });
    expect(r).toEqual({ status: 'applied', apply: trip, deleted: false, conflicts: [] });
  });

  it('compares base by value: key order, null and undefined', () => {
    const current = { ...FIXTURES.boat, airChambers: [{ maxKpa: 24, minKpa: 16, valve: 'port aft', name: 'port pontoon', id: 'port' }] };
    const reordered = { airChambers: [{ id: 'port', name: 'port pontoon', valve: 'port aft', minKpa: 16, maxKpa: 24 }] };
    expect(mergeMutation(input('boat', current, reordered, { airChambers: [] })).conflicts).toHaveLength(0);
    const withNull = { ...FIXTURES.boat, hullSerial: null };
    expect(mergeMutation(input('boat', withNull, { hullSerial: null }, { hullSerial: 'X1' })).conflicts).toHaveLength(0);
    expect(mergeMutation(input('boat', withNull, { hullSerial: undefined }, { hullSerial: 'X1' })).conflicts).toHaveLength(1);
  });
});

describe('three-way merge: rules for fields both sides changed', () => {
  it('lww keeps the later clock and records the loser', () => {
    const t = FIXTURES.trip;
    const late = mergeMutation(input('trip', t, { purpose: 'training' }, { purpose: 'rescue' }, { hlc: LATE }));
    expect(late.conflicts).toEqual([
      { field: 'purpose', keptSide: 'incoming', keptValue: 'rescue', overruledValue: 'patrol', kept: { actor: crew, hlc: LATE }, overruled: { actor: server, hlc: MID } },
    ]);
    const early = mergeMutation(input('trip', t, { purpose: 'training' }, { purpose: 'rescue' }, { hlc: EARLY }));
    expect(early.apply).toEqual({});
    expect(early.conflicts[0]).toMatchObject({ keptSide: 'server', keptValue: 'patrol', overruledValue: 'rescue' });
  });

  it('lww uses the field\'s own stamp when the server keeps one', () => {
    const stamps = { purpose: { actor: sup, hlc: EARLY } };
    const r = mergeMutation(input('trip', FIXTURES.trip, { purpose: 'x' }, { purpose: 'rescue' }, { hlc: encodeHlc({ l: 1_500, c: 0, node: 'p' }), currentFieldStamps: stamps }));
    expect(r.apply).toEqual({ purpose: 'rescue' });
    expect(r.conflicts[0]!.overruled).toEqual({ actor: sup, hlc: EARLY });
  });

  it('union merges both lists in order, without repeats and without a conflict', () => {
    const n = (text: string) => ({ at: '2026-12-05T21:30:00Z', by: 'm', text });
    const current = { ...FIXTURES.trip, notes: [n('a'), n('b')], crewIds: ['ana', 'cy'] };
    const r = mergeMutation(input('trip', current, { notes: [n('a')], crewIds: ['ana'] }, { notes: [n('a'), n('c')], crewIds: ['ana', 'dee'] }, { hlc: EARLY }));
    expect(r.status).toBe('merged');
    expect(r.apply).toEqual({ notes: [n('a'), n('b'), n('c')], crewIds: ['ana', 'cy', 'dee'] });
    expect(r.conflicts).toEqual([]);
  });

  it('union keeps an item one side removed while the other side changed the list', () => {
    const current = { ...FIXTURES.defect, photos: ['a'.repeat(64), 'b'.repeat(64), 'c'.repeat(64)] };
    const r = mergeMutation(input('defect', current, { photos: ['a'.repeat(64), 'b'.repeat(64)] }, { photos: ['a'.repeat(64)] }));
    expect(r.apply).toEqual({});
    expect(r.status).toBe('merged');
  });

  describe('check results: fail beats pass beats n/a, per item', () => {
    const res = (o: string, extra: Record<string, unknown> = {}) => ({ outcome: o, ...extra });
    const table: [string, unknown, unknown, unknown, string, unknown, string | null][] = [
      // name, base item, server item, incoming item, hlc, kept item, kept side of the conflict
      ['incoming fail beats server pass', res('na'), res('pass'), res('fail'), EARLY, res('fail'), 'incoming'],
      ['server fail beats incoming pass', res('na'), res('fail'), res('pass'), LATE, res('fail'), 'server'],
      ['pass beats n/a whatever the clock', undefined, res('na'), res('pass'), EARLY, res('pass'), 'incoming'],
      ['two different fails: later clock', res('pass'), res('fail', { note: 'cut' }), res('fail', { note: 'soft' }), LATE, res('fail', { note: 'soft' }), 'incoming'],
      ['two different fails: earlier loses', res('pass'), res('fail', { note: 'cut' }), res('fail', { note: 'soft' }), EARLY, res('fail', { note: 'cut' }), 'server'],
      ['only incoming changed the item', res('pass'), res('pass'), res('fail'), EARLY, res('fail'), null],
      ['only server changed the item', res('pass'), res('fail'), res('pass'), LATE, res('fail'), null],
      ['server removed, incoming changed: change kept', res('pass'), undefined, res('fail'), EARLY, res('fail'), 'incoming'],
    ];
    it.each(table)('%s', (_n, b, c, p, hlc, kept, side) => {
      const wrap = (x: unknown) => (x === undefined ? {} : { item: x });
      const current = { ...FIXTURES.check, results: { other: res('pass'), ...wrap(c) } };
      const r = mergeMutation(input('check', current, { results: { other: res('pass'), ...wrap(b) } }, { results: { other: res('pass'), ...wrap(p) } }, { hlc }));
      const merged = (r.apply.results ?? current.results) as Record<string, unknown>;
      expect(merged.item).toEqual(kept);
      expect(merged.other).toEqual(res('pass'));
      if (side === null) expect(r.conflicts).toEqual([]);
      else expect(r.conflicts).toEqual([expect.objectContaining({ field: 'results.item', keptSide: side, keptValue: kept, overruledValue: side === 'server' ? p ?? null : c ?? null })]);
    });
  });

  describe('defect status: open beats closed until a supervisor closes it again', () => {
    const table: [string, string, string, string, Actor, Actor, string, string][] = [
      // name, server status, incoming status, incoming hlc, server actor, incoming actor, kept, kept side
      ['reopen after an older close wins', 'verified', 'open', LATE, sup, crew, 'open', 'incoming'],
      ['a reopen older than the supervisor\'s close loses to it', 'verified', 'open', EARLY, sup, crew, 'verified', 'server'],
      ['supervisor closing later wins', 'repaired', 'verified', LATE, crew, sup, 'verified', 'incoming'],
      ['supervisor closing earlier loses', 'open', 'rejected', EARLY, crew, sup, 'open', 'server'],
      ['a stored close by a supervisor, later than the reopen, stays', 'verified', 'assigned', EARLY, sup, crew, 'verified', 'server'],
      ['a stored close whose writer was not a supervisor loses', 'verified', 'assigned', EARLY, crew, crew, 'assigned', 'incoming'],
      ['two open statuses: later clock', 'assigned', 'repaired', LATE, crew, crew, 'repaired', 'incoming'],
      ['two closed statuses: later clock', 'verified', 'rejected', EARLY, sup, sup, 'verified', 'server'],
    ];
    it.each(table)('%s', (_n, cur, inc, hlc, cActor, iActor, kept, side) => {
      const current = { ...FIXTURES.defect, status: cur };
      const r = mergeMutation(input('defect', current, { status: 'open' === cur ? 'assigned' : 'open' }, { status: inc }, { hlc, currentActor: cActor, actor: iActor }));
      expect((r.apply.status as string | undefined) ?? cur).toBe(kept);
      expect(r.conflicts).toEqual([expect.objectContaining({ field: 'status', keptSide: side, keptValue: kept })]);
    });

    it('takes the closing side as allowed when the stored writer\'s role is unknown', () => {
      const current = { ...FIXTURES.defect, status: 'verified' };
      const r = mergeMutation(input('defect', current, { status: 'open' }, { status: 'assigned' }, { hlc: EARLY, currentActor: { deviceId: 'd', userId: 'u' } }));
      expect(r.apply).toEqual({});
    });
  });
});

describe('three-way merge: deletes', () => {
  const d = FIXTURES.defect;
  it('deletes when the device saw every current value', () => {
    expect(mergeMutation(input('defect', d, { ...d }, {}, { deleted: true }))).toEqual({ status: 'merged', apply: {}, deleted: true, conflicts: [] });
  });
  it('deletes on the current version when the device showed the current values', () => {
    expect(mergeMutation(input('defect', d, { ...d }, {}, { deleted: true, baseIsCurrent: true }))).toMatchObject({ status: 'applied', deleted: true });
  });
  it('keeps the record when even on the current version the device showed other values', () => {
    const r = mergeMutation(input('defect', d, { ...d, description: 'mine' }, {}, { deleted: true, baseIsCurrent: true }));
    expect(r).toMatchObject({ status: 'conflict', deleted: false });
  });
  it('keeps a record changed since the device saw it, and records the refused delete', () => {
    const r = mergeMutation(input('defect', d, { ...d, description: 'older text' }, {}, { deleted: true }));
    expect(r.deleted).toBe(false);
    expect(r.status).toBe('conflict');
    expect(r.conflicts).toEqual([expect.objectContaining({ field: 'deleted', keptSide: 'server', keptValue: false, overruledValue: true })]);
  });
  it('keeps a record when the delete carries no base at all', () => {
    expect(mergeMutation(input('defect', d, {}, {}, { deleted: true })).deleted).toBe(false);
  });
  it('brings a record back when an edit meets a delete made elsewhere', () => {
    const r = mergeMutation(input('defect', d, { description: d.description }, { description: 'crack grew' }, { currentDeleted: true }));
    expect(r.deleted).toBe(false);
    expect(r.apply).toEqual({ description: 'crack grew' });
    expect(r.conflicts).toEqual([expect.objectContaining({ field: 'deleted', keptSide: 'incoming', keptValue: false, overruledValue: true })]);
  });
  it('treats a second delete of a tombstone as done', () => {
    expect(mergeMutation(input('defect', d, {}, {}, { deleted: true, currentDeleted: true }))).toMatchObject({ status: 'applied', deleted: true });
  });
});
