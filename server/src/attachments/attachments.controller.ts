import { Controller, Get, Head, HttpStatus, Param, Put, Res, StreamableFile, UploadedFile, UseGuards, UseInterceptors } from '@nestjs/common';
import { ApiBearerAuth, ApiBody, ApiConsumes, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { AppError } from '../common/app-error.js';
import { CurrentPrincipal, type Principal } from '../auth/principal.js';
import { AttachmentsService, type PhotoInfo } from './attachments.service.js';
import { PHOTO_FIELD, PhotoUploadInterceptor, type UploadedPhoto } from './photo-upload.interceptor.js';
import { Sha256Pipe } from './sha256.pipe.js';
import { StorageConfiguredGuard } from './storage-configured.guard.js';

// A photo's address is its hash, so what it names never changes; private because it needs sign-in.
const IMMUTABLE = 'private, max-age=31536000, immutable';

/** Photos of the caller's club, content-addressed by SHA-256; the club comes from the sign-in. */
@ApiTags('attachments')
@ApiBearerAuth()
@UseGuards(StorageConfiguredGuard)
@Controller('attachments')
export class AttachmentsController {
  constructor(private readonly photos: AttachmentsService) {}

  @Put(':sha256')
  @UseInterceptors(PhotoUploadInterceptor)
  @ApiConsumes('multipart/form-data')
  @ApiBody({ schema: { type: 'object', required: [PHOTO_FIELD], properties: { [PHOTO_FIELD]: { type: 'string', format: 'binary' } } } })
  async upload(
    @CurrentPrincipal() p: Principal,
    @Param('sha256', Sha256Pipe) sha256: string,
    @UploadedFile() file: UploadedPhoto | undefined,
    @Res({ passthrough: true }) res: Response,
  ): Promise<PhotoInfo> {
    if (!file) throw new AppError(400, 'validation_failed', `No photo came with the request. Send it as multipart/form-data in the field "${PHOTO_FIELD}".`);
    const info = await this.photos.upload(p, sha256, file.buffer);
    res.status(info.existed ? HttpStatus.OK : HttpStatus.CREATED);
    return info;
  }

  // Declared before GET: Express would otherwise answer HEAD with the GET route.
  /** Lets a phone skip sending a photo the server already keeps. */
  @Head(':sha256')
  async head(@CurrentPrincipal() p: Principal, @Param('sha256', Sha256Pipe) sha256: string, @Res({ passthrough: true }) res: Response): Promise<void> {
    const found = await this.photos.head(p, sha256);
    res.setHeader('Content-Type', found.type);
    res.setHeader('Content-Length', String(found.size));
  }

  @Get(':sha256')
  async get(@CurrentPrincipal() p: Principal, @Param('sha256', Sha256Pipe) sha256: string, @Res({ passthrough: true }) res: Response): Promise<StreamableFile> {
    const photo = await this.photos.open(p, sha256);
    res.setHeader('Cache-Control', IMMUTABLE);
    return new StreamableFile(photo.body, { type: photo.type, length: photo.size });
  }
}
