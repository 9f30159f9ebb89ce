import type { Graph } from './graph';

/** True when g has no cycle: every component has one edge fewer than vertices. */
export function isForest(g: Graph): boolean {
  const n = g.vertexCount;
  if (g.edgeCount >= n) return false;
  const seen = new Uint8Array(n);
  const stack: number[] = [];
  let components = 0;
  for (let s = 0; s < n; s++) {
    if (seen[s]) continue;
    components++;
    seen[s] = 1;
    stack.push(s);
    while (stack.length) {
      for (const w of g.neighbours(stack.pop()!)) {
        if (!seen[w]) {
          seen[w] = 1;
          stack.push(w);
        }
      }
    }
  }
  return g.edgeCount === n - components;
}
