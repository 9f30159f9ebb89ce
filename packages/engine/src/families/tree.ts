import { EngineError } from '../errors';
import { checkVertexCount, graphFromEdges } from '../graph/from-edges';
import type { Family } from '../graph/family';
import type { Graph } from '../graph/graph';
import { seededRandom } from './seeded-random';
import { checkWhole } from './sizes';

/**
 * The tree (or forest) given by a parent array: parent[v] is v's parent, or -1 for a root. Vertex v
 * keeps its number. A parent outside the vertices, a vertex its own parent, or a cycle is an error.
 */
export function treeFromParents(parent: ArrayLike<number>, family?: Family): Graph {
  const n = parent.length;
  checkVertexCount(n, 'tree size');
  const pairs: number[] = [];
  for (let v = 0; v < n; v++) {
    const p = parent[v]!;
    if (p === -1) continue;
    if (!Number.isInteger(p) || p < 0 || p >= n) throw new EngineError('invalid_tree', `tree: parent of vertex ${v} is ${p}; expected -1 or a vertex 0..${n - 1}`);
    if (p === v) throw new EngineError('invalid_tree', `tree: vertex ${v} is its own parent`);
    pairs.push(v, p);
  }
  // Walk up from each vertex; meeting a vertex of the current walk again is a cycle.
  const state = new Uint8Array(n); // 0 unseen, 1 on the current walk, 2 known to reach a root
  const walk: number[] = [];
  for (let s = 0; s < n; s++) {
    let v = s;
    while (v !== -1 && state[v] === 0) {
      state[v] = 1;
      walk.push(v);
      v = parent[v]!;
    }
    if (v !== -1 && state[v] === 1) throw new EngineError('invalid_tree', `tree: the parents of vertex ${v} lead back to it (a cycle)`);
    for (const x of walk) state[x] = 2;
    walk.length = 0;
  }
  return graphFromEdges(n, pairs, family ?? { kind: 'tree', n });
}

/**
 * A uniformly random labelled tree on n vertices, decoded from a random Prüfer sequence
 * (Prüfer 1918; linear-time decoding), reproducible from its seed.
 */
export function randomTree(n: number, seed: number): Graph {
  checkWhole('random tree', 'n', n, 1);
  checkVertexCount(n, 'random tree size');
  const family: Family = { kind: 'randomTree', n, seed };
  if (n === 1) return treeFromParents([-1], family);
  if (n === 2) return treeFromParents([-1, 0], family);
  const rand = seededRandom(seed);
  const code = new Uint32Array(n - 2);
  for (let i = 0; i < n - 2; i++) code[i] = Math.floor(rand() * n);
  const degree = new Uint32Array(n).fill(1);
  for (const x of code) degree[x]!++;
  const pairs = new Uint32Array(2 * (n - 1));
  let k = 0;
  let ptr = 0;
  while (degree[ptr] !== 1) ptr++;
  let leaf = ptr;
  for (const x of code) {
    pairs[k++] = leaf;
    pairs[k++] = x;
    if (--degree[x]! === 1 && x < ptr) {
      leaf = x;
    } else {
      ptr++;
      while (degree[ptr] !== 1) ptr++;
      leaf = ptr;
    }
  }
  pairs[k++] = leaf;
  pairs[k++] = n - 1;
  return graphFromEdges(n, pairs, family);
}
