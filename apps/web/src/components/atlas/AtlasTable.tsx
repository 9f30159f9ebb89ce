import { zodResolver } from '@hookform/resolvers/zod';
import { AtlasQuery, type AtlasEntryView } from '@cairn/schema';
import { createColumnHelper, getCoreRowModel, useReactTable } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link } from 'react-router';
import { z } from 'zod';
import { ATLAS_PAGE_SIZE, useAtlasPage, type AtlasFilters } from '../../api/atlas';
import { Field, invalidProps } from '../form/Field';
import { EmptyNote, ErrorNote, formatWhen, inputClass, LoadingNote, buttonClass } from '../sweep/states';
import { DataTable } from '../table/DataTable';
import { Pager } from '../table/Pager';
import { provenanceWords, valueText } from './entries';
import { SHADE_CLASS, shadeOf, SHADE_WORDS } from './knowledge';

const blankToUndefined = (v: unknown) => (typeof v === 'string' && v.trim() === '' ? undefined : v);

/** The table's filters, checked with the API's own size rules (an empty box is no filter). */
const FilterSchema = z.object({
  rows: z.preprocess(blankToUndefined, AtlasQuery.shape.rows),
  cols: z.preprocess(blankToUndefined, AtlasQuery.shape.cols),
  exact: z.enum(['any', 'true', 'false']),
});
type FilterInput = z.input<typeof FilterSchema>;
type FilterOutput = z.output<typeof FilterSchema>;

const column = createColumnHelper<AtlasEntryView>();

const runLink = (id: string | null, text: string) =>
  id ? (
    <Link to={`/runs/${id}`} className="text-lichen-700 underline underline-offset-2">
      {text}
    </Link>
  ) : null;

/** How one side of the value is known, with a link to the run that showed it. */
const boundColumn = (side: 'lower' | 'upper', header: string) =>
  column.display({
    id: side,
    header,
    cell: ({ row }) => (
      <span className="text-xs">
        {provenanceWords(row.original[`${side}Provenance`])} {runLink(row.original[`${side}RunId`], 'run')}
      </span>
    ),
  });

const columns = [
  column.accessor('graphKey', { header: 'Graph', cell: (c) => <span className="font-mono">{c.getValue()}</span> }),
  column.display({
    id: 'size',
    header: 'Vertices / edges',
    cell: ({ row }) => (
      <span className="font-mono text-xs">
        {row.original.vertexCount} / {row.original.edgeCount}
      </span>
    ),
  }),
  column.display({
    id: 'value',
    header: 'Rank number',
    cell: ({ row }) => {
      const shade = shadeOf(row.original.lower, row.original.upper);
      return (
        <span className="inline-flex items-center gap-2">
          <span className={`inline-block h-3.5 w-4 rounded-sm border ${SHADE_CLASS[shade]}`} aria-hidden="true" />
          <span className="font-mono font-medium">{valueText(row.original)}</span>
          <span className="sr-only">({SHADE_WORDS[shade]})</span>
        </span>
      );
    },
  }),
  boundColumn('lower', 'Lower bound from'),
  boundColumn('upper', 'Upper bound from'),
  column.accessor('updatedAt', { header: 'Updated', cell: (c) => <span className="whitespace-nowrap text-xs">{formatWhen(c.getValue())}</span> }),
];

/** The atlas as a table: filtered and paged by the server (offset), so any number of entries stays quick. */
export function AtlasTable({ family }: { family: string | undefined }) {
  const [filters, setFilters] = useState<Omit<AtlasFilters, 'family'>>({});
  const [pageIndex, setPageIndex] = useState(0);
  const query = useMemo(() => ({ ...filters, family }), [filters, family]);
  const page = useAtlasPage(query, pageIndex * ATLAS_PAGE_SIZE);
  const total = page.data?.total ?? 0;
  const pageCount = Math.max(1, Math.ceil(total / ATLAS_PAGE_SIZE));

  const table = useReactTable({
    data: page.data?.entries ?? [],
    columns,
    getCoreRowModel: getCoreRowModel(),
    manualPagination: true,
    pageCount,
    rowCount: total,
    state: { pagination: { pageIndex, pageSize: ATLAS_PAGE_SIZE } },
    onPaginationChange: (updater) => {
      const next = typeof updater === 'function' ? updater({ pageIndex, pageSize: ATLAS_PAGE_SIZE }) : updater;
      setPageIndex(next.pageIndex);
    },
    getRowId: (e) => e.graphKey,
  });

  const {
    register,
    handleSubmit,
    formState: { errors },
  } = useForm<FilterInput, unknown, FilterOutput>({ resolver: zodResolver(FilterSchema), defaultValues: { rows: '', cols: '', exact: 'any' } });

  const apply = (f: FilterOutput) => {
    setFilters({ rows: f.rows, cols: f.cols, exact: f.exact === 'any' ? undefined : f.exact === 'true' });
    setPageIndex(0);
  };

  return (
    <div className="space-y-4">
      <form onSubmit={handleSubmit(apply)} noValidate className="flex flex-wrap items-start gap-3" aria-label="Atlas filters">
        {(['rows', 'cols'] as const).map((axis) => (
          <Field key={axis} id={`atlas-${axis}`} label={axis === 'rows' ? 'Rows' : 'Columns'} error={errors[axis]?.message} className="w-28">
            <input
              id={`atlas-${axis}`}
              type="number"
              inputMode="numeric"
              min={1}
              className={inputClass}
              placeholder="any"
              {...register(axis)}
              {...invalidProps(`atlas-${axis}`, errors[axis]?.message)}
            />
          </Field>
        ))}
        <Field id="atlas-exact" label="Known" className="w-40">
          <select id="atlas-exact" className={inputClass} {...register('exact')}>
            <option value="any">exact or bounded</option>
            <option value="true">exact only</option>
            <option value="false">bounded only</option>
          </select>
        </Field>
        <button type="submit" className={`${buttonClass} mt-6`}>
          Apply filters
        </button>
      </form>
      <p className="text-xs text-lichen-500">For grids and tori the atlas stores rows ≤ columns; asking for 9 rows and 4 columns finds grid:4x9.</p>

      {page.isLoading ? (
        <LoadingNote>Loading the atlas…</LoadingNote>
      ) : page.isError ? (
        <ErrorNote error={page.error} what="load the atlas" />
      ) : total === 0 ? (
        <EmptyNote>No entries match. Every finished run adds its graph here; try fewer filters.</EmptyNote>
      ) : (
        <>
          <DataTable
            table={table}
            testId="atlas-table"
            busy={page.isFetching}
            classes={{ table: 'w-full min-w-[44rem] text-left text-sm', row: 'border-t border-stone-200 align-top', cell: 'px-3 py-2' }}
          />
          <Pager table={table} label="Atlas pages" busy={page.isFetching} always className="flex flex-wrap items-center gap-3" />
        </>
      )}
    </div>
  );
}
