import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AppConfigModule } from './config/config.module.js';
import { Env } from './config/env.js';
import { typeormOptions } from './database/typeorm-options.js';
import { AuthModule } from './auth/auth.module.js';
import { ClubsModule } from './clubs/clubs.module.js';
import { UsersModule } from './users/users.module.js';
import { SyncModule } from './sync/sync.module.js';
import { AttachmentsModule } from './attachments/attachments.module.js';
import { HealthController } from './health/health.controller.js';

@Module({
  imports: [
    AppConfigModule,
    TypeOrmModule.forRootAsync({
      inject: [Env],
      useFactory: (env: Env) => ({ ...typeormOptions(env.DATABASE_URL), retryAttempts: env.NODE_ENV === 'test' ? 0 : 3 }),
    }),
    UsersModule,
    ClubsModule,
    AuthModule,
    SyncModule,
    AttachmentsModule,
  ],
  controllers: [HealthController],
})
export class AppModule {}
