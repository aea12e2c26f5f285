'use client';
/** The probes table with each probe's calibration state, and the new-probe form for engineers. */
import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { toast } from 'sonner';
import type { ColumnDef } from '@tanstack/react-table';
import type { ProbeSummary } from '@/db/queries/probes';
import { DataTable } from '@/components/programs/client/data-table';
import { api, errorMessage } from '@/components/programs/client/api';
import { ProbeForm, blankProbe } from './probe-form';
import { CalibrationBadge } from './calibration-badge';

const columns: ColumnDef<ProbeSummary, unknown>[] = [
  { accessorKey: 'name', header: 'Probe', cell: (c) => <Link className="font-medium text-brand hover:underline" href={`/probes/${c.row.original.id}`}>{c.row.original.name}</Link> },
  { accessorKey: 'stylusDiameter', header: 'Ball ⌀ (mm)' },
  { accessorKey: 'effectiveDiameter', header: 'Effective ⌀ (mm)', cell: (c) => c.row.original.effectiveDiameter ?? '—' },
  { accessorKey: 'lengthMm', header: 'Length (mm)' },
  { id: 'status', header: 'Calibration', accessorFn: (r) => (r.status.state === 'current' ? 'current' : r.status.message), cell: (c) => <CalibrationBadge status={c.row.original.status} /> },
];

export function ProbesList({ rows, canEdit }: { rows: ProbeSummary[]; canEdit: boolean }) {
  const router = useRouter();
  const [open, setOpen] = useState(false);
  return (
    <div className="space-y-4">
      {canEdit ? (open ? (
        <section className="card p-4"><h2 className="mb-3 text-title">New probe</h2>
          <ProbeForm initial={blankProbe} submitLabel="Create probe" onSubmit={async (p) => {
            try { const { id } = await api<{ id: string }>('/api/probes', { body: p }); toast.success(`Probe ${p.name} created`); router.push(`/probes/${id}`); } catch (e) { toast.error(errorMessage(e)); }
          }} /></section>
      ) : <button type="button" className="btn-primary" onClick={() => setOpen(true)}>New probe</button>) : null}
      <DataTable data={rows} columns={columns} label="Probes" filterPlaceholder="Filter probes…" empty="No probes yet." />
    </div>
  );
}
