import { describe, expect, it } from 'vitest';
import { preparePhoto, scaledSize } from './photo';

describe('photo downscale', () => {
  it.each([
    [4032, 3024, 1600, 1200],
    [3024, 4032, 1200, 1600],
    [1200, 800, 1200, 800], // never enlarged
    [1600, 1600, 1600, 1600],
  ])('%i×%i is kept at %i×%i', (w, h, ew, eh) => {
    expect(scaledSize(w, h)).toEqual({ width: ew, height: eh });
  });

  it('refuses an image without a size', () => {
    expect(() => scaledSize(0, 100)).toThrow('take it again');
  });

  it('refuses a file that is not a picture, with a message a person can act on', async () => {
    await expect(preparePhoto(new Blob(['x'], { type: 'text/plain' }))).rejects.toThrow('not a photo');
  });

  it('keeps the original bytes where the browser cannot decode images', async () => {
    const photo = await preparePhoto(new Blob([new Uint8Array([1, 2, 3])], { type: 'image/png' }));
    expect(photo.type).toBe('image/png');
    expect(new Uint8Array(photo.bytes)).toEqual(new Uint8Array([1, 2, 3]));
  });
});
