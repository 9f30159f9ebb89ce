import { Graph } from './graph';

/**
 * Builds a simple graph on n vertices from an edge list given as pairs [u0, v0, u1, v1, ...].
 * Loops are dropped and parallel edges merged, so any list of pairs gives a simple graph.
 */
export function graphFromEdges(n: number, pairs: ArrayLike<number>): Graph {
  if (!Number.isInteger(n) || n < 0) throw new RangeError(`vertex count must be a whole number >= 0, got ${n}`);
  if (pairs.length % 2 !== 0) throw new RangeError('edge list must hold pairs');
  const degree = new Uint32Array(n + 1);
  for (let i = 0; i < pairs.length; i += 2) {
    const u = pairs[i]!;
    const v = pairs[i + 1]!;
    if (!(u >= 0 && u < n && v >= 0 && v < n) || !Number.isInteger(u) || !Number.isInteger(v)) {
      throw new RangeError(`edge ${i / 2} (${u}, ${v}) names a vertex outside 0..${n - 1}`);
    }
    if (u === v) continue;
    degree[u]!++;
    degree[v]!++;
  }
  const offsets = new Uint32Array(n + 1);
  for (let v = 0; v < n; v++) offsets[v + 1] = offsets[v]! + degree[v]!;
  const fill = offsets.slice(0, n);
  const raw = new Uint32Array(offsets[n]!);
  for (let i = 0; i < pairs.length; i += 2) {
    const u = pairs[i]!;
    const v = pairs[i + 1]!;
    if (u === v) continue;
    raw[fill[u]!++] = v;
    raw[fill[v]!++] = u;
  }
  // Sort each adjacency run and squeeze out repeats.
  const out = new Uint32Array(raw.length);
  const compactOffsets = new Uint32Array(n + 1);
  let w = 0;
  for (let v = 0; v < n; v++) {
    const run = raw.subarray(offsets[v], offsets[v + 1]).sort();
    compactOffsets[v] = w;
    for (let i = 0; i < run.length; i++) {
      if (i === 0 || run[i] !== run[i - 1]) out[w++] = run[i]!;
    }
  }
  compactOffsets[n] = w;
  return new Graph(compactOffsets, w === out.length ? out : out.slice(0, w));
}
