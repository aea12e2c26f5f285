import 'server-only';
import { getServerSession } from 'next-auth';
import { NextResponse, type NextRequest } from 'next/server';
import { z } from 'zod';
import { loadSessionUser } from '@/db/queries/auth';
import { getAuthOptions } from '@/lib/auth/options';
import { assertPermission, type Permission } from '@/lib/auth/permissions';
import { AppError, type ErrorBody } from './app-error';
import type { Ctx } from './context';
import { fromZod, toAppError } from './errors';
import { clientIp } from './request';
import { ctxFromBearer } from './tokens/bearer-ctx';

type Schema = z.ZodType;
type Out<S> = S extends Schema ? z.output<S> : undefined;

export interface RouteSpec<P extends Schema | undefined, Q extends Schema | undefined, B extends Schema | undefined> {
  /** The permission the caller needs. Every API route names one. */
  permission: Permission;
  params?: P;
  query?: Q;
  body?: B;
}

export interface RouteInput<P, Q, B> {
  params: Out<P>;
  query: Out<Q>;
  body: Out<B>;
  req: NextRequest;
}

type NextContext = { params: Promise<Record<string, string | string[]>> };

export function errorResponse(error: AppError): NextResponse<ErrorBody> {
  const headers: Record<string, string> = {};
  if (error.options.retryAfterSeconds) headers['Retry-After'] = String(error.options.retryAfterSeconds);
  return NextResponse.json(error.toBody(), { status: error.status, headers });
}

function parseWith<S extends Schema | undefined>(schema: S, value: unknown, where: 'params' | 'query' | 'body'): Out<S> {
  if (!schema) return undefined as Out<S>;
  const parsed = schema.safeParse(value);
  if (!parsed.success) throw fromZod(parsed.error, where);
  return parsed.data as Out<S>;
}

async function readJson(req: NextRequest): Promise<unknown> {
  const text = await req.text();
  if (!text) return undefined;
  try {
    return JSON.parse(text);
  } catch {
    throw new AppError('invalid', 'The request body is not valid JSON.', { path: 'body' });
  }
}

async function loadCtx(req: NextRequest): Promise<Ctx> {
  const fromToken = await ctxFromBearer(req); // API tokens (lib/server/tokens), before the cookie
  if (fromToken) return fromToken;
  const session = await getServerSession(getAuthOptions());
  const { id, workspaceId } = session?.user ?? {};
  const user = id && workspaceId ? await loadSessionUser(id, workspaceId) : null;
  if (!user) throw new AppError('unauthenticated', 'Sign in first.');
  return { user, ip: clientIp(req.headers) };
}

/**
 * The one wrapper for route handlers: parse params/query/body with zod → session →
 * roles re-read from the database → permission → handler. Errors answer as
 * `{ error: { code, message, path? } }` with their status.
 */
export function apiRoute<P extends Schema | undefined = undefined, Q extends Schema | undefined = undefined, B extends Schema | undefined = undefined>(
  spec: RouteSpec<P, Q, B>,
  handler: (ctx: Ctx, input: RouteInput<P, Q, B>) => Promise<unknown>,
): (req: NextRequest, context: NextContext) => Promise<Response> {
  return async (req, context) => {
    try {
      const params = parseWith(spec.params as P, await context.params, 'params');
      const query = parseWith(spec.query as Q, Object.fromEntries(req.nextUrl.searchParams), 'query');
      const body = parseWith(spec.body as B, spec.body ? await readJson(req) : undefined, 'body');
      const ctx = await loadCtx(req);
      assertPermission(ctx.user, spec.permission);
      const result = await handler(ctx, { params, query, body, req });
      return result instanceof Response ? result : NextResponse.json(result ?? { ok: true });
    } catch (error) {
      return errorResponse(toAppError(error, `${req.method} ${req.nextUrl.pathname}`));
    }
  };
}
