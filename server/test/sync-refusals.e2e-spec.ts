import { encodeHlc, MAX_HLC_COUNTER } from '@breakline/sync-protocol';
import { createTestApp, login, type TestApp } from './support/test-app.js';
import { defectFields, incidentFields, TestDevice, uuid } from './support/sync-fixtures.js';

/** Input that used to reach PostgreSQL or the server's clock and come back as a 500. */
describe('sync refusals', () => {
  let t: TestApp;
  let crew: Awaited<ReturnType<typeof login>> & { user: { id: string } };
  let kelp: typeof crew;
  const boatId = uuid();

  beforeAll(async () => {
    t = await createTestApp();
    crew = (await login(t, 'crew@gannetbay.example')) as typeof crew;
    kelp = (await login(t, 'admin@kelpreef.example')) as typeof crew;
  });
  afterAll(async () => { await t.app.close(); });

  const push = (token: string, body: unknown) => t.http().post('/api/sync/push').set('authorization', `Bearer ${token}`).send(body as object);
  const pull = (token: string, query = '') => t.http().get(`/api/sync/pull${query}`).set('authorization', `Bearer ${token}`);

  it('refuses a record made under an id another kind already holds, and keeps the first record', async () => {
    const phone = new TestDevice();
    const id = uuid();
    await push(crew.accessToken, phone.body([phone.mutation('defect', id, defectFields(boatId, crew.user.id, { severity: 'stand-down' }))])).expect(200);
    const again = await push(crew.accessToken, phone.body([phone.mutation('incidentNote', id, incidentFields(crew.user.id))])).expect(200);
    expect(again.body.results[0]).toMatchObject({
      status: 'rejected',
      error: { code: 'invalid', message: "This record's id is already taken by a defect, so it was not saved; make it again as a new record." },
    });
    expect(await t.db.query('SELECT id FROM incident_notes WHERE id = $1', [id])).toEqual([]);
    const { changes } = (await pull(crew.accessToken, '?limit=1000').expect(200)).body as { changes: { id: string; kind: string }[] };
    expect(changes.filter((c) => c.id === id).map((c) => c.kind)).toEqual(['defect']);
  });

  it('refuses a replayed refusal again, with its reason, where a replayed success is a duplicate', async () => {
    const phone = new TestDevice();
    const captain = (await login(t, 'captain@gannetbay.example')) as typeof crew;
    const body = phone.body([
      phone.mutation('defect', uuid(), defectFields(boatId, captain.user.id)), // crew may not report in the captain's name
      phone.mutation('defect', uuid(), defectFields(boatId, crew.user.id)),
    ]);
    const first = await push(crew.accessToken, body).expect(200);
    expect(first.body.results.map((r: { status: string }) => r.status)).toEqual(['rejected', 'applied']);
    // The answer was lost on the way: the phone sends the same batch again.
    const again = await push(crew.accessToken, body).expect(200);
    expect(again.body.results).toEqual([
      { mutationId: body.mutations[0]!.mutationId, status: 'rejected', error: first.body.results[0].error },
      { mutationId: body.mutations[1]!.mutationId, status: 'duplicate', version: 1 },
    ]);
    expect(again.body.lastSeq).toBe(first.body.lastSeq);
  });

  it('keeps a device to the member who first pushed from it, and the server\'s own device names to the server', async () => {
    const captain = (await login(t, 'captain@gannetbay.example')) as typeof crew;
    const phone = new TestDevice();
    const mine = await push(crew.accessToken, phone.body([phone.mutation('defect', uuid(), defectFields(boatId, crew.user.id))])).expect(200);
    // Another member sends under the crew member's id, with a seq far ahead of hers.
    const forged = phone.mutation('defect', uuid(), defectFields(boatId, captain.user.id), { seq: 2_000_000_000 });
    const refused = await push(captain.accessToken, phone.body([forged])).expect(403);
    expect(refused.body.message).toBe("This phone's sync id is already used by another member, so its changes were not taken. They stay on this phone; tell your club admin.");
    // Her next change is taken, not answered as already sent.
    const after = phone.mutation('defect', uuid(), defectFields(boatId, crew.user.id));
    const next = await push(crew.accessToken, phone.body([after])).expect(200);
    expect(next.body.results[0]).toMatchObject({ status: 'applied' });
    expect(next.body.lastSeq).toBe(after.seq);
    expect(after.seq).toBeGreaterThan(mine.body.lastSeq);
    for (const name of ['member-cards', 'demo-seed']) {
      const server = new TestDevice(name);
      const res = await push(crew.accessToken, server.body([server.mutation('defect', uuid(), defectFields(boatId, crew.user.id))])).expect(400);
      expect(res.body.message).toBe(`The device name "${name}" is kept for the server's own changes; a phone sends under its own id.`);
    }
  });

  it('goes on taking every club\'s changes after one stamped ahead with a full clock counter', async () => {
    // Four minutes ahead is inside the drift the server allows; the counter is one below its top,
    // so the server's clock would overflow on the next change it received.
    const fast = new TestDevice();
    const ahead = encodeHlc({ l: Date.now() + 4 * 60_000, c: MAX_HLC_COUNTER - 1, node: fast.deviceId });
    const first = await push(crew.accessToken, fast.body([fast.mutation('defect', uuid(), defectFields(boatId, crew.user.id), { hlc: ahead })])).expect(200);
    expect(first.body.results[0]).toMatchObject({ status: 'applied' });
    for (const [who, reporter] of [[crew, crew.user.id], [kelp, kelp.user.id]] as const) {
      const phone = new TestDevice();
      const res = await push(who.accessToken, phone.body([phone.mutation('defect', uuid(), defectFields(uuid(), reporter))])).expect(200);
      expect(res.body.results[0]).toMatchObject({ status: 'applied' });
    }
  });

  it('sends a phone whose checkpoint is past anything the server gave out back to the start', async () => {
    const [{ last_seq }] = await t.db.query('SELECT last_seq FROM sync_club_state WHERE club_id = $1', [crew.activeClub.id]);
    const res = await pull(crew.accessToken, `?since=${Number(last_seq) + 10}`).expect(200);
    expect(res.body).toMatchObject({ changes: [], hasMore: false, resetRequired: true });
    // The checkpoint it holds is the server's own.
    expect((await pull(crew.accessToken, `?since=${Number(last_seq)}`).expect(200)).body.resetRequired).toBeUndefined();
  });

  it('answers a checkpoint too long to be one with 400', async () => {
    const res = await pull(crew.accessToken, '?since=99999999999999999999').expect(400);
    expect(res.body.details).toEqual([{ field: 'since', message: 'must be a checkpoint from an earlier pull' }]);
  });

  it('answers a device seq past what the server stores with 400 naming it', async () => {
    const phone = new TestDevice();
    const m = phone.mutation('defect', uuid(), defectFields(boatId, crew.user.id), { seq: 2_147_483_648 });
    const res = await push(crew.accessToken, phone.body([m])).expect(400);
    expect(res.body.details).toEqual([{ field: 'mutations.0.seq', message: 'must be at most 2147483647' }]);
  });

  it('refuses text with half an emoji in it alone, and saves the rest of the push', async () => {
    const phone = new TestDevice();
    const res = await push(crew.accessToken, phone.body([
      phone.mutation('defect', uuid(), defectFields(boatId, crew.user.id, { description: 'Strap frayed \ud83d' })),
      phone.mutation('defect', uuid(), defectFields(boatId, crew.user.id, { description: 'Strap frayed \ud83c\udf0a' })),
    ])).expect(200);
    expect(res.body.results[0]).toMatchObject({ status: 'rejected', error: { code: 'invalid', message: expect.stringMatching(/broken character/) } });
    expect(res.body.results[1]).toMatchObject({ status: 'applied' });
  });

  it('answers a token whose id is not a UUID with the usual refusal, not a database error', async () => {
    const dashes = `${'-'.repeat(36)}.abcdefghijklmnopqrstuv`;
    await t.http().post('/api/auth/refresh').send({ refreshToken: dashes }).expect(401);
    const accept = await t.http().post('/api/invites/accept').send({ token: dashes, displayName: 'Noa Kereama', password: 'tide-chart-lantern' });
    expect(accept.status).toBeGreaterThanOrEqual(400);
    expect(accept.status).toBeLessThan(500);
  });

  it('answers a Review desk page past the limit with 400', async () => {
    const captain = await login(t, 'captain@gannetbay.example');
    const res = await t.http().get('/api/review/checks?page=200000000000000000').set('authorization', `Bearer ${captain.accessToken}`).expect(400);
    expect(JSON.stringify(res.body)).toMatch(/page must be a whole number from 0 to 100000/);
  });
});
