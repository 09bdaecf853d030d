var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
var __metadata = (this && this.__metadata) || function (k, v) {
    if (typeof Reflect === "object" && typeof Reflect.metadata === "function") return Reflect.metadata(k, v);
};
import { Injectable, Logger } from '@nestjs/common';
import { GetObjectCommand, HeadObjectCommand, PutObjectCommand, S3Client, S3ServiceException } from '@aws-sdk/client-s3';
import { Env } from '../config/env.js';
import { AppError } from '../common/app-error.js';
import { storageSettings } from './storage-settings.js';
/** Where photo bytes live. A token as well as a contract, so tests and other stores can stand in. */
export class PhotoStore {
}
export const NOT_CONFIGURED = 'Photo storage is not configured on this server, so photos cannot be sent or shown. Your club admin needs to set S3_ENDPOINT and the photo bucket settings.';
const isMissing = (e) => e instanceof S3ServiceException && (e.$metadata.httpStatusCode === 404 || e.name === 'NotFound' || e.name === 'NoSuchKey');
/** The photo store reached over the S3 API: the local fake or a real bucket, by settings alone. */
let StorageService = class StorageService extends PhotoStore {
    log = new Logger('PhotoStore');
    s3;
    bucket;
    configured;
    constructor(env) {
        super();
        const settings = storageSettings(env);
        this.s3 = settings ? new S3Client(settings.client) : null;
        this.bucket = settings?.bucket ?? '';
        this.configured = !!settings;
    }
    async put(key, body, type) {
        await this.call('store', (s3) => s3.send(new PutObjectCommand({ Bucket: this.bucket, Key: key, Body: body, ContentType: type, ContentLength: body.length })));
    }
    async head(key) {
        const res = await this.call('look up', (s3) => s3.send(new HeadObjectCommand({ Bucket: this.bucket, Key: key })));
        return res && { size: res.ContentLength ?? 0, type: res.ContentType ?? 'application/octet-stream' };
    }
    async get(key) {
        const res = await this.call('read', (s3) => s3.send(new GetObjectCommand({ Bucket: this.bucket, Key: key })));
        if (!res?.Body)
            return null;
        return { size: res.ContentLength ?? 0, type: res.ContentType ?? 'application/octet-stream', body: res.Body };
    }
    onModuleDestroy() {
        this.s3?.destroy();
    }
    /** Runs one S3 call; a missing object is null, any other failure a 503 a person can act on. */
    async call(what, fn) {
        if (!this.s3)
            throw new AppError(503, 'storage_unavailable', NOT_CONFIGURED);
        try {
            return await fn(this.s3);
        }
        catch (e) {
            if (isMissing(e) && !(e instanceof S3ServiceException && e.name === 'NoSuchBucket'))
                return null;
            this.log.error(`Could not ${what} a photo in bucket ${this.bucket}: ${e.name}: ${e.message}`);
            throw new AppError(503, 'storage_unavailable', unavailable(e));
        }
    }
};
StorageService = __decorate([
    Injectable(),
    __metadata("design:paramtypes", [Env])
], StorageService);
export { StorageService };
function unavailable(e) {
    const name = e.name;
    if (name === 'NoSuchBucket')
        return 'The photo bucket named in S3_BUCKET does not exist in the photo store. Your club admin needs to create it or correct the setting.';
    if (e instanceof S3ServiceException && e.$metadata.httpStatusCode === 403)
        return 'The photo store refused the server\'s keys. Your club admin needs to check S3_ACCESS_KEY_ID and S3_SECRET_ACCESS_KEY.';
    return 'The photo store cannot be reached just now. Try again in a few minutes; if it keeps happening, tell your club admin.';
}
//# sourceMappingURL=storage.service.js.map