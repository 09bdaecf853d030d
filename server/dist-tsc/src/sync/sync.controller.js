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
import { Body, Controller, Get, HttpCode, Param, ParseUUIDPipe, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { CurrentPrincipal, MinRole } from '../auth/principal.js';
import { PushService } from './push.service.js';
import { PullService } from './pull.service.js';
import { ConflictsService } from './conflicts.service.js';
import { RawBody } from './raw-body.js';
/** The sync contract, version 1: bodies are validated by sync-protocol's schemas in the services. */
let SyncController = class SyncController {
    pushes;
    pulls;
    conflicts;
    constructor(pushes, pulls, conflicts) {
        this.pushes = pushes;
        this.pulls = pulls;
        this.conflicts = conflicts;
    }
    push(p, body) {
        return this.pushes.push(p, body);
    }
    pull(p, query) {
        return this.pulls.pull(p, query);
    }
    /** What a phone shows in its sync status; any member may ask. */
    async status(p) {
        return { openConflicts: await this.conflicts.openCount(p) };
    }
    list(p, status) {
        const s = status === 'settled' || status === 'all' ? status : 'open';
        return this.conflicts.list(p, s);
    }
    settle(p, id, body) {
        return this.conflicts.settle(p, id, body);
    }
};
__decorate([
    Post('push'),
    HttpCode(200),
    __param(0, CurrentPrincipal()),
    __param(1, Body(RawBody)),
    __metadata("design:type", Function),
    __metadata("design:paramtypes", [Object, Object]),
    __metadata("design:returntype", Promise)
], SyncController.prototype, "push", null);
__decorate([
    Get('pull'),
    __param(0, CurrentPrincipal()),
    __param(1, Query(RawBody)),
    __metadata("design:type", Function),
    __metadata("design:paramtypes", [Object, Object]),
    __metadata("design:returntype", Promise)
], SyncController.prototype, "pull", null);
__decorate([
    Get('status'),
    __param(0, CurrentPrincipal()),
    __metadata("design:type", Function),
    __metadata("design:paramtypes", [Object]),
    __metadata("design:returntype", Promise)
], SyncController.prototype, "status", null);
__decorate([
    Get('conflicts'),
    MinRole('supervisor'),
    __param(0, CurrentPrincipal()),
    __param(1, Query('status')),
    __metadata("design:type", Function),
    __metadata("design:paramtypes", [Object, String]),
    __metadata("design:returntype", Promise)
], SyncController.prototype, "list", null);
__decorate([
    Post('conflicts/:id/settle'),
    HttpCode(200),
    MinRole('supervisor'),
    __param(0, CurrentPrincipal()),
    __param(1, Param('id', ParseUUIDPipe)),
    __param(2, Body(RawBody)),
    __metadata("design:type", Function),
    __metadata("design:paramtypes", [Object, String, Object]),
    __metadata("design:returntype", Promise)
], SyncController.prototype, "settle", null);
SyncController = __decorate([
    ApiTags('sync'),
    ApiBearerAuth(),
    Controller('sync'),
    __metadata("design:paramtypes", [PushService, PullService, ConflictsService])
], SyncController);
export { SyncController };
//# sourceMappingURL=sync.controller.js.map