import type { SweepCell, SweepView } from '@cairn/schema';
import { useMemo } from 'react';
import { Link } from 'react-router';
import { SHADE_CLASS, ShadeLegend, shadeOf } from '../atlas/knowledge';
import { cellText, isFormula } from './cells';

const range = (from: number, to: number) => Array.from({ length: Math.max(0, to - from + 1) }, (_, i) => from + i);

/** Words for screen readers: the cell's sizes, what is known, and whose run it shows. */
function cellLabel(cell: SweepCell): string {
  const what =
    cell.rankNumber !== null
      ? `rank number ${cell.rankNumber}`
      : cell.lower !== null && cell.upper !== null
        ? `between ${cell.lower} and ${cell.upper}${cell.status === 'running' ? ', still running' : ''}`
        : (cell.status ?? 'no run');
  const mirror = cell.mirrorOf ? `, mirror of ${cell.mirrorOf.rows} × ${cell.mirrorOf.cols}` : '';
  const formula = isFormula(cell.provenance) ? `, by ${cell.provenance}` : '';
  return `${cell.rows} × ${cell.cols}: ${what}${formula}${mirror}`;
}

function Cell({ cell }: { cell: SweepCell | undefined }) {
  if (!cell) return <td className="border border-stone-200 bg-stone-50" />;
  const known = cell.rankNumber !== null ? shadeOf(cell.rankNumber, cell.rankNumber) : shadeOf(cell.lower, cell.upper);
  const pending = cell.status === 'queued' || cell.status === 'running';
  const failed = cell.status === 'failed' || cell.status === 'cancelled';
  const tone =
    known !== 'unknown'
      ? SHADE_CLASS[known]
      : pending
        ? 'bg-stone-50 text-ochre-700 border-dashed border-ochre-500'
        : failed
          ? 'bg-stone-50 text-alarm-600 border-alarm-600/40'
          : SHADE_CLASS.unknown;
  const text = cellText(cell);
  const content = (
    <>
      <span className={cell.mirrorOf ? 'italic opacity-80' : ''}>{text}</span>
      {cell.mirrorOf && (
        <span className="absolute left-0.5 top-0 text-[9px] leading-none opacity-70" aria-hidden="true">
          ⇄
        </span>
      )}
      {isFormula(cell.provenance) && <span className="absolute right-0.5 top-0.5 h-1.5 w-1.5 rounded-full bg-ochre-500" aria-hidden="true" />}
      {pending && known !== 'unknown' && <span className="absolute bottom-0.5 right-0.5 h-1.5 w-1.5 animate-pulse rounded-full bg-ochre-500" aria-hidden="true" />}
    </>
  );
  const box = `relative flex h-full min-h-9 min-w-12 items-center justify-center whitespace-nowrap border px-1.5 font-mono text-xs ${tone}`;
  return (
    <td
      className="p-0"
      data-testid={`sweep-cell-${cell.rows}x${cell.cols}`}
      data-state={cell.status ?? 'none'}
      data-mirror={cell.mirrorOf ? `${cell.mirrorOf.rows}x${cell.mirrorOf.cols}` : undefined}
      data-formula={isFormula(cell.provenance) || undefined}
    >
      {cell.runId ? (
        <Link to={`/runs/${cell.runId}`} className={`${box} hover:outline hover:outline-2 hover:outline-ochre-500 focus:outline focus:outline-2 focus:outline-ochre-500`} aria-label={cellLabel(cell)} title={cellLabel(cell)}>
          {content}
        </Link>
      ) : (
        <span className={box} aria-label={cellLabel(cell)} title={cellLabel(cell)}>
          {content}
        </span>
      )}
    </td>
  );
}

/** The sweep as a rows × cols matrix: each cell its value, its interval, or where its run is. */
export function SweepTable({ view }: { view: SweepView }) {
  const { sweep, cells } = view;
  const byKey = useMemo(() => new Map(cells.map((c) => [`${c.rows}x${c.cols}`, c])), [cells]);
  const rows = range(sweep.rows.from, sweep.rows.to);
  const cols = range(sweep.cols.from, sweep.cols.to);
  return (
    <div className="space-y-3">
      <p className="text-sm text-lichen-700" aria-hidden="true">
        Rows {sweep.rows.from}–{sweep.rows.to} down, columns {sweep.cols.from}–{sweep.cols.to} across{sweep.mirrorCells === 'shared' ? '; ⇄ marks a cell showing its mirror’s run' : ''}.
      </p>
      <div className="overflow-x-auto rounded-md border border-stone-200 bg-white/40">
        <table className="border-separate border-spacing-0.5 text-sm" data-testid="sweep-table">
          <caption className="sr-only">
            {sweep.family} rank numbers: rows {sweep.rows.from}–{sweep.rows.to} down, columns {sweep.cols.from}–{sweep.cols.to} across
            {sweep.mirrorCells === 'shared' ? '; ⇄ marks a cell that shows its mirror’s run' : ''}
          </caption>
          <thead>
            <tr>
              <th scope="col" className="sticky left-0 whitespace-nowrap bg-stone-50 px-1.5 text-xs font-normal text-lichen-500">
                <span className="sr-only">rows \ columns</span>
                <span aria-hidden="true">r \ c</span>
              </th>
              {cols.map((c) => (
                <th key={c} scope="col" className="px-1 font-mono text-xs font-medium text-lichen-700">
                  {c}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {rows.map((r) => (
              <tr key={r}>
                <th scope="row" className="sticky left-0 bg-stone-50 px-1.5 text-right font-mono text-xs font-medium text-lichen-700">
                  {r}
                </th>
                {cols.map((c) => (
                  <Cell key={c} cell={byKey.get(`${r}x${c}`)} />
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <ShadeLegend
        extra={
          <>
            <li className="inline-flex items-center gap-1.5">
              <span className="inline-block h-4 w-5 rounded-sm border border-dashed border-ochre-500 bg-stone-50" aria-hidden="true" />
              queued or running
            </li>
            {sweep.mirrorCells === 'shared' && <li>⇄ mirror cell</li>}
          </>
        }
      />
    </div>
  );
}
