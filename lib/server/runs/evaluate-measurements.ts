import 'server-only';
/**
 * Runs the evaluation engine on part-frame measurements of one revision, with the
 * workspace's warning share, the probe's repeatability, the part temperature and the
 * work-offset correction settings (G54, dead band and cap from the engine's defaults).
 */
import { eq } from 'drizzle-orm';
import type { DbOrTx } from '@/db/client';
import { workspaceSettings } from '@/db/schema';
import { evaluateRun, type EvaluateOutput } from '@/lib/evaluation/evaluate';
import { evaluateInputSchema, type Measurement } from '@/lib/evaluation/input';
import type { Vec3 } from '@/lib/kinematics/schema';
import type { Ctx } from '@/lib/server/context';
import type { RevisionContext } from './revision-context';

export interface RunConditions {
  temperatureC?: number;
  /** The work offset's values on the control now (G54 X Y Z), for absolute correction lines. */
  workOffsetNow?: Vec3;
}

export async function warningShareOf(db: DbOrTx, ctx: Ctx): Promise<number> {
  const rows = await db.select({ share: workspaceSettings.warningShare }).from(workspaceSettings).where(eq(workspaceSettings.workspaceId, ctx.user.workspaceId)).limit(1);
  return rows[0]?.share ?? 0.8;
}

export function evaluateMeasurements(
  c: RevisionContext,
  measurements: Measurement[],
  conditions: RunConditions,
  warningShare: number,
): EvaluateOutput {
  const input = evaluateInputSchema.parse({
    part: c.part.engine,
    probe: c.probe.engine,
    plan: c.plan,
    measurements,
    conditions: {
      probeRepeatability2Sigma: c.probe.repeatability2SigmaMm,
      ...(conditions.temperatureC !== undefined ? { partTemperatureC: conditions.temperatureC } : {}),
    },
    options: { formMethod: 'minimum-zone', methods: {}, warningShare, minTur: 4 },
    corrections: {
      dialect: c.program.postId,
      workOffset: {
        register: 1,
        current: conditions.workOffsetNow ?? [0, 0, 0],
        xAxis: c.machine.engine.setup.xAxis,
        zAxis: c.machine.engine.setup.zAxis,
      },
      wear: [],
    },
  });
  return evaluateRun(input);
}
