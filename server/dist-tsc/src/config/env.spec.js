import { validateEnv, ConfigError } from './env.js';
describe('validateEnv', () => {
    it('lists every missing or bad setting in one error', () => {
        try {
            validateEnv({ PORT: 'seventy', JWT_SECRET: 'short' });
            throw new Error('expected a ConfigError');
        }
        catch (e) {
            expect(e).toBeInstanceOf(ConfigError);
            const msg = e.message;
            expect(msg).toMatch(/DATABASE_URL must be a postgres:\/\/ connection string/);
            expect(msg).toMatch(/JWT_SECRET must be at least 32 characters/);
            expect(msg).toMatch(/PORT/);
        }
    });
    it('fills defaults for optional settings', () => {
        const env = validateEnv({ DATABASE_URL: 'postgres://u:p@127.0.0.1:5432/db', JWT_SECRET: 'x'.repeat(32) });
        expect(env.PORT).toBe(3000);
        expect(env.HOST).toBe('127.0.0.1');
        expect(env.ACCESS_TOKEN_TTL_SECONDS).toBe(900);
    });
});
//# sourceMappingURL=env.spec.js.map