var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
var __metadata = (this && this.__metadata) || function (k, v) {
    if (typeof Reflect === "object" && typeof Reflect.metadata === "function") return Reflect.metadata(k, v);
};
import { Module, RequestMethod } from '@nestjs/common';
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
let MembersModule = class MembersModule {
    env;
    constructor(env) {
        this.env = env;
    }
    configure(consumer) {
        consumer
            .apply(resetLimiter(this.env.PASSWORD_RESET_MAX_REQUESTS, this.env.LOGIN_WINDOW_MINUTES))
            .forRoutes({ path: 'auth/password-reset', method: RequestMethod.POST });
    }
};
MembersModule = __decorate([
    Module({
        imports: [AuthModule, ClubsModule],
        controllers: [InvitesController, PasswordResetController, MembersController],
        providers: [InvitesService, PasswordResetService, MemberRolesService],
    }),
    __metadata("design:paramtypes", [Env])
], MembersModule);
export { MembersModule };
//# sourceMappingURL=members.module.js.map