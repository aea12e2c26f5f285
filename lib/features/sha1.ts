/**
 * SHA-1 (FIPS 180-4, "Secure Hash Standard", NIST 2015, §5.1.1 padding, §6.1.2
 * computation) on a caller's state and buffers, for the name-based touch-point uuids:
 * many short names that share a long prefix, so the prefix's whole blocks are hashed
 * once and each name only finishes the hash from that intermediate state
 * (touch-point-uuid.ts). node:crypto can copy a hash in progress too, but its copy,
 * update and digest calls cost several times this whole hash of one block.
 * SHA-1 serves here as RFC 9562 version 5 prescribes it, to name things, not to protect them.
 */

/** The five 32-bit words H0…H4 of a hash in progress. */
export type Sha1State = Int32Array;

/** FIPS 180-4 §5.3.1: sets `h` to the initial hash value (a new state without `h`). */
export function sha1Init(h: Sha1State = new Int32Array(5)): Sha1State {
  h[0] = 0x67452301;
  h[1] = 0xefcdab89 | 0;
  h[2] = 0x98badcfe | 0;
  h[3] = 0x10325476;
  h[4] = 0xc3d2e1f0 | 0;
  return h;
}

const W = new Int32Array(80);

/** FIPS 180-4 §6.1.2: folds the 64-byte block at `offset` of `bytes` into `h`. */
export function sha1Block(h: Sha1State, bytes: Uint8Array, offset: number): void {
  for (let t = 0; t < 16; t++) {
    const i = offset + 4 * t;
    W[t] = (bytes[i]! << 24) | (bytes[i + 1]! << 16) | (bytes[i + 2]! << 8) | bytes[i + 3]!;
  }
  for (let t = 16; t < 80; t++) {
    const x = W[t - 3]! ^ W[t - 8]! ^ W[t - 14]! ^ W[t - 16]!;
    W[t] = (x << 1) | (x >>> 31);
  }
  let a = h[0]!;
  let b = h[1]!;
  let c = h[2]!;
  let d = h[3]!;
  let e = h[4]!;
  // four rounds of 20 steps, each with its own function f_t and constant K_t (§4.1.1, §4.2.1)
  let t = 0;
  for (; t < 20; t++) {
    const temp = (((a << 5) | (a >>> 27)) + ((b & c) | (~b & d)) + e + 0x5a827999 + W[t]!) | 0;
    e = d; d = c; c = (b << 30) | (b >>> 2); b = a; a = temp;
  }
  for (; t < 40; t++) {
    const temp = (((a << 5) | (a >>> 27)) + (b ^ c ^ d) + e + 0x6ed9eba1 + W[t]!) | 0;
    e = d; d = c; c = (b << 30) | (b >>> 2); b = a; a = temp;
  }
  for (; t < 60; t++) {
    const temp = (((a << 5) | (a >>> 27)) + ((b & c) | (b & d) | (c & d)) + e + 0x8f1bbcdc + W[t]!) | 0;
    e = d; d = c; c = (b << 30) | (b >>> 2); b = a; a = temp;
  }
  for (; t < 80; t++) {
    const temp = (((a << 5) | (a >>> 27)) + (b ^ c ^ d) + e + 0xca62c1d6 + W[t]!) | 0;
    e = d; d = c; c = (b << 30) | (b >>> 2); b = a; a = temp;
  }
  h[0] = (h[0]! + a) | 0;
  h[1] = (h[1]! + b) | 0;
  h[2] = (h[2]! + c) | 0;
  h[3] = (h[3]! + d) | 0;
  h[4] = (h[4]! + e) | 0;
}

/**
 * Finishes a hash: `buf` holds the message's last `tailLength` bytes (at most 119) from
 * `offset`, every block before them already folded into `h`, and has room for 128 bytes
 * from `offset`; `totalLength` is the whole message's length in bytes. Pads the tail in
 * place (§5.1.1) and folds the last block or two.
 */
export function sha1Finish(h: Sha1State, buf: Uint8Array, offset: number, tailLength: number, totalLength: number): void {
  if (tailLength > 119 || buf.length < offset + 128) throw new RangeError('sha1Finish: the tail and its padding must fit 128 bytes of the buffer');
  const blocks = tailLength + 9 <= 64 ? 1 : 2;
  const end = offset + 64 * blocks;
  buf[offset + tailLength] = 0x80;
  buf.fill(0, offset + tailLength + 1, end - 8);
  const bits = totalLength * 8;
  const hi = Math.floor(bits / 0x100000000);
  const lo = bits >>> 0;
  buf[end - 8] = hi >>> 24;
  buf[end - 7] = hi >>> 16;
  buf[end - 6] = hi >>> 8;
  buf[end - 5] = hi;
  buf[end - 4] = lo >>> 24;
  buf[end - 3] = lo >>> 16;
  buf[end - 2] = lo >>> 8;
  buf[end - 1] = lo;
  sha1Block(h, buf, offset);
  if (blocks === 2) sha1Block(h, buf, offset + 64);
}

/** Folds every whole 64-byte block of the first `length` bytes of `buf` into `h`; returns where the rest begins. */
export function sha1Blocks(h: Sha1State, buf: Uint8Array, length: number): number {
  const whole = length - (length % 64);
  for (let o = 0; o < whole; o += 64) sha1Block(h, buf, o);
  return whole;
}
