import { ConfigError, validateEnv } from '../config/env.js';
import { storageSettings } from './storage-settings.js';
const base = { DATABASE_URL: 'postgres://u:p@127.0.0.1:5432/db', JWT_SECRET: 'x'.repeat(32) };
describe('photo storage settings', () => {
    it('leaves photo storage off without S3_ENDPOINT, or with it empty', () => {
        expect(storageSettings(validateEnv(base))).toBeNull();
        expect(storageSettings(validateEnv({ ...base, S3_ENDPOINT: '' }))).toBeNull();
        expect(validateEnv(base).PHOTO_MAX_MB).toBe(8);
    });
    it('gives a loopback fake its own keys, path-style addressing and checksums only when required', () => {
        const s = storageSettings(validateEnv({ ...base, S3_ENDPOINT: 'http://127.0.0.1:4568' }));
        expect(s.bucket).toBe('breakline-photos');
        expect(s.client).toMatchObject({
            endpoint: 'http://127.0.0.1:4568', region: 'us-east-1', forcePathStyle: true,
            requestChecksumCalculation: 'WHEN_REQUIRED', credentials: { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' },
        });
    });
    it('uses the given keys for a real bucket, and the SDK credential chain when none are given', () => {
        const real = { ...base, S3_ENDPOINT: 'https://s3.eu-west-2.example.com', S3_BUCKET: 'club-photos', S3_REGION: 'eu-west-2', S3_FORCE_PATH_STYLE: 'false' };
        const keyed = storageSettings(validateEnv({ ...real, S3_ACCESS_KEY_ID: 'id', S3_SECRET_ACCESS_KEY: 'secret' }));
        expect(keyed).toMatchObject({ bucket: 'club-photos', client: { region: 'eu-west-2', forcePathStyle: false, credentials: { accessKeyId: 'id', secretAccessKey: 'secret' } } });
        expect(storageSettings(validateEnv(real)).client.credentials).toBeUndefined();
    });
    it('lists every bad photo setting', () => {
        const bad = { ...base, S3_ENDPOINT: 'ftp://store', S3_BUCKET: 'ab', S3_FORCE_PATH_STYLE: 'maybe', PHOTO_MAX_MB: '0', S3_ACCESS_KEY_ID: 'id' };
        expect(() => validateEnv(bad)).toThrow(ConfigError);
        const msg = (() => { try {
            validateEnv(bad);
            return '';
        }
        catch (e) {
            return e.message;
        } })();
        expect(msg).toMatch(/S3_ENDPOINT must be an http:\/\/ or https:\/\/ address/);
        expect(msg).toMatch(/S3_BUCKET must be 3 to 63/);
        expect(msg).toMatch(/S3_FORCE_PATH_STYLE must be true or false/);
        expect(msg).toMatch(/PHOTO_MAX_MB/);
        expect(msg).toMatch(/S3_SECRET_ACCESS_KEY must be set when S3_ACCESS_KEY_ID is/);
    });
});
//# sourceMappingURL=storage-settings.spec.js.map