import { describe, expect, it } from 'vitest';
import { FakeBackend } from '@/sync/test/fake-backend';
import { testDevice } from '@/sync/test/device';
import { keepFetchedPhoto, markPhotoRefused, markPhotosDue, markPhotoSent, photoIdsIn, retryRefusedPhoto, savePhoto } from './photos';

// TextEncoder's buffer is of the realm crypto.subtle accepts under jsdom.
const bytesOf = (text: string) => new TextEncoder().encode(text).buffer as ArrayBuffer;
// FIPS 180-2 appendix B.1: SHA-256("abc").
const ABC = 'ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad';
const CLUB = 'club-saltmarsh';

describe('photos on the phone', () => {
  it('keeps a photo under its SHA-256, once, and moves it kept → due → sent', async () => {
    const { db } = testDevice(new FakeBackend());
    expect(await savePhoto(db, CLUB, bytesOf('abc'), 'image/jpeg')).toBe(ABC);
    expect(await savePhoto(db, CLUB, bytesOf('abc'), 'image/jpeg')).toBe(ABC);
    expect(await db.photos.count()).toBe(1);
    expect(await photoIdsIn(db, CLUB, 'kept')).toEqual([ABC]);
    expect(await photoIdsIn(db, CLUB, 'due')).toEqual([]);
    expect(await markPhotosDue(db, [ABC, 'f'.repeat(64)])).toBe(1); // a hash not on this phone is skipped
    expect(await photoIdsIn(db, CLUB, 'due')).toEqual([ABC]);
    await markPhotoSent(db, ABC);
    // Saving the same bytes again, or a record sent again, does not queue it a second time.
    await savePhoto(db, CLUB, bytesOf('abc'), 'image/jpeg');
    expect(await markPhotosDue(db, [ABC])).toBe(0);
    const row = await db.photos.get(ABC);
    expect([row?.type, row?.bytes.byteLength, row?.state]).toEqual(['image/jpeg', 3, 'sent']);
  });

  it('keeps a refused photo with its reason until the person tries again', async () => {
    const { db } = testDevice(new FakeBackend());
    await savePhoto(db, CLUB, bytesOf('abc'), 'image/jpeg');
    await markPhotosDue(db, [ABC]);
    await markPhotoRefused(db, ABC, 'The photo is larger than the 10 MB the server accepts.');
    expect(await db.photos.get(ABC)).toMatchObject({ state: 'refused', problem: 'The photo is larger than the 10 MB the server accepts.' });
    await retryRefusedPhoto(db, ABC);
    const row = await db.photos.get(ABC);
    expect(row?.state).toBe('due');
    expect(row).not.toHaveProperty('problem');
  });

  it('keeps a photo fetched from the server as sent, never to be uploaded back', async () => {
    const { db } = testDevice(new FakeBackend());
    await keepFetchedPhoto(db, CLUB, ABC, bytesOf('abc'), 'image/jpeg');
    expect(await photoIdsIn(db, CLUB, 'sent')).toEqual([ABC]);
    expect(await markPhotosDue(db, [ABC])).toBe(0);
  });

  it('refuses an empty photo', async () => {
    const { db } = testDevice(new FakeBackend());
    await expect(savePhoto(db, CLUB, bytesOf(''), 'image/jpeg')).rejects.toThrow(/empty/);
  });
});
