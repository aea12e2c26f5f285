/**
 * The `plan` request (spec/engine-cli.md): part, probe and machine, validated with zod,
 * plus the cross-references zod cannot see field by field (duplicate uuids, tolerances
 * and datums naming features that do not exist).
 */
import { z } from 'zod';
import { machineSchema } from '../kinematics/schema';
import { partSchema, probeSchema } from './schema';

export const planInputSchema = z
  .object({ part: partSchema, probe: probeSchema, machine: machineSchema })
  .superRefine((input, ctx) => {
    const seen = new Map<string, number>();
    input.part.features.forEach((f, i) => {
      const key = f.uuid.toLowerCase();
      if (seen.has(key)) ctx.addIssue({ code: 'custom', path: ['part', 'features', i, 'uuid'], message: `duplicate feature uuid (also features[${seen.get(key)}])` });
      else seen.set(key, i);
    });
    input.part.tolerances.forEach((t, i) => {
      if (!seen.has(t.featureUuid.toLowerCase())) ctx.addIssue({ code: 'custom', path: ['part', 'tolerances', i, 'featureUuid'], message: 'names no feature of this part' });
    });
    for (const [letter, uuid] of Object.entries(input.part.datums)) {
      if (!seen.has(uuid.toLowerCase())) ctx.addIssue({ code: 'custom', path: ['part', 'datums', letter], message: `datum ${letter} names no feature of this part` });
    }
    if (input.probe.effectiveDiameter !== undefined && input.probe.effectiveDiameter > input.probe.stylusDiameter) {
      ctx.addIssue({ code: 'custom', path: ['probe', 'effectiveDiameter'], message: 'must not exceed stylusDiameter (the effective diameter is the ball less its pre-travel)' });
    }
  });
export type PlanInput = z.infer<typeof planInputSchema>;
