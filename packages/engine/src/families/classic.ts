import { graphFromEdges } from '../graph/from-edges';
import type { Graph } from '../graph/graph';
import { checkCapacity, checkWhole } from './sizes';

/** The path P_n: vertices 0 .. n - 1, vertex i joined to i + 1; n - 1 edges. */
export function pathGraph(n: number): Graph {
  checkWhole('path', 'n', n, 1);
  checkCapacity(`path ${n}`, n, n);
  const pairs = new Uint32Array(2 * (n - 1));
  for (let i = 0; i + 1 < n; i++) {
    pairs[2 * i] = i;
    pairs[2 * i + 1] = i + 1;
  }
  return graphFromEdges(n, pairs, { kind: 'path', n });
}

/** The cycle C_n, n >= 3: the path with vertex n - 1 joined back to 0; n edges. */
export function cycleGraph(n: number): Graph {
  checkWhole('cycle', 'n', n, 3);
  checkCapacity(`cycle ${n}`, n, n);
  const pairs = new Uint32Array(2 * n);
  for (let i = 0; i < n; i++) {
    pairs[2 * i] = i;
    pairs[2 * i + 1] = (i + 1) % n;
  }
  return graphFromEdges(n, pairs, { kind: 'cycle', n });
}

/** The complete graph K_n: every pair of the n vertices joined; n(n - 1) / 2 edges. */
export function completeGraph(n: number): Graph {
  checkWhole('complete', 'n', n, 1);
  checkCapacity(`complete ${n}`, n, (n * (n - 1)) / 2);
  const pairs = new Uint32Array(n * (n - 1));
  let k = 0;
  for (let u = 0; u < n; u++) {
    for (let v = u + 1; v < n; v++) {
      pairs[k++] = u;
      pairs[k++] = v;
    }
  }
  return graphFromEdges(n, pairs, { kind: 'complete', n });
}

/** The complete bipartite graph K_{a,b}: side A is 0 .. a - 1, side B is a .. a + b - 1; a * b edges. */
export function completeBipartiteGraph(a: number, b: number): Graph {
  checkWhole('bipartite', 'a', a, 1);
  checkWhole('bipartite', 'b', b, 1);
  checkCapacity(`bipartite ${a}x${b}`, a + b, a * b);
  const pairs = new Uint32Array(2 * a * b);
  let k = 0;
  for (let u = 0; u < a; u++) {
    for (let v = 0; v < b; v++) {
      pairs[k++] = u;
      pairs[k++] = a + v;
    }
  }
  return graphFromEdges(a + b, pairs, { kind: 'completeBipartite', a, b });
}

/** The star K_{1,leaves}: centre 0 joined to the leaves 1 .. leaves. */
export function starGraph(leaves: number): Graph {
  checkWhole('star', 'leaves', leaves, 1);
  checkCapacity(`star ${leaves}`, leaves + 1, leaves);
  const pairs = new Uint32Array(2 * leaves);
  for (let i = 0; i < leaves; i++) {
    pairs[2 * i] = 0;
    pairs[2 * i + 1] = i + 1;
  }
  return graphFromEdges(leaves + 1, pairs, { kind: 'star', leaves });
}
