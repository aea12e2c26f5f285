import 'server-only';
import { ZodError } from 'zod';
import { AppError } from './app-error';

const DB_DOWN_CODES = new Set(['ECONNREFUSED', 'PROTOCOL_CONNECTION_LOST', 'ETIMEDOUT', 'ECONNRESET', 'ER_CON_COUNT_ERROR', 'EPIPE']);

/** The driver's error code (e.g. ECONNREFUSED), looking through drizzle's wrapping `cause`. */
export function driverErrorCode(error: unknown): string | null {
  for (let e: unknown = error, depth = 0; e && depth < 4; depth += 1) {
    if (typeof e === 'object' && 'code' in e && typeof e.code === 'string') return e.code;
    e = typeof e === 'object' && 'cause' in e ? e.cause : undefined;
  }
  return null;
}

/** True when the error means the database cannot be reached (not a bad query). */
export function isDatabaseDown(error: unknown): boolean {
  const code = driverErrorCode(error);
  return code !== null && DB_DOWN_CODES.has(code);
}

/** Turns a zod failure into a 400 naming the first bad field. */
export function fromZod(error: ZodError, where: 'body' | 'query' | 'params' | 'input'): AppError {
  const issue = error.issues[0];
  const path = issue?.path.map(String).join('.') ?? '';
  const message = issue ? `${path ? `${path}: ` : ''}${issue.message}` : 'The request is not valid.';
  return new AppError('invalid', message, { path: path ? `${where}.${path}` : where });
}

/** Any thrown value → AppError; unknown errors are logged here and shown only as a generic message. */
export function toAppError(error: unknown, label: string): AppError {
  if (error instanceof AppError) return error;
  if (error instanceof ZodError) return fromZod(error, 'input');
  if (isDatabaseDown(error)) {
    console.error(`[${label}] database unreachable:`, error instanceof Error ? error.message : error);
    return new AppError('unavailable', 'The database is not answering. Try again in a moment.');
  }
  console.error(`[${label}] unexpected error:`, error);
  return new AppError('internal', 'Something went wrong on our side. It has been logged; try again or tell your admin.');
}
