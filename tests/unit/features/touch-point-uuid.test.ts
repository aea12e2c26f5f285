/**
 * The SHA-1 behind the touch-point uuids, and the uuids themselves, against published
 * test vectors and two independent implementations: node:crypto (OpenSSL) for SHA-1 and
 * the uuid package's `v5` (RFC 9562 name-based uuids) for the uuids.
 */
import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { v5 } from 'uuid';
import { sha1Blocks, sha1Finish, sha1Init } from '@/lib/features/sha1';
import { geometryName, touchPointNamer, touchPointUuid, TOUCH_POINT_NAMESPACE } from '@/lib/features/touch-point-uuid';

/** Hex SHA-1 of `bytes` through the exported steps (a buffer with the 128 bytes of room they need). */
function sha1Hex(bytes: Uint8Array): string {
  const buf = new Uint8Array(bytes.length + 128);
  buf.set(bytes);
  const h = sha1Init();
  const rest = sha1Blocks(h, buf, bytes.length);
  sha1Finish(h, buf, rest, bytes.length - rest, bytes.length);
  return Array.from(h, (w) => (w >>> 0).toString(16).padStart(8, '0')).join('');
}

const ascii = (s: string) => new TextEncoder().encode(s);

/** Deterministic pseudo-random bytes (a linear congruential generator, constants of Numerical Recipes). */
function bytesOf(length: number, seed: number): Uint8Array {
  let x = seed >>> 0;
  return Uint8Array.from({ length }, () => {
    x = (Math.imul(x, 1664525) + 1013904223) >>> 0;
    return x >>> 24;
  });
}

describe('SHA-1 (FIPS 180-4)', () => {
  it('gives the published digests', () => {
    const vectors: [Uint8Array, string][] = [
      // Source: NIST CSRC, "Examples with Intermediate Values", SHA-1 (SHA1.pdf), the one-block and the
      // two-block message; digests written from memory, so node:crypto checks them too
      [ascii('abc'), 'a9993e364706816aba3e25717850c26c9cd0d89d'],
      [ascii('abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq'), '84983e441c3bd26ebaae4aa1f95129e5e54670f1'],
      // Source: FIPS 180-2 (2002), Appendix A.3, one million repetitions of "a" (digest from memory, as above)
      [new Uint8Array(1_000_000).fill(0x61), '34aa973cd4c4daa4f61eeb2bdbad27316534016f'],
      // From memory: the digest of the empty message
      [new Uint8Array(0), 'da39a3ee5e6b4b0d3255bfef95601890afd80709'],
    ];
    for (const [message, digest] of vectors) {
      expect(createHash('sha1').update(message).digest('hex')).toBe(digest);
      expect(sha1Hex(message)).toBe(digest);
    }
  });

  it('agrees with node:crypto on every length from 0 to 300 bytes, padding boundaries included', () => {
    for (let n = 0; n <= 300; n++) {
      const bytes = bytesOf(n, n + 1);
      expect(sha1Hex(bytes), `length ${n}`).toBe(createHash('sha1').update(bytes).digest('hex'));
    }
  });

  it('refuses a tail that does not fit its padding', () => {
    expect(() => sha1Finish(sha1Init(), new Uint8Array(200), 0, 120, 120)).toThrow(RangeError);
    expect(() => sha1Finish(sha1Init(), new Uint8Array(127), 0, 10, 10)).toThrow(RangeError);
  });
});

describe('touch-point uuids (RFC 9562 version 5)', () => {
  const ns = TOUCH_POINT_NAMESPACE;
  it('geometry names agree with the uuid package on short, long and non-ASCII keys', () => {
    for (let i = 0; i < 400; i++) {
      const key = JSON.stringify(['bore', [i, -2.5, 1e-7 * i], 'ü'.repeat(i % 3), 'x'.repeat(i)]);
      expect(geometryName(key)).toBe(v5(key, ns));
    }
  });

  it('touch-point uuids agree with the uuid package for thousands of names', () => {
    for (let i = 0; i < 300; i++) {
      const feature = `${(i * 2654435761 >>> 0).toString(16).padStart(8, '0')}-0000-4000-8000-${i.toString(16).padStart(12, '0')}`;
      const geometry = geometryName(`["plane",${i}]`);
      const name = touchPointNamer(feature, geometry);
      for (const index of [0, 1, 9, 10, 99, 100, 12345, i]) {
        expect(name(index)).toBe(v5(`${feature}|${geometry}|${index}`, ns));
      }
    }
  });

  it('feature uuids are lower-cased, and a namer keeps its prefix when others are used in between', () => {
    const upper = 'ABCDEF01-2345-4678-89AB-CDEF01234567';
    const g = geometryName('["sphere"]');
    const a = touchPointNamer(upper, g);
    const b = touchPointNamer('00000000-0000-4000-8000-000000000001', geometryName('["boss"]'));
    for (let i = 0; i < 20; i++) {
      expect(a(i)).toBe(v5(`${upper.toLowerCase()}|${g}|${i}`, ns));
      expect(b(i)).toBe(touchPointUuid('00000000-0000-4000-8000-000000000001', geometryName('["boss"]'), i));
    }
  });
});
