import 'server-only';
/**
 * A virtual run: the engine's `simulate` makes the trip points of a part made with the
 * given errors, then the same evaluation as a real run. Stored marked simulated (kept
 * out of trends, never e-mailed).
 */
import { z } from 'zod';
import { getDb } from '@/db/client';
import { simulateRun } from '@/lib/evaluation/simulate';
import { errorModelSchema, simulateInputSchema } from '@/lib/evaluation/simulate-input';
import type { Ctx } from '@/lib/server/context';
import { evaluateMeasurements, warningShareOf } from './evaluate-measurements';
import { loadRevisionContext } from './revision-context';
import { storeRun } from './store-run';

export const virtualRunSchema = z.object({
  revisionId: z.uuid(),
  seed: z.number().int().min(0).max(2 ** 31 - 1).default(1),
  temperatureC: z.number().finite().min(-50).max(150).optional(),
  errors: errorModelSchema,
});
export type VirtualRunInput = z.infer<typeof virtualRunSchema>;

export async function createVirtualRun(ctx: Ctx, input: VirtualRunInput): Promise<{ runId: string; hits: number; misses: number }> {
  const c = await loadRevisionContext(ctx, input.revisionId);
  const sim = simulateRun(simulateInputSchema.parse({
    part: c.part.engine, probe: c.probe.engine, plan: c.plan, machine: c.machine.engine, errors: input.errors, seed: input.seed,
  }));
  const evaluation = evaluateMeasurements(c, sim.measurements, { temperatureC: input.temperatureC }, await warningShareOf(getDb(), ctx));
  const { runId } = await storeRun(ctx, c, {
    serial: `simulated, seed ${sim.seed}`, temperatureC: input.temperatureC, simulated: true, measuredAt: new Date(),
    notes: JSON.stringify({ errors: input.errors, seed: sim.seed }),
    measurements: sim.measurements.map((m) => ({ uuid: m.uuid, point: 'point' in m ? m.point : null, line: null })),
    evaluation,
  });
  return { runId, hits: sim.hits, misses: sim.misses };
}
