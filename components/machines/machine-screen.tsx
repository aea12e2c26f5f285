'use client';
/** One machine: its model (editable by engineers, each save a new version), versions, 3D view and try-a-pose. */
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { toast } from 'sonner';
import type { MachineDetail } from '@/db/queries/machines';
import { MachineView3D } from '@/components/three/lazy-views';
import { api, ApiError, errorMessage } from '@/components/programs/client/api';
import { describeRotary } from '@/lib/validation/machines';
import { MachineForm } from './machine-form';
import { PosePanel } from './pose-panel';

export function MachineScreen({ machine, canEdit, posts }: { machine: MachineDetail; canEdit: boolean; posts: string[] }) {
  const router = useRouter();
  const [editing, setEditing] = useState(false);
  const [message, setMessage] = useState('');
  const [conflict, setConflict] = useState<string | null>(null);
  return (
    <div className="space-y-6">
      <p className="text-small" data-testid="machine-version">Version <strong>{machine.version}</strong> · {machine.layout} · post <code className="font-mono">{machine.record.post}</code> · {machine.model.rotaries.map(describeRotary).join('; ') || 'no rotary axes'}</p>
      <section aria-label="3D view of the machine"><MachineView3D machine={machine.model} /></section>
      <PosePanel machineId={machine.id} axisWords={['X', 'Y', 'Z', ...machine.model.rotaries.map((r) => r.name)]} />
      <section className="card space-y-3 p-4" aria-label="Machine model">
        <div className="flex flex-wrap items-center gap-2">
          <h2 className="text-title">Model</h2>
          {canEdit && !editing ? <button type="button" className="btn-secondary" onClick={() => setEditing(true)}>Edit</button> : null}
          {editing ? <input className="field-input max-w-sm" aria-label="What changed" placeholder="What changed (kept with the version)" value={message} onChange={(e) => setMessage(e.target.value)} /> : null}
        </div>
        {conflict ? <p role="alert" className="rounded border border-danger bg-danger-soft p-2 text-small text-danger">{conflict}</p> : null}
        <MachineForm key={`${machine.version}-${editing}`} initial={machine.record} posts={posts} readOnly={!editing} submitLabel="Save as a new version" onSubmit={async (m) => {
          try {
            const out = await api<{ version: number }>(`/api/machines/${machine.id}`, { method: 'PUT', body: { baseVersion: machine.version, machine: m, message } });
            toast.success(`Saved as version ${out.version}`);
            setEditing(false); setConflict(null);
            router.refresh();
          } catch (e) {
            if (e instanceof ApiError && e.status === 409) setConflict(e.message);
            toast.error(errorMessage(e));
          }
        }} />
      </section>
      <section className="card overflow-x-auto" aria-label="Versions">
        <h2 className="px-3 pt-3 text-title">Versions</h2>
        <table className="data-table mt-2">
          <thead><tr><th>Version</th><th>Post</th><th>Note</th><th>By</th><th>When</th></tr></thead>
          <tbody>{machine.versions.map((v) => <tr key={v.id}><td>{v.version}</td><td className="font-mono">{v.postId}</td><td>{v.note}</td><td>{v.createdBy ?? '—'}</td><td>{new Date(v.createdAt).toLocaleString()}</td></tr>)}</tbody>
        </table>
      </section>
    </div>
  );
}
