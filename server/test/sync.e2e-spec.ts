import { gzipSync } from 'node:zlib';
import { PROTOCOL_VERSION } from '@breakline/sync-protocol';
import { createTestApp, login, type TestApp } from './support/test-app.js';
import { defectFields, incidentFields, TestDevice, uuid } from './support/sync-fixtures.js';

describe('sync push and pull', () => {
  let t: TestApp;
  let crew: Awaited<ReturnType<typeof login>> & { user: { id: string } };
  let captain: typeof crew;
  const boatId = uuid();

  beforeAll(async () => {
    t = await createTestApp();
    crew = (await login(t, 'crew@gannetbay.example')) as typeof crew;
    captain = (await login(t, 'captain@gannetbay.example')) as typeof crew;
  });
  afterAll(async () => { await t.app.close(); });

  const push = (token: string, body: unknown) => t.http().post('/api/sync/push').set('authorization', `Bearer ${token}`).send(body as object);
  const pull = (token: string, query = '') => t.http().get(`/api/sync/pull${query}`).set('authorization', `Bearer ${token}`);
  const pullAll = async (token: string, since = '0') => {
    const res = await pull(token, `?since=${since}&limit=1000`).expect(200);
    return res.body as { changes: { id: string; version: number; fields: Record<string, unknown>; deleted: boolean }[]; checkpoint: string; hasMore: boolean };
  };

  it('creates, updates and deletes a record, each change pulled with its version', async () => {
    const phone = new TestDevice();
    const id = uuid();
    const fields = defectFields(boatId, crew.user.id);
    let res = await push(crew.accessToken, phone.body([phone.mutation('defect', id, fields)])).expect(200);
    expect(res.body.results[0]).toMatchObject({ status: 'applied', version: 1 });
    expect(res.body.lastSeq).toBe(1);
    res = await push(crew.accessToken, phone.body([phone.mutation('defect', id, { description: 'Port handle strap torn' },
      { baseVersion: 1, base: { description: fields.description } })])).expect(200);
    expect(res.body.results[0]).toMatchObject({ status: 'applied', version: 2 });
    const after = await pullAll(crew.accessToken);
    expect(after.changes.find((c) => c.id === id)).toMatchObject({ version: 2, deleted: false, fields: { description: 'Port handle strap torn' } });
    const desk = new TestDevice();
    res = await push(captain.accessToken, desk.body([desk.mutation('defect', id, {}, { deleted: true, baseVersion: 2, base: { ...fields, description: 'Port handle strap torn' } })])).expect(200);
    expect(res.body.results[0]).toMatchObject({ status: 'applied', version: 3 });
    const gone = await pullAll(crew.accessToken, after.checkpoint);
    expect(gone.changes).toEqual([expect.objectContaining({ id, deleted: true, version: 3 })]);
  });

  it('logs what each change wrote, a record made and changed in one batch included', async () => {
    const phone = new TestDevice();
    const [made, again, other] = [uuid(), uuid(), uuid()];
    const fields = defectFields(boatId, crew.user.id);
    const incident = incidentFields(crew.user.id);
    const res = await push(crew.accessToken, phone.body([
      phone.mutation('defect', made, fields),
      phone.mutation('defect', again, fields),
      phone.mutation('defect', again, { description: 'Strap gone', notes: [] }, { baseVersion: 1, base: { description: fields.description, notes: [] } }),
      phone.mutation('incidentNote', other, incident),
    ])).expect(200);
    expect(res.body.results.map((r: { status: string }) => r.status)).toEqual(['applied', 'applied', 'applied', 'applied']);
    const log: { record_id: string; kind: string; version: number; status: string; device_id: string; user_id: string; patch: unknown }[] =
      await t.db.query('SELECT record_id, kind, version, status, device_id, user_id, patch FROM sync_changes WHERE record_id = ANY($1::uuid[]) ORDER BY seq', [[made, again, other]]);
    const who = { device_id: phone.deviceId, user_id: crew.user.id, status: 'applied' };
    expect(log).toEqual([
      { ...who, record_id: made, kind: 'defect', version: 1, patch: fields },
      { ...who, record_id: again, kind: 'defect', version: 1, patch: fields },
      // Only what the edit changed: the unchanged notes are not part of it.
      { ...who, record_id: again, kind: 'defect', version: 2, patch: { description: 'Strap gone' } },
      { ...who, record_id: other, kind: 'incidentNote', version: 1, patch: incident },
    ]);
    const [row] = await t.db.query('SELECT version, description, field_stamps, club_id, updated_by, device_id FROM defects WHERE id = $1', [again]);
    expect(row).toMatchObject({ version: 2, description: 'Strap gone', club_id: crew.activeClub.id, updated_by: crew.user.id, device_id: phone.deviceId });
  });

  it('merges a stale edit of another field, and keeps both values of one field in a conflict', async () => {
    const a = new TestDevice();
    const b = new TestDevice();
    const id = uuid();
    const fields = defectFields(boatId, crew.user.id);
    await push(crew.accessToken, a.body([a.mutation('defect', id, fields)])).expect(200);
    await push(crew.accessToken, a.body([a.mutation('defect', id, { description: 'Strap torn through' }, { baseVersion: 1, base: { description: fields.description } })])).expect(200);
    // b still saw version 1: a different field merges cleanly ...
    let res = await push(crew.accessToken, b.body([b.mutation('defect', id, { severity: 'stand-down' }, { baseVersion: 1, base: { severity: 'limit' } })])).expect(200);
    expect(res.body.results[0]).toMatchObject({ status: 'merged', version: 3 });
    // ... the same field is a conflict: later clock wins for the screen, the other value is kept.
    res = await push(crew.accessToken, b.body([b.mutation('defect', id, { description: 'Strap fine, only dirty' }, { baseVersion: 1, base: { description: fields.description } })])).expect(200);
    expect(res.body.results[0].status).toBe('conflict');
    const list = await t.http().get('/api/sync/conflicts').set('authorization', `Bearer ${captain.accessToken}`).expect(200);
    const c = list.body.find((x: { id: string }) => x.id === res.body.results[0].conflictId);
    expect(c).toMatchObject({ recordId: id, field: 'description', status: 'open' });
    expect([c.keptValue, c.overruledValue].sort()).toEqual(['Strap fine, only dirty', 'Strap torn through']);
  });

  it('answers a replayed batch with duplicate and changes nothing', async () => {
    const phone = new TestDevice();
    const id = uuid();
    const body = phone.body([phone.mutation('defect', id, defectFields(boatId, crew.user.id))]);
    await push(crew.accessToken, body).expect(200);
    const before = await pullAll(crew.accessToken);
    const res = await push(crew.accessToken, body).expect(200);
    expect(res.body).toEqual({ results: [{ mutationId: body.mutations[0]!.mutationId, status: 'duplicate', version: 1 }], lastSeq: 1 });
    const after = await pullAll(crew.accessToken, before.checkpoint);
    expect(after.changes).toEqual([]);
  });

  it('rejects one bad mutation alone with a readable message, applies the rest and advances seq', async () => {
    const phone = new TestDevice();
    const good = uuid();
    const bad = uuid();
    const res = await push(crew.accessToken, phone.body([
      phone.mutation('defect', bad, defectFields(boatId, crew.user.id, { severity: 'catastrophic' })),
      phone.mutation('defect', good, defectFields(boatId, crew.user.id)),
      phone.mutation('boat', uuid(), { fleetNumber: 'IRB 9' }),
    ])).expect(200);
    const [r1, r2, r3] = res.body.results;
    expect(r1).toMatchObject({ status: 'rejected', error: { code: 'invalid' } });
    expect(r1.error.message).toMatch(/severity/i);
    expect(r2).toMatchObject({ status: 'applied', version: 1 });
    expect(r3.status).toBe('rejected');
    expect(res.body.lastSeq).toBe(3);
  });

  it("refuses a defect a crew member reports in someone else's name, and takes it from a supervisor", async () => {
    const phone = new TestDevice();
    const forged = await push(crew.accessToken, phone.body([phone.mutation('defect', uuid(), defectFields(boatId, captain.user.id))])).expect(200);
    expect(forged.body.results[0]).toMatchObject({ status: 'rejected', error: { code: 'forbidden', message: 'You may only enter a defect in your own name (reported by); a supervisor may enter one for someone else.' } });
    const desk = new TestDevice();
    const entered = await push(captain.accessToken, desk.body([desk.mutation('defect', uuid(), defectFields(boatId, crew.user.id))])).expect(200);
    expect(entered.body.results[0]).toMatchObject({ status: 'applied' });
  });

  it('rejects text holding the NUL character alone, with a message, and saves the rest of the push', async () => {
    const phone = new TestDevice();
    const res = await push(crew.accessToken, phone.body([
      phone.mutation('defect', uuid(), defectFields(boatId, crew.user.id, { description: 'Pontoon\u0000 scuffed' })),
      phone.mutation('defect', uuid(), defectFields(boatId, crew.user.id)),
    ])).expect(200);
    expect(res.body.results[0]).toMatchObject({ status: 'rejected', error: { code: 'invalid', message: expect.stringMatching(/control character \(NUL\)/) } });
    expect(res.body.results[1]).toMatchObject({ status: 'applied', version: 1 });
  });

  it('refuses a record id that belongs to another club as if it did not exist', async () => {
    const phone = new TestDevice();
    const id = uuid();
    await push(crew.accessToken, phone.body([phone.mutation('defect', id, defectFields(boatId, crew.user.id))])).expect(200);
    const kelp = (await login(t, 'admin@kelpreef.example')) as typeof crew;
    const intruder = new TestDevice();
    const res = await push(kelp.accessToken, intruder.body([intruder.mutation('defect', id, { description: 'overwritten' }, { baseVersion: 1, base: {} })])).expect(200);
    expect(res.body.results[0]).toMatchObject({ status: 'rejected', error: { code: 'not-found' } });
    const create = await push(kelp.accessToken, intruder.body([intruder.mutation('defect', id, defectFields(boatId, kelp.user.id))])).expect(200);
    expect(create.body.results[0]).toMatchObject({ status: 'rejected', error: { code: 'not-found' } });
    const theirs = await pullAll(kelp.accessToken);
    expect(theirs.changes.some((c) => c.id === id)).toBe(false);
  });

  it('sends a pull compressed to a phone that accepts it, and the same records to one that does not', async () => {
    const zipped = await pull(crew.accessToken, '?limit=1000').set('accept-encoding', 'gzip').expect(200);
    expect(zipped.headers['content-encoding']).toBe('gzip');
    expect(zipped.headers['content-type']).toMatch(/^application\/json/);
    const plain = await pull(crew.accessToken, '?limit=1000').set('accept-encoding', 'identity').expect(200);
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(zipped.body).toEqual(plain.body);
    expect(plain.body.changes.length).toBeGreaterThan(10);
    // A browser that takes brotli gets brotli: tighter than gzip for less of the server's time.
    const brotli = await pull(crew.accessToken, '?limit=1000').set('accept-encoding', 'gzip, deflate, br, zstd').expect(200);
    expect(brotli.headers['content-encoding']).toBe('br');
    expect(brotli.body).toEqual(plain.body);
  });

  it('pages a pull with hasMore and a checkpoint, oldest first', async () => {
    const phone = new TestDevice();
    const ids = Array.from({ length: 7 }, () => uuid());
    const start = (await pullAll(crew.accessToken)).checkpoint;
    await push(crew.accessToken, phone.body(ids.map((id) => phone.mutation('defect', id, defectFields(boatId, crew.user.id))))).expect(200);
    const seen: string[] = [];
    const remaining: number[] = [];
    let since = start;
    let pages = 0;
    for (;;) {
      const res = await pull(crew.accessToken, `?since=${since}&limit=3${pages === 0 ? '&count=1' : ''}`).expect(200);
      // The headers repeat the body's checkpoint and hasMore, for a phone to ask ahead.
      expect([res.headers['breakline-checkpoint'], res.headers['breakline-has-more']]).toEqual([res.body.checkpoint, String(res.body.hasMore)]);
      seen.push(...res.body.changes.map((c: { id: string }) => c.id));
      remaining.push(res.body.remaining);
      since = res.body.checkpoint;
      pages++;
      if (!res.body.hasMore) break;
    }
    expect(pages).toBe(3);
    expect(seen).toEqual(ids);
    // What is left after the first page, for the phone's "n of about m"; counted only when asked.
    expect(remaining).toEqual([4, undefined, undefined]);
    const wrong = await pull(crew.accessToken, '?count=yes').expect(400);
    expect(JSON.stringify(wrong.body)).toMatch(/must be 1 to count the changes left/);
  });

  it('gives two concurrent pushes distinct sequence numbers and a pull sees both', async () => {
    const start = (await pullAll(crew.accessToken)).checkpoint;
    const a = new TestDevice();
    const b = new TestDevice();
    const aIds = Array.from({ length: 40 }, () => uuid());
    const bIds = Array.from({ length: 40 }, () => uuid());
    await Promise.all([
      push(crew.accessToken, a.body(aIds.map((id) => a.mutation('defect', id, defectFields(boatId, crew.user.id))))).expect(200),
      push(captain.accessToken, b.body(bIds.map((id) => b.mutation('defect', id, defectFields(boatId, captain.user.id))))).expect(200),
    ]);
    const got = await pullAll(crew.accessToken, start);
    expect(new Set(got.changes.map((c) => c.id))).toEqual(new Set([...aIds, ...bIds]));
  });

  it('refuses a change stamped far in the future with a message about the phone\'s clock', async () => {
    const phone = new TestDevice();
    const m = phone.mutation('defect', uuid(), defectFields(boatId, crew.user.id), { hlc: phone.hlc(Date.now() + 20 * 60_000) });
    const res = await push(crew.accessToken, phone.body([m])).expect(200);
    expect(res.body.results[0]).toMatchObject({ status: 'rejected', error: { code: 'clock-drift' } });
    expect(res.body.results[0].error.message).toMatch(/clock is 20 minutes ahead/);
  });

  it('accepts a gzip-encoded push', async () => {
    const phone = new TestDevice();
    const id = uuid();
    const raw = JSON.stringify(phone.body([phone.mutation('defect', id, defectFields(boatId, crew.user.id))]));
    const res = await t.http().post('/api/sync/push').set('authorization', `Bearer ${crew.accessToken}`)
      .set('content-type', 'application/json').set('content-encoding', 'gzip')
      .serialize((b: unknown) => b as string).send(gzipSync(raw) as unknown as string);
    expect(res.body).toMatchObject({ lastSeq: 1 });
    expect(res.body.results[0].status).toBe('applied');
  });

  it('answers an oversize body with 413 stating the limit', async () => {
    const big = { protocolVersion: PROTOCOL_VERSION, deviceId: 'phone-big', mutations: [], pad: 'x'.repeat(17 * 1024 * 1024) };
    const res = await push(crew.accessToken, big).expect(413);
    expect(res.body).toMatchObject({ code: 'payload_too_large' });
    expect(res.body.message).toMatch(/16 MB/);
  });

  it('answers an outdated protocol with 426', async () => {
    const res = await push(crew.accessToken, { protocolVersion: 0, deviceId: 'phone-old', mutations: [] }).expect(426);
    expect(res.body.code).toBe('protocol_outdated');
  });

  it('shows an incident note to its author and drivers up, not to other crew', async () => {
    const phone = new TestDevice();
    const id = uuid();
    const driver = (await login(t, 'driver@gannetbay.example')) as typeof crew;
    await push(driver.accessToken, phone.body([phone.mutation('incidentNote', id, incidentFields(driver.user.id))])).expect(200);
    expect((await pullAll(driver.accessToken)).changes.some((c) => c.id === id)).toBe(true);
    expect((await pullAll(captain.accessToken)).changes.some((c) => c.id === id)).toBe(true);
    expect((await pullAll(crew.accessToken)).changes.some((c) => c.id === id)).toBe(false);
  });
});
