var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
import { Injectable } from '@nestjs/common';
/**
 * Passes a body through untouched: sync bodies are checked by sync-protocol's own schemas, so the
 * global class-validator pipe (which needs a DTO class) must not strip them.
 */
let RawBody = class RawBody {
    transform(value) {
        return value;
    }
};
RawBody = __decorate([
    Injectable()
], RawBody);
export { RawBody };
//# sourceMappingURL=raw-body.js.map