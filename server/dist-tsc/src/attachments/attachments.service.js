var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
var __metadata = (this && this.__metadata) || function (k, v) {
    if (typeof Reflect === "object" && typeof Reflect.metadata === "function") return Reflect.metadata(k, v);
};
import { createHash } from 'node:crypto';
import { Injectable } from '@nestjs/common';
import { AppError } from '../common/app-error.js';
import { PhotoStore } from './storage.service.js';
import { PHOTO_TYPES_TEXT, sniffPhotoType } from './sniff.js';
/** Photos are addressed by the SHA-256 of their bytes and kept per club. */
let AttachmentsService = class AttachmentsService {
    store;
    constructor(store) {
        this.store = store;
    }
    /** Stores the photo unless the club has it already; a retried upload changes nothing. */
    async upload(p, sha256, bytes) {
        const actual = createHash('sha256').update(bytes).digest('hex');
        if (actual !== sha256) {
            throw new AppError(400, 'validation_failed', `The photo's bytes have SHA-256 ${actual}, not the ${sha256} in the address. The file may have changed or been cut short; send it again under its own hash.`);
        }
        const type = sniffPhotoType(bytes);
        if (!type) {
            throw new AppError(415, 'unsupported_media_type', `This file is not a photo the server accepts: send a ${PHOTO_TYPES_TEXT} image. The type is read from the file's contents, not its name.`);
        }
        const key = photoKey(p.clubId, sha256);
        const had = await this.store.head(key);
        if (had)
            return { sha256, size: had.size, type: had.type, existed: true };
        await this.store.put(key, bytes, type);
        return { sha256, size: bytes.length, type, existed: false };
    }
    async head(p, sha256) {
        return (await this.store.head(photoKey(p.clubId, sha256))) ?? notFound(sha256);
    }
    async open(p, sha256) {
        return (await this.store.get(photoKey(p.clubId, sha256))) ?? notFound(sha256);
    }
};
AttachmentsService = __decorate([
    Injectable(),
    __metadata("design:paramtypes", [PhotoStore])
], AttachmentsService);
export { AttachmentsService };
export const photoKey = (clubId, sha256) => `clubs/${clubId}/photos/${sha256}`;
function notFound(sha256) {
    throw new AppError(404, 'not_found', `Your club has no photo ${sha256}. It may not have been uploaded yet from the phone that took it.`);
}
//# sourceMappingURL=attachments.service.js.map