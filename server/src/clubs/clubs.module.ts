import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { Club } from './club.entity.js';
import { Membership } from './membership.entity.js';
import { ClubsController } from './clubs.controller.js';
import { ClubsService } from './clubs.service.js';
import { MembershipsService } from './memberships.service.js';

@Module({
  imports: [TypeOrmModule.forFeature([Club, Membership])],
  controllers: [ClubsController],
  providers: [ClubsService, MembershipsService],
  exports: [ClubsService, MembershipsService],
})
export class ClubsModule {}
