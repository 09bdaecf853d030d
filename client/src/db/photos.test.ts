import { describe, expect, it } from 'vitest';
import { FakeBackend } from '@/sync/test/fake-backend';
import { testDevice } from '@/sync/test/device';
import { markPhotoUploaded, photosToUpload, savePhoto } from './photos';

describe('photos on the phone', () => {
  it('keeps a photo under its SHA-256, once, until it is uploaded', async () => {
    const { db } = testDevice(new FakeBackend());
    // TextEncoder's buffer is of the realm crypto.subtle accepts under jsdom.
    const bytes = new TextEncoder().encode('abc').buffer as ArrayBuffer;
    // FIPS 180-2 appendix B.1: SHA-256("abc").
    const abc = 'ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad';
    expect(await savePhoto(db, 'club-saltmarsh', bytes, 'image/jpeg')).toBe(abc);
    expect(await savePhoto(db, 'club-saltmarsh', bytes, 'image/jpeg')).toBe(abc);
    expect((await photosToUpload(db, 'club-saltmarsh')).map((p) => p.sha256)).toEqual([abc]);
    await markPhotoUploaded(db, abc);
    await savePhoto(db, 'club-saltmarsh', bytes, 'image/jpeg');
    expect(await photosToUpload(db, 'club-saltmarsh')).toEqual([]);
    const row = await db.photos.get(abc);
    expect([row?.type, row?.bytes.byteLength, row?.uploaded]).toEqual(['image/jpeg', 3, 1]);
  });

  it('refuses an empty photo', async () => {
    const { db } = testDevice(new FakeBackend());
    await expect(savePhoto(db, 'club-saltmarsh', new TextEncoder().encode('').buffer as ArrayBuffer, 'image/jpeg')).rejects.toThrow(/empty/);
  });
});
