var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
var __metadata = (this && this.__metadata) || function (k, v) {
    if (typeof Reflect === "object" && typeof Reflect.metadata === "function") return Reflect.metadata(k, v);
};
var __param = (this && this.__param) || function (paramIndex, decorator) {
    return function (target, key) { decorator(target, key, paramIndex); }
};
import { Body, Controller, HttpCode, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { Public } from '../auth/principal.js';
import { Env } from '../config/env.js';
import { PasswordResetService } from './password-reset.service.js';
import { PasswordResetConfirmDto, PasswordResetRequestDto } from './dto/password-reset.dto.js';
let PasswordResetController = class PasswordResetController {
    resets;
    env;
    constructor(resets, env) {
        this.resets = resets;
        this.env = env;
    }
    /** Always 202 with the same words, whether or not the address has an account. */
    request(dto) {
        this.resets.request(dto.email);
        return { message: `If an account uses ${dto.email}, a link to set a new password is on its way. It works once, for ${this.env.PASSWORD_RESET_TTL_MINUTES} minutes.` };
    }
    /** Sets the new password and answers like a sign-in. */
    confirm(dto) {
        return this.resets.confirm(dto.token, dto.password);
    }
};
__decorate([
    Public(),
    Post(),
    HttpCode(202),
    __param(0, Body()),
    __metadata("design:type", Function),
    __metadata("design:paramtypes", [PasswordResetRequestDto]),
    __metadata("design:returntype", Object)
], PasswordResetController.prototype, "request", null);
__decorate([
    Public(),
    Post('confirm'),
    HttpCode(200),
    __param(0, Body()),
    __metadata("design:type", Function),
    __metadata("design:paramtypes", [PasswordResetConfirmDto]),
    __metadata("design:returntype", Promise)
], PasswordResetController.prototype, "confirm", null);
PasswordResetController = __decorate([
    ApiTags('auth'),
    Controller('auth/password-reset'),
    __metadata("design:paramtypes", [PasswordResetService, Env])
], PasswordResetController);
export { PasswordResetController };
//# sourceMappingURL=password-reset.controller.js.map