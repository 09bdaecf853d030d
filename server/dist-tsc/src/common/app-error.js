import { HttpException } from '@nestjs/common';
/** An error with a status, a code and a sentence a person can act on. */
export class AppError extends HttpException {
    code;
    details;
    constructor(status, code, message, details) {
        super({ statusCode: status, code, message, ...(details ? { details } : {}) }, status);
        this.code = code;
        this.details = details;
    }
}
/** The code an error of this HTTP status carries when nothing more specific applies. */
export const CODE_BY_STATUS = {
    400: 'validation_failed', 401: 'unauthorized', 403: 'forbidden', 404: 'not_found',
    409: 'conflict', 413: 'payload_too_large', 415: 'unsupported_media_type', 426: 'protocol_outdated',
    429: 'too_many_attempts', 503: 'storage_unavailable',
};
//# sourceMappingURL=app-error.js.map