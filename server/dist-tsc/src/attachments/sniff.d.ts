export type PhotoType = 'image/jpeg' | 'image/png' | 'image/webp' | 'image/heic' | 'image/heic-sequence' | 'image/heif' | 'image/heif-sequence';
/** The photo type the bytes carry, or null when they are not a JPEG, PNG, WebP or HEIF/HEIC photo. */
export declare function sniffPhotoType(bytes: Uint8Array): PhotoType | null;
export declare const PHOTO_TYPES_TEXT = "JPEG, PNG, WebP or HEIC/HEIF";
