/** One revision under review: facts, verifier findings, text diff, point table, decision. */
import Link from 'next/link';
import type { DecisionRow, Finding, RevisionRow } from '@/db/queries/reviews';
import type { RevisionStatus } from '@/db/schema';
import { ProgramDiffView } from '@/components/editor/lazy-editors';
import { PageHeader } from '@/components/ui/page-header';
import { can } from '@/lib/auth/permissions';
import type { SessionUser } from '@/lib/server/context';
import type { RevisionComparison } from '@/lib/server/reviews/compare-revisions';
import { DecisionForm } from './decision-form';
import { PointDiffSummary, PointDiffTable } from './point-diff-table';
import { RevisionStatusTag } from './revision-status';
import { SubmitForReviewButton } from './submit-button';

interface Props {
  user: SessionUser;
  rev: RevisionRow;
  others: { id: string; number: number; status: RevisionStatus }[];
  decisions: DecisionRow[];
  comparison: RevisionComparison;
  findings: Finding[];
}

function approveBlockedReason(user: SessionUser, rev: RevisionRow): string | null {
  if (user.id === rev.authorId) return 'You wrote this revision: another reviewer must approve it.';
  if (rev.errors > 0) return `The verifier found ${rev.errors} error${rev.errors === 1 ? '' : 's'}: this revision cannot be approved.`;
  return null;
}

export function ReviewDetail({ user, rev, others, decisions, comparison, findings }: Props) {
  const same = comparison.base.id === comparison.head.id;
  return (
    <div className="space-y-6">
      <PageHeader
        title={`${rev.partNumber} · ${rev.programName} — revision ${rev.number}`}
        description={<>By {rev.authorName}: “{rev.message}” <RevisionStatusTag status={rev.status} /></>}
        actions={<>
          {rev.status === 'approved' && can(user, 'packages.download') ? <a className="btn-primary" href={`/api/packages/${rev.id}`} download>Download package</a> : null}
          {(rev.status === 'draft' || rev.status === 'sent-back') && can(user, 'revisions.submit') ? <SubmitForReviewButton revisionId={rev.id} /> : null}
          <Link className="btn-secondary" href="/reviews">All reviews</Link>
        </>}
      />
      <section aria-labelledby="findings-heading" className="card p-4">
        <h2 id="findings-heading" className="text-title">Verifier findings</h2>
        {findings.length === 0 ? <p className="text-small text-ink-muted">None: the verifier read the program back and found nothing.</p> : (
          <ul className="mt-2 space-y-1 text-small">
            {findings.map((f, i) => (
              <li key={i}><span className={f.severity === 'error' ? 'font-semibold text-danger' : 'font-semibold'}>{f.severity}</span>{f.line ? ` line ${f.line}` : ''} · {f.code}: {f.message}</li>
            ))}
          </ul>
        )}
      </section>
      <section aria-labelledby="diff-heading" className="space-y-3">
        <div className="flex flex-wrap items-end justify-between gap-3">
          <h2 id="diff-heading" className="text-title">{same ? 'Program (first revision: nothing to compare with)' : `Changes from revision ${comparison.base.number} to ${comparison.head.number}`}</h2>
          <form method="get" className="flex items-end gap-2">
            <label className="text-small">Compare with{' '}
              <select name="against" defaultValue={comparison.base.id} className="field-input inline-block w-auto">
                {others.map((o) => <option key={o.id} value={o.id}>revision {o.number} ({o.status})</option>)}
              </select>
            </label>
            <button className="btn-secondary" type="submit">Compare</button>
          </form>
        </div>
        {comparison.planProblems.map((p) => <p key={p} className="text-small text-danger">{p}</p>)}
        <PointDiffSummary diff={comparison.diff} />
        <div className="grid gap-4 xl:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
          <ProgramDiffView original={comparison.base.text} modified={comparison.head.text} label={`Program text, revision ${comparison.base.number} against ${comparison.head.number}`} />
          <div className="card max-h-[32rem] overflow-y-auto p-2"><PointDiffTable diff={comparison.diff} labels={comparison.labels} changedOnly={!same} /></div>
        </div>
      </section>
      {rev.status === 'in-review' && can(user, 'revisions.approve') ? (
        <section aria-labelledby="decide-heading" className="space-y-2">
          <h2 id="decide-heading" className="text-title">Your decision</h2>
          <DecisionForm revisionId={rev.id} approveBlocked={approveBlockedReason(user, rev)} />
        </section>
      ) : null}
      <section aria-labelledby="history-heading" className="space-y-2">
        <h2 id="history-heading" className="text-title">Decisions</h2>
        {decisions.length === 0 ? <p className="text-small text-ink-muted">No decisions yet.</p> : (
          <ul className="space-y-2">
            {decisions.map((d) => (
              <li key={d.id} className="card p-3 text-small"><strong>{d.decision === 'approved' ? 'Approved' : d.decision === 'sent-back' ? 'Sent back' : 'Comment'}</strong> by {d.reviewerName}, {d.createdAt.slice(0, 16).replace('T', ' ')} UTC{d.comment ? <p className="mt-1 whitespace-pre-wrap">{d.comment}</p> : null}</li>
            ))}
          </ul>
        )}
      </section>
    </div>
  );
}
