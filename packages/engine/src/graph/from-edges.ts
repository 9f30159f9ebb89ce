import { EngineError, SizeError } from '../errors';
import type { Family, GridLayout } from './family';
import { Graph } from './graph';
import { MAX_EDGES, MAX_VERTICES } from './limits';

/** Throws unless n is a whole number of vertices Cairn can hold. */
export function checkVertexCount(n: number, what = 'vertex count'): void {
  if (!Number.isInteger(n) || n < 0) throw new SizeError(`${what} must be a whole number >= 0, got ${n}`);
  if (n > MAX_VERTICES) throw new SizeError(`${what} ${n} is more than the ${MAX_VERTICES} vertices a graph may have`);
}

/**
 * Builds a simple graph on n vertices from an edge list given as pairs [u0, v0, u1, v1, ...].
 * Loops are dropped and parallel edges merged, so any list of pairs gives a simple graph; readers that
 * must report them do so before calling this.
 */
export function graphFromEdges(n: number, pairs: ArrayLike<number>, family?: Family, layout?: GridLayout): Graph {
  checkVertexCount(n);
  if (pairs.length % 2 !== 0) throw new EngineError('invalid_edges', 'the edge list must hold pairs of vertices');
  if (pairs.length / 2 > MAX_EDGES) throw new SizeError(`${pairs.length / 2} edges is more than the ${MAX_EDGES} a graph may have`);
  const degree = new Uint32Array(n + 1);
  for (let i = 0; i < pairs.length; i += 2) {
    const u = pairs[i]!;
    const v = pairs[i + 1]!;
    if (!(u >= 0 && u < n && v >= 0 && v < n) || !Number.isInteger(u) || !Number.isInteger(v)) {
      throw new EngineError('invalid_edges', `edge ${i / 2} (${u}, ${v}) names a vertex outside 0..${n - 1}`);
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
  return new Graph(compactOffsets, w === out.length ? out : out.slice(0, w), family, layout);
}
