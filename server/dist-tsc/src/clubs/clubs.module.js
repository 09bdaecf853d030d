var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { Club } from './club.entity.js';
import { Membership } from './membership.entity.js';
import { ClubsController } from './clubs.controller.js';
import { ClubsService } from './clubs.service.js';
import { MembershipsService } from './memberships.service.js';
import { MemberCardsService } from './member-cards.service.js';
import { SyncModule } from '../sync/sync.module.js';
let ClubsModule = class ClubsModule {
};
ClubsModule = __decorate([
    Module({
        imports: [TypeOrmModule.forFeature([Club, Membership]), SyncModule],
        controllers: [ClubsController],
        providers: [ClubsService, MembershipsService, MemberCardsService],
        exports: [ClubsService, MembershipsService, MemberCardsService],
    })
], ClubsModule);
export { ClubsModule };
//# sourceMappingURL=clubs.module.js.map