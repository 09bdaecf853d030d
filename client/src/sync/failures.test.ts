import { describe, expect, it } from 'vitest';
import { getRecord } from '@/db/queries';
import { closeReplicas, openReplica } from '@/db/open';
import { resendRejected } from '@/db/resend';
import { createRecord, updateRecord } from '@/db/write';
import { tokenStore } from '@/features/auth/token-store';
import { sessionAnswer } from '@/test/fixtures';
import { sessionAuth } from './auth-source';
import { syncOnce } from './engine';
import { FakeBackend, readBody } from './test/fake-backend';
import { TOO_LARGE_ALONE } from './push';
import { defectFields, testDevice } from './test/device';

/**
 * A driver's defect, synced, then a change of its status queued after the server came to know her
 * as crew only: the phone still says driver, so the change is queued and the server refuses it.
 */
async function statusChangeAsLoweredDriver(backend: FakeBackend) {
  const ana = testDevice(backend);
  const id = await createRecord(ana.writer, 'defect', defectFields());
  await ana.sync();
  backend.grant('token-crew', { userId: 'member-ana', role: 'crew', clubId: ana.scope.clubId });
  ana.auth.token = async () => 'token-crew';
  await updateRecord(ana.writer, 'defect', id, { status: 'repaired' });
  return { ana, id };
}

describe('sync failures', () => {
  it('on 426 asks for an update and stops with the outbox intact', async () => {
    const backend = new FakeBackend();
    const ana = testDevice(backend);
    await createRecord(ana.writer, 'defect', defectFields());
    backend.outdated = true;
    expect(await ana.sync()).toMatchObject({ ok: false, failure: { reason: 'outdated', message: expect.stringMatching(/out of date/) } });
    expect(ana.outdatedCalls).toBe(1);
    expect((await ana.db.outbox.toArray()).map((e) => e.status)).toEqual(['pending']);
    expect(backend.server.records(ana.scope.clubId)).toEqual([]);
    expect(backend.requests.filter((r) => r.path === '/api/sync/pull')).toEqual([]);
  });

  it('keeps the outbox of a person whose refresh is refused, and says they are signed out', async () => {
    const backend = new FakeBackend();
    const session = sessionAnswer('driver', { accessExpiresAt: '2000-01-01T00:00:00Z' });
    tokenStore.saveSession(session);
    const scope = sessionAuth.scope()!;
    const db = openReplica(scope.userId);
    await createRecord({ db, ...scope }, 'defect', defectFields({ reportedBy: scope.userId }));
    backend.routes['POST /api/auth/refresh'] = () =>
      new Response(JSON.stringify({ statusCode: 401, code: 'unauthorized', message: 'Refresh token refused.' }), { status: 401 });
    const fetchOf = globalThis.fetch;
    globalThis.fetch = backend.fetch; // the refresh goes through apiRequest and the global fetch
    try {
      const outcome = await syncOnce({ db, scope, auth: sessionAuth, fetch: backend.fetch, now: () => backend.now, onOutdated: () => undefined });
      expect(outcome).toMatchObject({ ok: false, failure: { reason: 'signed-out' } });
    } finally {
      globalThis.fetch = fetchOf;
    }
    expect(tokenStore.getState().session).toBeNull();
    expect(await db.outbox.count()).toBe(1);
    expect(backend.requests.map((r) => r.path)).toEqual(['/api/auth/refresh']);
    expect(await db.syncState.get(`club:${scope.clubId}`)).toMatchObject({ lastError: { reason: 'signed-out' } });
    await db.delete();
    closeReplicas();
  });

  it('keeps the outbox and says "no signal" when offline', async () => {
    const backend = new FakeBackend();
    const ana = testDevice(backend);
    await createRecord(ana.writer, 'defect', defectFields());
    backend.offline = true;
    expect(await ana.sync()).toMatchObject({ ok: false, failure: { reason: 'offline', message: expect.stringMatching(/^No signal/) } });
    expect(await ana.db.outbox.count()).toBe(1);
  });

  it('moves a refused change to the rejected list with the server message, and shows the server value again', async () => {
    const { ana, id } = await statusChangeAsLoweredDriver(new FakeBackend());
    expect(await ana.sync()).toEqual({ ok: true });
    expect(await ana.db.outbox.count()).toBe(0);
    const [rejected] = await ana.db.rejected.toArray();
    expect(rejected).toMatchObject({ recordId: id, kind: 'defect', patch: { status: 'repaired' }, error: { code: 'forbidden' } });
    expect(rejected!.error.message).toMatch(/driver, supervisor or admin/);
    expect(await getRecord(ana.db, ana.scope.clubId, 'defect', id)).toMatchObject({ waiting: 0, fields: { status: 'open' } });
  });

  it('drops a refused new record from the lists but keeps its fields in the rejected list', async () => {
    const backend = new FakeBackend();
    const ana = testDevice(backend);
    // The phone's clock runs an hour fast, so the server refuses the change's clock stamp.
    const id = await createRecord({ ...ana.writer, now: () => backend.now + 60 * 60_000 }, 'defect', defectFields());
    await ana.sync();
    expect(await getRecord(ana.db, ana.scope.clubId, 'defect', id)).toBeNull();
    expect(await ana.db.rejected.toArray()).toMatchObject([{ recordId: id, patch: defectFields(), error: { code: 'clock-drift' } }]);
  });

  it('hears a refusal again when the first answer was lost, and keeps the change in the refused list', async () => {
    const backend = new FakeBackend();
    const { ana, id } = await statusChangeAsLoweredDriver(backend);
    backend.loseNextPushAnswer = true;
    expect(await ana.sync()).toMatchObject({ ok: false });
    expect(await ana.sync()).toEqual({ ok: true });
    expect(await ana.db.rejected.toArray()).toMatchObject([{ recordId: id, patch: { status: 'repaired' }, error: { code: 'forbidden' } }]);
  });

  it('keeps a change the server answers as done without a record in the refused list, saying the answer was lost', async () => {
    const backend = new FakeBackend();
    const ana = testDevice(backend);
    const id = await createRecord(ana.writer, 'defect', defectFields());
    backend.routes['POST /api/sync/push'] = async (init) => {
      const body = (await readBody(init)) as { mutations: { mutationId: string; seq: number }[] };
      const results = body.mutations.map((m) => ({ mutationId: m.mutationId, status: 'duplicate' }));
      return new Response(JSON.stringify({ results, lastSeq: body.mutations.at(-1)!.seq }), { status: 200, headers: { 'content-type': 'application/json' } });
    };
    await ana.sync();
    expect(await ana.db.outbox.count()).toBe(0);
    const [kept] = await ana.db.rejected.toArray();
    expect(kept).toMatchObject({ recordId: id, patch: defectFields() });
    expect(kept!.error.message).toMatch(/answer saying why was lost on the way/);
  });

  it('sends again, once the phone\'s time is right, a change refused for a clock far ahead, and new changes are not refused', async () => {
    const backend = new FakeBackend();
    const ana = testDevice(backend);
    const fast = { ...ana.writer, now: () => backend.now + 60 * 60_000 };
    const early = await createRecord(fast, 'defect', defectFields({ description: 'Saved while the clock was an hour fast' }));
    await ana.sync();
    expect(await ana.db.rejected.toArray()).toMatchObject([{ recordId: early, error: { code: 'clock-drift' } }]);
    // The time is put right: the next change is stamped from now, not from the hour-fast clock.
    const later = await createRecord(ana.writer, 'defect', defectFields({ description: 'Saved after the clock was put right' }));
    const [refused] = await ana.db.rejected.toArray();
    await resendRejected(ana.writer, refused!);
    expect(await ana.db.rejected.count()).toBe(0);
    expect(await ana.sync()).toEqual({ ok: true });
    expect(await ana.db.rejected.count()).toBe(0);
    expect(backend.server.records(ana.scope.clubId).map((r) => r.id).sort()).toEqual([early, later].sort());
    expect(await getRecord(ana.db, ana.scope.clubId, 'defect', early)).toMatchObject({ fields: { description: 'Saved while the clock was an hour fast' } });
  });

  it('sends a queue the server finds too large in smaller batches, and sets aside a change too large alone', async () => {
    const backend = new FakeBackend();
    const ana = testDevice(backend);
    for (let i = 0; i < 6; i++) await createRecord(ana.writer, 'defect', defectFields({ description: `Strap ${i} frayed` }));
    const long = await createRecord(ana.writer, 'defect', defectFields({ description: 'Long report. '.repeat(150) }));
    await createRecord(ana.writer, 'defect', defectFields({ description: 'Last strap frayed' }));
    // About two ordinary changes fit in a push; the long report alone does not.
    const one = JSON.stringify((await ana.db.outbox.toArray())[0]!.mutation).length;
    backend.pushBodyLimit = one * 2 + 200;
    expect(await ana.sync()).toEqual({ ok: true });
    expect((await ana.db.outbox.toArray()).filter((e) => e.status === 'pending')).toEqual([]);
    expect(backend.server.records(ana.scope.clubId).filter((r) => r.kind === 'defect')).toHaveLength(7);
    const [set] = await ana.db.rejected.toArray();
    expect(set).toMatchObject({ recordId: long, error: { message: TOO_LARGE_ALONE } });
    expect(backend.requests.filter((r) => r.path === '/api/sync/push').map((r) => r.mutations).slice(0, 4)).toEqual([8, 4, 2, 2]);
  });
});
