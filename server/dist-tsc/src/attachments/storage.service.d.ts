import { OnModuleDestroy } from '@nestjs/common';
import type { Readable } from 'node:stream';
import { Env } from '../config/env.js';
export interface StoredObject {
    size: number;
    type: string;
}
/** Where photo bytes live. A token as well as a contract, so tests and other stores can stand in. */
export declare abstract class PhotoStore {
    abstract readonly configured: boolean;
    abstract put(key: string, body: Buffer, type: string): Promise<void>;
    /** The object's size and type, or null when there is none under the key. */
    abstract head(key: string): Promise<StoredObject | null>;
    abstract get(key: string): Promise<(StoredObject & {
        body: Readable;
    }) | null>;
}
export declare const NOT_CONFIGURED = "Photo storage is not configured on this server, so photos cannot be sent or shown. Your club admin needs to set S3_ENDPOINT and the photo bucket settings.";
/** The photo store reached over the S3 API: the local fake or a real bucket, by settings alone. */
export declare class StorageService extends PhotoStore implements OnModuleDestroy {
    private readonly log;
    private readonly s3;
    private readonly bucket;
    readonly configured: boolean;
    constructor(env: Env);
    put(key: string, body: Buffer, type: string): Promise<void>;
    head(key: string): Promise<StoredObject | null>;
    get(key: string): Promise<{
        size: number;
        type: string;
        body: Readable;
    } | null>;
    onModuleDestroy(): void;
    /** Runs one S3 call; a missing object is null, any other failure a 503 a person can act on. */
    private call;
}
