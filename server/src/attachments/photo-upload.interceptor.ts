import { BadRequestException, CallHandler, ExecutionContext, Injectable, NestInterceptor, PayloadTooLargeException } from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import type { Observable } from 'rxjs';
import { Env } from '../config/env.js';
import { AppError } from '../common/app-error.js';

export const PHOTO_FIELD = 'file';

/** What the route gets from multer's memory storage. */
export interface UploadedPhoto { buffer: Buffer; size: number }

/**
 * Reads one photo from the multipart field `file` into memory, refusing anything over
 * PHOTO_MAX_MB, and turns multer's refusals into sentences a person can act on.
 */
@Injectable()
export class PhotoUploadInterceptor implements NestInterceptor {
  private readonly multer: NestInterceptor;
  private readonly limitMb: number;

  constructor(env: Env) {
    this.limitMb = env.PHOTO_MAX_MB;
    const Multer = FileInterceptor(PHOTO_FIELD);
    this.multer = new Multer({ limits: { fileSize: env.PHOTO_MAX_MB * 1024 * 1024, files: 1, fields: 10, parts: 11 } });
  }

  async intercept(ctx: ExecutionContext, next: CallHandler): Promise<Observable<unknown>> {
    try {
      return await this.multer.intercept(ctx, next);
    } catch (e) {
      throw this.explain(e);
    }
  }

  private explain(e: unknown): unknown {
    if (e instanceof PayloadTooLargeException) {
      return new AppError(413, 'payload_too_large', `The photo is larger than the ${this.limitMb} MB the server accepts. Choose a smaller photo or a lower camera resolution and send it again.`);
    }
    if (e instanceof BadRequestException) {
      const code = (e.cause as { code?: string } | undefined)?.code;
      const message = code === 'LIMIT_UNEXPECTED_FILE' || code === 'LIMIT_FILE_COUNT'
        ? `Send one photo a request, in the multipart field named "${PHOTO_FIELD}".`
        : `The upload is not a complete multipart form. Send the photo as multipart/form-data in the field "${PHOTO_FIELD}".`;
      return new AppError(400, 'validation_failed', message);
    }
    return e;
  }
}
