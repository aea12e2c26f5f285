'use client';

import {
  createColumnHelper, flexRender, getCoreRowModel, getFilteredRowModel, getSortedRowModel, useReactTable,
  type ColumnFiltersState, type SortingState,
} from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { ROLE_LABELS, ROLES, type Role } from '@/lib/auth/roles';
import { PersonActions } from './person-actions';

export interface PersonView {
  membershipId: string; name: string; email: string; roles: Role[]; active: boolean; lastSignIn: string | null; isSelf: boolean;
}

const col = createColumnHelper<PersonView>();

export function PeopleTable({ people }: { people: PersonView[] }) {
  const [sorting, setSorting] = useState<SortingState>([{ id: 'name', desc: false }]);
  const [globalFilter, setGlobalFilter] = useState('');
  const [columnFilters, setColumnFilters] = useState<ColumnFiltersState>([]);
  const columns = useMemo(() => [
    col.accessor('name', { header: 'Name' }),
    col.accessor('email', { header: 'E-mail' }),
    col.accessor('roles', {
      header: 'Roles',
      cell: (c) => c.getValue().map((r) => ROLE_LABELS[r]).join(', '),
      sortingFn: (a, b) => a.original.roles.join().localeCompare(b.original.roles.join()),
      filterFn: (row, _id, value: string) => !value || row.original.roles.includes(value as Role),
    }),
    col.accessor((p) => (p.active ? 'Active' : 'Deactivated'), { id: 'status', header: 'Status' }),
    col.accessor('lastSignIn', { header: 'Last sign-in', cell: (c) => c.getValue() ?? 'never', sortUndefined: 'last' }),
    col.display({ id: 'actions', header: () => <span className="sr-only">Actions</span>, cell: (c) => <PersonActions person={c.row.original} /> }),
  ], []);
  const table = useReactTable({
    data: people, columns, state: { sorting, globalFilter, columnFilters },
    onSortingChange: setSorting, onGlobalFilterChange: setGlobalFilter, onColumnFiltersChange: setColumnFilters,
    getCoreRowModel: getCoreRowModel(), getSortedRowModel: getSortedRowModel(), getFilteredRowModel: getFilteredRowModel(),
    globalFilterFn: (row, _id, value: string) => `${row.original.name} ${row.original.email}`.toLowerCase().includes(value.toLowerCase()),
  });
  const roleFilter = (columnFilters.find((f) => f.id === 'roles')?.value as string | undefined) ?? '';

  return (
    <section className="card" aria-label="People">
      <div className="flex flex-wrap items-end gap-3 border-b border-line p-3">
        <div className="min-w-48 flex-1">
          <label htmlFor="people-search" className="field-label">Find</label>
          <input id="people-search" className="field-input" placeholder="Name or e-mail" value={globalFilter} onChange={(e) => setGlobalFilter(e.target.value)} />
        </div>
        <div>
          <label htmlFor="people-role" className="field-label">Role</label>
          <select id="people-role" className="field-input" value={roleFilter}
            onChange={(e) => setColumnFilters(e.target.value ? [{ id: 'roles', value: e.target.value }] : [])}>
            <option value="">Any role</option>
            {ROLES.map((r) => <option key={r} value={r}>{ROLE_LABELS[r]}</option>)}
          </select>
        </div>
        <p className="pb-2 text-small text-ink-muted" aria-live="polite">{table.getRowModel().rows.length} of {people.length} people</p>
      </div>
      <div className="overflow-x-auto">
        <table className="data-table">
          <thead>{table.getHeaderGroups().map((hg) => (
            <tr key={hg.id}>{hg.headers.map((h) => {
              const sorted = h.column.getIsSorted();
              return (
                <th key={h.id} aria-sort={sorted ? (sorted === 'asc' ? 'ascending' : 'descending') : undefined}>
                  {h.column.getCanSort() ? (
                    <button type="button" className="inline-flex items-center gap-1 font-semibold" onClick={h.column.getToggleSortingHandler()}>
                      {flexRender(h.column.columnDef.header, h.getContext())}
                      <span aria-hidden className="text-ink-faint">{sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : '↕'}</span>
                    </button>
                  ) : flexRender(h.column.columnDef.header, h.getContext())}
                </th>
              );
            })}</tr>
          ))}</thead>
          <tbody>{table.getRowModel().rows.map((row) => (
            <tr key={row.id} data-testid="person-row" className={row.original.active ? '' : 'text-ink-faint'}>
              {row.getVisibleCells().map((cell) => <td key={cell.id}>{flexRender(cell.column.columnDef.cell, cell.getContext())}</td>)}
            </tr>
          ))}</tbody>
        </table>
      </div>
    </section>
  );
}
