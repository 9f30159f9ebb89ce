import type { Family, GridLayout } from '../graph/family';
import { Graph } from '../graph/graph';

/**
 * The rows x cols lattice with vertex r * cols + c, joined to its row and column neighbours; with
 * wrapRows the columns close into cycles (row r - 1 of row 0 is row rows - 1), with wrapCols the rows do.
 * Builds the compressed adjacency directly (no edge list, no sort beyond four entries).
 */
export function latticeGraph(rows: number, cols: number, wrapRows: boolean, wrapCols: boolean, family: Family): Graph {
  const n = rows * cols;
  const offsets = new Uint32Array(n + 1);
  const targets = new Uint32Array(4 * n);
  const run = new Uint32Array(4);
  let w = 0;
  for (let r = 0; r < rows; r++) {
    for (let c = 0; c < cols; c++) {
      const v = r * cols + c;
      offsets[v] = w;
      let k = 0;
      if (r > 0) run[k++] = v - cols;
      else if (wrapRows) run[k++] = (rows - 1) * cols + c;
      if (c > 0) run[k++] = v - 1;
      else if (wrapCols) run[k++] = v + cols - 1;
      if (c < cols - 1) run[k++] = v + 1;
      else if (wrapCols) run[k++] = v - cols + 1;
      if (r < rows - 1) run[k++] = v + cols;
      else if (wrapRows) run[k++] = c;
      if (wrapRows || wrapCols) {
        for (let i = 1; i < k; i++) {
          const x = run[i]!;
          let j = i - 1;
          for (; j >= 0 && run[j]! > x; j--) run[j + 1] = run[j]!;
          run[j + 1] = x;
        }
      }
      for (let i = 0; i < k; i++) targets[w++] = run[i]!;
    }
  }
  offsets[n] = w;
  const cells = new Int32Array(n);
  for (let v = 0; v < n; v++) cells[v] = v;
  const layout: GridLayout = { rows, cols, cells };
  return new Graph(offsets, w === targets.length ? targets : targets.slice(0, w), family, layout);
}
