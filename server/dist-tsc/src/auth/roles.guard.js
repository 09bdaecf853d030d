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
import { AppError } from '../common/app-error.js';
import { roleAtLeast } from '@breakline/sync-protocol';
import { MIN_ROLE_KEY } from './principal.js';
/** Refuses a route whose @MinRole the caller's role in the active club does not reach. */
let RolesGuard = class RolesGuard {
    reflector;
    constructor(reflector) {
        this.reflector = reflector;
    }
    canActivate(ctx) {
        const min = this.reflector.getAllAndOverride(MIN_ROLE_KEY, [ctx.getHandler(), ctx.getClass()]);
        if (!min)
            return true;
        const p = ctx.switchToHttp().getRequest().user;
        if (p && roleAtLeast(p.role, min))
            return true;
        throw new AppError(403, 'forbidden', `This needs the ${min} role or higher in this club; you are signed in as ${p?.role ?? 'nobody'}.`);
    }
};
RolesGuard = __decorate([
    Injectable(),
    __metadata("design:paramtypes", [Reflector])
], RolesGuard);
export { RolesGuard };
//# sourceMappingURL=roles.guard.js.map