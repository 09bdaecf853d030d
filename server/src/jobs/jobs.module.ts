import { Global, Module } from '@nestjs/common';
import { JobsService } from './jobs.service.js';

/** The job queue, shared by every module that sends or works jobs. */
@Global()
@Module({
  providers: [JobsService],
  exports: [JobsService],
})
export class JobsModule {}
