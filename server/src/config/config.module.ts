import { Global, Module } from '@nestjs/common';
import { Env, validateEnv } from './env.js';

/** Provides the validated settings as the `Env` class, read once. */
@Global()
@Module({
  providers: [{ provide: Env, useFactory: () => validateEnv(process.env) }],
  exports: [Env],
})
export class AppConfigModule {}
