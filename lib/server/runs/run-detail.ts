import 'server-only';
/** Everything the run page shows, with each measured point's deviation along its nominal normal. */
import { getRunHeaderOrThrow, listRunCorrections, listRunMeasurements, listRunResults } from '@/db/queries/runs';
import { dot, sub } from '@/lib/geometry/vec3';
import type { Vec3 } from '@/lib/kinematics/schema';
import type { Ctx } from '@/lib/server/context';
import { loadRevisionContext } from './revision-context';

export async function loadRunDetail(ctx: Ctx, runId: string) {
  const run = await getRunHeaderOrThrow(ctx, runId);
  const [results, measured, corrections, context] = await Promise.all([
    listRunResults(ctx, runId), listRunMeasurements(ctx, runId), listRunCorrections(ctx, runId), loadRevisionContext(ctx, run.revisionId),
  ]);
  const tps = new Map(context.plan.touchPoints.map((t) => [t.uuid, t]));
  const points = measured.flatMap((m) => {
    const tp = tps.get(m.uuid);
    if (!tp) return [];
    const point: Vec3 = [m.x, m.y, m.z];
    return [{ uuid: m.uuid, point, deviation: dot(sub(point, tp.target), tp.normal), line: m.line }];
  });
  return { run, results, corrections, points, context, missing: context.plan.touchPoints.length - points.length };
}
