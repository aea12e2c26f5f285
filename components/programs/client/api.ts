'use client';
/**
 * Browser side of the JSON API: one fetch helper that turns the server's
 * `{ error: { code, message, path } }` into an ApiError the forms and toasts use.
 * Shared by the machine, probe, part and program screens.
 */
export class ApiError extends Error {
  constructor(readonly status: number, readonly code: string, message: string, readonly path?: string, readonly body?: unknown) {
    super(message);
    this.name = 'ApiError';
  }
}

export async function api<T>(url: string, init: { method?: string; body?: unknown } = {}): Promise<T> {
  const res = await fetch(url, {
    method: init.method ?? (init.body === undefined ? 'GET' : 'POST'),
    headers: init.body === undefined ? undefined : { 'Content-Type': 'application/json' },
    body: init.body === undefined ? undefined : JSON.stringify(init.body),
    credentials: 'same-origin',
  });
  const text = await res.text();
  let data: unknown;
  try { data = text ? JSON.parse(text) : undefined; } catch { data = text; }
  if (!res.ok) {
    const err = (data as { error?: { code?: string; message?: string; path?: string } } | undefined)?.error;
    throw new ApiError(res.status, err?.code ?? 'error', err?.message ?? `The server answered ${res.status}.`, err?.path, data);
  }
  return data as T;
}

/** The form field an API error names ("body.rotaries.0.min" → "rotaries.0.min"). */
export function fieldOfError(error: unknown): string | null {
  if (!(error instanceof ApiError) || !error.path) return null;
  return error.path.replace(/^(body|params|query)\.?/, '') || null;
}

export const errorMessage = (error: unknown) => (error instanceof Error ? error.message : 'Something went wrong.');
