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
import { Controller, Get, Head, HttpStatus, Param, Put, Res, StreamableFile, UploadedFile, UseGuards, UseInterceptors } from '@nestjs/common';
import { ApiBearerAuth, ApiBody, ApiConsumes, ApiTags } from '@nestjs/swagger';
import { AppError } from '../common/app-error.js';
import { CurrentPrincipal } from '../auth/principal.js';
import { AttachmentsService } from './attachments.service.js';
import { PHOTO_FIELD, PhotoUploadInterceptor } from './photo-upload.interceptor.js';
import { Sha256Pipe } from './sha256.pipe.js';
import { StorageConfiguredGuard } from './storage-configured.guard.js';
// A photo's address is its hash, so what it names never changes; private because it needs sign-in.
const IMMUTABLE = 'private, max-age=31536000, immutable';
/** Photos of the caller's club, content-addressed by SHA-256; the club comes from the sign-in. */
let AttachmentsController = class AttachmentsController {
    photos;
    constructor(photos) {
        this.photos = photos;
    }
    async upload(p, sha256, file, res) {
        if (!file)
            throw new AppError(400, 'validation_failed', `No photo came with the request. Send it as multipart/form-data in the field "${PHOTO_FIELD}".`);
        const info = await this.photos.upload(p, sha256, file.buffer);
        res.status(info.existed ? HttpStatus.OK : HttpStatus.CREATED);
        return info;
    }
    // Declared before GET: Express would otherwise answer HEAD with the GET route.
    /** Lets a phone skip sending a photo the server already keeps. */
    async head(p, sha256, res) {
        const found = await this.photos.head(p, sha256);
        res.setHeader('Content-Type', found.type);
        res.setHeader('Content-Length', String(found.size));
    }
    async get(p, sha256, res) {
        const photo = await this.photos.open(p, sha256);
        res.setHeader('Cache-Control', IMMUTABLE);
        return new StreamableFile(photo.body, { type: photo.type, length: photo.size });
    }
};
__decorate([
    Put(':sha256'),
    UseInterceptors(PhotoUploadInterceptor),
    ApiConsumes('multipart/form-data'),
    ApiBody({ schema: { type: 'object', required: [PHOTO_FIELD], properties: { [PHOTO_FIELD]: { type: 'string', format: 'binary' } } } }),
    __param(0, CurrentPrincipal()),
    __param(1, Param('sha256', Sha256Pipe)),
    __param(2, UploadedFile()),
    __param(3, Res({ passthrough: true })),
    __metadata("design:type", Function),
    __metadata("design:paramtypes", [Object, String, Object, Object]),
    __metadata("design:returntype", Promise)
], AttachmentsController.prototype, "upload", null);
__decorate([
    Head(':sha256'),
    __param(0, CurrentPrincipal()),
    __param(1, Param('sha256', Sha256Pipe)),
    __param(2, Res({ passthrough: true })),
    __metadata("design:type", Function),
    __metadata("design:paramtypes", [Object, String, Object]),
    __metadata("design:returntype", Promise)
], AttachmentsController.prototype, "head", null);
__decorate([
    Get(':sha256'),
    __param(0, CurrentPrincipal()),
    __param(1, Param('sha256', Sha256Pipe)),
    __param(2, Res({ passthrough: true })),
    __metadata("design:type", Function),
    __metadata("design:paramtypes", [Object, String, Object]),
    __metadata("design:returntype", Promise)
], AttachmentsController.prototype, "get", null);
AttachmentsController = __decorate([
    ApiTags('attachments'),
    ApiBearerAuth(),
    UseGuards(StorageConfiguredGuard),
    Controller('attachments'),
    __metadata("design:paramtypes", [AttachmentsService])
], AttachmentsController);
export { AttachmentsController };
//# sourceMappingURL=attachments.controller.js.map