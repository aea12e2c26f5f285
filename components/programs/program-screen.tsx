'use client';
/** One program: what it was made for, generate / regenerate, re-target, and its revisions. */
import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { toast } from 'sonner';
import type { ColumnDef } from '@tanstack/react-table';
import type { ProgramDetail, RevisionRow } from '@/db/queries/programs';
import { DataTable } from './client/data-table';
import { api, errorMessage } from './client/api';
import { GenerateButton } from './generate-button';

type Props = { program: ProgramDetail; canGenerate: boolean; autoGenerate: boolean; machines: { id: string; name: string }[]; probeWarning: string | null };

export function ProgramScreen({ program, canGenerate, autoGenerate, machines, probeWarning }: Props) {
  const router = useRouter();
  const [target, setTarget] = useState(machines.find((m) => m.id !== program.machineId)?.id ?? '');
  const [busy, setBusy] = useState(false);
  const columns: ColumnDef<RevisionRow, unknown>[] = [
    { accessorKey: 'number', header: 'Revision', cell: (c) => <Link className="font-medium text-brand hover:underline" href={`/revisions/${c.row.original.id}`}>Revision {c.row.original.number}</Link> },
    { accessorKey: 'author', header: 'Author' },
    { accessorKey: 'message', header: 'Message' },
    { accessorKey: 'status', header: 'Status' },
    { accessorKey: 'findings', header: 'Findings', cell: (c) => <span className="tabular-nums">{c.row.original.findings}{c.row.original.errors > 0 ? ` (${c.row.original.errors} errors)` : ''}</span> },
    { accessorKey: 'createdAt', header: 'Saved', cell: (c) => new Date(c.row.original.createdAt).toLocaleString() },
  ];
  const retarget = async () => {
    setBusy(true);
    try {
      const out = await api<{ programId: string; revision: { number: number } }>(`/api/programs/${program.id}/retarget`, { body: { machineId: target } });
      toast.success('Re-targeted: a new linked program with revision 1');
      router.push(`/programs/${out.programId}`);
    } catch (e) { toast.error(errorMessage(e)); } finally { setBusy(false); }
  };
  return (
    <div className="space-y-6">
      <dl className="card grid gap-3 p-4 sm:grid-cols-4 text-small">
        <div><dt className="text-ink-muted">Part</dt><dd><Link className="text-brand hover:underline" href={`/parts/${program.partId}`}>{program.part}</Link></dd></div>
        <div><dt className="text-ink-muted">Machine</dt><dd><Link className="text-brand hover:underline" href={`/machines/${program.machineId}`}>{program.machine}</Link> version {program.machineVersion}</dd></div>
        <div><dt className="text-ink-muted">Probe</dt><dd>{program.probe}</dd></div>
        <div><dt className="text-ink-muted">Post</dt><dd className="font-mono">{program.post}</dd></div>
        {program.linkedFromProgramId ? <div className="sm:col-span-4"><dt className="sr-only">Linked</dt><dd>Re-targeted from <Link className="text-brand hover:underline" href={`/programs/${program.linkedFromProgramId}`}>another program</Link></dd></div> : null}
      </dl>
      {program.machineChanged ? <p role="alert" className="rounded border border-status-marginal bg-status-marginal/10 p-2 text-small">▲ The machine has changed since this program was generated (now version {program.currentMachineVersion}). Regenerate to use the new version.</p> : null}
      {probeWarning ? <p role="alert" className="rounded border border-status-marginal bg-status-marginal/10 p-2 text-small">▲ Probe calibration: {probeWarning}</p> : null}
      {canGenerate ? (
        <section className="card flex flex-wrap items-start gap-6 p-4" aria-label="Generate">
          <GenerateButton programId={program.id} label={program.latest ? 'Regenerate' : 'Generate revision 1'} auto={autoGenerate && !program.latest} onDone={() => router.refresh()} />
          {machines.length > 1 ? (
            <div className="flex items-end gap-2">
              <div><label className="field-label" htmlFor="retarget-machine">Re-target to machine</label>
                <select id="retarget-machine" className="field-input" value={target} onChange={(e) => setTarget(e.target.value)}>{machines.filter((m) => m.id !== program.machineId).map((m) => <option key={m.id} value={m.id}>{m.name}</option>)}</select></div>
              <button type="button" className="btn-secondary" disabled={busy || !target} onClick={() => void retarget()}>{busy ? 'Working…' : 'Re-target'}</button>
            </div>
          ) : null}
        </section>
      ) : null}
      <section aria-label="Revisions">
        <h2 className="mb-2 text-title">Revisions</h2>
        <DataTable data={program.revisions} columns={columns} label="Revisions" empty="No revisions you may open yet." />
      </section>
    </div>
  );
}
