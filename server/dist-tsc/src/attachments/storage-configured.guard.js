var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
var __metadata = (this && this.__metadata) || function (k, v) {
    if (typeof Reflect === "object" && typeof Reflect.metadata === "function") return Reflect.metadata(k, v);
};
import { Injectable } from '@nestjs/common';
import { AppError } from '../common/app-error.js';
import { NOT_CONFIGURED, PhotoStore } from './storage.service.js';
/** Answers before an upload is read when there is nowhere to keep it. */
let StorageConfiguredGuard = class StorageConfiguredGuard {
    store;
    constructor(store) {
        this.store = store;
    }
    canActivate() {
        if (this.store.configured)
            return true;
        throw new AppError(503, 'storage_unavailable', NOT_CONFIGURED);
    }
};
StorageConfiguredGuard = __decorate([
    Injectable(),
    __metadata("design:paramtypes", [PhotoStore])
], StorageConfiguredGuard);
export { StorageConfiguredGuard };
//# sourceMappingURL=storage-configured.guard.js.map