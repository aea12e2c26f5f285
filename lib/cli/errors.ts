/**
 * The contract's error object (spec/engine-cli.md): `{"error": {"code", "message", "path"}}`.
 * `zodToError` turns a zod error into one (code VALIDATION, the first issue in words,
 * path like `machine.rotaries[0].direction`) so every command reports the same way.
 */
import type { z } from 'zod';
import { GeometryError } from '../geometry/vec3';

export interface ErrorObject { error: { code: string; message: string; path: string } }

export const errorObject = (code: string, message: string, path = ''): ErrorObject => ({ error: { code, message, path } });

export const isErrorObject = (v: unknown): v is ErrorObject =>
  typeof v === 'object' && v !== null && 'error' in v && typeof (v as ErrorObject).error?.code === 'string';

/** `['machine', 'rotaries', 0, 'direction']` → `machine.rotaries[0].direction`. */
export function formatPath(path: readonly PropertyKey[], prefix = ''): string {
  let out = prefix;
  for (const k of path) {
    if (typeof k === 'number') out += `[${k}]`;
    else out += out ? `.${String(k)}` : String(k);
  }
  return out;
}

export function zodToError(err: z.ZodError, prefix = ''): ErrorObject {
  const issue = err.issues[0];
  if (!issue) return errorObject('VALIDATION', 'invalid input', prefix);
  const path = formatPath(issue.path, prefix);
  const more = err.issues.length > 1 ? ` (and ${err.issues.length - 1} more problem${err.issues.length > 2 ? 's' : ''})` : '';
  return errorObject('VALIDATION', `${path || 'input'}: ${issue.message}${more}`, path);
}

/** Validates with a zod schema, or throws the error object (caught by the runner). */
export function parseOrThrow<S extends z.ZodType>(schema: S, input: unknown, prefix = ''): z.infer<S> {
  const r = schema.safeParse(input);
  if (!r.success) throw new CommandError(zodToError(r.error, prefix));
  return r.data;
}

/** An expected failure carrying its error object. */
export class CommandError extends Error {
  constructor(readonly body: ErrorObject) {
    super(body.error.message);
  }
}

/** Expected failures (validation, geometry) → error object; anything else is rethrown as an internal fault. */
export function toErrorObject(e: unknown): ErrorObject {
  if (e instanceof CommandError) return e.body;
  if (e instanceof GeometryError) return errorObject(e.code, e.message, e.path ?? '');
  throw e;
}
