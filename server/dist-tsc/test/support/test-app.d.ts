import 'reflect-metadata';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { DataSource } from 'typeorm';
import request from 'supertest';
export interface TestApp {
    app: NestExpressApplication;
    http: () => ReturnType<typeof request>;
    db: DataSource;
}
export declare function createTestApp(overrides?: Record<string, string>): Promise<TestApp>;
/** Empties the schema and migrates from nothing, so every file starts from the same state. */
export declare function resetDatabase(db: DataSource): Promise<void>;
export declare function login(t: TestApp, email: string, password?: string): Promise<{
    accessToken: string;
    refreshToken: string;
    activeClub: {
        id: string;
        role: string;
    };
}>;
