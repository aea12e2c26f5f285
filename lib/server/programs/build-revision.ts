import 'server-only';
/**
 * From stored records to a revision's content: the engine plans the part for the
 * machine version with the probe in the spindle, posts it in the machine's
 * dialect and the verifier reads it back. Stages are reported to `onStage` so a
 * large part shows its progress. No maths here: all of it is the engine's.
 */
import { createHash } from 'node:crypto';
import { and, eq } from 'drizzle-orm';
import type { DbOrTx } from '@/db/client';
import { machineVersions } from '@/db/schema';
import { enginePart } from '@/db/queries/parts';
import { engineProbe } from '@/db/queries/probes';
import { planProgram } from '@/lib/features/plan';
import { postProgram } from '@/lib/program/post';
import { GeometryError } from '@/lib/geometry/vec3';
import type { Part, Probe } from '@/lib/features/schema';
import type { Machine } from '@/lib/kinematics/schema';
import type { Plan } from '@/lib/program/plan-schema';
import { AppError } from '@/lib/server/app-error';
import type { Ctx } from '@/lib/server/context';
import { engineMachineFor } from '@/lib/validation/machines';
import type { Finding } from '@/lib/validation/programs';
import { verifyText } from './verify-text';

export type Stage = 'loading' | 'planning' | 'posting' | 'verifying' | 'storing' | 'done';
export type RevisionContent = { plan: Plan; text: string; sha256: string; findings: Finding[] };
export type EngineInputs = { part: Part; probe: Probe; machine: Machine; post: string };

export const sha256 = (text: string) => createHash('sha256').update(text, 'utf8').digest('hex');

export async function loadEngineInputs(db: DbOrTx, ctx: Ctx, ids: { partId: string; probeId: string; machineVersionId: string; post: string }): Promise<EngineInputs> {
  const [partWithLabel, probe, versions] = await Promise.all([
    enginePart(db, ctx, ids.partId),
    engineProbe(db, ctx, ids.probeId),
    db.select({ model: machineVersions.model }).from(machineVersions)
      .where(and(eq(machineVersions.id, ids.machineVersionId), eq(machineVersions.workspaceId, ctx.user.workspaceId))).limit(1),
  ]);
  const version = versions[0];
  if (!version) throw new AppError('not-found', 'The machine version of this program is not in this workspace.');
  const { label: _label, ...part } = partWithLabel;
  return { part, probe: probe.probe, machine: engineMachineFor(version.model, probe.lengthMm), post: ids.post };
}

function engineFailure(error: unknown, stage: Stage): never {
  if (error instanceof GeometryError) throw new AppError('invalid', `Could not ${stage === 'planning' ? 'plan' : 'post'} the program: ${error.message}`, { path: error.path });
  throw error;
}

export async function buildRevisionContent(inputs: EngineInputs, onStage: (s: Stage, detail?: string) => void = () => {}): Promise<RevisionContent> {
  if (inputs.part.features.length === 0) throw new AppError('invalid', 'The part has no features to measure yet.', { path: 'partId' });
  onStage('planning', `${inputs.part.features.length} features`);
  let plan: Plan;
  try { plan = planProgram({ part: inputs.part, probe: inputs.probe, machine: inputs.machine }); } catch (e) { engineFailure(e, 'planning'); }
  onStage('posting', `${plan.touchPoints.length} touch points`);
  let text: string;
  try { text = postProgram({ plan, part: inputs.part, probe: inputs.probe, machine: inputs.machine, postprocessor: inputs.post }); } catch (e) { engineFailure(e, 'posting'); }
  onStage('verifying', `${text.split('\n').length} lines`);
  const findings = verifyText(text, inputs, plan);
  return { plan, text, sha256: sha256(text), findings };
}
