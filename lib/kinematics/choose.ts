/**
 * Choice among inverse-kinematics solutions (spec/engine-cli.md, "ik" → `chosen`):
 * least rotary travel from `previous` — smallest largest single-axis move, then the
 * smallest sum of moves — ties to the lower index. Degrees.
 */
import type { AxisValues } from './schema';

const TIE = 1e-9;

export function chooseSolution(solutions: AxisValues[], previous: AxisValues, rotaryNames: string[]): number {
  let best = 0;
  let bestMax = Infinity;
  let bestSum = Infinity;
  solutions.forEach((s, i) => {
    let max = 0;
    let sum = 0;
    for (const n of rotaryNames) {
      const d = Math.abs((s[n] ?? 0) - (previous[n] ?? 0));
      if (d > max) max = d;
      sum += d;
    }
    if (max < bestMax - TIE || (Math.abs(max - bestMax) <= TIE && sum < bestSum - TIE)) {
      best = i;
      bestMax = max;
      bestSum = sum;
    }
  });
  return best;
}
