/**
 * A small ranking checker of the tests' own, independent of the engine and the server, for the little
 * graphs the end-to-end tests draw: straight from the definition (Bodlaender et al., "Rankings of graphs",
 * SIAM J. Discrete Math. 1998) — a labelling is a ranking when every path between two vertices with the
 * same label passes a vertex with a larger label. Equivalently, for every label L, each connected
 * component of the subgraph induced by the vertices labelled at most L holds at most one vertex labelled L.
 */
export type Adjacency = number[][];

const join = (adj: Adjacency, v: number, w: number) => {
  adj[v]!.push(w);
  adj[w]!.push(v);
};

/** The rows x cols grid, vertices numbered row by row (as Cairn numbers them). */
export function gridAdjacency(rows: number, cols: number): Adjacency {
  const adj: Adjacency = Array.from({ length: rows * cols }, () => []);
  for (let r = 0; r < rows; r++)
    for (let c = 0; c < cols; c++) {
      const v = r * cols + c;
      if (c + 1 < cols) join(adj, v, v + 1);
      if (r + 1 < rows) join(adj, v, v + cols);
    }
  return adj;
}

/** A mask (`#` cell, `.` hole): its cells numbered row by row, joined to the cells beside them. */
export function maskAdjacency(text: string): { adj: Adjacency; cells: [row: number, col: number][] } {
  const lines = text.split('\n').filter((l) => l.trim() !== '');
  const index = new Map<string, number>();
  const cells: [number, number][] = [];
  lines.forEach((line, r) =>
    [...line].forEach((ch, c) => {
      if (ch !== '#') return;
      index.set(`${r},${c}`, cells.length);
      cells.push([r, c]);
    }),
  );
  const adj: Adjacency = cells.map(() => []);
  cells.forEach(([r, c], v) => {
    for (const [dr, dc] of [[0, 1], [1, 0]] as const) {
      const w = index.get(`${r + dr},${c + dc}`);
      if (w !== undefined) join(adj, v, w);
    }
  });
  return { adj, cells };
}

/** The path P_n. */
export function pathAdjacency(n: number): Adjacency {
  return Array.from({ length: n }, (_, v) => [v - 1, v + 1].filter((w) => w >= 0 && w < n));
}

export function isRanking(adj: Adjacency, labels: readonly number[]): boolean {
  if (labels.length !== adj.length || labels.some((l) => !Number.isInteger(l) || l < 1)) return false;
  for (const L of new Set(labels)) {
    const seen = new Array<boolean>(adj.length).fill(false);
    for (let s = 0; s < adj.length; s++) {
      if (seen[s] || labels[s]! > L) continue;
      let top = 0;
      const stack = [s];
      seen[s] = true;
      while (stack.length > 0) {
        const v = stack.pop()!;
        if (labels[v] === L && ++top > 1) return false;
        for (const w of adj[v]!) {
          if (seen[w] || labels[w]! > L) continue;
          seen[w] = true;
          stack.push(w);
        }
      }
    }
  }
  return true;
}

/** Whether `path` is a walk along edges of the graph without repeated vertices. */
export function isSimplePath(adj: Adjacency, path: readonly number[]): boolean {
  if (new Set(path).size !== path.length) return false;
  return path.every((v, i) => i === 0 || adj[path[i - 1]!]!.includes(v));
}
