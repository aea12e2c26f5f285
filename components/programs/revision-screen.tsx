'use client';
/**
 * A revision: the program in the editor (read-only until "Edit"), verifier
 * findings as markers and as a list, plan warnings by feature, and the touch
 * points in 3D. Saving asks for a message and stores a new revision; a save from
 * a base that is no longer the latest gets the server's conflict message.
 */
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { toast } from 'sonner';
import type { RevisionDetail } from '@/db/queries/revisions';
import type { Feature } from '@/lib/features/schema';
import type { Finding } from '@/lib/validation/programs';
import { ProgramEditor } from '@/components/editor/lazy-editors';
import { PartView3D } from '@/components/three/lazy-views';
import { api, ApiError, errorMessage } from './client/api';

export type AdviceRow = { key: string; feature: string; characteristic: string; points: number; tur: number | null; where: 'on-machine' | 'cmm' | null; message: string };
type Props = { revision: RevisionDetail; features: Feature[]; canEdit: boolean; advice: AdviceRow[] };

const severityMark: Record<Finding['severity'], string> = { error: '✖ error', warning: '▲ warning', info: 'ℹ info' };

export function RevisionScreen({ revision, features, canEdit, advice }: Props) {
  const router = useRouter();
  const [editing, setEditing] = useState(false);
  const [text, setText] = useState(revision.text);
  const [message, setMessage] = useState('');
  const [findings, setFindings] = useState<Finding[]>(revision.findings);
  const [conflict, setConflict] = useState<string | null>(null);
  const [saving, setSaving] = useState(false);
  const [reveal, setReveal] = useState<number | null>(null);
  const labelOf = new Map(features.map((f) => [f.uuid, f.label]));

  const save = async () => {
    if (!message.trim()) { toast.error('Say what you changed before saving.'); return; }
    setSaving(true); setConflict(null);
    try {
      const out = await api<{ id: string; number: number; findings: Finding[] }>(`/api/programs/${revision.programId}/revisions`, { body: { baseRevision: revision.number, text, message } });
      setFindings(out.findings);
      toast.success(`Saved as revision ${out.number} (${out.findings.length} finding${out.findings.length === 1 ? '' : 's'})`);
      router.push(`/revisions/${out.id}`);
    } catch (e) {
      if (e instanceof ApiError && e.status === 409) setConflict(e.message);
      toast.error(errorMessage(e));
    } finally { setSaving(false); }
  };

  return (
    <div className="space-y-6">
      <p className="text-small text-ink-muted">By {revision.author}, {new Date(revision.createdAt).toLocaleString()} · “{revision.message}” · status <strong>{revision.status}</strong> · SHA-256 <code className="font-mono text-caption">{revision.sha256.slice(0, 16)}…</code></p>
      <p className="rounded border border-line bg-sunken p-2 text-small">Prove out every new or edited program before production: single block, reduced rapid and feed override, clearance checked; the machine builder’s instructions and local rules come first.</p>
      {revision.plan.warnings.length > 0 ? (
        <div role="alert" className="rounded border border-status-marginal bg-status-marginal/10 p-2 text-small">
          <p className="font-semibold">▲ Plan warnings</p>
          <ul>{revision.plan.warnings.map((w, i) => <li key={i}>Feature {w.label ?? labelOf.get(w.featureUuid ?? '') ?? '?'}: {w.message}</li>)}</ul>
        </div>
      ) : null}
      <section aria-label="Program text" className="space-y-2">
        <div className="flex flex-wrap items-center gap-2">
          {canEdit && revision.isLatest && !editing ? <button type="button" className="btn-secondary" onClick={() => setEditing(true)}>Edit</button> : null}
          {canEdit && !revision.isLatest ? <span className="text-small text-ink-muted">Edits start from the latest revision.</span> : null}
          {editing ? (
            <>
              <label className="sr-only" htmlFor="save-message">What you changed</label>
              <input id="save-message" className="field-input max-w-md" placeholder="What you changed (required)" value={message} onChange={(e) => setMessage(e.target.value)} />
              <button type="button" className="btn-primary" disabled={saving} onClick={() => void save()}>{saving ? 'Saving…' : 'Save as new revision'}</button>
              <button type="button" className="btn-secondary" onClick={() => { setEditing(false); setText(revision.text); }}>Cancel</button>
            </>
          ) : null}
        </div>
        {conflict ? <p role="alert" className="rounded border border-danger bg-danger-soft p-2 text-small text-danger">Conflict: {conflict}</p> : null}
        <ProgramEditor value={text} readOnly={!editing} findings={findings} onChange={setText} revealLine={reveal} label={`Program text, revision ${revision.number}`} />
      </section>
      <section aria-label="Verifier findings">
        <h2 className="mb-2 text-title">Verifier findings ({findings.length})</h2>
        {findings.length === 0 ? <p className="text-small text-ink-muted">No findings.</p> : (
          <ul className="card divide-y divide-line text-small">
            {findings.map((f, i) => (
              <li key={i} className="flex gap-3 p-2">
                <span className="w-24 shrink-0 font-semibold">{severityMark[f.severity]}</span>
                <button type="button" className="w-20 shrink-0 text-left font-mono text-brand hover:underline" onClick={() => setReveal(f.line || 1)}>line {f.line}</button>
                <span>{f.message} <code className="text-caption text-ink-muted">{f.code}</code></span>
              </li>
            ))}
          </ul>
        )}
      </section>
      <section aria-label="Capability advice" className="card overflow-x-auto">
        <h2 className="px-3 pt-3 text-title">Capability advice per tolerance</h2>
        <p className="px-3 text-caption text-ink-muted">Test-uncertainty ratio (span / 2U) for this probe and these points; on the machine at 4:1 or better, otherwise the CMM. Unentered conditions use the workspace defaults.</p>
        <table className="data-table mt-2">
          <thead><tr><th>Feature</th><th>Characteristic</th><th>Points</th><th>TUR</th><th>Advice</th></tr></thead>
          <tbody>{advice.map((a) => (
            <tr key={a.key}><td className="font-mono">{a.feature}</td><td>{a.characteristic}</td><td className="tabular-nums">{a.points}</td>
              <td className="tabular-nums">{a.tur === null ? '—' : `${a.tur.toFixed(1)}:1`}</td>
              <td>{a.where === 'on-machine' ? '● on the machine' : a.where === 'cmm' ? '▲ send to the CMM' : ''} <span className="text-caption text-ink-muted">{a.message}</span></td></tr>
          ))}</tbody>
        </table>
      </section>
      <section aria-label="Touch points in 3D">
        <h2 className="mb-2 text-title">Touch points ({revision.plan.touchPoints.length})</h2>
        <PartView3D features={features} touchPoints={revision.plan.touchPoints} />
      </section>
    </div>
  );
}
