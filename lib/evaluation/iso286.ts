/**
 * ISO 286-1 limits and fits: a fit code such as "25H7" or "25g6" resolved to limit
 * deviations from TABLES (not from the tolerance-unit formula, which misses cells once
 * rounded). Sizes are "over … up to and including"; 0–3 mm includes 3.
 *
 * Sources (REFERENCES.md §4): IT5–IT11 and the f, g, h, k, p deviations [from memory,
 * corroborated by the check values listed there and by V. B. Bhandari, *Design of
 * Machine Elements*, examples 3.1–3.4 [published]]. IT4 (for the Δ of K5/P5) and the
 * d, e, s deviations are from memory here, corroborated at 12 d11, 20 e7, 20 s6 and
 * 50 s6 by Bhandari's examples; s is tabulated only up to 50 mm (above it the steps
 * split and are not carried).
 */

/** Upper ends of the size steps, mm. */
const STEPS = [3, 6, 10, 18, 30, 50, 80, 120, 180, 250, 315, 400, 500] as const;

/** Standard tolerance grades, µm, one row per step. */
const IT: Record<number, readonly number[]> = {
  4: [3, 4, 4, 5, 6, 7, 8, 10, 12, 14, 16, 18, 20],
  5: [4, 5, 6, 8, 9, 11, 13, 15, 18, 20, 23, 25, 27],
  6: [6, 8, 9, 11, 13, 16, 19, 22, 25, 29, 32, 36, 40],
  7: [10, 12, 15, 18, 21, 25, 30, 35, 40, 46, 52, 57, 63],
  8: [14, 18, 22, 27, 33, 39, 46, 54, 63, 72, 81, 89, 97],
  9: [25, 30, 36, 43, 52, 62, 74, 87, 100, 115, 130, 140, 155],
  10: [40, 48, 58, 70, 84, 100, 120, 140, 160, 185, 210, 230, 250],
  11: [60, 75, 90, 110, 130, 160, 190, 220, 250, 290, 320, 360, 400],
};

/** Shaft upper deviations es, µm (d … h). */
const ES: Record<string, readonly number[]> = {
  d: [-20, -30, -40, -50, -65, -80, -100, -120, -145, -170, -190, -210, -230],
  e: [-14, -20, -25, -32, -40, -50, -60, -72, -85, -100, -110, -125, -135],
  f: [-6, -10, -13, -16, -20, -25, -30, -36, -43, -50, -56, -62, -68],
  g: [-2, -4, -5, -6, -7, -9, -10, -12, -14, -15, -17, -18, -20],
  h: [0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0],
};

/** Shaft lower deviations ei, µm (k for IT4–IT7, p, s); `null` = not tabulated here. */
const EI: Record<string, readonly (number | null)[]> = {
  k: [0, 1, 1, 1, 2, 2, 2, 3, 3, 4, 4, 4, 5],
  p: [6, 12, 15, 18, 22, 26, 32, 37, 43, 50, 56, 62, 68],
  s: [14, 19, 23, 28, 35, 43, null, null, null, null, null, null, null],
};

export class FitCodeError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'FitCodeError';
  }
}

export interface FitLimits {
  code: string;
  nominal: number;
  kind: 'hole' | 'shaft';
  letter: string;
  grade: number;
  /** Tolerance grade value, µm. */
  itUm: number;
  upperUm: number;
  lowerUm: number;
  /** Deviations in mm (upper, lower) and the limits of size. */
  upper: number;
  lower: number;
  max: number;
  min: number;
}

export function sizeStep(nominal: number): number {
  if (!(nominal > 0)) throw new FitCodeError(`size ${nominal} mm must be above 0`);
  const k = STEPS.findIndex((top) => nominal <= top);
  if (k < 0) throw new FitCodeError(`size ${nominal} mm is above 500 mm, beyond the tables carried`);
  return k;
}

export function itGrade(grade: number, nominal: number): number {
  const row = IT[grade];
  if (!row) throw new FitCodeError(`grade IT${grade} is not tabulated here (IT4–IT11 are)`);
  return row[sizeStep(nominal)] as number;
}

const CODE = /^\s*(\d+(?:\.\d+)?)\s*([A-Za-z])\s*(\d{1,2})\s*$/;

export function resolveFitCode(code: string): FitLimits {
  const m = CODE.exec(code);
  if (!m) throw new FitCodeError(`"${code}" is not a fit code like 12H7 or 25g6`);
  const nominal = Number(m[1]);
  const letter = m[2] as string;
  const grade = Number(m[3]);
  const step = sizeStep(nominal);
  const it = itGrade(grade, nominal);
  const isHole = letter === letter.toUpperCase();
  const [upperUm, lowerUm] = isHole ? holeDeviations(letter, grade, step, it, nominal) : shaftDeviations(letter, grade, step, it, nominal);
  const upper = upperUm / 1000;
  const lower = lowerUm / 1000;
  return {
    code: `${m[1]}${letter}${grade}`, nominal, kind: isHole ? 'hole' : 'shaft', letter, grade, itUm: it,
    upperUm, lowerUm, upper, lower, max: nominal + upper, min: nominal + lower,
  };
}

function shaftDeviations(letter: string, grade: number, step: number, it: number, nominal: number): [number, number] {
  const es = ES[letter]?.[step];
  if (es !== undefined) return [es, es - it];
  const eiRow = EI[letter];
  if (!eiRow) throw new FitCodeError(`shaft deviation "${letter}" is not tabulated here (d, e, f, g, h, k, p, s are)`);
  let ei = eiRow[step];
  if (ei === null || ei === undefined) throw new FitCodeError(`deviation "${letter}" is not tabulated here for ${nominal} mm`);
  if (letter === 'k' && (grade < 4 || grade > 7)) ei = 0;
  return [ei + it, ei];
}

function holeDeviations(letter: string, grade: number, step: number, it: number, nominal: number): [number, number] {
  const lower = letter.toLowerCase();
  const es = ES[lower]?.[step];
  if (es !== undefined) {
    const ei = -es + 0; // EI = −es for D … H (+ 0 turns −0 into 0)
    return [ei + it, ei];
  }
  const eiRow = EI[lower];
  if (!eiRow) throw new FitCodeError(`hole deviation "${letter}" is not tabulated here (D, E, F, G, H, K, P, S are)`);
  const ei = eiRow[step];
  if (ei === null || ei === undefined) throw new FitCodeError(`deviation "${letter}" is not tabulated here for ${nominal} mm`);
  const deltaLimit = letter === 'K' ? 8 : 7;
  if (grade > deltaLimit) {
    if (letter === 'K') throw new FitCodeError(`K above IT8 is not carried here`);
    return [-ei, -ei - it];
  }
  // ES = −ei + Δ, Δ = ITn − IT(n−1); Δ = 0 up to 3 mm.
  const delta = step === 0 ? 0 : it - itGrade(grade - 1, nominal);
  const esHole = -ei + delta;
  return [esHole, esHole - it];
}
