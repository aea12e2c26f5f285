import 'server-only';
/**
 * Generate (or regenerate) a program's next revision from the current part,
 * probe and machine version; re-target a program to another machine. Planning
 * and posting run before the transaction; storing locks the program row.
 */
import { getDb } from '@/db/client';
import { createProgram, followCurrentMachineVersion, getProgram, insertRevision, lockProgram } from '@/db/queries/programs';
import { getMachineVersionOrThrow } from '@/db/queries/machines';
import type { Ctx } from '@/lib/server/context';
import type { Retarget } from '@/lib/validation/programs';
import type { Plan } from '@/lib/program/plan-schema';
import { buildRevisionContent, loadEngineInputs, sha256, type Stage } from './build-revision';
import { verifyText } from './verify-text';

export type Generated = { id: string; number: number; touchPoints: number; findings: number; warnings: Plan['warnings'] };

export async function generateRevision(ctx: Ctx, programId: string, message: string, onStage: (s: Stage, detail?: string) => void = () => {}): Promise<Generated> {
  onStage('loading');
  const program = await getProgram(ctx, programId);
  const versionId = program.machineChanged
    ? await getDb().transaction((tx) => followCurrentMachineVersion(tx, ctx, programId, program.machineId))
    : program.machineVersionId;
  const inputs = await loadEngineInputs(getDb(), ctx, { partId: program.partId, probeId: program.probeId, machineVersionId: versionId, post: program.post });
  const content = await buildRevisionContent(inputs, onStage);
  onStage('storing');
  const saved = await getDb().transaction(async (tx) => {
    const { latest, latestId } = await lockProgram(tx, ctx, programId);
    const text = latest === 0 ? 'generated' : message;
    return insertRevision(tx, ctx, programId, latest + 1, content, { message: text, baseRevisionId: latestId });
  });
  onStage('done');
  return { ...saved, touchPoints: content.plan.touchPoints.length, findings: content.findings.length, warnings: content.plan.warnings };
}

/** The checker used when an edited text is saved: the verifier against the base plan. */
export async function checkEditedText(ctx: Ctx, programId: string, text: string, basePlan: Plan) {
  const program = await getProgram(ctx, programId);
  const inputs = await loadEngineInputs(getDb(), ctx, { partId: program.partId, probeId: program.probeId, machineVersionId: program.machineVersionId, post: program.post });
  return { findings: verifyText(text, inputs, basePlan), sha256: sha256(text) };
}

/** The same part's routine for another machine: a new program linked to this one, with its revision 1. */
export async function retargetProgram(ctx: Ctx, programId: string, input: Retarget): Promise<{ programId: string; revision: Generated }> {
  const from = await getProgram(ctx, programId);
  const target = await getMachineVersionOrThrow(getDb(), ctx, input.machineId);
  const { id } = await createProgram(ctx, {
    name: input.name ?? `${from.name} on ${target.name}`, partId: from.partId, machineId: input.machineId,
    probeId: input.probeId ?? from.probeId, post: input.post ?? target.postId,
  }, from.id);
  return { programId: id, revision: await generateRevision(ctx, id, 'generated') };
}
