'use client';
/** The programs table and, for programmers, the new-program form. */
import Link from 'next/link';
import { useState } from 'react';
import type { ColumnDef } from '@tanstack/react-table';
import type { ProgramRow } from '@/db/queries/programs';
import { DataTable } from './client/data-table';
import { NewProgramForm, type ProgramChoices } from './new-program-form';

const columns: ColumnDef<ProgramRow, unknown>[] = [
  { accessorKey: 'name', header: 'Program', cell: (c) => <Link className="font-medium text-brand hover:underline" href={`/programs/${c.row.original.id}`}>{c.row.original.name}</Link> },
  { accessorKey: 'part', header: 'Part' },
  { accessorKey: 'machine', header: 'Machine', cell: (c) => <>{c.row.original.machine} v{c.row.original.machineVersion}{c.row.original.machineChanged ? <span className="ml-1 text-caption font-semibold text-ink" title="the machine has a newer version"> ▲ machine changed</span> : null}</> },
  { accessorKey: 'probe', header: 'Probe' },
  { accessorKey: 'post', header: 'Post' },
  { accessorKey: 'latest', header: 'Latest revision', cell: (c) => (c.row.original.latest ? `${c.row.original.latest} (${c.row.original.latestStatus})` : '—') },
];

export function ProgramsList({ rows, canCreate, choices }: { rows: ProgramRow[]; canCreate: boolean; choices: ProgramChoices | null }) {
  const [open, setOpen] = useState(false);
  return (
    <div className="space-y-4">
      {canCreate && choices ? (open ? (
        <section className="card p-4"><h2 className="mb-3 text-title">New program</h2><NewProgramForm choices={choices} /></section>
      ) : <button type="button" className="btn-primary" onClick={() => setOpen(true)}>New program</button>) : null}
      <DataTable data={rows} columns={columns} label="Programs" filterPlaceholder="Filter by program, part, machine…" empty="No programs yet." />
    </div>
  );
}
