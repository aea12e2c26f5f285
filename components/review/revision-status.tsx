/** A revision's review status: a word and a shape, never colour alone. */
import type { RevisionStatus } from '@/db/schema';
import { LockIcon } from '@/components/ui/icons';

const WORD: Record<RevisionStatus, string> = { draft: 'Draft', 'in-review': 'In review', approved: 'Approved', 'sent-back': 'Sent back' };
const STYLE: Record<RevisionStatus, string> = {
  draft: 'border-line-strong bg-sunken',
  'in-review': 'border-status-info bg-status-info/10',
  approved: 'border-status-conforming bg-status-conforming/10',
  'sent-back': 'border-status-nonconforming bg-status-nonconforming/10',
};

export function RevisionStatusTag({ status }: { status: RevisionStatus }) {
  return (
    <span data-status={status} className={`inline-flex items-center gap-1 rounded-full border px-2 py-0.5 text-caption font-semibold text-ink ${STYLE[status]}`}>
      {status === 'approved' ? <LockIcon width={13} height={13} aria-hidden="true" /> : null}
      {WORD[status]}
    </span>
  );
}
