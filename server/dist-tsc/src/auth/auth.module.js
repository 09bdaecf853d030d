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
import { APP_GUARD } from '@nestjs/core';
import { JwtModule } from '@nestjs/jwt';
import { PassportModule } from '@nestjs/passport';
import { TypeOrmModule } from '@nestjs/typeorm';
import { Env } from '../config/env.js';
import { UsersModule } from '../users/users.module.js';
import { ClubsModule } from '../clubs/clubs.module.js';
import { AuthController } from './auth.controller.js';
import { AuthService } from './auth.service.js';
import { JwtStrategy } from './jwt.strategy.js';
import { JwtAuthGuard } from './jwt-auth.guard.js';
import { RolesGuard } from './roles.guard.js';
import { RefreshToken } from './refresh-token.entity.js';
import { RefreshTokensService } from './refresh-tokens.service.js';
import { loginLimiter } from './login-limiter.js';
let AuthModule = class AuthModule {
    env;
    constructor(env) {
        this.env = env;
    }
    configure(consumer) {
        consumer
            .apply(loginLimiter(this.env.LOGIN_MAX_FAILURES, this.env.LOGIN_WINDOW_MINUTES))
            .forRoutes({ path: 'auth/login', method: RequestMethod.POST });
    }
};
AuthModule = __decorate([
    Module({
        imports: [
            PassportModule,
            UsersModule,
            ClubsModule,
            TypeOrmModule.forFeature([RefreshToken]),
            JwtModule.registerAsync({
                inject: [Env],
                useFactory: (env) => ({ secret: env.JWT_SECRET, signOptions: { algorithm: 'HS256' } }),
            }),
        ],
        controllers: [AuthController],
        providers: [
            AuthService,
            RefreshTokensService,
            JwtStrategy,
            { provide: APP_GUARD, useClass: JwtAuthGuard },
            { provide: APP_GUARD, useClass: RolesGuard },
        ],
        exports: [AuthService],
    }),
    __metadata("design:paramtypes", [Env])
], AuthModule);
export { AuthModule };
//# sourceMappingURL=auth.module.js.map