var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
import { Module } from '@nestjs/common';
import { AttachmentsController } from './attachments.controller.js';
import { AttachmentsService } from './attachments.service.js';
import { PhotoUploadInterceptor } from './photo-upload.interceptor.js';
import { StorageConfiguredGuard } from './storage-configured.guard.js';
import { PhotoStore, StorageService } from './storage.service.js';
/** Photo uploads and downloads; the bytes live in an S3-compatible store. */
let AttachmentsModule = class AttachmentsModule {
};
AttachmentsModule = __decorate([
    Module({
        controllers: [AttachmentsController],
        providers: [AttachmentsService, PhotoUploadInterceptor, StorageConfiguredGuard, { provide: PhotoStore, useClass: StorageService }],
        exports: [AttachmentsService],
    })
], AttachmentsModule);
export { AttachmentsModule };
//# sourceMappingURL=attachments.module.js.map