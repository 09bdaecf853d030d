import type { FieldError } from '@breakline/sync-protocol';

export type LocalWriteErrorCode = 'invalid' | 'forbidden' | 'not-found';

/** A change this phone refused before saving anything; `fields` carry one message a field. */
export class LocalWriteError extends Error {
  constructor(
    readonly code: LocalWriteErrorCode,
    message: string,
    readonly fields: readonly FieldError[] = [],
  ) {
    super(message);
    this.name = 'LocalWriteError';
  }

  /** The message for one form field, if there is one. */
  fieldMessage(field: string): string | undefined {
    return this.fields.find((f) => f.field === field)?.message;
  }
}

export function isLocalWriteError(error: unknown, code?: LocalWriteErrorCode): error is LocalWriteError {
  return error instanceof LocalWriteError && (code === undefined || error.code === code);
}
