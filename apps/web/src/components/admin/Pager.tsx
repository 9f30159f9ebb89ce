import type { Table } from '@tanstack/react-table';
import { quietButtonClass } from '../sweep/states';

/** Previous / next for a table paged in the browser, with where one is. */
export function Pager<T>({ table, label }: { table: Table<T>; label: string }) {
  const { pageIndex, pageSize } = table.getState().pagination;
  const rows = table.getFilteredRowModel().rows.length;
  if (rows <= pageSize) return null;
  return (
    <nav className="flex items-center gap-3" aria-label={label}>
      <button type="button" className={quietButtonClass} onClick={() => table.previousPage()} disabled={!table.getCanPreviousPage()}>
        Previous
      </button>
      <span className="text-sm text-lichen-700" aria-live="polite">
        {pageIndex * pageSize + 1}–{Math.min(rows, (pageIndex + 1) * pageSize)} of {rows}
      </span>
      <button type="button" className={quietButtonClass} onClick={() => table.nextPage()} disabled={!table.getCanNextPage()}>
        Next
      </button>
    </nav>
  );
}
