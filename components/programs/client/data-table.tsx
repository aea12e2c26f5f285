'use client';
/**
 * A table with sorting, a text filter and pages (TanStack Table 8), for the list
 * screens. Columns are TanStack column definitions.
 */
import { useState } from 'react';
import {
  flexRender, getCoreRowModel, getFilteredRowModel, getPaginationRowModel, getSortedRowModel,
  useReactTable, type ColumnDef, type SortingState,
} from '@tanstack/react-table';

export type DataTableProps<T> = {
  data: T[];
  columns: ColumnDef<T, unknown>[];
  label: string;
  filterPlaceholder?: string;
  pageSize?: number;
  empty?: string;
};

export function DataTable<T>({ data, columns, label, filterPlaceholder = 'Filter…', pageSize = 20, empty = 'Nothing here yet.' }: DataTableProps<T>) {
  const [sorting, setSorting] = useState<SortingState>([]);
  const [filter, setFilter] = useState('');
  const table = useReactTable({
    data, columns,
    state: { sorting, globalFilter: filter },
    onSortingChange: setSorting,
    onGlobalFilterChange: setFilter,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getPaginationRowModel: getPaginationRowModel(),
    initialState: { pagination: { pageSize } },
  });
  const rows = table.getRowModel().rows;
  return (
    <div className="card overflow-hidden">
      <div className="flex items-center gap-2 border-b border-line p-2">
        <input className="field-input max-w-xs" placeholder={filterPlaceholder} aria-label={`Filter ${label}`} value={filter} onChange={(e) => setFilter(e.target.value)} />
        <span className="text-caption text-ink-muted">{table.getFilteredRowModel().rows.length} of {data.length}</span>
      </div>
      <div className="overflow-x-auto">
        <table className="data-table" aria-label={label}>
          <thead>
            {table.getHeaderGroups().map((hg) => (
              <tr key={hg.id}>
                {hg.headers.map((h) => {
                  const sorted = h.column.getIsSorted();
                  return (
                    <th key={h.id} aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : 'none'}>
                      {h.column.getCanSort() ? (
                        <button type="button" className="inline-flex items-center gap-1" onClick={h.column.getToggleSortingHandler()}>
                          {flexRender(h.column.columnDef.header, h.getContext())}
                          <span aria-hidden>{sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : '↕'}</span>
                        </button>
                      ) : flexRender(h.column.columnDef.header, h.getContext())}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {rows.length === 0 ? (
              <tr><td colSpan={columns.length} className="text-ink-muted">{empty}</td></tr>
            ) : rows.map((r) => (
              <tr key={r.id}>{r.getVisibleCells().map((c) => <td key={c.id}>{flexRender(c.column.columnDef.cell, c.getContext())}</td>)}</tr>
            ))}
          </tbody>
        </table>
      </div>
      {table.getPageCount() > 1 ? (
        <div className="flex items-center gap-2 border-t border-line p-2 text-small">
          <button type="button" className="btn-secondary" disabled={!table.getCanPreviousPage()} onClick={() => table.previousPage()}>Previous</button>
          <span>Page {table.getState().pagination.pageIndex + 1} of {table.getPageCount()}</span>
          <button type="button" className="btn-secondary" disabled={!table.getCanNextPage()} onClick={() => table.nextPage()}>Next</button>
        </div>
      ) : null}
    </div>
  );
}
