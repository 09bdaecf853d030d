import { Injectable, Logger, OnModuleDestroy } from '@nestjs/common';
import { GetObjectCommand, HeadObjectCommand, PutObjectCommand, S3Client, S3ServiceException } from '@aws-sdk/client-s3';
import type { Readable } from 'node:stream';
import { Env } from '../config/env.js';
import { AppError } from '../common/app-error.js';
import { storageSettings } from './storage-settings.js';

export interface StoredObject { size: number; type: string }

/** Where photo bytes live. A token as well as a contract, so tests and other stores can stand in. */
export abstract class PhotoStore {
  abstract readonly configured: boolean;
  abstract put(key: string, body: Buffer, type: string): Promise<void>;
  /** The object's size and type, or null when there is none under the key. */
  abstract head(key: string): Promise<StoredObject | null>;
  abstract get(key: string): Promise<(StoredObject & { body: Readable }) | null>;
}

export const NOT_CONFIGURED = 'Photo storage is not configured on this server, so photos cannot be sent or shown. Your club admin needs to set S3_ENDPOINT and the photo bucket settings.';

const isMissing = (e: unknown) =>
  e instanceof S3ServiceException && (e.$metadata.httpStatusCode === 404 || e.name === 'NotFound' || e.name === 'NoSuchKey');

/** The photo store reached over the S3 API: the local fake or a real bucket, by settings alone. */
@Injectable()
export class StorageService extends PhotoStore implements OnModuleDestroy {
  private readonly log = new Logger('PhotoStore');
  private readonly s3: S3Client | null;
  private readonly bucket: string;
  readonly configured: boolean;

  constructor(env: Env) {
    super();
    const settings = storageSettings(env);
    this.s3 = settings ? new S3Client(settings.client) : null;
    this.bucket = settings?.bucket ?? '';
    this.configured = !!settings;
  }

  async put(key: string, body: Buffer, type: string): Promise<void> {
    await this.call('store', (s3) => s3.send(new PutObjectCommand({ Bucket: this.bucket, Key: key, Body: body, ContentType: type, ContentLength: body.length })));
  }

  async head(key: string): Promise<StoredObject | null> {
    const res = await this.call('look up', (s3) => s3.send(new HeadObjectCommand({ Bucket: this.bucket, Key: key })));
    return res && { size: res.ContentLength ?? 0, type: res.ContentType ?? 'application/octet-stream' };
  }

  async get(key: string) {
    const res = await this.call('read', (s3) => s3.send(new GetObjectCommand({ Bucket: this.bucket, Key: key })));
    if (!res?.Body) return null;
    return { size: res.ContentLength ?? 0, type: res.ContentType ?? 'application/octet-stream', body: res.Body as Readable };
  }

  onModuleDestroy() {
    this.s3?.destroy();
  }

  /** Runs one S3 call; a missing object is null, any other failure a 503 a person can act on. */
  private async call<T>(what: string, fn: (s3: S3Client) => Promise<T>): Promise<T | null> {
    if (!this.s3) throw new AppError(503, 'storage_unavailable', NOT_CONFIGURED);
    try {
      return await fn(this.s3);
    } catch (e) {
      if (isMissing(e) && !(e instanceof S3ServiceException && e.name === 'NoSuchBucket')) return null;
      this.log.error(`Could not ${what} a photo in bucket ${this.bucket}: ${(e as Error).name}: ${(e as Error).message}`);
      throw new AppError(503, 'storage_unavailable', unavailable(e));
    }
  }
}

function unavailable(e: unknown): string {
  const name = (e as Error).name;
  if (name === 'NoSuchBucket') return 'The photo bucket named in S3_BUCKET does not exist in the photo store. Your club admin needs to create it or correct the setting.';
  if (e instanceof S3ServiceException && e.$metadata.httpStatusCode === 403) return 'The photo store refused the server\'s keys. Your club admin needs to check S3_ACCESS_KEY_ID and S3_SECRET_ACCESS_KEY.';
  return 'The photo store cannot be reached just now. Try again in a few minutes; if it keeps happening, tell your club admin.';
}
