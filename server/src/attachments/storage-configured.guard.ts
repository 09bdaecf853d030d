import { CanActivate, Injectable } from '@nestjs/common';
import { AppError } from '../common/app-error.js';
import { NOT_CONFIGURED, PhotoStore } from './storage.service.js';

/** Answers before an upload is read when there is nowhere to keep it. */
@Injectable()
export class StorageConfiguredGuard implements CanActivate {
  constructor(private readonly store: PhotoStore) {}

  canActivate(): boolean {
    if (this.store.configured) return true;
    throw new AppError(503, 'storage_unavailable', NOT_CONFIGURED);
  }
}
