import 'server-only';
import { headers } from 'next/headers';
import { z } from 'zod';
import { assertPermission, type Permission } from '@/lib/auth/permissions';
import type { ErrorCode } from './app-error';
import { AppError } from './app-error';
import type { Ctx } from './context';
import { toAppError } from './errors';
import { clientIp } from './request';
import { getSessionUser } from './session';

export type ActionResult<T> =
  | { ok: true; data: T }
  | { ok: false; code: ErrorCode; message: string; fieldErrors?: Record<string, string> };

function fieldErrorsOf(error: z.ZodError): Record<string, string> {
  const out: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.map(String).join('.') || 'form';
    out[key] ??= issue.message;
  }
  return out;
}

/** A zod refusal as action data: every field's message beside it. */
function invalidResult(error: z.ZodError): ActionResult<never> {
  return { ok: false, code: 'invalid', message: 'Some fields need attention.', fieldErrors: fieldErrorsOf(error) };
}

/** Any thrown error as action data (typed AppErrors keep their code, message and field). */
function failureResult(error: unknown): ActionResult<never> {
  const e = toAppError(error, 'action');
  return { ok: false, code: e.code, message: e.message, ...(e.options.path ? { fieldErrors: { [e.options.path]: e.message } } : {}) };
}

/**
 * The one wrapper for server actions: zod parse → session → roles re-read from the
 * database → permission → run. Expected failures come back as data
 * (`{ ok: false, fieldErrors, message }`), never as a thrown error.
 */
export function authedAction<S extends z.ZodType, T>(
  spec: { permission: Permission; input: S },
  run: (ctx: Ctx, input: z.output<S>) => Promise<T>,
): (raw: z.input<S>) => Promise<ActionResult<T>> {
  return async (raw) => {
    const parsed = spec.input.safeParse(raw);
    if (!parsed.success) return invalidResult(parsed.error);
    try {
      const user = await getSessionUser();
      if (!user) throw new AppError('unauthenticated', 'Your session has ended. Sign in again.');
      assertPermission(user, spec.permission);
      const ctx: Ctx = { user, ip: clientIp(await headers()) };
      return { ok: true, data: await run(ctx, parsed.data) };
    } catch (error) {
      return failureResult(error);
    }
  };
}

/** For the few actions open to the signed-out (accepting an invitation): parse → run. */
export function publicAction<S extends z.ZodType, T>(
  spec: { input: S },
  run: (input: z.output<S>, ip: string) => Promise<T>,
): (raw: z.input<S>) => Promise<ActionResult<T>> {
  return async (raw) => {
    const parsed = spec.input.safeParse(raw);
    if (!parsed.success) return invalidResult(parsed.error);
    try {
      return { ok: true, data: await run(parsed.data, clientIp(await headers())) };
    } catch (error) {
      return failureResult(error);
    }
  };
}
