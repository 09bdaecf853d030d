import { Module } from '@nestjs/common';
import { ReviewController } from './review.controller.js';
import { ReviewService } from './review.service.js';
import { HistoryService } from './history.service.js';

/** The Review desk's server half: paged tables of merged records, their CSV, and each record's versions. */
@Module({
  controllers: [ReviewController],
  providers: [ReviewService, HistoryService],
  exports: [ReviewService],
})
export class ReviewModule {}
