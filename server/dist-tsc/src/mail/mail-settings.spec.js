import { ConfigError, validateEnv } from '../config/env.js';
import { appUrl } from './app-url.js';
const base = { DATABASE_URL: 'postgres://u:p@127.0.0.1:5432/db', JWT_SECRET: 'x'.repeat(32) };
describe('mail settings', () => {
    it('leaves mail off without SMTP_HOST and fills the other defaults', () => {
        const env = validateEnv({ ...base, SMTP_HOST: '' });
        expect(env.SMTP_HOST).toBeUndefined();
        expect(env.SMTP_PORT).toBe(587);
        expect(env.SMTP_SECURE).toBe(false);
        expect(env.INVITE_TTL_HOURS).toBe(168);
        expect(env.PASSWORD_RESET_TTL_MINUTES).toBe(60);
        expect(appUrl(env)).toBe('http://127.0.0.1:3000');
    });
    it('reads a full SMTP setting, and APP_URL without its trailing slash', () => {
        const env = validateEnv({ ...base, SMTP_HOST: 'smtp.club.example', SMTP_PORT: '465', SMTP_SECURE: 'TRUE', SMTP_USER: 'breakline', SMTP_PASSWORD: 'pw',
            SMTP_FROM: 'Gannet Bay IRB <irb@gannetbay.example>', APP_URL: 'https://breakline.gannetbay.example/' });
        expect(env).toMatchObject({ SMTP_HOST: 'smtp.club.example', SMTP_PORT: 465, SMTP_SECURE: true, SMTP_USER: 'breakline', SMTP_FROM: 'Gannet Bay IRB <irb@gannetbay.example>' });
        expect(appUrl(env)).toBe('https://breakline.gannetbay.example');
    });
    it('lists each bad mail setting with what to write instead', () => {
        try {
            validateEnv({ ...base, SMTP_HOST: 'smtp club', SMTP_PORT: 'twenty-five', SMTP_SECURE: 'maybe', SMTP_USER: 'only-the-user', SMTP_FROM: 'nobody', APP_URL: 'breakline.example' });
            throw new Error('expected a ConfigError');
        }
        catch (e) {
            expect(e).toBeInstanceOf(ConfigError);
            const msg = e.message;
            expect(msg).toMatch(/SMTP_HOST must be a host name or address/);
            expect(msg).toMatch(/SMTP_PORT must be a port number/);
            expect(msg).toMatch(/SMTP_SECURE must be true or false/);
            expect(msg).toMatch(/SMTP_PASSWORD must be set when SMTP_USER is/);
            expect(msg).toMatch(/SMTP_FROM must be an address/);
            expect(msg).toMatch(/APP_URL must be an http:\/\/ or https:\/\/ address/);
        }
    });
});
//# sourceMappingURL=mail-settings.spec.js.map