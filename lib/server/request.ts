/**
 * The client address: the first X-Forwarded-For entry (Next.js fills it from the
 * socket when the request has none). Behind a reverse proxy, the proxy must set it.
 */
export function clientIp(headers: Headers | Record<string, string | string[] | undefined>): string {
  const raw = headers instanceof Headers ? headers.get('x-forwarded-for') : headers['x-forwarded-for'];
  const value = Array.isArray(raw) ? raw[0] : raw;
  const first = value?.split(',')[0]?.trim();
  return first ? first.slice(0, 64) : 'unknown';
}
