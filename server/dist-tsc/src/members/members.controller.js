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
import { Body, Controller, Param, ParseUUIDPipe, Patch } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { CurrentPrincipal, MinRole } from '../auth/principal.js';
import { MemberRolesService } from './member-roles.service.js';
import { MemberRoleDto } from './dto/member-role.dto.js';
let MembersController = class MembersController {
    roles;
    constructor(roles) {
        this.roles = roles;
    }
    changeRole(p, id, dto) {
        return this.roles.change(p, id, dto.role);
    }
};
__decorate([
    Patch(':membershipId'),
    MinRole('admin'),
    __param(0, CurrentPrincipal()),
    __param(1, Param('membershipId', ParseUUIDPipe)),
    __param(2, Body()),
    __metadata("design:type", Function),
    __metadata("design:paramtypes", [Object, String, MemberRoleDto]),
    __metadata("design:returntype", Promise)
], MembersController.prototype, "changeRole", null);
MembersController = __decorate([
    ApiTags('members'),
    ApiBearerAuth(),
    Controller('members'),
    __metadata("design:paramtypes", [MemberRolesService])
], MembersController);
export { MembersController };
//# sourceMappingURL=members.controller.js.map