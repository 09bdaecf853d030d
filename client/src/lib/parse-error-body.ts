import { ApiError, type FieldProblem } from './api-error';

// Used when the body is not our error shape (a proxy's HTML page, an empty 502 ...).
const codeForStatus: Record<number, string> = {
  400: 'validation_failed',
  401: 'unauthorized',
  403: 'forbidden',
  404: 'not_found',
  409: 'conflict',
  413: 'payload_too_large',
  426: 'protocol_outdated',
  429: 'too_many_attempts',
};

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

function readDetails(value: unknown): FieldProblem[] {
  if (!Array.isArray(value)) return [];
  return value.filter(
    (d): d is FieldProblem => isRecord(d) && typeof d.field === 'string' && typeof d.message === 'string',
  );
}

/** Turns any error answer into an ApiError; the server's own message wins when it sent one. */
export function parseErrorBody(status: number, statusText: string, bodyText: string): ApiError {
  let body: unknown;
  try {
    body = bodyText ? JSON.parse(bodyText) : undefined;
  } catch {
    body = undefined;
  }
  if (isRecord(body) && typeof body.code === 'string' && typeof body.message === 'string') {
    return new ApiError(status, body.code, body.message, readDetails(body.details));
  }
  const code = codeForStatus[status] ?? (status >= 500 ? 'internal_error' : 'bad_response');
  const label = statusText ? `${status} ${statusText}` : String(status);
  return new ApiError(status, code, `The server answered ${label}. Try again; if it keeps happening, tell your club admin.`);
}
