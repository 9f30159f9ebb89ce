import { MAX_SWEEP_CELLS, type SweepCell, type SweepFamily } from '@cairn/schema';

export { MAX_SWEEP_CELLS };

/** Grids and tori are the same graph transposed; cylinders are not (rows are paths, columns cycles). */
export const mirrorsShare = (family: SweepFamily) => family !== 'cylinder';

const span = (r: { from: number; to: number }) => (Number.isInteger(r.from) && Number.isInteger(r.to) && r.from >= 1 && r.to >= r.from ? r.to - r.from + 1 : null);

/** How many cells a sweep over these ranges makes, and how many runs compute them (mirror cells share one). */
export function countCells(family: SweepFamily, rows: { from: number; to: number }, cols: { from: number; to: number }): { cells: number; runs: number } | null {
  const r = span(rows);
  const c = span(cols);
  if (r === null || c === null) return null;
  const cells = r * c;
  if (!mirrorsShare(family) || cells > 100 * MAX_SWEEP_CELLS) return { cells, runs: cells };
  const seen = new Set<string>();
  for (let i = rows.from; i <= rows.to; i++) for (let j = cols.from; j <= cols.to; j++) seen.add(i <= j ? `${i}x${j}` : `${j}x${i}`);
  return { cells, runs: seen.size };
}

/** What a cell of the table says: the value, the interval, or where its run is. */
export function cellText(cell: SweepCell): string {
  if (cell.rankNumber !== null) return String(cell.rankNumber);
  if (cell.lower !== null && cell.upper !== null) return cell.lower === cell.upper ? String(cell.lower) : `[${cell.lower}, ${cell.upper}]`;
  return cell.status ?? 'no run';
}

/** How well a cell is known, which sets its shade (the atlas uses the same words). */
export type Knowledge = 'exact' | 'bounded' | 'pending' | 'missing';

export function cellKnowledge(cell: SweepCell): Knowledge {
  if (cell.rankNumber !== null || (cell.lower !== null && cell.lower === cell.upper)) return 'exact';
  if (cell.lower !== null && cell.upper !== null) return 'bounded';
  if (cell.status === 'queued' || cell.status === 'running') return 'pending';
  return 'missing';
}

/** A closed form proves the value (`formula:<id>`), as opposed to a search or a pair of bounds. */
export const isFormula = (provenance: string | null | undefined) => provenance?.startsWith('formula:') ?? false;
