import { createHash, randomBytes } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { crc32, deflateSync } from 'node:zlib';
import { HeadObjectCommand, S3Client } from '@aws-sdk/client-s3';
import { createTestApp, login } from './support/test-app.js';
// The fake lives with the start and test scripts (plain ESM, no types); a non-literal specifier
// keeps the compiler from looking for declarations.
const S3_FAKE = '../../scripts/lib/s3-fake.mjs';
const startS3Fake = async (o) => (await import(S3_FAKE)).startS3Fake(o);
const sha = (b) => createHash('sha256').update(b).digest('hex');
/** A real 1x1 PNG: signature, IHDR, one deflated scanline, IEND, each chunk with its CRC. */
function tinyPng() {
    const chunk = (type, data) => {
        const body = Buffer.concat([Buffer.from(type, 'latin1'), data]);
        const out = Buffer.alloc(12 + data.length);
        out.writeUInt32BE(data.length, 0);
        body.copy(out, 4);
        out.writeUInt32BE(crc32(body), 8 + data.length);
        return out;
    };
    const ihdr = Buffer.from([0, 0, 0, 1, 0, 0, 0, 1, 8, 2, 0, 0, 0]); // 1x1, 8-bit RGB
    const pixel = Buffer.from([0, 0xe8, 0x4a, 0x27]); // filter byte, then one orange pixel
    return Buffer.concat([Buffer.from([137, 80, 78, 71, 13, 10, 26, 10]), chunk('IHDR', ihdr), chunk('IDAT', deflateSync(pixel)), chunk('IEND', Buffer.alloc(0))]);
}
/** JPEG framing (SOI, APP0 "JFIF", EOI) around `size` random bytes, big enough to stream. */
function jpegOf(size) {
    return Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10]), Buffer.from('JFIF\0', 'latin1'), randomBytes(size), Buffer.from([0xff, 0xd9])]);
}
/** Reads any response body as bytes, so a photo is compared byte for byte. */
const binary = (res, done) => {
    const parts = [];
    res.on('data', (c) => parts.push(c));
    res.on('end', () => done(null, Buffer.concat(parts)));
};
describe('photo attachments', () => {
    let t;
    let fake;
    let dir;
    let gannet;
    let kelp;
    beforeAll(async () => {
        dir = mkdtempSync(join(tmpdir(), 'breakline-photos-'));
        fake = await startS3Fake({ dir, port: 0, bucket: 'photos-test' });
        t = await createTestApp({ S3_ENDPOINT: fake.endpoint, S3_BUCKET: fake.bucket, PHOTO_MAX_MB: '1' });
        gannet = await login(t, 'crew@gannetbay.example');
        kelp = await login(t, 'crew@kelpreef.example');
    });
    afterAll(async () => {
        await t?.app.close();
        await fake?.stop();
        rmSync(dir, { recursive: true, force: true });
    });
    const put = (token, hash, bytes, filename = 'photo.jpg', contentType = 'image/jpeg') => t.http().put(`/api/attachments/${hash}`).set('authorization', `Bearer ${token}`).attach('file', bytes, { filename, contentType });
    const head = (token, hash) => t.http().head(`/api/attachments/${hash}`).set('authorization', `Bearer ${token}`);
    const get = (token, hash) => t.http().get(`/api/attachments/${hash}`).set('authorization', `Bearer ${token}`).buffer(true).parse(binary);
    it('stores a photo once: 201 the first time, 200 existed after, HEAD 404 then 200', async () => {
        const png = tinyPng();
        const hash = sha(png);
        await head(gannet.accessToken, hash).expect(404);
        const first = await put(gannet.accessToken, hash, png, 'defect.png', 'image/png').expect(201);
        expect(first.body).toEqual({ sha256: hash, size: png.length, type: 'image/png', existed: false });
        const again = await put(gannet.accessToken, hash, png, 'defect.png', 'image/png').expect(200);
        expect(again.body).toEqual({ sha256: hash, size: png.length, type: 'image/png', existed: true });
        const found = await head(gannet.accessToken, hash).expect(200);
        expect(found.headers['content-type']).toBe('image/png');
        expect(found.headers['content-length']).toBe(String(png.length));
    });
    it('keeps the photo under the club\'s key in the bucket', async () => {
        const png = tinyPng();
        const s3 = new S3Client({ endpoint: fake.endpoint, region: 'us-east-1', forcePathStyle: true, credentials: { accessKeyId: fake.accessKeyId, secretAccessKey: fake.secretAccessKey } });
        const obj = await s3.send(new HeadObjectCommand({ Bucket: fake.bucket, Key: `clubs/${gannet.activeClub.id}/photos/${sha(png)}` }));
        s3.destroy();
        expect(obj.ContentLength).toBe(png.length);
    });
    it('streams back exactly the bytes sent, with the type sniffed and an immutable cache header', async () => {
        const jpeg = jpegOf(300_000);
        const hash = sha(jpeg);
        // The client calls it a PNG; the bytes say JPEG.
        await put(gannet.accessToken, hash.toUpperCase(), jpeg, 'IMG_0001.png', 'image/png').expect(201);
        const res = await get(gannet.accessToken, hash).expect(200);
        expect(res.headers['content-type']).toBe('image/jpeg');
        expect(res.headers['cache-control']).toBe('private, max-age=31536000, immutable');
        expect(Buffer.isBuffer(res.body)).toBe(true);
        expect(res.body.length).toBe(jpeg.length);
        expect(res.body.equals(jpeg)).toBe(true);
    });
    it('refuses bytes that do not match the hash in the address', async () => {
        const jpeg = jpegOf(1000);
        const res = await put(gannet.accessToken, sha(Buffer.from('another photo')), jpeg).expect(400);
        expect(res.body).toMatchObject({ statusCode: 400, code: 'validation_failed' });
        expect(res.body.message).toContain(sha(jpeg));
        await head(gannet.accessToken, sha(jpeg)).expect(404);
    });
    it('refuses an address that is not a SHA-256, and a request without the file field', async () => {
        const bad = await head(gannet.accessToken, 'not-a-hash').expect(400);
        expect(bad.headers['content-type']).toMatch(/json/);
        const none = await t.http().put(`/api/attachments/${sha(tinyPng())}`).set('authorization', `Bearer ${gannet.accessToken}`).field('note', 'no photo').expect(400);
        expect(none.body.message).toMatch(/field "file"/);
        const wrongField = await t.http().put(`/api/attachments/${sha(tinyPng())}`).set('authorization', `Bearer ${gannet.accessToken}`).attach('photo', tinyPng(), 'p.png').expect(400);
        expect(wrongField.body).toMatchObject({ code: 'validation_failed', message: expect.stringMatching(/field named "file"/) });
    });
    it('refuses a text file renamed .jpg with 415, whatever type the client claims', async () => {
        const text = Buffer.from('Port sponson scuffed near the towing eye; photo to follow.\n');
        const res = await put(gannet.accessToken, sha(text), text, 'sponson.jpg', 'image/jpeg').expect(415);
        expect(res.body).toMatchObject({ statusCode: 415, code: 'unsupported_media_type' });
        expect(res.body.message).toMatch(/JPEG, PNG, WebP or HEIC\/HEIF/);
    });
    it('refuses a photo over PHOTO_MAX_MB with 413 naming the limit', async () => {
        const big = jpegOf(1024 * 1024);
        const res = await put(gannet.accessToken, sha(big), big).expect(413);
        expect(res.body).toMatchObject({ statusCode: 413, code: 'payload_too_large' });
        expect(res.body.message).toMatch(/larger than the 1 MB the server accepts/);
        await head(gannet.accessToken, sha(big)).expect(404);
    });
    it('shows another club neither the photo nor that it exists, and keeps their copy apart', async () => {
        const png = tinyPng();
        const hash = sha(png);
        await head(gannet.accessToken, hash).expect(200);
        await head(kelp.accessToken, hash).expect(404);
        const res = await get(kelp.accessToken, hash).expect(404);
        expect(res.headers['cache-control']).toBeUndefined();
        const theirs = await put(kelp.accessToken, hash, png, 'x.png', 'image/png').expect(201);
        expect(theirs.body.existed).toBe(false);
    });
    it('needs sign-in', async () => {
        const res = await t.http().get(`/api/attachments/${sha(tinyPng())}`).expect(401);
        expect(res.body.code).toBe('unauthorized');
    });
});
describe('photo attachments without photo storage', () => {
    let t;
    beforeAll(async () => { t = await createTestApp({ S3_ENDPOINT: '' }); });
    afterAll(async () => { await t?.app.close(); });
    it('answers 503 saying photo storage is not configured, while the rest runs', async () => {
        const { accessToken } = await login(t, 'crew@gannetbay.example');
        const png = tinyPng();
        const res = await t.http().put(`/api/attachments/${sha(png)}`).set('authorization', `Bearer ${accessToken}`).attach('file', png, 'p.png').expect(503);
        expect(res.body).toMatchObject({ statusCode: 503, message: expect.stringMatching(/Photo storage is not configured/) });
        await t.http().get(`/api/attachments/${sha(png)}`).set('authorization', `Bearer ${accessToken}`).expect(503);
    });
});
//# sourceMappingURL=attachments.e2e-spec.js.map