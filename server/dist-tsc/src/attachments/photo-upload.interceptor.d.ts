import { CallHandler, ExecutionContext, NestInterceptor } from '@nestjs/common';
import type { Observable } from 'rxjs';
import { Env } from '../config/env.js';
export declare const PHOTO_FIELD = "file";
/** What the route gets from multer's memory storage. */
export interface UploadedPhoto {
    buffer: Buffer;
    size: number;
}
/**
 * Reads one photo from the multipart field `file` into memory, refusing anything over
 * PHOTO_MAX_MB, and turns multer's refusals into sentences a person can act on.
 */
export declare class PhotoUploadInterceptor implements NestInterceptor {
    private readonly multer;
    private readonly limitMb;
    constructor(env: Env);
    intercept(ctx: ExecutionContext, next: CallHandler): Promise<Observable<unknown>>;
    private explain;
}
