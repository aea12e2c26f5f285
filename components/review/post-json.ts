/** Calls one of our JSON route handlers and turns an error body into a message for a toast. */
export type ApiOutcome<T> = { ok: true; data: T } | { ok: false; status: number; message: string; path?: string };

export async function postJson<T>(url: string, body?: unknown): Promise<ApiOutcome<T>> {
  let res: Response;
  try {
    res = await fetch(url, {
      method: 'POST',
      headers: body === undefined ? undefined : { 'Content-Type': 'application/json' },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  } catch {
    return { ok: false, status: 0, message: 'The server could not be reached. Check the connection and try again.' };
  }
  const json: unknown = await res.json().catch(() => null);
  if (res.ok) return { ok: true, data: json as T };
  const err = (json as { error?: { message?: string; path?: string } } | null)?.error;
  return { ok: false, status: res.status, message: err?.message ?? `The request failed (HTTP ${res.status}).`, path: err?.path };
}
