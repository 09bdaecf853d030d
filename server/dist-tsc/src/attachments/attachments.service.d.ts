import type { Principal } from '../auth/principal.js';
import { PhotoStore, type StoredObject } from './storage.service.js';
export interface PhotoInfo {
    sha256: string;
    size: number;
    type: string;
    existed: boolean;
}
/** Photos are addressed by the SHA-256 of their bytes and kept per club. */
export declare class AttachmentsService {
    private readonly store;
    constructor(store: PhotoStore);
    /** Stores the photo unless the club has it already; a retried upload changes nothing. */
    upload(p: Principal, sha256: string, bytes: Buffer): Promise<PhotoInfo>;
    head(p: Principal, sha256: string): Promise<StoredObject>;
    open(p: Principal, sha256: string): Promise<StoredObject & {
        body: import("stream").Readable;
    }>;
}
export declare const photoKey: (clubId: string, sha256: string) => string;
