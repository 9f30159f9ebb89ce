import type { RunSummary } from '@cairn/schema';
import { createColumnHelper, getCoreRowModel, getSortedRowModel, useReactTable, type SortingState } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { Link } from 'react-router';
import { DataTable } from '../table/DataTable';
import { StatusBadge, linkClass } from './bits';
import { formatDuration, formatWhen, METHOD_WORDS, provenanceTag, runDurationMs, valueText } from './words';

const column = createColumnHelper<RunSummary>();

/** Sorts unknown values (null) last whichever way the column is sorted. */
const nullLast = (a: number | null, b: number | null) => (a === null ? (b === null ? 0 : 1) : b === null ? -1 : a - b);

/**
 * One page of runs as a table. Sorting reorders the page that is loaded (the server pages newest first);
 * the filters and the pages themselves are the server's.
 */
export function RunsTable({ runs, showOwner }: { runs: RunSummary[]; showOwner: boolean }) {
  const [sorting, setSorting] = useState<SortingState>([]);
  const columns = useMemo(
    () => [
      column.accessor('status', { header: 'Status', cell: (c) => <StatusBadge status={c.getValue()} /> }),
      column.accessor('specText', {
        header: 'Graph',
        cell: (c) => (
          <Link className={`${linkClass} font-mono`} to={`/runs/${c.row.original.id}`}>
            {c.getValue()}
          </Link>
        ),
      }),
      column.accessor((r) => r.rankNumber ?? r.upper, {
        id: 'value',
        header: 'Value',
        sortingFn: (a, b) => nullLast(a.original.rankNumber ?? a.original.upper, b.original.rankNumber ?? b.original.upper),
        cell: (c) => {
          const r = c.row.original;
          const progress = r.progress && r.status === 'running' ? `${r.progress.lower}–${r.progress.upper} so far` : null;
          return (
            <span>
              <span className="font-medium">{r.rankNumber !== null || r.lower !== null ? valueText(r) : (progress ?? '—')}</span>
              {r.provenance && <span className="block text-xs text-lichen-700">{provenanceTag(r.provenance)}</span>}
            </span>
          );
        },
      }),
      column.accessor('method', { header: 'Method', cell: (c) => METHOD_WORDS[c.getValue()].name }),
      column.accessor('createdAt', { header: 'Created', cell: (c) => <span className="whitespace-nowrap">{formatWhen(c.getValue())}</span> }),
      column.accessor((r) => runDurationMs(r), {
        id: 'took',
        header: 'Time taken',
        sortingFn: (a, b) => nullLast(runDurationMs(a.original), runDurationMs(b.original)),
        cell: (c) => {
          const r = c.row.original;
          const ms = c.getValue();
          return ms === null ? '—' : r.finishedAt ? formatDuration(ms) : `${formatDuration(ms)} so far`;
        },
      }),
      ...(showOwner ? [column.accessor((r) => r.owner.login, { id: 'owner', header: 'Owner' })] : []),
    ],
    [showOwner],
  );
  const table = useReactTable({
    data: runs,
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    sortDescFirst: false, // every column sorts smallest first on the first click
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getRowId: (r) => r.id,
  });
  return (
    <DataTable
      table={table}
      testId="runs-table"
      caption="Runs, newest first; the column headers sort this page"
      sortable
      classes={{
        wrapper: 'overflow-x-auto rounded-lg ring-1 ring-stone-200',
        table: 'min-w-full text-left text-sm',
        headerCell: 'px-3 py-2 font-medium',
        body: 'divide-y divide-stone-100',
        row: 'hover:bg-stone-100/60',
        cell: 'px-3 py-2 align-top',
      }}
      rowTestId="run-row"
    />
  );
}
