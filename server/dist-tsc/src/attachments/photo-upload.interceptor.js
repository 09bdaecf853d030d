var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
var __metadata = (this && this.__metadata) || function (k, v) {
    if (typeof Reflect === "object" && typeof Reflect.metadata === "function") return Reflect.metadata(k, v);
};
import { BadRequestException, Injectable, PayloadTooLargeException } from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { Env } from '../config/env.js';
import { AppError } from '../common/app-error.js';
export const PHOTO_FIELD = 'file';
/**
 * Reads one photo from the multipart field `file` into memory, refusing anything over
 * PHOTO_MAX_MB, and turns multer's refusals into sentences a person can act on.
 */
let PhotoUploadInterceptor = class PhotoUploadInterceptor {
    multer;
    limitMb;
    constructor(env) {
        this.limitMb = env.PHOTO_MAX_MB;
        const Multer = FileInterceptor(PHOTO_FIELD);
        this.multer = new Multer({ limits: { fileSize: env.PHOTO_MAX_MB * 1024 * 1024, files: 1, fields: 10, parts: 11 } });
    }
    async intercept(ctx, next) {
        try {
            return await this.multer.intercept(ctx, next);
        }
        catch (e) {
            throw this.explain(e);
        }
    }
    explain(e) {
        if (e instanceof PayloadTooLargeException) {
            return new AppError(413, 'payload_too_large', `The photo is larger than the ${this.limitMb} MB the server accepts. Choose a smaller photo or a lower camera resolution and send it again.`);
        }
        if (e instanceof BadRequestException) {
            const code = e.cause?.code;
            const message = code === 'LIMIT_UNEXPECTED_FILE' || code === 'LIMIT_FILE_COUNT'
                ? `Send one photo a request, in the multipart field named "${PHOTO_FIELD}".`
                : `The upload is not a complete multipart form. Send the photo as multipart/form-data in the field "${PHOTO_FIELD}".`;
            return new AppError(400, 'validation_failed', message);
        }
        return e;
    }
};
PhotoUploadInterceptor = __decorate([
    Injectable(),
    __metadata("design:paramtypes", [Env])
], PhotoUploadInterceptor);
export { PhotoUploadInterceptor };
//# sourceMappingURL=photo-upload.interceptor.js.map