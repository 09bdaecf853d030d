import type { NestExpressApplication } from '@nestjs/platform-express';
import type { Env } from './config/env.js';
/** Everything main.ts and the e2e tests share, so tests run the app as it is served. */
export declare function configureApp(app: NestExpressApplication, env: Env): void;
