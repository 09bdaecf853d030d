import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { Club } from './club.entity.js';
import { Membership } from './membership.entity.js';
import { ClubsController } from './clubs.controller.js';
import { ClubsService } from './clubs.service.js';
import { MembershipsService } from './memberships.service.js';
import { MemberCardsService } from './member-cards.service.js';
import { SyncModule } from '../sync/sync.module.js';

@Module({
  imports: [TypeOrmModule.forFeature([Club, Membership]), SyncModule],
  controllers: [ClubsController],
  providers: [ClubsService, MembershipsService, MemberCardsService],
  exports: [ClubsService, MembershipsService, MemberCardsService],
})
export class ClubsModule {}
