import type { AtlasEntryView } from '@cairn/schema';

/** The families drawn as a rows × cols matrix; the rest are listed in the table only. */
export const MATRIX_FAMILIES = ['grid', 'cylinder', 'torus'] as const;
export type MatrixFamily = (typeof MATRIX_FAMILIES)[number];
export const isMatrixFamily = (f: string): f is MatrixFamily => (MATRIX_FAMILIES as readonly string[]).includes(f);

/** Every family a graph in the atlas can belong to (the graph spec families). */
export const ATLAS_FAMILIES = ['grid', 'cylinder', 'torus', 'staircase', 'path', 'cycle', 'complete', 'bipartite', 'star', 'random-tree', 'gnp', 'mask', 'tree', 'upload'] as const;

/** Grids and tori are the same graph transposed, so the atlas stores rows <= cols and the mirror reads it. */
export const hasMirror = (family: string) => family === 'grid' || family === 'torus';

/** rows and cols of an entry, from its sizes or else its key (`grid:4x9`). */
export function entrySize(entry: AtlasEntryView): { rows: number; cols: number } | null {
  const rows = entry.sizes.rows;
  const cols = entry.sizes.cols;
  if (typeof rows === 'number' && typeof cols === 'number') return { rows, cols };
  const m = /:(\d+)x(\d+)/.exec(entry.graphKey);
  return m ? { rows: Number(m[1]), cols: Number(m[2]) } : null;
}

/** The value, or the interval, as the atlas writes it. */
export const valueText = (e: Pick<AtlasEntryView, 'exact' | 'rankNumber' | 'lower' | 'upper'>) =>
  e.exact || e.lower === e.upper ? String(e.rankNumber ?? e.lower) : `${e.lower}–${e.upper}`;

/** A side's argument in words: the provenance records carry `argument` (and `source` or `construction`). */
export function provenanceWords(p: Record<string, unknown>): string {
  const parts = ['construction', 'argument', 'source'].map((k) => p[k]).filter((v): v is string => typeof v === 'string' && v.length > 0);
  return parts.length > 0 ? [...new Set(parts)].join(' — ') : Object.keys(p).length > 0 ? JSON.stringify(p) : 'no argument recorded';
}
