import { Module } from '@nestjs/common';
import { SyncController } from './sync.controller.js';
import { PushService } from './push.service.js';
import { PullService } from './pull.service.js';
import { ConflictsService } from './conflicts.service.js';
import { TombstonesService } from './tombstones.service.js';

@Module({
  controllers: [SyncController],
  providers: [PushService, PullService, ConflictsService, TombstonesService],
  exports: [TombstonesService, PushService],
})
export class SyncModule {}
