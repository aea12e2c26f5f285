import 'server-only';
/**
 * A reviewer approves or sends back a revision in review. Nobody approves their own
 * revision; a revision with verifier errors cannot be approved; approval locks it (the
 * editor makes a new revision for any later change). Audited and e-mailed to the author.
 */
import { z } from 'zod';
import { getDb } from '@/db/client';
import { kickOutbox } from '@/lib/mail/worker';
import { recordAudit } from '@/db/queries/audit';
import { getRevisionRowOrThrow, insertDecision, transitionRevision } from '@/db/queries/reviews';
import { assertNotAuthor } from '@/lib/auth/permissions';
import { AppError } from '@/lib/server/app-error';
import type { Ctx } from '@/lib/server/context';
import { appLink, queueMail, usersByIds } from './mail';

export const decisionSchema = z.discriminatedUnion('decision', [
  z.object({ decision: z.literal('approve'), comment: z.string().trim().max(2000).optional() }),
  z.object({ decision: z.literal('send-back'), comment: z.string().trim().min(3, 'say what needs to change (at least 3 characters)').max(2000) }),
]);
export type DecisionInput = z.infer<typeof decisionSchema>;

export async function decideRevision(ctx: Ctx, revisionId: string, input: DecisionInput): Promise<{ status: 'approved' | 'sent-back' }> {
  const out = await getDb().transaction(async (tx) => {
    const rev = await getRevisionRowOrThrow(tx, ctx, revisionId);
    if (rev.status !== 'in-review') {
      throw new AppError('conflict', `This revision is ${rev.status.replace('-', ' ')}, not waiting for review.`);
    }
    const approving = input.decision === 'approve';
    if (approving) {
      assertNotAuthor(ctx.user, rev.authorId);
      if (rev.errors > 0) {
        throw new AppError('conflict', `The verifier found ${rev.errors} error${rev.errors === 1 ? '' : 's'} in this revision; it cannot be approved. Send it back.`);
      }
    }
    const now = new Date();
    const status = approving ? 'approved' as const : 'sent-back' as const;
    await transitionRevision(tx, ctx, revisionId, ['in-review'], status, approving ? { approverId: ctx.user.id, approvedAt: now } : {});
    const comment = input.comment?.trim() || null;
    await insertDecision(tx, ctx, revisionId, status, comment);
    const title = `${rev.partNumber} · ${rev.programName} revision ${rev.number}`;
    await queueMail(tx, {
      workspaceId: ctx.user.workspaceId,
      kind: approving ? 'revision-approved' : 'revision-sent-back',
      to: await usersByIds(tx, [rev.authorId]),
      subject: `${approving ? 'Approved' : 'Sent back'}: ${title}`,
      text: `${ctx.user.name} ${approving ? 'approved' : 'sent back'} ${title}.${comment ? `\n\nComment: ${comment}` : ''}\n\n${appLink(`/reviews/${revisionId}`)}`,
    });
    await recordAudit(tx, {
      workspaceId: ctx.user.workspaceId, actorUserId: ctx.user.id, actorEmail: ctx.user.email, ip: ctx.ip,
      action: approving ? 'revision-approved' : 'revision-sent-back', targetType: 'revision', targetId: revisionId,
      summary: `${approving ? 'Approved' : 'Sent back'} ${title}`, details: { comment },
    });
    return { status };
  });
  kickOutbox();
  return out;
}
