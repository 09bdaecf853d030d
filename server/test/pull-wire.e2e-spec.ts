import { toWire, type RecordKind } from '@breakline/sync-protocol';
import { ALL_KINDS, tableOf, type FieldColumn } from '../src/records/columns.js';
import { recordStore } from '../src/records/record-store.js';
import { fieldsJson } from '../src/records/wire-rows.js';
import { createTestApp, login, type TestApp } from './support/test-app.js';
import { TestDevice, uuid } from './support/sync-fixtures.js';

/**
 * The pull sends records as JSON that PostgreSQL writes from the kind tables. These tests hold it
 * to the record the sync rules read from the same rows (rowToRecord, then toWire): the two must
 * be the same value for every kind, with nulls, absent fields and tombstones.
 */
describe('pulled records as JSON', () => {
  let t: TestApp;

  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(async () => { await t.app.close(); });

  it('are, for every kind in the demo season, the records as the sync rules hold them', async () => {
    // The demo season has no service record or day sign-off: a captain's phone adds one of each.
    const captain = (await login(t, 'captain@gannetbay.example')) as Awaited<ReturnType<typeof login>> & { user: { id: string } };
    const [motor] = await t.db.query('SELECT id FROM motors WHERE club_id = $1 LIMIT 1', [captain.activeClub.id]);
    const [boat] = await t.db.query('SELECT id FROM boats WHERE club_id = $1 LIMIT 1', [captain.activeClub.id]);
    const phone = new TestDevice();
    const res = await t.http().post('/api/sync/push').set('authorization', `Bearer ${captain.accessToken}`).send(phone.body([
      phone.mutation('serviceRecord', uuid(), {
        motorId: motor.id, servicedAt: '2026-11-20T03:00:00Z', engineHours: 151.5, work: 'Gearbox oil changed', parts: '', performedBy: 'Ira Bellweather',
      }),
      phone.mutation('daySignOff', uuid(), {
        sessionDate: '2026-11-29', boatId: null, signedOffBy: captain.user.id, signedOffAt: '2026-11-29T06:00:00Z', note: '',
      }),
      phone.mutation('daySignOff', uuid(), {
        sessionDate: '2026-11-29', boatId: boat.id, signedOffBy: captain.user.id, signedOffAt: '2026-11-29T06:05:00Z', note: 'Washed down, fuel topped up',
      }),
    ])).expect(200);
    expect(res.body.results.map((r: { status: string }) => r.status)).toEqual(['applied', 'applied', 'applied']);
    // One record of each kind soft-deleted, so tombstones are compared too.
    for (const kind of ALL_KINDS) {
      await t.db.query(`UPDATE "${tableOf(kind)}" SET deleted = true WHERE id = (SELECT id FROM "${tableOf(kind)}" ORDER BY id LIMIT 1)`);
    }
    const clubs: { club_id: string }[] = await t.db.query('SELECT club_id FROM sync_club_state');
    const seen = new Map<RecordKind, number>();
    for (const { club_id: clubId } of clubs) {
      let since = 0;
      for (;;) {
        const { rows, hasMore } = await recordStore.changedPage(t.db.manager, clubId, since, 40);
        for (const row of rows) {
          const wire = JSON.parse(row.json);
          const [stored] = await recordStore.loadMany(t.db.manager, row.kind, [wire.id]);
          expect(wire).toStrictEqual(toWire(stored!));
          expect(row.changeSeq).toBe(stored!.changeSeq);
          seen.set(row.kind, (seen.get(row.kind) ?? 0) + 1);
        }
        if (rows.length) since = rows[rows.length - 1]!.changeSeq;
        if (!hasMore) break;
      }
    }
    // The demo season holds every kind, so none went unchecked.
    expect([...seen.keys()].sort()).toEqual([...ALL_KINDS].sort());
  });

  it('come a page at a time in change order, each record once, the page size kept', async () => {
    const [{ club_id: clubId }]: { club_id: string }[] = await t.db.query('SELECT club_id FROM sync_club_state ORDER BY last_seq DESC LIMIT 1');
    const all: number[] = [];
    const left: number[] = [];
    let since = 0;
    for (;;) {
      const { rows, hasMore } = await recordStore.changedPage(t.db.manager, clubId, since, 7);
      expect(rows.length).toBeLessThanOrEqual(7);
      if (hasMore) expect(rows).toHaveLength(7);
      all.push(...rows.map((r) => r.changeSeq));
      if (rows.length) since = rows[rows.length - 1]!.changeSeq;
      left.push(await recordStore.countChangedAfter(t.db.manager, clubId, since));
      if (!hasMore) break;
    }
    const counted = await t.db.query(
      ALL_KINDS.map((k) => `SELECT change_seq FROM "${tableOf(k)}" WHERE club_id = $1`).join(' UNION ALL '), [clubId]) as { change_seq: string }[];
    expect(all).toEqual(counted.map((r) => Number(r.change_seq)).sort((a, b) => a - b));
    // After each page, the count of what is left is what the later pages brought.
    expect(left).toEqual(left.map((_, i) => all.length - Math.min(all.length, (i + 1) * 7)));
  });

  it('leave out a NULL field that is optional and not nullable, and keep a null that is allowed', async () => {
    const cols: FieldColumn[] = [
      { field: 'reason', column: 'reason', type: 'text', nullable: false, optional: true },
      { field: 'note', column: 'note', type: 'text', nullable: true, optional: true },
      { field: 'count', column: 'count', type: 'double precision', nullable: false, optional: false },
      { field: 'tags', column: 'tags', type: 'jsonb', nullable: false, optional: true },
    ];
    const [row] = await t.db.query(
      `SELECT ${fieldsJson(cols)}::text AS j FROM (SELECT NULL::text AS reason, NULL::text AS note, 2.5::float8 AS count, '["a",null]'::jsonb AS tags) t`);
    expect(JSON.parse(row.j)).toStrictEqual({ note: null, count: 2.5, tags: ['a', null] });
  });

  it('hold kinds wider than one json_build_object call allows', async () => {
    const cols: FieldColumn[] = Array.from({ length: 60 }, (_, i) => ({ field: `f${i}`, column: `c${i}`, type: 'double precision', nullable: false, optional: false }));
    const [row] = await t.db.query(`SELECT ${fieldsJson(cols)}::text AS j FROM (SELECT ${cols.map((c, i) => `${i}::float8 AS ${c.column}`).join(', ')}) t`);
    expect(JSON.parse(row.j)).toStrictEqual(Object.fromEntries(cols.map((c, i) => [c.field, i])));
  });
});
