import 'server-only';
/** A programmer sends a draft (or sent-back) revision for review; reviewers get an e-mail. */
import { getDb } from '@/db/client';
import { kickOutbox } from '@/lib/mail/worker';
import { recordAudit } from '@/db/queries/audit';
import { getRevisionRowOrThrow, transitionRevision } from '@/db/queries/reviews';
import { AppError } from '@/lib/server/app-error';
import type { Ctx } from '@/lib/server/context';
import { appLink, membersWithRoles, queueMail } from './mail';

export async function submitRevision(ctx: Ctx, revisionId: string): Promise<{ status: 'in-review'; notified: number }> {
  const out = await getDb().transaction(async (tx) => {
    const rev = await getRevisionRowOrThrow(tx, ctx, revisionId);
    if (rev.status === 'in-review') throw new AppError('conflict', 'This revision is already waiting for review.');
    if (rev.status === 'approved') throw new AppError('conflict', 'This revision is approved and locked; edit it to make a new revision.');
    await transitionRevision(tx, ctx, revisionId, ['draft', 'sent-back'], 'in-review', { submittedAt: new Date() });
    const reviewers = (await membersWithRoles(tx, ctx.user.workspaceId, ['reviewer'])).filter((r) => r.id !== ctx.user.id);
    const title = `${rev.partNumber} · ${rev.programName} revision ${rev.number}`;
    const notified = await queueMail(tx, {
      workspaceId: ctx.user.workspaceId,
      kind: 'review-requested',
      to: reviewers,
      subject: `Review requested: ${title}`,
      text: `${ctx.user.name} asks you to review ${title}.\n\nMessage: ${rev.message}\nVerifier errors: ${rev.errors}\n\nOpen the review: ${appLink(`/reviews/${revisionId}`)}`,
    });
    await recordAudit(tx, {
      workspaceId: ctx.user.workspaceId, actorUserId: ctx.user.id, actorEmail: ctx.user.email, ip: ctx.ip,
      action: 'revision-submitted', targetType: 'revision', targetId: revisionId,
      summary: `Submitted ${title} for review`, details: { reviewersNotified: notified },
    });
    return { status: 'in-review' as const, notified };
  });
  kickOutbox();
  return out;
}
