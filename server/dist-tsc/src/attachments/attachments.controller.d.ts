import { StreamableFile } from '@nestjs/common';
import type { Response } from 'express';
import { type Principal } from '../auth/principal.js';
import { AttachmentsService, type PhotoInfo } from './attachments.service.js';
import { type UploadedPhoto } from './photo-upload.interceptor.js';
/** Photos of the caller's club, content-addressed by SHA-256; the club comes from the sign-in. */
export declare class AttachmentsController {
    private readonly photos;
    constructor(photos: AttachmentsService);
    upload(p: Principal, sha256: string, file: UploadedPhoto | undefined, res: Response): Promise<PhotoInfo>;
    /** Lets a phone skip sending a photo the server already keeps. */
    head(p: Principal, sha256: string, res: Response): Promise<void>;
    get(p: Principal, sha256: string, res: Response): Promise<StreamableFile>;
}
