/** `simulate` (spec/engine-cli.md): the trip points of a virtual run on a mis-made part, from a seed. */
import { simulateRun } from '../evaluation/simulate';
import { simulateInputSchema } from '../evaluation/simulate-input';
import { parseOrThrow } from './errors';

export function simulateCommand(input: unknown): unknown {
  return simulateRun(parseOrThrow(simulateInputSchema, input));
}
