'use client';
/** The machines table and, for engineers, "new machine from a preset" with the full model to edit before saving. */
import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { toast } from 'sonner';
import type { ColumnDef } from '@tanstack/react-table';
import type { MachineListRow } from '@/db/queries/machines';
import { DataTable } from '@/components/programs/client/data-table';
import { api, errorMessage } from '@/components/programs/client/api';
import type { MachineRecordInput } from '@/lib/validation/machines';
import { MachineForm } from './machine-form';

const columns: ColumnDef<MachineListRow, unknown>[] = [
  { accessorKey: 'name', header: 'Machine', cell: (c) => <Link className="font-medium text-brand hover:underline" href={`/machines/${c.row.original.id}`}>{c.row.original.name}</Link> },
  { accessorKey: 'layout', header: 'Layout' },
  { accessorKey: 'axes', header: 'Axes' },
  { accessorKey: 'post', header: 'Post' },
  { accessorKey: 'version', header: 'Version' },
];

export type PresetChoice = { id: string; label: string; record: MachineRecordInput };

export function MachinesList({ rows, canEdit, presets, posts }: { rows: MachineListRow[]; canEdit: boolean; presets: PresetChoice[]; posts: string[] }) {
  const router = useRouter();
  const [preset, setPreset] = useState<PresetChoice | null>(null);
  const [choice, setChoice] = useState(presets[0]?.id ?? '');
  return (
    <div className="space-y-4">
      {canEdit ? (
        <section className="card space-y-3 p-4" aria-label="New machine">
          <div className="flex flex-wrap items-end gap-2">
            <div><label className="field-label" htmlFor="preset">New machine from a preset</label>
              <select id="preset" className="field-input" value={choice} onChange={(e) => setChoice(e.target.value)}>{presets.map((p) => <option key={p.id} value={p.id}>{p.label}</option>)}</select></div>
            <button type="button" className="btn-primary" onClick={() => setPreset(presets.find((p) => p.id === choice) ?? null)}>Start from this preset</button>
          </div>
          {preset ? (
            <MachineForm key={preset.id} initial={preset.record} posts={posts} submitLabel="Create machine" onSubmit={async (m) => {
              try {
                const { id } = await api<{ id: string }>('/api/machines', { body: m });
                toast.success(`Machine ${m.name} created (version 1)`);
                router.push(`/machines/${id}`);
              } catch (e) { toast.error(errorMessage(e)); }
            }} />
          ) : null}
        </section>
      ) : null}
      <DataTable data={rows} columns={columns} label="Machines" filterPlaceholder="Filter machines…" empty="No machines yet." />
    </div>
  );
}
