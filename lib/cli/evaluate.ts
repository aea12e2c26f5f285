/** `evaluate` (spec/engine-cli.md): trip points → fits per feature, results per tolerance, corrections. */
import { evaluateRun } from '../evaluation/evaluate';
import { evaluateInputSchema } from '../evaluation/input';
import { CommandError, errorObject, parseOrThrow } from './errors';

export function evaluateCommand(input: unknown): unknown {
  const req = parseOrThrow(evaluateInputSchema, input);
  const known = new Set(req.part.features.map((f) => f.uuid));
  const i = req.plan.touchPoints.findIndex((tp) => !known.has(tp.featureUuid));
  if (i >= 0) throw new CommandError(errorObject('VALIDATION', `plan.touchPoints[${i}].featureUuid: names no feature of the part`, `plan.touchPoints[${i}].featureUuid`));
  return evaluateRun(req);
}
