import { sniffPhotoType } from './sniff.js';
const bytes = (...parts) => Buffer.concat(parts.map((p) => (typeof p === 'string' ? Buffer.from(p, 'latin1') : Buffer.from(p))));
/** An ISO base media "ftyp" box: size, type, major brand, minor version, compatible brands. */
const ftyp = (major, ...compatible) => {
    const size = 16 + 4 * compatible.length;
    return bytes([0, 0, 0, size], 'ftyp', major, [0, 0, 0, 0], compatible.join(''), [0, 0, 0, 8], 'meta');
};
describe('sniffPhotoType', () => {
    it('knows JPEG by its start-of-image marker followed by another marker', () => {
        // ITU-T T.81 (JPEG) marker codes: SOI is 0xFFD8 and every marker starts with 0xFF (from memory).
        expect(sniffPhotoType(bytes([0xff, 0xd8, 0xff, 0xe0, 0, 16], 'JFIF'))).toBe('image/jpeg');
        expect(sniffPhotoType(bytes([0xff, 0xd8, 0xff, 0xe1, 0, 16], 'Exif'))).toBe('image/jpeg');
    });
    it('knows PNG by its eight-byte signature', () => {
        // PNG specification (W3C, ISO/IEC 15948), PNG signature: 137 80 78 71 13 10 26 10 (from memory).
        expect(sniffPhotoType(bytes([137, 80, 78, 71, 13, 10, 26, 10, 0, 0, 0, 13], 'IHDR'))).toBe('image/png');
        expect(sniffPhotoType(bytes([137, 80, 78, 71, 13, 10, 26]))).toBeNull();
    });
    it('knows WebP by its RIFF container with the WEBP form type', () => {
        // RFC 9649 (WebP) RIFF header: "RIFF", 32-bit size, "WEBP" (from memory).
        expect(sniffPhotoType(bytes('RIFF', [0x24, 0, 0, 0], 'WEBPVP8 '))).toBe('image/webp');
        expect(sniffPhotoType(bytes('RIFF', [0x24, 0, 0, 0], 'WAVEfmt '))).toBeNull();
    });
    it('knows HEIC and HEIF by the brands of their ftyp box, and not AVIF', () => {
        // ISO/IEC 23008-12 (HEIF) brands heic, mif1, msf1, hevc (from memory).
        expect(sniffPhotoType(ftyp('heic', 'mif1', 'heic'))).toBe('image/heic');
        expect(sniffPhotoType(ftyp('mif1', 'mif1'))).toBe('image/heif');
        expect(sniffPhotoType(ftyp('msf1', 'msf1'))).toBe('image/heif-sequence');
        expect(sniffPhotoType(ftyp('hevc', 'msf1'))).toBe('image/heic-sequence');
        expect(sniffPhotoType(ftyp('isom', 'mif1', 'heic'))).toBe('image/heic');
        expect(sniffPhotoType(ftyp('avif', 'mif1', 'miaf'))).toBeNull();
        expect(sniffPhotoType(ftyp('mp42', 'isom', 'mp42'))).toBeNull();
    });
    it('refuses text, a renamed document and an empty file', () => {
        expect(sniffPhotoType(Buffer.from('Port sponson scuffed, photo to follow'))).toBeNull();
        expect(sniffPhotoType(bytes('%PDF-1.7\n'))).toBeNull();
        expect(sniffPhotoType(Buffer.alloc(0))).toBeNull();
        expect(sniffPhotoType(bytes([0xff, 0xd8]))).toBeNull();
    });
});
//# sourceMappingURL=sniff.spec.js.map