/** `fit` (spec/engine-cli.md): one shape fitted to points, least squares or minimum zone. */
import { z } from 'zod';
import { fitShape } from '../fitting/fit-shape';
import { FitError } from '../fitting/types';
import { directionSchema, vec3Schema } from '../kinematics/schema';
import { CommandError, errorObject, parseOrThrow } from './errors';

const fitInputSchema = z.object({
  shape: z.enum(['line', 'plane', 'circle', 'sphere', 'cylinder']),
  points: z.array(vec3Schema).min(1).max(2_000_000),
  method: z.enum(['least-squares', 'minimum-zone']).optional(),
  hint: z.object({ normal: directionSchema.optional(), axis: directionSchema.optional(), direction: directionSchema.optional() }).optional(),
});

export function fitCommand(input: unknown): unknown {
  const req = parseOrThrow(fitInputSchema, input);
  try {
    return fitShape(req);
  } catch (e) {
    if (e instanceof FitError) throw new CommandError(errorObject(e.code, e.message, e.code === 'UNSUPPORTED_METHOD' ? 'method' : 'points'));
    throw e;
  }
}
