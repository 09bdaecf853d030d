var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
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
import { JobsModule } from './jobs/jobs.module.js';
import { MailModule } from './mail/mail.module.js';
import { MembersModule } from './members/members.module.js';
import { ReviewModule } from './review/review.module.js';
import { ReportsModule } from './reports/reports.module.js';
import { AlertsModule } from './alerts/alerts.module.js';
let AppModule = class AppModule {
};
AppModule = __decorate([
    Module({
        imports: [
            AppConfigModule,
            TypeOrmModule.forRootAsync({
                inject: [Env],
                useFactory: (env) => ({ ...typeormOptions(env.DATABASE_URL), retryAttempts: env.NODE_ENV === 'test' ? 0 : 3 }),
            }),
            UsersModule,
            ClubsModule,
            AuthModule,
            SyncModule,
            AttachmentsModule,
            JobsModule,
            MailModule,
            MembersModule,
            ReviewModule,
            ReportsModule,
            AlertsModule,
        ],
        controllers: [HealthController],
    })
], AppModule);
export { AppModule };
//# sourceMappingURL=app.module.js.map