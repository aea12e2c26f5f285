/**
 * Deterministic touch-point UUIDs: RFC 9562 version 5 (SHA-1, name-based) of the feature
 * uuid, the feature's canonical geometry (itself named by a v5 uuid, so the hashed name
 * stays short) and the point's index in the feature, in a namespace of Probity's own. The same three always give the same uuid, so revisions of
 * a program can be compared point by point.
 *
 * RFC 9562 §5.5: SHA-1 over the namespace's 16 bytes followed by the name's bytes (UTF-8
 * here); the uuid is the digest's first 16 bytes with the version (5) in the high nibble
 * of byte 6 and the variant bits 10 at the top of byte 8.
 */
import { parse } from 'uuid';
import { sha1Blocks, sha1Finish, sha1Init } from './sha1';

/** Probity's namespace for touch points (a random version-4 uuid drawn once for this project). */
export const TOUCH_POINT_NAMESPACE = '45dd1cb9-7083-4dfc-8fd2-54fe6f5fed68';

const NAMESPACE_BYTES = parse(TOUCH_POINT_NAMESPACE);
const utf8 = new TextEncoder();

// Scratch space, used only inside one call: a message, a hash state, the uuid's characters.
let msg = new Uint8Array(256);
const h = new Int32Array(5);
const chars: number[] = new Array<number>(36).fill(0);

/** Writes the namespace and the UTF-8 bytes of `name` into `msg` (with 128 bytes to spare); returns the length. */
function message(name: string): number {
  const room = 16 + 3 * name.length + 128; // UTF-8 takes at most 3 bytes per UTF-16 unit
  if (msg.length < room) msg = new Uint8Array(2 * room);
  msg.set(NAMESPACE_BYTES);
  return 16 + utf8.encodeInto(name, msg.subarray(16)).written;
}

const HEX = '0123456789abcdef';

/** The v5 uuid text of the finished hash in `h` (its first 16 bytes). */
function uuidText(): string {
  let pos = 0;
  for (let i = 0; i < 16; i++) {
    let byte = (h[i >> 2]! >>> (24 - 8 * (i & 3))) & 0xff;
    if (i === 6) byte = (byte & 0x0f) | 0x50;
    else if (i === 8) byte = (byte & 0x3f) | 0x80;
    if (i === 4 || i === 6 || i === 8 || i === 10) chars[pos++] = 45; // '-'
    chars[pos++] = HEX.charCodeAt(byte >> 4);
    chars[pos++] = HEX.charCodeAt(byte & 15);
  }
  return String.fromCharCode(...chars);
}

/** The name of a feature's geometry: a v5 uuid of its canonical text (computed once per feature). */
export function geometryName(geometryKey: string): string {
  const length = message(geometryKey);
  sha1Init(h);
  const rest = sha1Blocks(h, msg, length);
  sha1Finish(h, msg, rest, length - rest, length);
  return uuidText();
}

/**
 * The uuids of one feature's touch points by index: the name's prefix (namespace, feature
 * uuid, geometry name) is hashed once, each index only finishes the hash.
 */
export function touchPointNamer(featureUuid: string, geometry: string): (index: number) => string {
  const length = message(`${featureUuid.toLowerCase()}|${geometry}|`);
  const mid = sha1Init();
  const rest = sha1Blocks(mid, msg, length);
  const tail = msg.slice(rest, length);
  return (index) => {
    // String(number) is ASCII (digits, sign, point, exponent, Infinity, NaN), at most 24 characters
    const digits = String(index);
    msg.set(tail);
    let n = tail.length;
    for (let i = 0; i < digits.length; i++) msg[n++] = digits.charCodeAt(i);
    h.set(mid);
    sha1Finish(h, msg, 0, n, length + digits.length);
    return uuidText();
  };
}

/** The touch point's uuid from its feature uuid, the feature's `geometryName` and the point index. */
export const touchPointUuid = (featureUuid: string, geometry: string, index: number): string =>
  touchPointNamer(featureUuid, geometry)(index);
