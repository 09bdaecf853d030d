var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
var __metadata = (this && this.__metadata) || function (k, v) {
    if (typeof Reflect === "object" && typeof Reflect.metadata === "function") return Reflect.metadata(k, v);
};
import { Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { AuthGuard } from '@nestjs/passport';
import { AppError } from '../common/app-error.js';
import { PUBLIC_KEY } from './principal.js';
/** Global guard: every route needs a valid access token unless marked @Public(). */
let JwtAuthGuard = class JwtAuthGuard extends AuthGuard('jwt') {
    reflector;
    constructor(reflector) {
        super();
        this.reflector = reflector;
    }
    canActivate(ctx) {
        const isPublic = this.reflector.getAllAndOverride(PUBLIC_KEY, [ctx.getHandler(), ctx.getClass()]);
        return isPublic ? true : super.canActivate(ctx);
    }
    handleRequest(err, user, info) {
        if (user)
            return user;
        if (info?.name === 'TokenExpiredError') {
            throw new AppError(401, 'token_expired', 'Your session has expired. Refresh it or sign in again.');
        }
        if (err)
            throw err;
        throw new AppError(401, 'unauthorized', 'Sign in to continue.');
    }
};
JwtAuthGuard = __decorate([
    Injectable(),
    __metadata("design:paramtypes", [Reflector])
], JwtAuthGuard);
export { JwtAuthGuard };
//# sourceMappingURL=jwt-auth.guard.js.map