/**
 * Unexpected-but-known failures, thrown anywhere on the server and turned into a
 * status and a JSON body (`{ error: { code, message, path? } }`) by the wrappers.
 * `message` is written for the person; details go to the log only.
 */
export const ERROR_STATUS = {
  invalid: 400,
  unauthenticated: 401,
  forbidden: 403,
  'not-found': 404,
  conflict: 409,
  throttled: 429,
  internal: 500,
  unavailable: 503,
} as const;

export type ErrorCode = keyof typeof ERROR_STATUS;

export interface ErrorBody {
  error: { code: ErrorCode; message: string; path?: string };
}

export class AppError extends Error {
  readonly status: number;

  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly options: { path?: string; retryAfterSeconds?: number } = {},
  ) {
    super(message);
    this.name = 'AppError';
    this.status = ERROR_STATUS[code];
  }

  toBody(): ErrorBody {
    return { error: { code: this.code, message: this.message, ...(this.options.path ? { path: this.options.path } : {}) } };
  }
}

export function isAppError(value: unknown): value is AppError {
  return value instanceof AppError;
}

/** A MariaDB duplicate-key error (unique index), as mysql2 reports it. */
export function isDuplicateKey(error: unknown): boolean {
  const cause = error instanceof Error && 'cause' in error ? error.cause : undefined;
  return [error, cause].some((e) => typeof e === 'object' && e !== null && 'code' in e && e.code === 'ER_DUP_ENTRY');
}
