// Names a photo's type from its first bytes: the client's content type is only a claim.
const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
/** Major brands of the ISO base media file box ("ftyp") that mark a HEIF photo. */
const HEIF_BRANDS = {
    heic: 'image/heic', heix: 'image/heic', heim: 'image/heic', heis: 'image/heic',
    hevc: 'image/heic-sequence', hevx: 'image/heic-sequence', hevm: 'image/heic-sequence', hevs: 'image/heic-sequence',
    mif1: 'image/heif', msf1: 'image/heif-sequence',
};
const ascii = (b, from, to) => String.fromCharCode(...b.subarray(from, to));
const startsWith = (b, sig) => b.length >= sig.length && sig.every((x, i) => b[i] === x);
function sniffHeif(b) {
    if (b.length < 16 || ascii(b, 4, 8) !== 'ftyp')
        return null;
    const major = HEIF_BRANDS[ascii(b, 8, 12)];
    if (major)
        return major;
    // Some writers put a generic major brand first and list heic among the compatible ones.
    // mif1 alone is not enough here: AVIF files list it too.
    const boxSize = Math.min(b.length, new DataView(b.buffer, b.byteOffset, b.byteLength).getUint32(0));
    for (let i = 16; i + 4 <= boxSize; i += 4) {
        const brand = ascii(b, i, i + 4);
        if (brand === 'heic' || brand === 'heix')
            return 'image/heic';
    }
    return null;
}
/** The photo type the bytes carry, or null when they are not a JPEG, PNG, WebP or HEIF/HEIC photo. */
export function sniffPhotoType(bytes) {
    if (startsWith(bytes, [0xff, 0xd8, 0xff]))
        return 'image/jpeg';
    if (startsWith(bytes, PNG_SIGNATURE))
        return 'image/png';
    if (bytes.length >= 12 && ascii(bytes, 0, 4) === 'RIFF' && ascii(bytes, 8, 12) === 'WEBP')
        return 'image/webp';
    return sniffHeif(bytes);
}
export const PHOTO_TYPES_TEXT = 'JPEG, PNG, WebP or HEIC/HEIF';
//# sourceMappingURL=sniff.js.map