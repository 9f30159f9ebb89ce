import { formulaFor, graphFromSpec } from '@cairn/engine';
import type { SweepFamily } from '@cairn/schema';

/** Beyond this many cells a table's closed forms are not worth building the graph for on every read. */
const MAX_CELLS = 100_000;
const known = new Map<string, { value: number; id: string } | null>();

/**
 * The closed-form value of one sweep cell (2 x n grids, paths, cycles, ...) with the formula's id, or
 * null; from the engine's formulas on the cell's own graph, remembered per size.
 */
export function closedFormOf(family: SweepFamily, rows: number, cols: number): { value: number; id: string } | null {
  if (rows * cols > MAX_CELLS) return null;
  const key = `${family}:${rows}x${cols}`;
  let found = known.get(key);
  if (found === undefined) {
    const f = formulaFor(graphFromSpec({ family, rows, cols }));
    found = f ? { value: f.value, id: f.formula.id } : null;
    if (known.size > 10_000) known.clear();
    known.set(key, found);
  }
  return found;
}
