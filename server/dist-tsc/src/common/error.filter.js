var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
var __metadata = (this && this.__metadata) || function (k, v) {
    if (typeof Reflect === "object" && typeof Reflect.metadata === "function") return Reflect.metadata(k, v);
};
import { Catch, HttpException, HttpStatus, Logger } from '@nestjs/common';
import { AppError, CODE_BY_STATUS } from './app-error.js';
const PLAIN = {
    401: 'Sign in to continue.', 403: 'Your role in this club does not allow this.',
    404: 'Nothing was found at this address.',
};
/** Turns every error into the one body shape `{ statusCode, code, message, details? }`. */
let ErrorFilter = class ErrorFilter {
    bodyLimitMb;
    log = new Logger('Error');
    constructor(bodyLimitMb) {
        this.bodyLimitMb = bodyLimitMb;
    }
    catch(err, host) {
        const res = host.switchToHttp().getResponse();
        const body = this.body(err);
        res.status(body.statusCode).json(body);
    }
    body(err) {
        if (err instanceof AppError)
            return err.getResponse();
        if (err instanceof HttpException) {
            const status = err.getStatus();
            const raw = err.getResponse();
            const msg = typeof raw === 'string' ? raw : raw.message;
            if (status === 413)
                return this.tooLarge();
            // The JSON body parser's failure reaches here as a 400 carrying the parser's own words.
            if (status === 400 && typeof msg === 'string' && (msg === 'Bad Request' || /JSON/.test(msg)))
                return { statusCode: 400, code: 'validation_failed', message: 'The request body is not valid JSON.' };
            const message = PLAIN[status] ?? (typeof msg === 'string' ? msg : err.message);
            return { statusCode: status, code: CODE_BY_STATUS[status] ?? 'internal_error', message };
        }
        const { status, limit } = err;
        if (status === 413)
            return this.tooLarge(limit);
        if (status === 415)
            return { statusCode: 415, code: 'unsupported_media_type', message: 'The request body is in an encoding the server does not accept; send JSON, plain or gzip.' };
        if (status === 400)
            return { statusCode: 400, code: 'validation_failed', message: 'The request body is not valid JSON.' };
        this.log.error(err instanceof Error ? err.stack : String(err));
        return { statusCode: HttpStatus.INTERNAL_SERVER_ERROR, code: 'internal_error', message: 'Something went wrong on the server. Try again; if it keeps happening, tell your club admin.' };
    }
    tooLarge(limitBytes) {
        const mb = limitBytes ? Math.round(limitBytes / 1048576) : this.bodyLimitMb;
        const limit = mb ? ` (${mb} MB)` : '';
        return { statusCode: 413, code: 'payload_too_large', message: `The request is larger than the server accepts${limit}. Send fewer changes at a time.` };
    }
};
ErrorFilter = __decorate([
    Catch(),
    __metadata("design:paramtypes", [Number])
], ErrorFilter);
export { ErrorFilter };
//# sourceMappingURL=error.filter.js.map