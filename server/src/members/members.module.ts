import { MiddlewareConsumer, Module, NestModule, RequestMethod } from '@nestjs/common';
import { Env } from '../config/env.js';
import { AuthModule } from '../auth/auth.module.js';
import { ClubsModule } from '../clubs/clubs.module.js';
import { InvitesController } from './invites.controller.js';
import { InvitesService } from './invites.service.js';
import { PasswordResetController } from './password-reset.controller.js';
import { PasswordResetService } from './password-reset.service.js';
import { MembersController } from './members.controller.js';
import { MemberRolesService } from './member-roles.service.js';
import { resetLimiter } from './reset-limiter.js';

/** Joining and belonging: invitations, password reset by e-mail, roles per club. */
@Module({
  imports: [AuthModule, ClubsModule],
  controllers: [InvitesController, PasswordResetController, MembersController],
  providers: [InvitesService, PasswordResetService, MemberRolesService],
})
export class MembersModule implements NestModule {
  constructor(private readonly env: Env) {}

  configure(consumer: MiddlewareConsumer) {
    consumer
      .apply(resetLimiter(this.env.PASSWORD_RESET_MAX_REQUESTS, this.env.LOGIN_WINDOW_MINUTES))
      .forRoutes({ path: 'auth/password-reset', method: RequestMethod.POST });
  }
}
