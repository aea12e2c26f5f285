/** A list of revisions with where to go for each. */
import Link from 'next/link';
import type { ReactNode } from 'react';
import type { RevisionRow } from '@/db/queries/reviews';
import { RevisionStatusTag } from './revision-status';

const when = (iso: string | null) => (iso ? iso.slice(0, 16).replace('T', ' ') : '—');

export function RevisionTable({ rows, empty, action }: { rows: RevisionRow[]; empty: string; action?: (r: RevisionRow) => ReactNode }) {
  if (rows.length === 0) return <p className="text-small text-ink-muted">{empty}</p>;
  return (
    <div className="card overflow-x-auto">
      <table className="data-table">
        <thead>
          <tr><th scope="col">Part · program</th><th scope="col">Rev.</th><th scope="col">Status</th><th scope="col">Author</th><th scope="col">Message</th><th scope="col">Verifier</th><th scope="col">Submitted (UTC)</th>{action ? <th scope="col"><span className="sr-only">Action</span></th> : null}</tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.id}>
              <td><Link className="font-medium text-brand underline-offset-2 hover:underline" href={`/reviews/${r.id}`}>{r.partNumber} · {r.programName}</Link></td>
              <td className="font-mono">{r.number}</td>
              <td><RevisionStatusTag status={r.status} /></td>
              <td>{r.authorName}</td>
              <td className="max-w-xs truncate" title={r.message}>{r.message}</td>
              <td>{r.errors > 0 ? <span className="font-semibold text-danger">{r.errors} error{r.errors === 1 ? '' : 's'}</span> : 'no errors'}</td>
              <td className="whitespace-nowrap">{when(r.submittedAt)}</td>
              {action ? <td>{action(r)}</td> : null}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
