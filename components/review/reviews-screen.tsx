/** The Reviews section: what waits for review, the caller's own open drafts, recent decisions. */
import { listOwnOpenRevisions, listRevisionsByStatus } from '@/db/queries/reviews';
import { PageHeader } from '@/components/ui/page-header';
import { can } from '@/lib/auth/permissions';
import type { Ctx } from '@/lib/server/context';
import { RevisionTable } from './revision-table';
import { SubmitForReviewButton } from './submit-button';

export async function ReviewsScreen({ ctx }: { ctx: Ctx }) {
  const mayApprove = can(ctx.user, 'revisions.approve');
  const maySubmit = can(ctx.user, 'revisions.submit');
  const [waiting, own, decided] = await Promise.all([
    listRevisionsByStatus(ctx, ['in-review']),
    maySubmit ? listOwnOpenRevisions(ctx) : Promise.resolve([]),
    listRevisionsByStatus(ctx, ['approved', 'sent-back'], 20),
  ]);
  return (
    <div className="space-y-8">
      <PageHeader title="Reviews" description="A revision runs on a machine only after someone other than its author has checked and approved it. Approved revisions are locked; a later edit makes a new revision." />
      <section aria-labelledby="waiting-heading" className="space-y-3">
        <h2 id="waiting-heading" className="text-title">Waiting for review</h2>
        <RevisionTable rows={waiting} empty="Nothing is waiting for review." action={mayApprove ? () => <span className="text-caption text-ink-muted">open to review</span> : undefined} />
      </section>
      {maySubmit ? (
        <section aria-labelledby="own-heading" className="space-y-3">
          <h2 id="own-heading" className="text-title">Your drafts and sent-back revisions</h2>
          <RevisionTable rows={own} empty="You have no open drafts." action={(r) => <SubmitForReviewButton revisionId={r.id} label={r.status === 'sent-back' ? 'Submit again' : 'Submit for review'} />} />
        </section>
      ) : null}
      <section aria-labelledby="decided-heading" className="space-y-3">
        <h2 id="decided-heading" className="text-title">Recently decided</h2>
        <RevisionTable rows={decided} empty="No decisions yet." />
      </section>
    </div>
  );
}
