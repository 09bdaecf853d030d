import { describe, expect, it } from 'vitest';
import { markPhotosDue, savePhoto } from '@/db/photos';
import { createRecord, updateRecord } from '@/db/write';
import { uploadPhotos } from './photo-upload';
import type { SyncProgress } from './progress';
import { SyncRunner } from './runner';
import { readSyncStatus } from './status';
import { FakeBackend } from './test/fake-backend';
import { defectFields, testDevice, type TestDevice } from './test/device';

/** Bytes that begin like a JPEG (FF D8 FF, JPEG File Interchange Format marker), different each time. */
function jpegBytes(tag: string): ArrayBuffer {
  const body = new TextEncoder().encode(`breakline test photo ${tag}`);
  const bytes = new Uint8Array(4 + body.length);
  bytes.set([0xff, 0xd8, 0xff, 0xe0]);
  bytes.set(body, 4);
  return bytes.buffer;
}

async function photoOn(phone: TestDevice, tag: string): Promise<string> {
  return savePhoto(phone.db, phone.scope.clubId, jpegBytes(tag), 'image/jpeg');
}

const photoRequests = (b: FakeBackend) => b.requests.filter((r) => r.path.startsWith('/api/attachments/'));
const stateOf = async (phone: TestDevice, sha: string) => (await phone.db.photos.get(sha))?.state;

describe('photo upload queue', () => {
  it('uploads a photo only after the record that refers to it was accepted, with the same bytes', async () => {
    const backend = new FakeBackend();
    const ana = testDevice(backend);
    const sha = await photoOn(ana, 'hull');
    // Taken, but no record refers to it yet (the form is still open): nothing goes up.
    expect(await ana.sync()).toEqual({ ok: true });
    expect(photoRequests(backend)).toEqual([]);
    expect(await stateOf(ana, sha)).toBe('kept');

    await createRecord(ana.writer, 'defect', defectFields({ photos: [sha] }));
    expect(await ana.sync()).toEqual({ ok: true });
    const paths = backend.requests.map((r) => `${r.method} ${r.path}`);
    const push = paths.lastIndexOf('POST /api/sync/push');
    const head = paths.indexOf(`HEAD /api/attachments/${sha}`);
    const put = paths.indexOf(`PUT /api/attachments/${sha}`);
    expect(push).toBeGreaterThanOrEqual(0);
    expect(head).toBeGreaterThan(push);
    expect(put).toBeGreaterThan(head);
    expect(backend.photos.get(`${ana.scope.clubId}/${sha}`)?.bytes).toEqual(new Uint8Array(jpegBytes('hull')));
    expect(await stateOf(ana, sha)).toBe('sent');
    expect((await readSyncStatus(ana.db, ana.scope.clubId)).photosWaiting).toBe(0);
  });

  it('never uploads a photo whose record the server refused', async () => {
    const backend = new FakeBackend();
    const ana = testDevice(backend);
    const id = await createRecord(ana.writer, 'defect', defectFields());
    await ana.sync();
    const sha = await photoOn(ana, 'strap');
    await updateRecord(ana.writer, 'defect', id, { photos: [sha], status: 'repaired', actionTaken: 'Strap replaced' });
    // Her role was lowered on the server meanwhile: only a driver may mark a defect repaired.
    backend.grant((await ana.auth.token(ana.scope))!, { userId: 'member-ana', role: 'crew', clubId: ana.scope.clubId });
    await ana.sync();
    expect(await ana.db.rejected.count()).toBe(1);
    expect(await stateOf(ana, sha)).toBe('kept');
    expect(photoRequests(backend)).toEqual([]);
  });

  it('holds back a due photo while a change that refers to it waits in the outbox', async () => {
    const backend = new FakeBackend();
    const ana = testDevice(backend);
    const sha = await photoOn(ana, 'valve');
    await createRecord(ana.writer, 'defect', defectFields({ photos: [sha] }));
    await markPhotosDue(ana.db, [sha]); // as a photo upgraded from schema version 2 would be
    await uploadPhotos({ db: ana.db, scope: ana.scope, auth: ana.auth, fetch: backend.fetch });
    expect(photoRequests(backend)).toEqual([]);
    expect(await stateOf(ana, sha)).toBe('due');
  });

  it('makes a retried upload a no-op: an upload whose answer was lost is not sent again', async () => {
    const backend = new FakeBackend();
    const ana = testDevice(backend);
    const sha = await photoOn(ana, 'propeller guard');
    await createRecord(ana.writer, 'defect', defectFields({ photos: [sha] }));
    backend.loseNextPhotoAnswer = true;
    expect(await ana.sync()).toMatchObject({ ok: false, failure: { reason: 'offline' } });
    expect(await stateOf(ana, sha)).toBe('due');
    expect(backend.photos.size).toBe(1); // the server kept it; the phone never heard

    expect(await ana.sync()).toEqual({ ok: true });
    expect(await stateOf(ana, sha)).toBe('sent');
    const puts = photoRequests(backend).filter((r) => r.method === 'PUT');
    expect(puts).toHaveLength(1);
    expect(photoRequests(backend).filter((r) => r.method === 'HEAD')).toHaveLength(2);
    expect(backend.photos.size).toBe(1);

    // The same photo in a second record: already sent, nothing to do.
    await createRecord(ana.writer, 'defect', defectFields({ description: 'Same photo, second report', photos: [sha] }));
    await ana.sync();
    expect(photoRequests(backend)).toHaveLength(3);
  });

  it('reports upload progress as n of m photos', async () => {
    const backend = new FakeBackend();
    const ana = testDevice(backend);
    const shas = [await photoOn(ana, 'bow'), await photoOn(ana, 'transom'), await photoOn(ana, 'floor')];
    await createRecord(ana.writer, 'defect', defectFields({ photos: shas }));
    const seen: SyncProgress[] = [];
    await ana.sync({ onProgress: (p) => seen.push(p) });
    expect(seen.filter((p) => p.phase === 'photos')).toEqual([0, 1, 2, 3].map((done) => ({ phase: 'photos', done, total: 3 })));
    // The records' progress came first.
    expect(seen[0]).toMatchObject({ phase: 'sending' });
    expect(backend.photos.size).toBe(3);
  });

  it('sets aside a photo that is too large (413) or not a photo (415) with the reason, and sends the rest', async () => {
    const backend = new FakeBackend();
    const ana = testDevice(backend);
    const big = await savePhoto(ana.db, ana.scope.clubId, jpegBytes('x'.repeat(400)), 'image/jpeg');
    const notPhoto = await savePhoto(ana.db, ana.scope.clubId, new TextEncoder().encode('GIF89a not taken').buffer as ArrayBuffer, 'image/gif');
    const fine = await photoOn(ana, 'fine');
    backend.photoLimitBytes = 200;
    await createRecord(ana.writer, 'defect', defectFields({ photos: [big, notPhoto, fine] }));
    expect(await ana.sync()).toEqual({ ok: true });
    expect(await ana.db.photos.get(big)).toMatchObject({ state: 'refused', problem: 'The photo is larger than the 200 bytes the server accepts.' });
    expect(await ana.db.photos.get(notPhoto)).toMatchObject({ state: 'refused', problem: expect.stringMatching(/^This file is not a photo/) });
    expect(await stateOf(ana, fine)).toBe('sent');
    const status = await readSyncStatus(ana.db, ana.scope.clubId);
    expect(status.refusedPhotos.map((p) => p.sha256).sort()).toEqual([big, notPhoto].sort());
    expect(status.photosWaiting).toBe(0);
    // Refused photos are not tried again on every sync.
    const before = photoRequests(backend).length;
    await ana.sync();
    expect(photoRequests(backend)).toHaveLength(before);
  });

  it('stops on a photo store that is down (503), says so, and retries on the backoff timer', async () => {
    const backend = new FakeBackend();
    const ana = testDevice(backend);
    const shas = [await photoOn(ana, 'cowling'), await photoOn(ana, 'kill cord')];
    await createRecord(ana.writer, 'defect', defectFields({ photos: shas }));
    backend.photoStoreDown = true;
    const timers: { ms: number; run: () => void }[] = [];
    const runner = new SyncRunner({
      auth: ana.auth, openDb: () => ana.db, fetch: backend.fetch, now: () => backend.now, random: () => 0,
      onOutdated: () => undefined, setTimer: (run, ms) => timers.push({ ms, run }), clearTimer: () => undefined,
    });
    expect(await runner.requestSync()).toBe(false);
    const status = await readSyncStatus(ana.db, ana.scope.clubId);
    expect(status.lastError).toMatchObject({ reason: 'photos', message: 'Photos not sent yet: The photo store cannot be reached just now. Try again in a few minutes.' });
    // The records went through; the photos wait.
    expect(status.waiting).toBe(0);
    expect(status.lastSyncAt).not.toBeNull();
    expect(status.photosWaiting).toBe(2);
    expect(photoRequests(backend)).toHaveLength(1); // stopped at the first photo
    expect(timers).toHaveLength(1);

    backend.photoStoreDown = false;
    timers.shift()!.run();
    await runner.idle();
    expect(await readSyncStatus(ana.db, ana.scope.clubId)).toMatchObject({ photosWaiting: 0, lastError: null });
    expect(backend.photos.size).toBe(2);
  });

  it('says "no signal" when the connection drops between the records and the photos', async () => {
    const backend = new FakeBackend();
    const ana = testDevice(backend);
    const sha = await photoOn(ana, 'fuel line');
    await createRecord(ana.writer, 'defect', defectFields({ photos: [sha] }));
    const real = backend.fetch;
    const cutting = async (input: RequestInfo | URL, init?: RequestInit) => {
      if (String(input).startsWith('/api/attachments/')) throw new TypeError('Failed to fetch');
      return real(input, init);
    };
    expect(await ana.sync({ fetch: cutting })).toMatchObject({ ok: false, failure: { reason: 'offline' } });
    expect(await stateOf(ana, sha)).toBe('due');
    expect(await ana.sync()).toEqual({ ok: true });
    expect(await stateOf(ana, sha)).toBe('sent');
  });
});
