import { MiddlewareConsumer, Module, NestModule, RequestMethod } from '@nestjs/common';
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

@Module({
  imports: [
    PassportModule,
    UsersModule,
    ClubsModule,
    TypeOrmModule.forFeature([RefreshToken]),
    JwtModule.registerAsync({
      inject: [Env],
      useFactory: (env: Env) => ({ secret: env.JWT_SECRET, signOptions: { algorithm: 'HS256' } }),
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
})
export class AuthModule implements NestModule {
  constructor(private readonly env: Env) {}

  configure(consumer: MiddlewareConsumer) {
    consumer
      .apply(loginLimiter(this.env.LOGIN_MAX_FAILURES, this.env.LOGIN_WINDOW_MINUTES))
      .forRoutes({ path: 'auth/login', method: RequestMethod.POST });
  }
}
