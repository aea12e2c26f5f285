'use client';
/** Proposed corrections grouped by proposal: code line, plain instruction, applied or not. */
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { toast } from 'sonner';
import type { CorrectionRow } from '@/db/queries/runs';
import { postJson } from '@/components/review/post-json';

const STATE_WORD: Record<string, string> = {
  apply: 'Enter this', 'within-dead-band': 'No change (inside the dead band)', 'stop-ask-a-person': 'Stop: past the cap — ask a person', 'not-available': 'Not available',
};

export function CorrectionsPanel({ runId, rows, mayApply, simulated }: { runId: string; rows: CorrectionRow[]; mayApply: boolean; simulated: boolean }) {
  const router = useRouter();
  const [busy, setBusy] = useState<number | null>(null);
  const groups = new Map<number, CorrectionRow[]>();
  for (const r of rows) {
    const g = typeof r.details.group === 'number' ? r.details.group : -1;
    groups.set(g, [...(groups.get(g) ?? []), r]);
  }
  if (groups.size === 0) return <p className="text-small text-ink-muted">No corrections proposed for this run.</p>;

  async function toggle(group: number, applied: boolean) {
    setBusy(group);
    const r = await postJson(`/api/runs/${runId}/corrections`, { group, applied });
    setBusy(null);
    if (!r.ok) { toast.error(r.message); return; }
    toast.success(applied ? 'Marked as entered at the machine.' : 'Marked as not entered.');
    router.refresh();
  }

  return (
    <ul className="space-y-3" data-testid="corrections">
      {[...groups.entries()].map(([group, list]) => {
        const first = list[0];
        if (!first) return null;
        const state = String(first.details.state ?? '');
        const applied = list.every((r) => r.applied);
        return (
          <li key={group} className="card space-y-2 p-3" data-state={state}>
            <div className="flex flex-wrap items-center justify-between gap-2">
              <strong>{STATE_WORD[state] ?? state}</strong>
              {mayApply && !simulated && state === 'apply' ? (
                <label className="inline-flex items-center gap-2 text-small">
                  <input type="checkbox" checked={applied} disabled={busy === group} onChange={(e) => toggle(group, e.target.checked)} />
                  Entered at the machine{applied && first.appliedBy ? ` (${first.appliedBy}, ${first.appliedAt?.slice(0, 16).replace('T', ' ')} UTC)` : ''}
                </label>
              ) : <span className="text-caption text-ink-muted">{applied ? 'entered' : 'not entered'}</span>}
            </div>
            <table className="data-table"><tbody>
              {list.map((r) => <tr key={r.id}><td>{r.register}</td><td className="font-mono">{r.oldValue === null ? '—' : r.oldValue.toFixed(4)} → {r.newValue.toFixed(4)}</td></tr>)}
            </tbody></table>
            {first.code ? <pre className="overflow-x-auto rounded-control bg-sunken p-2 text-small" data-testid="correction-code">{first.code}</pre> : null}
            <p className="text-small">{String(first.details.instruction ?? '')}</p>
          </li>
        );
      })}
    </ul>
  );
}
