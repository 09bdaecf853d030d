/** The error codes the server sends, plus two the client makes up for itself. */
export type ApiErrorCode =
  | 'validation_failed'
  | 'invalid_credentials'
  | 'too_many_attempts'
  | 'token_expired'
  | 'unauthorized'
  | 'forbidden'
  | 'not_found'
  | 'conflict'
  | 'protocol_outdated'
  | 'payload_too_large'
  | 'internal_error'
  | 'network_error' // the request never got an answer (offline, DNS, server down)
  | 'bad_response'; // an answer that is not the shape we agreed on

export interface FieldProblem {
  field: string;
  message: string;
}

export class ApiError extends Error {
  readonly status: number;
  /** A code from ApiErrorCode, or a newer one this client does not know yet. */
  readonly code: ApiErrorCode | (string & {});
  readonly details: FieldProblem[];

  constructor(status: number, code: ApiError['code'], message: string, details: FieldProblem[] = []) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.code = code;
    this.details = details;
  }

  /** The server's message for one form field, if it sent one. */
  fieldMessage(field: string): string | undefined {
    return this.details.find((d) => d.field === field)?.message;
  }
}

export function isApiError(error: unknown, code?: ApiError['code']): error is ApiError {
  return error instanceof ApiError && (code === undefined || error.code === code);
}
