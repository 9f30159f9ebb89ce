import type { SweepView } from '@cairn/schema';
import { isFormula } from './cells';

/**
 * One point per column count; per row count r the keys `u<r>` (upper, the value when exact), `l<r>` (lower),
 * `f<r>` (whether the run's value came from a closed form) and `c<r>` (the closed form's value, where one exists).
 */
export type ChartPoint = { cols: number } & Record<string, number | boolean | null>;

export interface SweepChartData {
  points: ChartPoint[];
  rowCounts: number[];
  formulaCells: number;
  /** Row counts with a closed-form curve (at least two cells with a closed form). */
  curveRows: number[];
}

/** The sweep's cells as chart series: value, lower and upper bound against the column count, one series per row count. */
export function sweepChartData({ sweep, cells }: SweepView): SweepChartData {
  const rowCounts: number[] = [];
  for (let r = sweep.rows.from; r <= sweep.rows.to; r++) rowCounts.push(r);
  const points = new Map<number, ChartPoint>();
  for (let c = sweep.cols.from; c <= sweep.cols.to; c++) points.set(c, { cols: c });
  let formulaCells = 0;
  for (const cell of cells) {
    const p = points.get(cell.cols);
    if (!p) continue;
    const upper = cell.rankNumber ?? cell.upper;
    const lower = cell.rankNumber ?? cell.lower;
    p[`u${cell.rows}`] = upper;
    p[`l${cell.rows}`] = lower;
    const formula = isFormula(cell.provenance);
    p[`f${cell.rows}`] = formula;
    if (formula) formulaCells++;
    p[`c${cell.rows}`] = cell.closedForm?.value ?? null;
  }
  const curveRows = rowCounts.filter((r) => cells.filter((c) => c.rows === r && c.closedForm).length >= 2);
  return { points: [...points.values()], rowCounts, formulaCells, curveRows };
}

/** Series colours from Cairn's palette, repeated when there are more row counts than colours. */
export const SERIES_COLOURS = ['#1f2d2b', '#c98a3a', '#3f5a55', '#8f5a1c', '#6f8a80', '#b23a2e'] as const;
export const seriesColour = (i: number) => SERIES_COLOURS[i % SERIES_COLOURS.length]!;
