/**
 * Seeded pseudo-random numbers for virtual runs and tests (the engine has no unseeded
 * randomness). mulberry32: a 32-bit generator by Tommy Ettinger (public domain), good
 * enough for simulated noise, not for cryptography. Normal deviates by Box–Muller.
 */
export interface Rng {
  /** Uniform in [0, 1). */
  next(): number;
  /** Normal with mean 0 and standard deviation `sigma`. */
  normal(sigma?: number): number;
}

export function createRng(seed: number): Rng {
  let a = (Math.trunc(seed) >>> 0) || 0x9e3779b9;
  const next = (): number => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  let spare: number | null = null;
  const normal = (sigma = 1): number => {
    if (spare !== null) { const s = spare; spare = null; return s * sigma; }
    let u = 0;
    while (u <= 1e-300) u = next();
    const v = next();
    const r = Math.sqrt(-2 * Math.log(u));
    spare = r * Math.sin(2 * Math.PI * v);
    return r * Math.cos(2 * Math.PI * v) * sigma;
  };
  return { next, normal };
}
