/**
 * The one-pass sums of a large point set (Σx, Σy, Σz, Σx², Σxy, Σxz, Σy², Σyz, Σz² of the
 * points shifted by an origin) with WebAssembly SIMD: two points per step in 128-bit lanes.
 * The points are copied into the module's memory 2,048 at a time (48 KiB, so each chunk
 * is summed from the L1/L2 cache right after its copy); each chunk's lane sums are added
 * in double precision on the JavaScript side. Returns null where WebAssembly SIMD is not
 * available; the caller then sums in plain JavaScript (scatter.ts), with the same shift.
 *
 * The module is assembled below from its instructions (WebAssembly Core Specification 2.0,
 * binary format §5, with the fixed-width SIMD instructions of §5.4.8), so what it does can
 * be read here; there is no binary file.
 */

const CHUNK_POINTS = 2048;
const RESULT_OFFSET = CHUNK_POINTS * 24; // bytes: the nine result vectors follow the chunk
/** The origin x, y, z (three doubles), read from memory in the loop: kept in registers they push a sum out to the stack. */
const ORIGIN_OFFSET = RESULT_OFFSET + 9 * 16;

// ---- a minimal assembler for one function -------------------------------------------
const uleb = (n: number): number[] => {
  const out: number[] = [];
  do {
    let b = n & 0x7f;
    n >>>= 7;
    if (n) b |= 0x80;
    out.push(b);
  } while (n);
  return out;
};
const sleb = (n: number): number[] => {
  const out: number[] = [];
  for (;;) {
    const b = n & 0x7f;
    n >>= 7;
    if ((n === 0 && (b & 0x40) === 0) || (n === -1 && (b & 0x40) !== 0)) return [...out, b];
    out.push(b | 0x80);
  }
};
const name = (s: string): number[] => [...uleb(s.length), ...Array.from(s, (c) => c.charCodeAt(0))];
const section = (id: number, bytes: number[]): number[] => [id, ...uleb(bytes.length), ...bytes];
const simd = (op: number): number[] => [0xfd, ...uleb(op)];
const get = (i: number): number[] => [0x20, ...uleb(i)];
const set = (i: number): number[] => [0x21, ...uleb(i)];
const i32 = (v: number): number[] => [0x41, ...sleb(v)];
const LOAD = (offset: number): number[] => [...simd(0x00), 4, ...uleb(offset)]; // v128.load align=16
const STORE = (offset: number): number[] => [...simd(0x0b), 4, ...uleb(offset)]; // v128.store
const LOAD_SPLAT = (offset: number): number[] => [...i32(0), ...simd(0x0a), 3, ...uleb(offset)]; // v128.load64_splat align=8
const ADD = simd(0xf0); // f64x2.add
const SUB = simd(0xf1); // f64x2.sub
const MUL = simd(0xf2); // f64x2.mul
const SHUFFLE = (lanes: number[]): number[] => [...simd(0x0d), ...lanes]; // i8x16.shuffle
const LOW = [0, 1, 2, 3, 4, 5, 6, 7];
const HIGH = [8, 9, 10, 11, 12, 13, 14, 15];
/** (a.low, b.high) and (a.high, b.low): 64-bit lanes picked from two vectors. */
const LOW_HIGH = SHUFFLE([...LOW, ...HIGH.map((b) => b + 16)]);
const HIGH_LOW = SHUFFLE([...HIGH, ...LOW.map((b) => b + 16)]);

/**
 * sums(pairs): two points x0 y0 z0 x1 y1 z1 per step from address 0 are three vectors
 * A = (x0, y0), B = (z0, x1), C = (y1, z1); X = (x0, x1) = (A.low, B.high),
 * Y = (y0, y1) = (A.high, C.low), Z = (z0, z1) = (B.low, C.high), less the origin stored
 * at ORIGIN_OFFSET; the nine sums accumulate lane-wise and are stored at RESULT_OFFSET in
 * the order x y z xx xy xz yy yz zz.
 */
function moduleBytes(): Uint8Array<ArrayBuffer> {
  // locals: 0 pairs (param); 1 i, 2 end (i32); 3–11 sums, 12 X, 13 Y, 14 Z, 15 A, 16 B, 17 C (v128)
  const [I, END, X, Y, Z, A, B, C] = [1, 2, 12, 13, 14, 15, 16, 17];
  const S = (k: number) => 3 + k;
  const accumulate = (k: number, ...value: number[]) => [...get(S(k)), ...value, ...ADD, ...set(S(k))];
  const body = [
    ...get(0), ...i32(48), 0x6c, ...set(END), // end = pairs · 48 bytes (i32.mul)
    0x02, 0x40, 0x03, 0x40, // block, loop
    ...get(I), ...get(END), 0x4f, 0x0d, 0x01, // i ≥ end (i32.ge_u) → out of the block
    ...get(I), ...LOAD(0), ...set(A), ...get(I), ...LOAD(16), ...set(B), ...get(I), ...LOAD(32), ...set(C),
    ...get(A), ...get(B), ...LOW_HIGH, ...LOAD_SPLAT(ORIGIN_OFFSET), ...SUB, ...set(X),
    ...get(A), ...get(C), ...HIGH_LOW, ...LOAD_SPLAT(ORIGIN_OFFSET + 8), ...SUB, ...set(Y),
    ...get(B), ...get(C), ...LOW_HIGH, ...LOAD_SPLAT(ORIGIN_OFFSET + 16), ...SUB, ...set(Z),
    ...accumulate(0, ...get(X)), ...accumulate(1, ...get(Y)), ...accumulate(2, ...get(Z)),
    ...accumulate(3, ...get(X), ...get(X), ...MUL), ...accumulate(4, ...get(X), ...get(Y), ...MUL), ...accumulate(5, ...get(X), ...get(Z), ...MUL),
    ...accumulate(6, ...get(Y), ...get(Y), ...MUL), ...accumulate(7, ...get(Y), ...get(Z), ...MUL), ...accumulate(8, ...get(Z), ...get(Z), ...MUL),
    ...get(I), ...i32(48), 0x6a, ...set(I), // i += 48 (i32.add)
    0x0c, 0x00, // continue the loop
    0x0b, 0x0b, // end loop, end block
    ...Array.from({ length: 9 }, (_, k) => [...i32(RESULT_OFFSET + 16 * k), ...get(S(k)), ...STORE(0)]).flat(),
    0x0b,
  ];
  const locals = [0x02, ...uleb(2), 0x7f, ...uleb(15), 0x7b]; // 2 × i32, 15 × v128
  const code = [...locals, ...body];
  return new Uint8Array([
    0x00, 0x61, 0x73, 0x6d, 0x01, 0x00, 0x00, 0x00, // magic, version 1
    ...section(1, [0x01, 0x60, 0x01, 0x7f, 0x00]), // type (i32) → ()
    ...section(3, [0x01, 0x00]), // one function of type 0
    ...section(5, [0x01, 0x00, 0x01]), // one memory of one 64 KiB page
    ...section(7, [0x02, ...name('memory'), 0x02, 0x00, ...name('sums'), 0x00, 0x00]),
    ...section(10, [0x01, ...uleb(code.length), ...code]),
  ]);
}

interface Kernel { sums: (pairs: number) => void; mem: Float64Array }
let kernel: Kernel | null | undefined;

function loadKernel(): Kernel | null {
  if (kernel !== undefined) return kernel;
  kernel = null;
  try {
    const bytes = moduleBytes();
    if (typeof WebAssembly === 'object' && WebAssembly.validate(bytes)) {
      const instance = new WebAssembly.Instance(new WebAssembly.Module(bytes));
      const exports = instance.exports as { memory: WebAssembly.Memory; sums: Kernel['sums'] };
      kernel = { sums: exports.sums, mem: new Float64Array(exports.memory.buffer) };
    }
  } catch {
    kernel = null; // no WebAssembly (or no SIMD) here: the caller sums in JavaScript
  }
  return kernel;
}

/**
 * The nine shifted sums of the first `n` points of flat x y z data, in the order
 * x y z xx xy xz yy yz zz, or null without WebAssembly SIMD.
 */
export type ShiftedSums = [number, number, number, number, number, number, number, number, number];

export function shiftedSumsSimd(xyz: Float64Array, n: number, ox: number, oy: number, oz: number): ShiftedSums | null {
  const k = loadKernel();
  if (!k) return null;
  const s = new Float64Array(9);
  const r = RESULT_OFFSET / 8;
  k.mem[ORIGIN_OFFSET / 8] = ox;
  k.mem[ORIGIN_OFFSET / 8 + 1] = oy;
  k.mem[ORIGIN_OFFSET / 8 + 2] = oz;
  const pairs = n >> 1;
  for (let p = 0; p < pairs; p += CHUNK_POINTS / 2) {
    const m = Math.min(CHUNK_POINTS / 2, pairs - p);
    k.mem.set(xyz.subarray(6 * p, 6 * (p + m)));
    k.sums(m);
    for (let j = 0; j < 9; j++) s[j]! += k.mem[r + 2 * j]! + k.mem[r + 2 * j + 1]!;
  }
  if (n & 1) {
    const i = 3 * (n - 1);
    const x = xyz[i]! - ox, y = xyz[i + 1]! - oy, z = xyz[i + 2]! - oz;
    s[0]! += x; s[1]! += y; s[2]! += z; s[3]! += x * x; s[4]! += x * y; s[5]! += x * z; s[6]! += y * y; s[7]! += y * z; s[8]! += z * z;
  }
  return Array.from(s) as ShiftedSums;
}
