import { flexRender, type Row, type Table } from '@tanstack/react-table';
import type { ReactNode } from 'react';

/** The class of each part of a table; what a table leaves out it takes from the boxed look of the admin and atlas tables. */
export interface DataTableClasses {
  wrapper: string;
  table: string;
  head: string;
  headerCell: string;
  body?: string;
  row?: string;
  cell: string;
}

const BOXED: DataTableClasses = {
  wrapper: 'overflow-x-auto rounded-md border border-stone-200',
  table: 'w-full text-left text-sm',
  head: 'bg-stone-100 text-xs uppercase tracking-wide text-lichen-700',
  headerCell: 'px-3 py-2',
  row: 'border-t border-stone-200',
  cell: 'px-3 py-2 align-middle',
};

const ARIA_SORT = { asc: 'ascending', desc: 'descending' } as const;

interface DataTableProps<T> {
  table: Table<T>;
  /** The table's data-testid. */
  testId: string;
  /** Read to screen readers only, as the table's caption. */
  caption?: string;
  classes?: Partial<DataTableClasses>;
  /** Added to the row's class, e.g. to grey out a revoked key. */
  rowClass?: (row: Row<T>) => string;
  /** Each body row's data-testid. */
  rowTestId?: string;
  /** Header buttons that sort by the column (the table needs its sorting state and sorted row model). */
  sortable?: boolean;
  busy?: boolean;
  /** Shown below the table when no row is left, such as when a search matches nothing. */
  empty?: ReactNode;
}

/** A TanStack table as HTML: a header row (sort buttons when `sortable`), the body rows of the current page, and an empty note. */
export function DataTable<T>({ table, testId, caption, classes, rowClass, rowTestId, sortable = false, busy, empty }: DataTableProps<T>) {
  const c = { ...BOXED, ...classes };
  const rows = table.getRowModel().rows;
  return (
    <>
      <div className={c.wrapper}>
        <table className={c.table} data-testid={testId} aria-busy={busy}>
          {caption && <caption className="sr-only">{caption}</caption>}
          <thead className={c.head}>
            {table.getHeaderGroups().map((g) => (
              <tr key={g.id}>
                {g.headers.map((h) => {
                  const header = flexRender(h.column.columnDef.header, h.getContext());
                  if (!sortable) {
                    return (
                      <th key={h.id} scope="col" className={c.headerCell}>
                        {header}
                      </th>
                    );
                  }
                  const sorted = h.column.getIsSorted();
                  return (
                    <th key={h.id} scope="col" className={c.headerCell} aria-sort={sorted ? ARIA_SORT[sorted] : 'none'}>
                      <button type="button" className="inline-flex items-center gap-1 uppercase hover:text-slate-ink" onClick={h.column.getToggleSortingHandler()}>
                        {header}
                        <span aria-hidden="true">{sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : ''}</span>
                      </button>
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody className={c.body}>
            {rows.map((row) => (
              <tr key={row.id} className={rowClass ? `${c.row ?? ''} ${rowClass(row)}` : c.row} data-testid={rowTestId}>
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className={c.cell}>
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {rows.length === 0 && empty}
    </>
  );
}
