import 'server-only';
/** The latest real run on a machine with its statuses, for the machine's live page. */
import { getMachineNameOrThrow, listRunResults, listRuns } from '@/db/queries/runs';
import type { Ctx } from '@/lib/server/context';

export async function machineLive(ctx: Ctx, machineId: string) {
  const machineName = await getMachineNameOrThrow(ctx, machineId);
  const latest = (await listRuns(ctx, { machineId, limit: 20 })).find((r) => !r.simulated) ?? null;
  const results = latest ? await listRunResults(ctx, latest.id) : [];
  return {
    machineName,
    run: latest,
    results: results.map((r) => ({ id: r.id, label: String(r.details.label ?? '?'), characteristic: r.characteristic, status: r.status, value: r.value, upper: r.upper, lower: r.lower }))
      .sort((a, b) => a.label.localeCompare(b.label, 'en', { numeric: true })),
  };
}
