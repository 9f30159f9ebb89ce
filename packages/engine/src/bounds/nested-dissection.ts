import { graphFromEdges } from '../graph/from-edges';
import type { Graph } from '../graph/graph';
import { optimalTreeRanking } from './tree-ranking';
import type { UpperBound } from './upper-bound';

/**
 * Nested dissection for any graph (George, "Nested dissection of a regular finite element mesh",
 * SIAM J. Numer. Anal. 1973; here with breadth-first level separators): in each connected part, grow
 * breadth-first levels from a far vertex, take the level that best balances size against the parts it
 * leaves, shrink it to the vertices that really touch both sides (a local search), rank the parts left
 * recursively and give the separator distinct labels above them (td(G) <= |S| + max td(G - S)). Parts
 * that are trees are ranked optimally (Schäffer 1989); cliques get distinct labels.
 */
export function nestedDissectionRanking(g: Graph): UpperBound {
  const n = g.vertexCount;
  const { offsets, targets } = g;
  const labels = new Int32Array(n);
  const part = new Int32Array(n); // which part a vertex belongs to now; -1 once it is a separator vertex
  const level = new Int32Array(n);
  const queue = new Uint32Array(n);
  let nextPart = 1;

  /** Breadth-first search inside part p from `start`; fills queue[0..count) and level[]; returns count. */
  const bfs = (start: number, p: number): number => {
    let head = 0;
    let tail = 0;
    queue[tail++] = start;
    level[start] = 0;
    const mark = -2 - p; // visited marker, restored to p by the caller
    part[start] = mark;
    while (head < tail) {
      const v = queue[head++]!;
      for (let e = offsets[v]!; e < offsets[v + 1]!; e++) {
        const w = targets[e]!;
        if (part[w] !== p) continue;
        part[w] = mark;
        level[w] = level[v]! + 1;
        queue[tail++] = w;
      }
    }
    for (let i = 0; i < tail; i++) part[queue[i]!] = p;
    return tail;
  };

  /** Splits the vertices of part p into its connected components, each under a fresh part number. */
  const componentsOfPart = (vertices: Uint32Array, p: number): Uint32Array[] => {
    const out: Uint32Array[] = [];
    for (const s of vertices) {
      if (part[s] !== p) continue;
      const count = bfs(s, p);
      const q = nextPart++;
      const members = queue.slice(0, count);
      for (const v of members) part[v] = q;
      out.push(members);
    }
    return out;
  };

  const rankTreePart = (members: Uint32Array): number => {
    // Build the induced tree and rank it optimally.
    const index = new Map<number, number>();
    members.forEach((v, i) => index.set(v, i));
    const parent = new Int32Array(members.length).fill(-1);
    const order = [0];
    const seen = new Uint8Array(members.length);
    seen[0] = 1;
    for (let h = 0; h < order.length; h++) {
      const v = members[order[h]!]!;
      const p = part[v];
      for (let e = offsets[v]!; e < offsets[v + 1]!; e++) {
        const w = targets[e]!;
        if (part[w] !== p) continue;
        const j = index.get(w)!;
        if (seen[j]) continue;
        seen[j] = 1;
        parent[j] = order[h]!;
        order.push(j);
      }
    }
    const pairs: number[] = [];
    parent.forEach((pp, j) => pp >= 0 && pairs.push(j, pp));
    const sub = graphFromEdges(members.length, pairs);
    const sublabels = optimalTreeRanking(sub);
    let top = 0;
    members.forEach((v, i) => {
      labels[v] = sublabels[i]!;
      if (sublabels[i]! > top) top = sublabels[i]!;
    });
    return top;
  };

  /** Ranks the connected part made of `members` (all with part number p); returns its number of labels. */
  const rankConnected = (members: Uint32Array, p: number): number => {
    const size = members.length;
    if (size === 1) {
      labels[members[0]!] = 1;
      return 1;
    }
    let degreeSum = 0;
    for (const v of members) for (let e = offsets[v]!; e < offsets[v + 1]!; e++) if (part[targets[e]!] === p) degreeSum++;
    const edges = degreeSum / 2;
    if (edges === size - 1) return rankTreePart(members);
    if (edges === (size * (size - 1)) / 2) {
      members.forEach((v, i) => (labels[v] = i + 1));
      return size;
    }
    // A far vertex: the last one reached from the last one reached (pseudo-peripheral).
    let count = bfs(members[0]!, p);
    count = bfs(queue[count - 1]!, p);
    const depth = level[queue[count - 1]!]! + 1;
    const widths = new Uint32Array(depth);
    for (let i = 0; i < count; i++) widths[level[queue[i]!]!]!++;
    // Choose the level minimising |S| + (size of the larger side) / 4: small cuts, rough balance.
    let best = -1;
    let bestScore = Infinity;
    let before = 0;
    for (let d = 0; d < depth; d++) {
      const after = size - before - widths[d]!;
      const score = widths[d]! + Math.max(before, after) / 4;
      if (d > 0 && d < depth - 1 && score < bestScore) {
        bestScore = score;
        best = d;
      }
      before += widths[d]!;
    }
    if (best < 0) best = depth >> 1;
    const cutLevel = best;
    const separator: number[] = [];
    for (let i = 0; i < count; i++) {
      const v = queue[i]!;
      if (level[v] === cutLevel) separator.push(v);
    }
    // Local search: a separator vertex with no neighbour below the cut level can join the upper side.
    const kept: number[] = [];
    for (const v of separator) {
      let touchesBelow = false;
      for (let e = offsets[v]!; e < offsets[v + 1]! && !touchesBelow; e++) {
        const w = targets[e]!;
        if (part[w] === p && level[w]! < cutLevel) touchesBelow = true;
      }
      if (touchesBelow) kept.push(v);
      else level[v] = cutLevel + 1; // now counts as above the cut, for the next vertices' test
    }
    const cut = kept.length > 0 ? kept : separator;
    for (const v of cut) part[v] = -1;
    let top = 0;
    for (const c of componentsOfPart(members, p)) top = Math.max(top, rankConnected(c, part[c[0]!]!));
    for (const v of cut) labels[v] = ++top;
    return top;
  };

  const all = new Uint32Array(n);
  for (let v = 0; v < n; v++) all[v] = v;
  part.fill(0);
  let value = 0;
  for (const c of componentsOfPart(all, 0)) value = Math.max(value, rankConnected(c, part[c[0]!]!));
  return {
    value,
    labels,
    construction: 'nested-dissection',
    argument: `nested dissection with breadth-first level separators (George 1973); each separator takes distinct labels above the parts it splits (${value} labels)`,
  };
}
