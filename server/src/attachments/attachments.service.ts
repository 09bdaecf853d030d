import { createHash } from 'node:crypto';
import { Injectable } from '@nestjs/common';
import { AppError } from '../common/app-error.js';
import type { Principal } from '../auth/principal.js';
import { PhotoStore, type StoredObject } from './storage.service.js';
import { PHOTO_TYPES_TEXT, sniffPhotoType } from './sniff.js';

export interface PhotoInfo { sha256: string; size: number; type: string; existed: boolean }

/** Photos are addressed by the SHA-256 of their bytes and kept per club. */
@Injectable()
export class AttachmentsService {
  constructor(private readonly store: PhotoStore) {}

  /** Stores the photo unless the club has it already; a retried upload changes nothing. */
  async upload(p: Principal, sha256: string, bytes: Buffer): Promise<PhotoInfo> {
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
    if (had) return { sha256, size: had.size, type: had.type, existed: true };
    await this.store.put(key, bytes, type);
    return { sha256, size: bytes.length, type, existed: false };
  }

  async head(p: Principal, sha256: string): Promise<StoredObject> {
    return (await this.store.head(photoKey(p.clubId, sha256))) ?? notFound(sha256);
  }

  async open(p: Principal, sha256: string) {
    return (await this.store.get(photoKey(p.clubId, sha256))) ?? notFound(sha256);
  }
}

export const photoKey = (clubId: string, sha256: string) => `clubs/${clubId}/photos/${sha256}`;

function notFound(sha256: string): never {
  throw new AppError(404, 'not_found', `Your club has no photo ${sha256}. It may not have been uploaded yet from the phone that took it.`);
}
