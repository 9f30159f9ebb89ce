import type { Table } from '@tanstack/react-table';
import type { ReactNode } from 'react';
import { quietButtonClass } from '../sweep/states';

interface PagerNavProps {
  /** The nav's aria-label, e.g. "Member pages". */
  label: string;
  /** Where one is, between the two buttons. */
  children: ReactNode;
  canPrevious: boolean;
  canNext: boolean;
  onPrevious: () => void;
  onNext: () => void;
  previousText?: string;
  nextText?: string;
  className?: string;
  buttonClassName?: string;
}

/** Previous / where one is / next, for any list that comes a page at a time (a table, a cursor, an offset). */
export function PagerNav({
  label,
  children,
  canPrevious,
  canNext,
  onPrevious,
  onNext,
  previousText = 'Previous',
  nextText = 'Next',
  className = 'flex items-center gap-3',
  buttonClassName = quietButtonClass,
}: PagerNavProps) {
  return (
    <nav className={className} aria-label={label}>
      <button type="button" className={buttonClassName} onClick={onPrevious} disabled={!canPrevious}>
        {previousText}
      </button>
      {children}
      <button type="button" className={buttonClassName} onClick={onNext} disabled={!canNext}>
        {nextText}
      </button>
    </nav>
  );
}

interface PagerProps<T> extends Pick<PagerNavProps, 'label' | 'previousText' | 'nextText' | 'className' | 'buttonClassName'> {
  table: Table<T>;
  /** Both buttons wait while a page is loading (tables paged by the server). */
  busy?: boolean;
  /** Show the pager even when every row fits on one page. */
  always?: boolean;
  /** Where one is; by default "21–40 of 57" (the rows of this page, of all rows, `rowCount` for a table paged by the server). */
  position?: ReactNode;
}

/** The pager of a TanStack table, paged in the browser or by the server; hidden when there is one page only, unless `always`. */
export function Pager<T>({ table, busy = false, always = false, position, ...nav }: PagerProps<T>) {
  if (!always && table.getPageCount() <= 1) return null;
  const { pageIndex, pageSize } = table.getState().pagination;
  const first = pageIndex * pageSize;
  return (
    <PagerNav {...nav} canPrevious={table.getCanPreviousPage() && !busy} canNext={table.getCanNextPage() && !busy} onPrevious={() => table.previousPage()} onNext={() => table.nextPage()}>
      {position ?? (
        <span className="text-sm text-lichen-700" aria-live="polite">
          {first + 1}–{first + table.getRowModel().rows.length} of {table.getRowCount()}
        </span>
      )}
    </PagerNav>
  );
}
