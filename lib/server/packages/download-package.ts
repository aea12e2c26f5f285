import 'server-only';
/**
 * The shop-floor package of an approved revision (lib/packaging), audited on every
 * download. Only approved revisions are packaged.
 */
import { getDb } from '@/db/client';
import { recordAudit } from '@/db/queries/audit';
import { buildPackage, type BuiltPackage } from '@/lib/packaging/build-package';
import type { PackageInput } from '@/lib/packaging/package-input';
import { AppError } from '@/lib/server/app-error';
import type { Ctx } from '@/lib/server/context';
import { loadRevisionContext, type RevisionContext } from '@/lib/server/runs/revision-context';
import { postFacts } from './post-facts';

export function packageInputFor(c: RevisionContext, generatedAt: Date): PackageInput {
  const post = postFacts(c.program.postId);
  const cal = c.probe.calibration;
  return {
    generatedAt: generatedAt.toISOString(),
    part: { uuid: c.part.id, number: c.part.number, revision: c.part.revision, name: c.part.name, material: c.part.material ?? undefined, features: c.part.engine.features, tolerances: c.part.engine.tolerances, datums: c.part.engine.datums },
    machine: { uuid: c.machine.id, name: c.machine.name, versionUuid: c.machine.versionId, versionNumber: c.machine.version, model: c.machine.engine },
    probe: {
      uuid: c.probe.id, name: c.probe.name, stylusDiameter: c.probe.engine.stylusDiameter,
      effectiveDiameter: c.probe.engine.effectiveDiameter ?? c.probe.engine.stylusDiameter,
      calibration: {
        state: cal.state === 'current' ? 'current' : cal.reason === 'never' ? 'none' : 'stale',
        calibratedAt: c.probe.lastCalibratedOn ? `${c.probe.lastCalibratedOn}T00:00:00.000Z` : undefined,
        note: cal.state === 'stale' ? cal.message : undefined,
      },
    },
    program: { uuid: c.program.id, name: c.program.name, postprocessorId: c.program.postId, postprocessorName: post.name, fileExtension: post.extension, workOffset: post.workOffset },
    revision: { uuid: c.revision.id, number: c.revision.number, text: c.revision.programText },
    plan: c.plan,
    approval: { approverUuid: c.revision.approverId ?? '', approverName: c.revision.approverName ?? '', approvedAt: c.revision.approvedAt?.toISOString() ?? '' },
  };
}

export async function downloadPackage(ctx: Ctx, revisionId: string): Promise<BuiltPackage> {
  const c = await loadRevisionContext(ctx, revisionId);
  if (c.revision.status !== 'approved' || !c.revision.approverId || !c.revision.approvedAt) {
    throw new AppError('conflict', `Revision ${c.revision.number} is ${c.revision.status.replace('-', ' ')}; only approved revisions can be downloaded.`);
  }
  const built = await buildPackage(packageInputFor(c, new Date()));
  await recordAudit(getDb(), {
    workspaceId: ctx.user.workspaceId, actorUserId: ctx.user.id, actorEmail: ctx.user.email, ip: ctx.ip,
    action: 'package-downloaded', targetType: 'revision', targetId: revisionId,
    summary: `Downloaded the package of ${c.part.number} · ${c.program.name} revision ${c.revision.number}`,
    details: { fileName: built.fileName, manifestSha256: built.manifestSha256 },
  });
  return built;
}
