'use client';
/** The parts table (sort, filter, pages) and, for programmers, the new-part form. */
import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import type { ColumnDef } from '@tanstack/react-table';
import { DataTable } from '@/components/programs/client/data-table';
import type { PartListRow } from '@/db/queries/parts';
import { PartHeaderForm } from './part-header-form';

const columns: ColumnDef<PartListRow, unknown>[] = [
  { accessorKey: 'number', header: 'Number', cell: (c) => <Link className="font-medium text-brand hover:underline" href={`/parts/${c.row.original.id}`}>{c.row.original.number}</Link> },
  { accessorKey: 'revision', header: 'Rev.' },
  { accessorKey: 'name', header: 'Name' },
  { accessorKey: 'material', header: 'Material', cell: (c) => c.row.original.material || '—' },
  { accessorKey: 'features', header: 'Features', cell: (c) => <span className="tabular-nums">{c.row.original.features}</span> },
  { accessorKey: 'updatedAt', header: 'Changed', cell: (c) => new Date(c.row.original.updatedAt).toLocaleDateString() },
];

export function PartsList({ rows, canEdit }: { rows: PartListRow[]; canEdit: boolean }) {
  const router = useRouter();
  const [open, setOpen] = useState(false);
  return (
    <div className="space-y-4">
      {canEdit ? (
        <div>
          {open ? (
            <section className="card p-4" aria-label="New part">
              <h2 className="mb-3 text-title">New part</h2>
              <PartHeaderForm onSaved={(id) => router.push(`/parts/${id}`)} submitLabel="Create part" />
            </section>
          ) : <button type="button" className="btn-primary" onClick={() => setOpen(true)}>New part</button>}
        </div>
      ) : null}
      <DataTable data={rows} columns={columns} label="Parts" filterPlaceholder="Filter by number, name, material…" empty="No parts yet." />
    </div>
  );
}
