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
import { Body, Controller, Delete, Get, HttpCode, Param, ParseUUIDPipe, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { CurrentPrincipal, MinRole, Public } from '../auth/principal.js';
import { InvitesService } from './invites.service.js';
import { AcceptInviteDto, CreateInviteDto } from './dto/invite.dto.js';
let InvitesController = class InvitesController {
    invites;
    constructor(invites) {
        this.invites = invites;
    }
    create(p, dto) {
        return this.invites.create(p, dto);
    }
    list(p) {
        return this.invites.list(p);
    }
    async withdraw(p, id) {
        await this.invites.withdraw(p, id);
    }
    /** Accepting needs no sign-in: the link's token is the proof. Answers like a sign-in. */
    accept(dto) {
        return this.invites.accept(dto);
    }
};
__decorate([
    ApiBearerAuth(),
    Post(),
    MinRole('admin'),
    __param(0, CurrentPrincipal()),
    __param(1, Body()),
    __metadata("design:type", Function),
    __metadata("design:paramtypes", [Object, CreateInviteDto]),
    __metadata("design:returntype", Promise)
], InvitesController.prototype, "create", null);
__decorate([
    ApiBearerAuth(),
    Get(),
    MinRole('admin'),
    __param(0, CurrentPrincipal()),
    __metadata("design:type", Function),
    __metadata("design:paramtypes", [Object]),
    __metadata("design:returntype", Promise)
], InvitesController.prototype, "list", null);
__decorate([
    ApiBearerAuth(),
    Delete(':id'),
    HttpCode(204),
    MinRole('admin'),
    __param(0, CurrentPrincipal()),
    __param(1, Param('id', ParseUUIDPipe)),
    __metadata("design:type", Function),
    __metadata("design:paramtypes", [Object, String]),
    __metadata("design:returntype", Promise)
], InvitesController.prototype, "withdraw", null);
__decorate([
    Public(),
    Post('accept'),
    HttpCode(200),
    __param(0, Body()),
    __metadata("design:type", Function),
    __metadata("design:paramtypes", [AcceptInviteDto]),
    __metadata("design:returntype", Promise)
], InvitesController.prototype, "accept", null);
InvitesController = __decorate([
    ApiTags('invites'),
    Controller('invites'),
    __metadata("design:paramtypes", [InvitesService])
], InvitesController);
export { InvitesController };
//# sourceMappingURL=invites.controller.js.map