import { buildMutation, encodeHlc } from '@breakline/sync-protocol';
import { describe, expect, it } from 'vitest';
import { uuid7 } from '@/db/uuid7';
import { getRecord, listRecords } from '@/db/queries';
import { createRecord, updateRecord } from '@/db/write';
import { FakeBackend } from './test/fake-backend';
import { defectFields, testDevice, twoPhonesWithOneDefect } from './test/device';

describe('push and pull', () => {
  it('sends a change, then another phone pulls it; the outbox empties and versions move', async () => {
    const backend = new FakeBackend();
    const ana = testDevice(backend, 'member-ana');
    const ben = testDevice(backend, 'member-ben');
    const id = await createRecord(ana.writer, 'defect', defectFields());
    expect(await ana.sync()).toEqual({ ok: true });
    expect(await ana.db.outbox.count()).toBe(0);
    expect(await getRecord(ana.db, ana.scope.clubId, 'defect', id)).toMatchObject({ version: 1, waiting: 0 });
    expect(backend.server.record(ana.scope.clubId, id)).toMatchObject({ version: 1, fields: defectFields() });

    expect(await ben.sync()).toEqual({ ok: true });
    expect(await getRecord(ben.db, ben.scope.clubId, 'defect', id)).toMatchObject({ version: 1, fields: defectFields() });
    await updateRecord(ben.writer, 'defect', id, { actionTaken: 'Strap restitched' });
    await ben.sync();
    await ana.sync();
    expect(await getRecord(ana.db, ana.scope.clubId, 'defect', id)).toMatchObject({ version: 2, fields: { actionTaken: 'Strap restitched' } });
    expect(await ana.db.syncState.get('club:club-saltmarsh')).toMatchObject({ lastError: null, lastSyncAt: new Date(backend.now).toISOString() });
  });

  it('sends at most 500 changes a batch, gzip-compressed, and pulls page by page', async () => {
    const backend = new FakeBackend();
    const ana = testDevice(backend);
    // The outbox is filled in one bulk write, as 520 saves one by one would; only quicker to run.
    await ana.db.outbox.bulkAdd(
      Array.from({ length: 520 }, (_, i) => {
        const recordId = uuid7(backend.now + i);
        const patch = defectFields({ description: `Scuff ${i} on the hull` });
        const mutation = buildMutation({
          mutationId: uuid7(backend.now + i), seq: i + 1, hlc: encodeHlc({ l: backend.now, c: i, node: 'phone-ana' }),
          view: undefined, kind: 'defect', recordId, patch,
        });
        return { seq: i + 1, clubId: ana.scope.clubId, recordId, kind: 'defect' as const, status: 'pending' as const, mutation };
      }),
    );
    const progress: string[] = [];
    await ana.sync({ pageSize: 200, onProgress: (p) => progress.push(p.phase === 'receiving' ? `r${p.done}${p.total === undefined ? '' : `/${p.total}`}` : `s${p.done}/${p.total}`) });
    const pushes = backend.requests.filter((r) => r.path === '/api/sync/push');
    expect(pushes.map((p) => [p.mutations, p.gzip])).toEqual([[500, true], [20, true]]);
    const pulls = backend.requests.filter((r) => r.path === '/api/sync/pull');
    // Only the first page asks how many are left: counting on every page would cost the server dear.
    expect(pulls.map((r) => r.count ?? false)).toEqual([true, false, false]);
    // While more pages follow, the receiving side knows the total from what the server says is left.
    expect(progress).toEqual(['s0/520', 's500/520', 's520/520', 'r200/520', 'r400/520', 'r520']);
    expect(await listRecords(ana.db, ana.scope.clubId, 'defect')).toHaveLength(520);
    expect(await ana.db.outbox.count()).toBe(0);
  });

  it('keeps a local edit on top when a pull brings another change to the record', async () => {
    const { backend, ana, ben, id } = await twoPhonesWithOneDefect();
    await updateRecord(ben.writer, 'defect', id, { actionTaken: 'Strap restitched' });
    await ben.sync();
    // Ana edits another field offline, then only pulls: her edit is still what she sees.
    await updateRecord(ana.writer, 'defect', id, { severity: 'stand-down' });
    backend.offline = false;
    const { pullAll } = await import('./pull');
    await pullAll({ db: ana.db, scope: ana.scope, auth: ana.auth, fetch: backend.fetch, now: () => backend.now });
    expect(await getRecord(ana.db, ana.scope.clubId, 'defect', id)).toMatchObject({
      version: 2, waiting: 1, fields: { severity: 'stand-down', actionTaken: 'Strap restitched' },
    });
    await ana.sync();
    expect(await getRecord(ana.db, ana.scope.clubId, 'defect', id)).toMatchObject({ version: 3, waiting: 0, fields: { severity: 'stand-down' } });
  });

  it('replays after a lost answer: the server says duplicate and nothing is doubled', async () => {
    const backend = new FakeBackend();
    const ana = testDevice(backend);
    const id = await createRecord(ana.writer, 'defect', defectFields());
    await updateRecord(ana.writer, 'defect', id, { notes: [{ at: '2026-12-05T21:40:00Z', by: 'member-ana', text: 'Taped for now' }] });
    backend.loseNextPushAnswer = true;
    expect(await ana.sync()).toMatchObject({ ok: false, failure: { reason: 'offline' } });
    expect(await ana.db.outbox.count()).toBe(2);
    expect(backend.server.record(ana.scope.clubId, id)!.version).toBe(2);

    const answers: string[] = [];
    const spying: typeof fetch = async (input, init) => {
      const res = await backend.fetch(input, init);
      if (String(input).endsWith('/push')) answers.push(...((await res.clone().json()) as { results: { status: string }[] }).results.map((r) => r.status));
      return res;
    };
    expect(await ana.sync({ fetch: spying })).toEqual({ ok: true });
    expect(answers).toEqual(['duplicate', 'duplicate']);
    expect(backend.server.record(ana.scope.clubId, id)).toMatchObject({ version: 2, fields: { notes: [{ text: 'Taped for now' }] } });
    expect(backend.server.records(ana.scope.clubId)).toHaveLength(1);
    expect(await ana.db.outbox.count()).toBe(0);
    expect(await getRecord(ana.db, ana.scope.clubId, 'defect', id)).toMatchObject({ version: 2, waiting: 0 });
  });

  it('still shows an accepted edit between the push and the pull that brings it back', async () => {
    const backend = new FakeBackend();
    const ana = testDevice(backend);
    const id = await createRecord(ana.writer, 'defect', defectFields());
    await ana.sync();
    await updateRecord(ana.writer, 'defect', id, { severity: 'stand-down' });
    const { pushOutbox } = await import('./push');
    await pushOutbox({ db: ana.db, scope: ana.scope, auth: ana.auth, fetch: backend.fetch, now: () => backend.now });
    expect(await ana.db.outbox.where('[clubId+status]').equals([ana.scope.clubId, 'pending']).count()).toBe(0);
    expect(await getRecord(ana.db, ana.scope.clubId, 'defect', id)).toMatchObject({ version: 1, waiting: 0, fields: { severity: 'stand-down' } });
    await ana.sync();
    expect(await ana.db.outbox.count()).toBe(0);
    expect(await getRecord(ana.db, ana.scope.clubId, 'defect', id)).toMatchObject({ version: 2, fields: { severity: 'stand-down' } });
  });

  it("fills an empty phone page by page while others change records: newest copies win, the phone's own edit stays on top", async () => {
    const backend = new FakeBackend();
    const ben = testDevice(backend, 'member-ben');
    const ids: string[] = [];
    for (let i = 0; i < 5; i++) ids.push(await createRecord(ben.writer, 'defect', defectFields({ description: `Scuff ${i} on the hull`, reportedBy: 'member-ben' })));
    await ben.sync();
    const ana = testDevice(backend, 'member-ana');
    // Ana's first sync, two records a page: when its first page arrives, Ben changes a record of
    // that page, so a later page brings a newer copy over one this pull wrote; when its third
    // arrives (the first is written by then), Ana edits the other record of the first page.
    let pulls = 0;
    const mid = async (input: RequestInfo | URL, init?: RequestInit) => {
      const response = await backend.fetch(input, init);
      if (!String(input).includes('/api/sync/pull')) return response;
      pulls += 1;
      if (pulls === 1) {
        await updateRecord(ben.writer, 'defect', ids[0]!, { actionTaken: 'Patched and re-glued' });
        await ben.sync();
      }
      if (pulls === 3) await updateRecord(ana.writer, 'defect', ids[1]!, { severity: 'stand-down' });
      return response;
    };
    const { pullAll } = await import('./pull');
    await pullAll({ db: ana.db, scope: ana.scope, auth: ana.auth, fetch: mid, now: () => backend.now, pageSize: 2 });
    expect(pulls).toBe(3);
    const shown = await listRecords(ana.db, ana.scope.clubId, 'defect');
    expect(shown).toHaveLength(5);
    expect(shown.find((r) => r.id === ids[0])).toMatchObject({ version: 2, fields: { actionTaken: 'Patched and re-glued' } });
    expect(shown.find((r) => r.id === ids[1])).toMatchObject({ version: 1, waiting: 1, fields: { severity: 'stand-down' } });
  });

  it('asks for the next page from the headers, and goes by the body when they say otherwise or say nothing', async () => {
    const backend = new FakeBackend();
    const ben = testDevice(backend, 'member-ben');
    for (let i = 0; i < 5; i++) await createRecord(ben.writer, 'defect', defectFields({ description: `Scuff ${i} on the hull`, reportedBy: 'member-ben' }));
    await ben.sync();
    const { pullAll } = await import('./pull');
    const pullsOf = () => backend.requests.filter((r) => r.path === '/api/sync/pull').map((r) => r.since ?? 'start');

    const ana = testDevice(backend, 'member-ana');
    backend.requests.length = 0;
    await pullAll({ db: ana.db, scope: ana.scope, auth: ana.auth, fetch: backend.fetch, now: () => backend.now, pageSize: 2 });
    const straight = pullsOf();
    expect(straight).toHaveLength(3);
    expect(await listRecords(ana.db, ana.scope.clubId, 'defect')).toHaveLength(5);

    // Headers that contradict the body: the early request is dropped and the body's checkpoint asked.
    backend.pullHeaderCheckpoint = () => '0.999999';
    const cy = testDevice(backend, 'member-cy');
    backend.requests.length = 0;
    await pullAll({ db: cy.db, scope: cy.scope, auth: cy.auth, fetch: backend.fetch, now: () => backend.now, pageSize: 2 });
    expect(pullsOf().filter((s) => s === '0.999999')).toHaveLength(2);
    expect(pullsOf().filter((s) => s !== '0.999999')).toEqual(straight);
    expect(await listRecords(cy.db, cy.scope.clubId, 'defect')).toHaveLength(5);

    // No headers, as from an older server: the body alone.
    backend.pullHeaderCheckpoint = () => null;
    const di = testDevice(backend, 'member-di');
    backend.requests.length = 0;
    await pullAll({ db: di.db, scope: di.scope, auth: di.auth, fetch: backend.fetch, now: () => backend.now, pageSize: 2 });
    expect(pullsOf()).toEqual(straight);
    expect(await listRecords(di.db, di.scope.clubId, 'defect')).toHaveLength(5);
  });
});
