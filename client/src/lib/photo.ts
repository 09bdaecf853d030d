/** Long edge of a stored photo: enough to read a serial plate or see a cut, small enough to sync on a weak signal. */
export const PHOTO_LONG_EDGE = 1600;
const JPEG_QUALITY = 0.82;

export interface PreparedPhoto {
  bytes: ArrayBuffer;
  type: string;
}

/** The size a photo is drawn at: the long edge brought down to `longEdge`, never enlarged. */
export function scaledSize(width: number, height: number, longEdge = PHOTO_LONG_EDGE): { width: number; height: number } {
  if (!(width > 0 && height > 0)) throw new RangeError('The photo has no size; take it again.');
  const scale = Math.min(1, longEdge / Math.max(width, height));
  return { width: Math.max(1, Math.round(width * scale)), height: Math.max(1, Math.round(height * scale)) };
}

async function toJpeg(bitmap: ImageBitmap): Promise<Blob> {
  const { width, height } = scaledSize(bitmap.width, bitmap.height);
  if (typeof OffscreenCanvas !== 'undefined') {
    const canvas = new OffscreenCanvas(width, height);
    canvas.getContext('2d')!.drawImage(bitmap, 0, 0, width, height);
    return canvas.convertToBlob({ type: 'image/jpeg', quality: JPEG_QUALITY });
  }
  const canvas = document.createElement('canvas');
  canvas.width = width;
  canvas.height = height;
  canvas.getContext('2d')!.drawImage(bitmap, 0, 0, width, height);
  return new Promise((resolve, reject) =>
    canvas.toBlob((b) => (b ? resolve(b) : reject(new Error('This phone could not shrink the photo.'))), 'image/jpeg', JPEG_QUALITY),
  );
}

/** FileReader rather than Blob.arrayBuffer: older phone browsers still in use lack the latter. */
function readBytes(blob: Blob): Promise<ArrayBuffer> {
  return new Promise((resolve, reject) => {
    const reader = new FileReader();
    reader.onload = () => resolve(reader.result as ArrayBuffer);
    reader.onerror = () => reject(new Error('This phone could not read the photo; take it again.'));
    reader.readAsArrayBuffer(blob);
  });
}

/**
 * A camera photo made ready to keep: downscaled on the phone to a JPEG. Where the browser cannot
 * decode it (an old browser, a test), the original image is kept rather than losing the photo.
 */
export async function preparePhoto(file: Blob): Promise<PreparedPhoto> {
  if (!file.type.startsWith('image/')) throw new TypeError('That file is not a photo. Choose a picture from the camera or gallery.');
  if (file.size === 0) throw new RangeError('The photo is empty; take it again.');
  if (typeof createImageBitmap !== 'function') return { bytes: await readBytes(file), type: file.type };
  const bitmap = await createImageBitmap(file);
  try {
    const jpeg = await toJpeg(bitmap);
    return { bytes: await readBytes(jpeg), type: 'image/jpeg' };
  } finally {
    bitmap.close();
  }
}
