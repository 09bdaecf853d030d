import { act, renderHook, waitFor } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { savePhoto } from '@/db/photos';
import { createRecord } from '@/db/write';
import { fetchPhoto } from './photo-fetch';
import { FakeBackend } from './test/fake-backend';
import { defectFields, testDevice, type TestDevice } from './test/device';
import { usePhoto } from './use-photo';

// Starts like a JPEG (FF D8 FF E0), which the server's type check asks for.
const JPEG = new Uint8Array([0xff, 0xd8, 0xff, 0xe0, 0x42, 0x72, 0x65, 0x61, 0x6b]);

/** Ana takes a photo for a defect; Ben's phone, same club, has only the record. */
async function twoPhones() {
  const backend = new FakeBackend();
  const ana = testDevice(backend, 'member-ana');
  const ben = testDevice(backend, 'member-ben');
  const sha = await savePhoto(ana.db, ana.scope.clubId, JPEG.slice().buffer, 'image/jpeg');
  await createRecord(ana.writer, 'defect', defectFields({ photos: [sha] }));
  return { backend, ana, ben, sha };
}

const fetchOn = (phone: TestDevice, backend: FakeBackend, sha: string) =>
  fetchPhoto({ db: phone.db, scope: phone.scope, auth: phone.auth, fetch: backend.fetch }, sha);

afterEach(() => {
  Reflect.deleteProperty(URL, 'createObjectURL');
  Reflect.deleteProperty(URL, 'revokeObjectURL');
});

describe('photos from other phones', () => {
  it('are fetched on demand, checked against their hash and kept on this phone', async () => {
    const { backend, ana, ben, sha } = await twoPhones();
    backend.offline = true;
    expect(await fetchOn(ben, backend, sha)).toEqual({ status: 'offline' });
    backend.offline = false;
    expect(await fetchOn(ben, backend, sha)).toEqual({ status: 'not-sent' });
    await ana.sync();
    expect(await fetchOn(ben, backend, sha)).toEqual({ status: 'kept' });
    const kept = await ben.db.photos.get(sha);
    expect(kept).toMatchObject({ state: 'sent', type: 'image/jpeg', clubId: ben.scope.clubId });
    expect(new Uint8Array(kept!.bytes)).toEqual(JPEG);
    // Kept here: the next sync of Ben's phone does not upload it back.
    await ben.sync();
    expect(backend.requests.filter((r) => r.method === 'PUT')).toHaveLength(1);
  });

  it('are not kept when the bytes do not match the hash', async () => {
    const { backend, ben, sha } = await twoPhones();
    backend.photos.set(`${ben.scope.clubId}/${sha}`, { bytes: new Uint8Array([0xff, 0xd8, 0xff, 0x00]), type: 'image/jpeg' });
    expect(await fetchOn(ben, backend, sha)).toEqual({ status: 'failed', message: expect.stringMatching(/arrived damaged/) });
    expect(await ben.db.photos.count()).toBe(0);
  });

  it('share one request when several thumbnails ask at once', async () => {
    const { backend, ana, ben, sha } = await twoPhones();
    await ana.sync();
    const before = backend.requests.length;
    await Promise.all([fetchOn(ben, backend, sha), fetchOn(ben, backend, sha), fetchOn(ben, backend, sha)]);
    expect(backend.requests.length - before).toBe(1);
  });

  it('show a plain placeholder offline, and the photo once there is signal', async () => {
    const { backend, ana, ben, sha } = await twoPhones();
    await ana.sync();
    const made: Blob[] = [];
    Object.defineProperty(URL, 'createObjectURL', { configurable: true, value: (b: Blob) => (made.push(b), `blob:photo-${made.length}`) });
    Object.defineProperty(URL, 'revokeObjectURL', { configurable: true, value: () => undefined });
    backend.offline = true;
    const source = { auth: ben.auth, fetch: backend.fetch };
    const { result } = renderHook(() => usePhoto(ben.db, sha, source));
    await waitFor(() => expect(result.current).toMatchObject({ status: 'placeholder', text: 'Photo shows when there is signal' }));
    expect(await ben.db.photos.count()).toBe(0);

    backend.offline = false;
    act(() => void window.dispatchEvent(new Event('online')));
    await waitFor(() => expect(result.current).toEqual({ status: 'shown', url: 'blob:photo-1' }));
    expect(made[0]?.type).toBe('image/jpeg');
    expect(await ben.db.photos.get(sha)).toMatchObject({ state: 'sent' });
  });

  it('say when the phone that took the photo has not sent it yet', async () => {
    const { backend, ben, sha } = await twoPhones();
    const { result } = renderHook(() => usePhoto(ben.db, sha, { auth: ben.auth, fetch: backend.fetch }));
    await waitFor(() => expect(result.current).toMatchObject({ status: 'placeholder', text: 'Photo not sent yet by its phone' }));
  });
});
