// Boots the real app against the test PostgreSQL given by DATABASE_URL (npm test starts one).
import 'reflect-metadata';
import { Test } from '@nestjs/testing';
import { DataSource } from 'typeorm';
import request from 'supertest';
import { AppModule } from '../../src/app.module.js';
import { configureApp } from '../../src/app.setup.js';
import { Env, validateEnv } from '../../src/config/env.js';
import { seedDemo } from '../../src/seed/seed.js';
import { DEMO_PASSWORD } from '../../src/seed/demo-scenario.js';
export async function createTestApp(overrides = {}) {
    if (!process.env.DATABASE_URL) {
        throw new Error('DATABASE_URL is not set: run the tests with "npm test" from the repository root, which starts a test PostgreSQL.');
    }
    const env = validateEnv({ JWT_SECRET: 'test-secret-test-secret-test-secret!', NODE_ENV: 'test', ...process.env, ...overrides });
    const mod = await Test.createTestingModule({ imports: [AppModule] }).overrideProvider(Env).useValue(env).compile();
    const app = mod.createNestApplication({ logger: ['error'] });
    configureApp(app, env);
    await app.init();
    const db = app.get(DataSource);
    await resetDatabase(db);
    return { app, db, http: () => request(app.getHttpServer()) };
}
/** Empties the schema and migrates from nothing, so every file starts from the same state. */
export async function resetDatabase(db) {
    await db.query('DROP SCHEMA public CASCADE; CREATE SCHEMA public;');
    await db.runMigrations({ transaction: 'each' });
    await seedDemo(db);
}
export async function login(t, email, password = DEMO_PASSWORD) {
    const res = await t.http().post('/api/auth/login').send({ email, password }).expect(200);
    return res.body;
}
//# sourceMappingURL=test-app.js.map