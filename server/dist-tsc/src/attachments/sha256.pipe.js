var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
import { Injectable } from '@nestjs/common';
import { AppError } from '../common/app-error.js';
/** A photo's address is the hex SHA-256 of its bytes; case does not matter, lower case is kept. */
let Sha256Pipe = class Sha256Pipe {
    transform(value) {
        if (/^[0-9a-fA-F]{64}$/.test(value))
            return value.toLowerCase();
        throw new AppError(400, 'validation_failed', `"${value.slice(0, 80)}" is not a photo address: it must be the 64 hexadecimal digits of the photo's SHA-256.`);
    }
};
Sha256Pipe = __decorate([
    Injectable()
], Sha256Pipe);
export { Sha256Pipe };
//# sourceMappingURL=sha256.pipe.js.map