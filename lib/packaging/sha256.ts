/**
 * SHA-256 through Web Crypto (`crypto.subtle`), which Node 20, browsers and workers all
 * provide, so packages can be built and checked anywhere the engine runs.
 */

const encoder = new TextEncoder();

export function utf8(text: string): Uint8Array {
  return encoder.encode(text);
}

/** Lower-case hex SHA-256 of the bytes (or of the UTF-8 encoding of a string). */
export async function sha256Hex(data: Uint8Array | string): Promise<string> {
  const bytes = typeof data === 'string' ? utf8(data) : data;
  // Copy into a fresh ArrayBuffer: subtle.digest refuses views over shared or oversized buffers.
  const copy = new Uint8Array(bytes.byteLength);
  copy.set(bytes);
  const digest = await globalThis.crypto.subtle.digest('SHA-256', copy.buffer);
  return Array.from(new Uint8Array(digest), (b) => b.toString(16).padStart(2, '0')).join('');
}
