import type { Metadata } from 'next';
import { PageHeader } from '@/components/ui/page-header';
import { AUDIT_ACTIONS, listAuditEvents } from '@/db/queries/audit';
import { requirePageCtx } from '@/lib/server/session';
import { auditFilterSchema } from '@/lib/validation/audit';

export const metadata: Metadata = { title: 'Audit log' };

export default async function AuditPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const ctx = await requirePageCtx('audit.read');
  const raw = await searchParams;
  const parsed = auditFilterSchema.safeParse(raw);
  const filters = parsed.success ? parsed.data : {};
  const rows = await listAuditEvents(ctx, filters);
  const value = (k: 'action' | 'text' | 'from' | 'to') => (typeof raw[k] === 'string' ? raw[k] : '');
  return (
    <>
      <PageHeader title="Audit log" description="Sign-ins, failed sign-ins, invitations, role changes, approvals and downloads in this workspace, newest first." />
      <form method="get" className="card mb-4 flex flex-wrap items-end gap-3 p-3" aria-label="Filter the audit log">
        <div>
          <label htmlFor="audit-action" className="field-label">Event</label>
          <select id="audit-action" name="action" className="field-input" defaultValue={value('action')}>
            <option value="">Any event</option>
            {AUDIT_ACTIONS.map((a) => <option key={a} value={a}>{a}</option>)}
          </select>
        </div>
        <div className="min-w-48 flex-1">
          <label htmlFor="audit-text" className="field-label">Person or text</label>
          <input id="audit-text" name="text" className="field-input" defaultValue={value('text')} placeholder="e-mail or words" />
        </div>
        <div>
          <label htmlFor="audit-from" className="field-label">From (UTC)</label>
          <input id="audit-from" name="from" type="date" className="field-input" defaultValue={value('from')} />
        </div>
        <div>
          <label htmlFor="audit-to" className="field-label">Until (UTC, inclusive)</label>
          <input id="audit-to" name="to" type="date" className="field-input" defaultValue={value('to')} />
        </div>
        <button type="submit" className="btn-primary">Filter</button>
        <a href="/admin/audit" className="btn-secondary">Clear</a>
      </form>
      {!parsed.success ? <p role="alert" className="mb-3 text-small text-danger">{parsed.error.issues[0]?.message}</p> : null}
      <div className="card overflow-x-auto">
        <table className="data-table">
          <thead><tr><th>When (UTC)</th><th>Event</th><th>Who</th><th>What</th><th>Address</th></tr></thead>
          <tbody>
            {rows.length === 0 ? <tr><td colSpan={5} className="text-ink-muted">No events match these filters.</td></tr> : rows.map((r) => (
              <tr key={r.id} data-testid="audit-row">
                <td className="whitespace-nowrap font-mono text-caption">{r.createdAt.toISOString().slice(0, 19).replace('T', ' ')}</td>
                <td className="whitespace-nowrap">{r.action}</td><td>{r.actorEmail ?? '—'}</td><td>{r.summary}</td>
                <td className="font-mono text-caption">{r.ip ?? '—'}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </>
  );
}
