import { ArgumentsHost, Catch, ExceptionFilter, HttpException, HttpStatus, Logger } from '@nestjs/common';
import type { Response } from 'express';
import { AppError, CODE_BY_STATUS, type ErrorBody } from './app-error.js';

const PLAIN: Record<number, string> = {
  401: 'Sign in to continue.', 403: 'Your role in this club does not allow this.',
  404: 'Nothing was found at this address.',
};

/** Turns every error into the one body shape `{ statusCode, code, message, details? }`. */
@Catch()
export class ErrorFilter implements ExceptionFilter {
  private readonly log = new Logger('Error');

  constructor(private readonly bodyLimitMb?: number) {}

  catch(err: unknown, host: ArgumentsHost) {
    const res = host.switchToHttp().getResponse<Response>();
    const body = this.body(err);
    res.status(body.statusCode).json(body);
  }

  body(err: unknown): ErrorBody {
    if (err instanceof AppError) return err.getResponse() as ErrorBody;
    if (err instanceof HttpException) {
      const status = err.getStatus();
      const raw = err.getResponse();
      const msg = typeof raw === 'string' ? raw : (raw as { message?: unknown }).message;
      if (status === 413) return this.tooLarge();
      // The JSON body parser's failure reaches here as a 400 carrying the parser's own words.
      if (status === 400 && typeof msg === 'string' && (msg === 'Bad Request' || /JSON/.test(msg))) return { statusCode: 400, code: 'validation_failed', message: 'The request body is not valid JSON.' };
      const message = PLAIN[status] ?? (typeof msg === 'string' ? msg : err.message);
      return { statusCode: status, code: CODE_BY_STATUS[status] ?? 'internal_error', message };
    }
    // PostgreSQL refuses the NUL character in text (22021) and in JSON (22P05); the sync rules
    // refuse it before it gets here, and any other form's text is answered the same way.
    const pgCode = (err as { code?: unknown }).code;
    if (pgCode === '22021' || pgCode === '22P05') {
      return { statusCode: 400, code: 'validation_failed', message: 'Some text holds an invisible control character (NUL) that cannot be saved; retype it or paste it again as plain text.' };
    }
    const { status, limit } = err as { status?: number; limit?: number };
    if (status === 413) return this.tooLarge(limit);
    if (status === 415) return { statusCode: 415, code: 'unsupported_media_type', message: 'The request body is in an encoding the server does not accept; send JSON, plain or gzip.' };
    if (status === 400) return { statusCode: 400, code: 'validation_failed', message: 'The request body is not valid JSON.' };
    this.log.error(err instanceof Error ? err.stack : String(err));
    return { statusCode: HttpStatus.INTERNAL_SERVER_ERROR, code: 'internal_error', message: 'Something went wrong on the server. Try again; if it keeps happening, tell your club admin.' };
  }

  private tooLarge(limitBytes?: number): ErrorBody {
    const mb = limitBytes ? Math.round(limitBytes / 1048576) : this.bodyLimitMb;
    const limit = mb ? ` (${mb} MB)` : '';
    return { statusCode: 413, code: 'payload_too_large', message: `The request is larger than the server accepts${limit}. Send fewer changes at a time.` };
  }
}
