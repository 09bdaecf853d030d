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
import { Controller, Get } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { CurrentPrincipal, MinRole } from '../auth/principal.js';
import { CaughtMailService } from './caught-mail.service.js';
/** Mail the local catcher caught: on only where MAIL_CAUGHT_DIR is set (npm start, npm test). */
let DevMailController = class DevMailController {
    caught;
    constructor(caught) {
        this.caught = caught;
    }
    mail(p) {
        return this.caught.list(p.clubId);
    }
};
__decorate([
    Get('mail'),
    MinRole('admin'),
    __param(0, CurrentPrincipal()),
    __metadata("design:type", Function),
    __metadata("design:paramtypes", [Object]),
    __metadata("design:returntype", Promise)
], DevMailController.prototype, "mail", null);
DevMailController = __decorate([
    ApiTags('dev'),
    ApiBearerAuth(),
    Controller('dev'),
    __metadata("design:paramtypes", [CaughtMailService])
], DevMailController);
export { DevMailController };
//# sourceMappingURL=dev-mail.controller.js.map