import type { Graph } from '../graph/graph';

/** A part of the graph still to rank: a connected vertex set hanging below `parent` in the elimination forest. */
interface Part {
  id: number;
  vertices: Uint32Array;
  parent: number;
}

/** The chosen separator of a part: a BFS root and a level, scored by size, then by the larger side. */
interface LevelCut {
  root: number;
  level: number;
  size: number;
  larger: number;
}

/**
 * A vertex ranking of any graph by nested dissection: split each connected part by a small vertex
 * separator, chain the separator's vertices above everything else in the part, and recurse on what is
 * left (td(G) <= |S| + max td(G - S) for a separator S, Nešetřil & Ossona de Mendez, Sparsity, 2012).
 * The separator is, in this order of preference: the cut vertex leaving the smallest largest piece, if
 * no piece exceeds 2/3 of the part (line graphs of trees are full of them); else the smallest
 * breadth-first level, trimmed to its vertices that touch the next level, that leaves no side above 2/3,
 * trying levels from both ends of a double sweep (a pseudo-peripheral pair, as in Gibbs, Poole &
 * Stockmeyer, SIAM J. Numer. Anal. 13, 1976); else one vertex of largest degree. A clique is chained
 * whole. The labels are the heights in the resulting elimination forest, a ranking since every edge of
 * the graph joins a vertex to one of its forest ancestors. A heuristic: an upper bound, not the optimum.
 */
export function separatorRanking(g: Graph): Int32Array {
  return new NestedDissection(g).ranking();
}

class NestedDissection {
  private readonly n: number;
  private readonly part: Int32Array; // part id of each vertex still to place, -1 once placed
  private readonly dist: Int32Array;
  private readonly queue: Uint32Array;
  private readonly up: Int32Array; // elimination forest parent
  // Depth-first search state for cut vertices.
  private readonly low: Int32Array;
  private readonly size: Uint32Array;
  private readonly cursor: Uint32Array;
  private readonly dfsParent: Int32Array;
  private readonly cutSum: Uint32Array; // sizes of the child subtrees that fall off with the vertex
  private readonly cutMax: Uint32Array;
  private readonly placed: Uint32Array; // vertices in the order they were placed, parents first
  private placedCount = 0;
  private nextId = 0;

  constructor(private readonly g: Graph) {
    this.n = g.vertexCount;
    this.part = new Int32Array(this.n);
    this.dist = new Int32Array(this.n).fill(-1);
    this.queue = new Uint32Array(this.n);
    this.up = new Int32Array(this.n).fill(-1);
    this.low = new Int32Array(this.n);
    this.size = new Uint32Array(this.n);
    this.cursor = new Uint32Array(this.n);
    this.dfsParent = new Int32Array(this.n);
    this.cutSum = new Uint32Array(this.n);
    this.cutMax = new Uint32Array(this.n);
    this.placed = new Uint32Array(this.n);
  }

  ranking(): Int32Array {
    const { n } = this;
    const stack: Part[] = [];
    this.part.fill(this.nextId++);
    for (const vertices of this.components(0)) stack.push(this.newPart(vertices, -1));
    for (let item = stack.pop(); item; item = stack.pop()) {
      const { id, vertices, parent } = item;
      if (vertices.length <= 2 || this.isClique(vertices, id)) {
        this.chain(vertices, parent);
        continue;
      }
      const separator = this.separator(vertices, id);
      const last = this.chain(separator, parent);
      for (const rest of this.components(id, vertices)) stack.push(this.newPart(rest, last));
    }
    // Heights in the forest: a vertex is one above the tallest of its children.
    const labels = new Int32Array(n);
    for (let i = this.placedCount - 1; i >= 0; i--) {
      const v = this.placed[i]!;
      if (labels[v] === 0) labels[v] = 1;
      const p = this.up[v]!;
      if (p >= 0 && labels[p]! < labels[v]! + 1) labels[p] = labels[v]! + 1;
    }
    return labels;
  }

  private newPart(vertices: Uint32Array, parent: number): Part {
    const id = this.nextId++;
    for (const v of vertices) this.part[v] = id;
    return { id, vertices, parent };
  }

  /** Places the vertices as a chain below parent (each the parent of the next); returns the last. */
  private chain(vertices: ArrayLike<number>, parent: number): number {
    let last = parent;
    for (let i = 0; i < vertices.length; i++) {
      const v = vertices[i]!;
      this.up[v] = last;
      this.part[v] = -1;
      this.placed[this.placedCount++] = v;
      last = v;
    }
    return last;
  }

  private isClique(vertices: Uint32Array, id: number): boolean {
    const { offsets, targets } = this.g;
    const s = vertices.length;
    for (const v of vertices) {
      let inside = 0;
      for (let e = offsets[v]!; e < offsets[v + 1]!; e++) if (this.part[targets[e]!] === id) inside++;
      if (inside !== s - 1) return false;
    }
    return true;
  }

  /** Breadth-first search from root inside part id; leaves dist set on the part and returns its deepest level. */
  private levels(root: number, id: number): number {
    const { offsets, targets } = this.g;
    const { dist, queue, part } = this;
    let tail = 0;
    queue[tail++] = root;
    dist[root] = 0;
    let depth = 0;
    for (let head = 0; head < tail; head++) {
      const v = queue[head]!;
      const d = dist[v]! + 1;
      for (let e = offsets[v]!; e < offsets[v + 1]!; e++) {
        const w = targets[e]!;
        if (part[w] !== id || dist[w] !== -1) continue;
        dist[w] = d;
        depth = d;
        queue[tail++] = w;
      }
    }
    return depth;
  }

  private clearDist(vertices: Uint32Array): void {
    for (const v of vertices) this.dist[v] = -1;
  }

  /** Whether v (at level dist[v]) has a neighbour in the part one level further out. */
  private touchesNext(v: number, id: number): boolean {
    const { offsets, targets } = this.g;
    const next = this.dist[v]! + 1;
    for (let e = offsets[v]!; e < offsets[v + 1]!; e++) {
      const w = targets[e]!;
      if (this.part[w] === id && this.dist[w] === next) return true;
    }
    return false;
  }

  /** The best balanced level cut of the BFS from root (dist must be set from it), or undefined. */
  private bestLevel(root: number, depth: number, vertices: Uint32Array, id: number, best: LevelCut | undefined): LevelCut | undefined {
    const s = vertices.length;
    const levelSize = new Uint32Array(depth + 1);
    const cutSize = new Uint32Array(depth + 1);
    for (const v of vertices) {
      const d = this.dist[v]!;
      levelSize[d]!++;
      if (d < depth && this.touchesNext(v, id)) cutSize[d]!++;
    }
    let before = 0;
    for (let i = 0; i < depth; i++) {
      const size = cutSize[i]!;
      const inner = before + levelSize[i]! - size;
      const larger = Math.max(inner, s - inner - size);
      before += levelSize[i]!;
      if (i === 0 || 3 * larger > 2 * s) continue;
      if (!best || size < best.size || (size === best.size && larger < best.larger)) best = { root, level: i, size, larger };
    }
    return best;
  }

  /** A separator of the connected part: a balanced cut vertex, else a trimmed BFS level, else a vertex of largest degree. */
  private separator(vertices: Uint32Array, id: number): Uint32Array {
    const cutVertex = this.balancedCutVertex(vertices, id);
    if (cutVertex >= 0) return Uint32Array.of(cutVertex);
    const a = this.farthest(vertices[0]!, vertices, id);
    const depthA = this.levels(a, id);
    let best = this.bestLevel(a, depthA, vertices, id, undefined);
    let b = a;
    for (const v of vertices) if (this.dist[v]! > this.dist[b]!) b = v;
    this.clearDist(vertices);
    const depthB = this.levels(b, id);
    best = this.bestLevel(b, depthB, vertices, id, best);
    this.clearDist(vertices);
    if (!best) return Uint32Array.of(this.largestDegree(vertices, id));
    this.levels(best.root, id);
    const cut: number[] = [];
    for (const v of vertices) if (this.dist[v] === best.level && this.touchesNext(v, id)) cut.push(v);
    this.clearDist(vertices);
    return Uint32Array.from(cut);
  }

  /**
   * The cut vertex of the part whose removal leaves the smallest largest component, if that is at most
   * 2/3 of the part; else -1. Depth-first search with low points (Hopcroft & Tarjan, "Efficient
   * algorithms for graph manipulation", Comm. ACM 16, 1973): a child subtree whose low point does not
   * reach above v falls off when v goes, the rest of the part stays in one piece.
   */
  private balancedCutVertex(vertices: Uint32Array, id: number): number {
    const { offsets, targets } = this.g;
    const { part, dist: disc, queue: stack } = this; // dist doubles as the discovery time
    const s = vertices.length;
    const low = this.low;
    const size = this.size;
    const cursor = this.cursor;
    const dfsParent = this.dfsParent;
    const root = vertices[0]!;
    let time = 0;
    let top = 0;
    stack[top++] = root;
    disc[root] = time;
    low[root] = time++;
    size[root] = 1;
    cursor[root] = offsets[root]!;
    dfsParent[root] = -1;
    this.cutSum[root] = 0;
    this.cutMax[root] = 0;
    let best = -1;
    let bestLarger = Math.floor((2 * s) / 3);
    while (top > 0) {
      const v = stack[top - 1]!;
      if (cursor[v]! < offsets[v + 1]!) {
        const w = targets[cursor[v]!++]!;
        if (part[w] !== id) continue;
        if (disc[w] === -1) {
          disc[w] = time;
          low[w] = time++;
          size[w] = 1;
          cursor[w] = offsets[w]!;
          dfsParent[w] = v;
          this.cutSum[w] = 0;
          this.cutMax[w] = 0;
          stack[top++] = w;
        } else if (w !== dfsParent[v] && disc[w]! < low[v]!) low[v] = disc[w]!;
        continue;
      }
      top--;
      const p = dfsParent[v]!;
      // v is finished: the pieces its removal leaves are its cut-off child subtrees and, unless v is the
      // root, the rest of the part. A vertex that cuts nothing leaves one piece of s - 1.
      const larger = p === -1 ? this.cutMax[v]! : Math.max(this.cutMax[v]!, s - 1 - this.cutSum[v]!);
      if (larger < s - 1 && larger <= bestLarger && (best === -1 || larger < bestLarger)) {
        best = v;
        bestLarger = larger;
      }
      if (p === -1) continue;
      size[p]! += size[v]!;
      if (low[v]! < low[p]!) low[p] = low[v]!;
      if (low[v]! >= disc[p]!) {
        this.cutSum[p]! += size[v]!;
        if (size[v]! > this.cutMax[p]!) this.cutMax[p] = size[v]!;
      }
    }
    this.clearDist(vertices);
    return best;
  }

  private farthest(root: number, vertices: Uint32Array, id: number): number {
    this.levels(root, id);
    let far = root;
    for (const v of vertices) if (this.dist[v]! > this.dist[far]!) far = v;
    this.clearDist(vertices);
    return far;
  }

  private largestDegree(vertices: Uint32Array, id: number): number {
    const { offsets, targets } = this.g;
    let best = vertices[0]!;
    let bestDegree = -1;
    for (const v of vertices) {
      let d = 0;
      for (let e = offsets[v]!; e < offsets[v + 1]!; e++) if (this.part[targets[e]!] === id) d++;
      if (d > bestDegree) {
        best = v;
        bestDegree = d;
      }
    }
    return best;
  }

  /** The connected components of what is left of part id (of every vertex when `vertices` is absent). */
  private components(id: number, vertices?: Uint32Array): Uint32Array[] {
    const { offsets, targets } = this.g;
    const { part, queue } = this;
    const marker = this.nextId++; // components found so far carry this id until they get their own
    const out: Uint32Array[] = [];
    const scan = vertices ?? Uint32Array.from({ length: this.n }, (_, v) => v);
    for (const s of scan) {
      if (part[s] !== id) continue;
      let tail = 0;
      queue[tail++] = s;
      part[s] = marker;
      for (let head = 0; head < tail; head++) {
        const v = queue[head]!;
        for (let e = offsets[v]!; e < offsets[v + 1]!; e++) {
          const w = targets[e]!;
          if (part[w] !== id) continue;
          part[w] = marker;
          queue[tail++] = w;
        }
      }
      out.push(queue.slice(0, tail));
    }
    return out;
  }
}
