import { CanActivate } from '@nestjs/common';
import { PhotoStore } from './storage.service.js';
/** Answers before an upload is read when there is nowhere to keep it. */
export declare class StorageConfiguredGuard implements CanActivate {
    private readonly store;
    constructor(store: PhotoStore);
    canActivate(): boolean;
}
