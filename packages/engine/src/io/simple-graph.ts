import type { Family } from '../graph/family';
import { graphFromEdges } from '../graph/from-edges';
import type { Graph } from '../graph/graph';
import type { EdgeBuffer } from './edge-buffer';
import type { WarningList } from './warnings';

/** Why an edge is not in the graph: a loop, or a repeat of the earlier edge `firstIndex`. */
export type DroppedEdge =
  | { kind: 'self-loop'; index: number }
  | { kind: 'duplicate-edge'; index: number; firstIndex: number };

export interface SimpleGraphOptions {
  vertexCount: number;
  family: Family;
  /** Index of the first buffered edge to use (a reader may have buffered a line that turned out to be a header). */
  from: number;
  /** Subtracted from every id: 1 for files that number vertices from 1. */
  base: number;
  /**
   * true: u v and v u are the same edge, so the second is a duplicate (edge lists, DIMACS, symmetric
   * matrices). false: only an exact repeat is a duplicate, since a general matrix lists both (i, j) and (j, i).
   */
  unordered: boolean;
  /** Called for each left-out edge, in file order. */
  onDrop: (dropped: DroppedEdge) => void;
}

/**
 * The simple graph of the buffered edges, reporting every self-loop and repeat it leaves out.
 * graphFromEdges already drops loops and merges repeats, so the repeats are only searched for when the
 * edge count shows that something was merged: a clean file of a million edges pays for no hash table.
 */
export function buildSimpleGraph(edges: EdgeBuffer, options: SimpleGraphOptions): Graph {
  const { from, base } = options;
  const ends = edges.ends;
  const pairs = new Uint32Array(2 * (edges.count - from));
  let loops = 0;
  for (let k = from, w = 0; k < edges.count; k++, w += 2) {
    const u = ends[2 * k]!;
    const v = ends[2 * k + 1]!;
    if (u === v) loops++;
    pairs[w] = u - base;
    pairs[w + 1] = v - base;
  }
  const graph = graphFromEdges(options.vertexCount, pairs, options.family);
  const merged = edges.count - from - loops - graph.edgeCount;
  if (merged > 0) reportDropped(edges, options);
  else if (loops > 0) {
    for (let k = from; k < edges.count; k++) if (ends[2 * k] === ends[2 * k + 1]) options.onDrop({ kind: 'self-loop', index: k });
  }
  return graph;
}

/**
 * Finds the loops and repeats in file order with an open-addressing hash table of edge indices, sized
 * from the edge count (two typed arrays, one pass).
 */
function reportDropped(edges: EdgeBuffer, options: SimpleGraphOptions): void {
  const { from, unordered, onDrop } = options;
  const ends = edges.ends;
  let capacity = 16;
  while (capacity < 2 * (edges.count - from)) capacity *= 2;
  const mask = capacity - 1;
  const table = new Int32Array(capacity); // edge index + 1; 0 marks an empty slot
  for (let k = from; k < edges.count; k++) {
    const u = ends[2 * k]!;
    const v = ends[2 * k + 1]!;
    if (u === v) {
      onDrop({ kind: 'self-loop', index: k });
      continue;
    }
    const a = unordered && u > v ? v : u;
    const b = unordered && u > v ? u : v;
    let slot = (Math.imul(a, 0x9e3779b1) ^ Math.imul(b + 0x7f4a7c15, 0x85ebca77)) >>> 0;
    slot = (slot ^ (slot >>> 15)) & mask;
    for (;;) {
      const held = table[slot]!;
      if (held === 0) {
        table[slot] = k + 1;
        break;
      }
      const j = held - 1;
      const x = ends[2 * j]!;
      const y = ends[2 * j + 1]!;
      if ((x === a && y === b) || (unordered && x === b && y === a)) {
        onDrop({ kind: 'duplicate-edge', index: k, firstIndex: j });
        break;
      }
      slot = (slot + 1) & mask;
    }
  }
}

/** The usual onDrop for text readers: a warning at the line and column where the dropped edge is written. */
export function warnAtBufferedEdge(edges: EdgeBuffer, warnings: WarningList): (dropped: DroppedEdge) => void {
  return (dropped) => {
    if (warnings.full) return warnings.countOnly();
    const k = dropped.index;
    const u = edges.ends[2 * k]!;
    const v = edges.ends[2 * k + 1]!;
    const line = edges.lines[k]!;
    const column = edges.columns[k]!;
    if (dropped.kind === 'self-loop') {
      warnings.add('self-loop', line, column, `vertex ${u} is joined to itself; the loop is dropped`);
    } else {
      const first = edges.lines[dropped.firstIndex]!;
      warnings.add('duplicate-edge', line, column, `edge {${u}, ${v}} repeats the edge on line ${first}; the copy is dropped`);
    }
  };
}
