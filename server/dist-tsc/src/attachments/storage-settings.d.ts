import type { S3ClientConfig } from '@aws-sdk/client-s3';
import type { Env } from '../config/env.js';
export interface StorageSettings {
    bucket: string;
    client: S3ClientConfig;
}
/** How to reach the photo bucket, or null when photo storage is not configured. */
export declare function storageSettings(env: Env): StorageSettings | null;
