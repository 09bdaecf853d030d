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
import { Controller, Get, Param, ParseUUIDPipe } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { CurrentPrincipal, MinRole } from '../auth/principal.js';
import { ClubsService } from './clubs.service.js';
let ClubsController = class ClubsController {
    clubs;
    constructor(clubs) {
        this.clubs = clubs;
    }
    current(p) {
        return this.clubs.get(p, p.clubId);
    }
    one(p, id) {
        return this.clubs.get(p, id);
    }
    members(p) {
        return this.clubs.members(p);
    }
};
__decorate([
    Get('clubs/current'),
    __param(0, CurrentPrincipal()),
    __metadata("design:type", Function),
    __metadata("design:paramtypes", [Object]),
    __metadata("design:returntype", Promise)
], ClubsController.prototype, "current", null);
__decorate([
    Get('clubs/:id'),
    __param(0, CurrentPrincipal()),
    __param(1, Param('id', ParseUUIDPipe)),
    __metadata("design:type", Function),
    __metadata("design:paramtypes", [Object, String]),
    __metadata("design:returntype", Promise)
], ClubsController.prototype, "one", null);
__decorate([
    Get('members'),
    MinRole('supervisor'),
    __param(0, CurrentPrincipal()),
    __metadata("design:type", Function),
    __metadata("design:paramtypes", [Object]),
    __metadata("design:returntype", Promise)
], ClubsController.prototype, "members", null);
ClubsController = __decorate([
    ApiTags('clubs'),
    ApiBearerAuth(),
    Controller(),
    __metadata("design:paramtypes", [ClubsService])
], ClubsController);
export { ClubsController };
//# sourceMappingURL=clubs.controller.js.map