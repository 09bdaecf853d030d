import { Module } from '@nestjs/common';
import { AttachmentsController } from './attachments.controller.js';
import { AttachmentsService } from './attachments.service.js';
import { PhotoUploadInterceptor } from './photo-upload.interceptor.js';
import { StorageConfiguredGuard } from './storage-configured.guard.js';
import { PhotoStore, StorageService } from './storage.service.js';

/** Photo uploads and downloads; the bytes live in an S3-compatible store. */
@Module({
  controllers: [AttachmentsController],
  providers: [AttachmentsService, PhotoUploadInterceptor, StorageConfiguredGuard, { provide: PhotoStore, useClass: StorageService }],
  exports: [AttachmentsService],
})
export class AttachmentsModule {}
