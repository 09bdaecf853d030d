import { HttpException } from '@nestjs/common';
/** Codes the client can switch on; every error body carries one. */
export type ErrorCode = 'validation_failed' | 'invalid_credentials' | 'too_many_attempts' | 'token_expired' | 'unauthorized' | 'forbidden' | 'not_found' | 'conflict' | 'protocol_outdated' | 'payload_too_large' | 'unsupported_media_type' | 'clock_ahead' | 'storage_unavailable' | 'internal_error' | 'mail_unavailable' | 'link_invalid' | 'link_expired' | 'link_used';
export interface FieldProblem {
    field: string;
    message: string;
}
export interface ErrorBody {
    statusCode: number;
    code: ErrorCode;
    message: string;
    details?: FieldProblem[];
}
/** An error with a status, a code and a sentence a person can act on. */
export declare class AppError extends HttpException {
    readonly code: ErrorCode;
    readonly details?: FieldProblem[] | undefined;
    constructor(status: number, code: ErrorCode, message: string, details?: FieldProblem[] | undefined);
}
/** The code an error of this HTTP status carries when nothing more specific applies. */
export declare const CODE_BY_STATUS: Readonly<Record<number, ErrorCode>>;
