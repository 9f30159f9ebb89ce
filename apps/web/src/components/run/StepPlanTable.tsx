import type { RunPlan } from '@cairn/schema';
import { createColumnHelper, getCoreRowModel, getPaginationRowModel, useReactTable } from '@tanstack/react-table';
import { useMemo } from 'react';
import { DataTable } from '../table/DataTable';
import { Pager } from '../table/Pager';
import { quietButtonClass } from './bits';

type Step = RunPlan['steps'][number];

/** How many vertices of a step are listed before "…". */
export const STEP_VERTICES_SHOWN = 12;

/** The step plan read from labels alone (step s handles every vertex labelled s), when the plan route is not at hand. */
export function stepsFromLabels(labels: readonly number[]): Step[] {
  const byLabel = new Map<number, number[]>();
  labels.forEach((l, v) => {
    const list = byLabel.get(l);
    if (list) list.push(v);
    else byLabel.set(l, [v]);
  });
  return [...byLabel.entries()].sort((a, b) => a[0] - b[0]).map(([step, vertices]) => ({ step, vertices, count: vertices.length }));
}

const column = createColumnHelper<Step>();

/**
 * The step plan as a table, a page of steps at a time: step s handles its vertices in parallel, and
 * step s + 1 may start once step s is done. `nameOf` writes a vertex the way the page draws it.
 */
export function StepPlanTable({ steps, nameOf = String, pageSize = 20 }: { steps: Step[]; nameOf?: (v: number) => string; pageSize?: number }) {
  const columns = useMemo(
    () => [
      column.accessor('step', { header: 'Step', cell: (c) => <span className="font-mono">{c.getValue()}</span> }),
      column.accessor('count', { header: 'Count', cell: (c) => c.getValue().toLocaleString('en') }),
      column.accessor('vertices', {
        header: 'Vertices',
        cell: (c) => {
          const vs = c.getValue();
          const shown = vs.slice(0, STEP_VERTICES_SHOWN).map(nameOf).join(', ');
          return (
            <span className="font-mono text-xs">
              {shown}
              {vs.length > STEP_VERTICES_SHOWN ? ', …' : ''}
            </span>
          );
        },
      }),
    ],
    [nameOf],
  );
  const table = useReactTable({
    data: steps,
    columns,
    getCoreRowModel: getCoreRowModel(),
    getPaginationRowModel: getPaginationRowModel(),
    initialState: { pagination: { pageIndex: 0, pageSize } },
  });
  if (steps.length === 0) return <p className="text-sm text-lichen-700">The plan has no steps.</p>;
  return (
    <div className="space-y-2">
      <DataTable
        table={table}
        testId="step-plan"
        caption="Step plan: the vertices each step handles in parallel"
        classes={{
          wrapper: 'overflow-x-auto',
          table: 'min-w-full text-left text-sm',
          head: 'border-b border-stone-200 text-xs uppercase tracking-wide text-lichen-700',
          headerCell: 'px-2 py-1.5 font-medium',
          body: 'divide-y divide-stone-100',
          row: undefined, // the body draws the lines between steps
          cell: 'px-2 py-1.5 align-top',
        }}
      />
      <Pager
        table={table}
        label="Step plan pages"
        previousText="Previous steps"
        nextText="Next steps"
        className="flex items-center gap-2 text-sm"
        buttonClassName={quietButtonClass}
        position={
          <span>
            page {table.getState().pagination.pageIndex + 1} of {table.getPageCount()}
          </span>
        }
      />
    </div>
  );
}
