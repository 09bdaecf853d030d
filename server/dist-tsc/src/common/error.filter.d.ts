import { ArgumentsHost, ExceptionFilter } from '@nestjs/common';
import { type ErrorBody } from './app-error.js';
/** Turns every error into the one body shape `{ statusCode, code, message, details? }`. */
export declare class ErrorFilter implements ExceptionFilter {
    private readonly bodyLimitMb?;
    private readonly log;
    constructor(bodyLimitMb?: number | undefined);
    catch(err: unknown, host: ArgumentsHost): void;
    body(err: unknown): ErrorBody;
    private tooLarge;
}
