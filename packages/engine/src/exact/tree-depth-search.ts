import { floorLog2, grid2RankNumber } from '../formulas/closed-forms';
import { Bitset } from '../graph/bitset';
import type { Graph } from '../graph/graph';
import { BitsetMemo, type MemoEntry } from './bitset-memo';
import { CutVertices } from './cut-vertices';
import { SearchStopped } from './search-stop';
import { ShapeCanon, type CanonicalShape } from './shape-canon';

export interface SearchLimits {
  signal?: AbortSignal | undefined;
  /** A flag shared with another thread: non-zero stops the search (a worker's event loop is busy with it). */
  stopFlag?: Int32Array | undefined;
  /** Wall-clock deadline (Date.now() milliseconds). */
  deadline?: number | undefined;
}

/** One component of a vertex set, with its memo entry and (for grid shapes) its canonical frame. */
interface Part {
  c: Bitset;
  e: MemoEntry;
  shape: CanonicalShape | undefined;
}

/**
 * Exact tree-depth by search over vertex sets, from the defining recursion (Nešetřil & Ossona de Mendez,
 * Sparsity, 2012): td(empty) = 0, td(G) = max over components, td(G) = 1 + min_v td(G - v) for connected G.
 * Asked in decision form, "td(S) <= k?", every component first checked against its proven bounds, every
 * set's proven bounds memoised, and lower bounds cutting branches that cannot fit: degeneracy + 1 and the
 * path bound from a breadth-first eccentricity, and for grid shapes the rectangle bound with missing
 * cells (value(R) - |R \ S| for each rectangle R of the bounding box). The same bound confines the top:
 * it must lie in every rectangle that already bounds S by k (see ShapeCanon.topWindow).
 */
export class TreeDepthSearch {
  readonly memo = new BitsetMemo();
  nodes = 0;
  /** Grid shapes: raw vertex set -> its entry and canonical frame (see entryOf). */
  private readonly raw = new Map<number, { set: Bitset; e: MemoEntry; shape: CanonicalShape | undefined }[]>();
  private readonly n: number;
  private readonly adj: Bitset[];
  /** All vertices, highest degree first: the order in which tops are tried. */
  private readonly byDegree: Uint32Array;
  /** For grid shapes: memo keys up to translation and the 8 symmetries of the square. */
  private readonly canon: ShapeCanon | undefined;
  /** Proven tree-depths of full h x w rectangles (key h * 65536 + w, h <= w), for lower bounds of shapes. */
  private readonly rectangles = new Map<number, number>();

  constructor(
    g: Graph,
    private readonly limits: SearchLimits = {},
  ) {
    this.n = g.vertexCount;
    this.adj = Array.from({ length: this.n }, (_, v) => Bitset.of(this.n, g.neighbours(v)));
    this.rest = new Bitset(this.n);
    this.frontier = new Bitset(this.n);
    this.grown = new Bitset(this.n);
    this.cuts = new CutVertices(g.offsets, g.targets);
    this.canon = ShapeCanon.applies(g) ? new ShapeCanon(g) : undefined;
    this.byDegree = Uint32Array.from({ length: this.n }, (_, v) => v).sort((a, b) => g.degree(b) - g.degree(a) || a - b);
  }

  /** Scratch sets of components(): what is left to place, the last layer reached and the next one. */
  private readonly rest: Bitset;
  private readonly frontier: Bitset;
  private readonly grown: Bitset;
  private readonly cuts: CutVertices;

  /** The connected components of S, largest first. */
  components(s: Bitset): Bitset[] {
    const rest = this.rest.copyFrom(s);
    const out: Bitset[] = [];
    const frontier = this.frontier;
    const grown = this.grown;
    const fw = frontier.words;
    const gw = grown.words;
    const adj = this.adj;
    for (let start = rest.first(); start >= 0; start = rest.first()) {
      const comp = new Bitset(this.n).add(start);
      frontier.clear().add(start);
      rest.delete(start);
      for (;;) {
        // One breadth-first layer: the neighbours of the frontier still left (word loops, no closures).
        gw.fill(0);
        for (let i = 0; i < fw.length; i++) {
          let w = fw[i]!;
          while (w !== 0) {
            const low = w & -w;
            w ^= low;
            const aw = adj[(i << 5) + (31 - Math.clz32(low))]!.words;
            for (let j = 0; j < gw.length; j++) gw[j]! |= aw[j]!;
          }
        }
        grown.andWith(rest);
        if (grown.isEmpty()) break;
        rest.andNotWith(grown);
        comp.orWith(grown);
        frontier.copyFrom(grown);
      }
      out.push(comp);
    }
    return out.length > 1 ? out.sort((a, b) => b.popcount() - a.popcount()) : out;
  }

  /**
   * Proven lower bound for a connected set: the degeneracy plus one (skipped for grid shapes, see
   * degeneracyBound), the path bound from a breadth-first eccentricity, and for grid shapes the
   * rectangle bound with missing cells.
   */
  private cheapLowerBound(c: Bitset, size: number): number {
    const byDegeneracy = this.canon ? Math.min(size, 2) : this.degeneracyBound(c, size);
    // A breadth-first search from the first vertex reaches a vertex at distance ecc: a path of ecc + 1
    // vertices, so td >= ⌊log2(ecc + 1)⌋ + 1 (Bodlaender et al., SIAM J. Discrete Math. 1998).
    let ecc = 0;
    const seen = new Bitset(this.n).add(c.first());
    let frontier = seen.clone();
    const next = new Bitset(this.n);
    for (;;) {
      next.clear();
      frontier.forEach((v) => next.orWith(this.adj[v]!));
      next.andWith(c).andNotWith(seen);
      if (next.isEmpty()) break;
      seen.orWith(next);
      frontier.copyFrom(next);
      ecc++;
    }
    return Math.max(byDegeneracy, 32 - Math.clz32(ecc + 1), this.rectangleBound(c));
  }

  /**
   * The degeneracy plus one (td >= tw + 1 >= degeneracy + 1; a clique gets its size this way). Grid shapes
   * skip it: their degeneracy is at most 2, and a 2 x 2 block gives the 3 through the rectangle bound.
   */
  private degeneracyBound(c: Bitset, size: number): number {
    // Degeneracy: repeatedly remove a vertex of least degree inside what is left (Matula & Beck 1983).
    const left = c.clone();
    const deg = new Int32Array(this.n);
    c.forEach((v) => (deg[v] = this.adj[v]!.and(c).popcount()));
    let degeneracy = 0;
    for (let remaining = size; remaining > 0; remaining--) {
      let best = -1;
      left.forEach((v) => {
        if (best < 0 || deg[v]! < deg[best]!) best = v;
      });
      degeneracy = Math.max(degeneracy, deg[best]!);
      left.delete(best);
      this.adj[best]!.forEach((w) => {
        if (left.has(w)) deg[w]!--;
      });
    }
    return degeneracy + 1;
  }

  /**
   * For grid shapes: the best of value(R) - |R \ C| over the rectangles R of C's bounding box, where
   * value(R) is an exact value proven earlier in this search, else the closed forms for sides 1 and 2
   * (Bodlaender et al. 1998; Alpert 2010) and the treewidth bound min(h, w) + 1 (td >= tw + 1).
   */
  private rectangleBound(c: Bitset): number {
    if (!this.canon) return 0;
    return this.canon.rectangleBound(c, this.rectangleValue);
  }

  /** A proven lower bound of the full h x w rectangle (exact when the search has solved it). */
  private readonly rectangleValue = (h0: number, w0: number): number => {
    const h = Math.min(h0, w0);
    const w = Math.max(h0, w0);
    const known = this.rectangles.get(h * 65536 + w);
    return known ?? (h === 1 ? floorLog2(w) + 1 : h === 2 ? grid2RankNumber(w) : h + 1);
  };

  /** Remembers an exact value when the set is a full rectangle, for later lower bounds. */
  private noteIfRectangle(e: MemoEntry, c: Bitset): void {
    if (!this.canon || e.lower !== e.upper) return;
    const dims = e.set.words[0]!; // canonical key: height << 16 | width
    const h = dims >>> 16;
    const w = dims & 0xffff;
    if (c.popcount() === h * w) this.rectangles.set(Math.min(h, w) * 65536 + Math.max(h, w), e.upper);
  }

  private tick(): void {
    if ((++this.nodes & 15) !== 0) return;
    if (this.limits.signal?.aborted || (this.limits.stopFlag && Atomics.load(this.limits.stopFlag, 0) !== 0)) throw new SearchStopped('aborted');
    if (this.limits.deadline !== undefined && Date.now() > this.limits.deadline) throw new SearchStopped('time-limit');
  }

  /**
   * The memo entry of a connected set (created with its cheap bounds), and for grid shapes the frame in
   * which its `choice` is written.
   */
  private entryOf(c: Bitset): { e: MemoEntry; shape: CanonicalShape | undefined } {
    if (!this.canon) return this.freshEntryOf(c);
    // Grid shapes: the same cells are met again and again; remember their entry and frame by the raw
    // set, so the canonical form is worked out once per set (common practice).
    const h = c.hash();
    let bucket = this.raw.get(h);
    if (!bucket) {
      bucket = [];
      this.raw.set(h, bucket);
    }
    for (const r of bucket) if (r.set.equals(c)) return r;
    const found = this.freshEntryOf(c);
    bucket.push({ set: c.clone(), e: found.e, shape: found.shape });
    return found;
  }

  private freshEntryOf(c: Bitset): { e: MemoEntry; shape: CanonicalShape | undefined } {
    const shape = this.canon?.canonical(c);
    const key = shape ? shape.key : c;
    const known = this.memo.get(key);
    if (known) return { e: known, shape };
    const size = c.popcount();
    return { e: this.memo.entry(key, this.cheapLowerBound(c, size), size, -1), shape };
  }

  /** The best lower bound proven so far for a vertex set: the largest over its components. */
  provenLower(s: Bitset): number {
    let best = 0;
    for (const c of this.components(s)) best = Math.max(best, this.entryOf(c).e.lower);
    return best;
  }

  /** Decides td(S) <= k for any vertex set S. */
  atMost(s: Bitset, k: number): boolean {
    const parts = this.components(s).map((c) => ({ c, ...this.entryOf(c) }));
    // Every component must fit: look for one already known not to before searching any of them.
    for (const p of parts) if (p.e.lower > k) return false;
    for (const p of parts) if (p.e.upper > k && !this.connectedPartAtMost(p, k)) return false;
    return true;
  }

  /** Decides td(C) <= k for a connected set C, recording what it proves. */
  connectedAtMost(c: Bitset, k: number): boolean {
    return this.connectedPartAtMost({ c, ...this.entryOf(c) }, k);
  }

  private connectedPartAtMost(part: Part, k: number): boolean {
    const { c, e, shape } = part;
    if (e.upper <= k) return true;
    if (e.lower > k) return false;
    this.tick();
    // For grid shapes, only tops inside every rectangle that bounds C by k can leave C - v within k - 1.
    const win = this.canon?.topWindow(c, k, this.rectangleValue);
    if (this.canon && !win) {
      e.lower = k + 1;
      this.noteIfRectangle(e, c);
      return false;
    }
    // Try the vertices of highest degree first: they are the likeliest tops of a shallow elimination tree;
    // in a grid shape, the cells nearest the middle of the window first (a balanced cut).
    const rest = c.clone();
    let tops: ArrayLike<number> = this.byDegree;
    if (win) {
      const inside: number[] = [];
      for (const v of this.byDegree) if (c.has(v) && this.canon!.inWindow(v, win)) inside.push(v);
      const canon = this.canon!;
      tops = inside.sort((a, b) => canon.offCentre(a, win) - canon.offCentre(b, win));
    }
    // Which tops leave C in one piece: those need no component search (most cells of a grid shape).
    const cut = this.cuts.find(c, c.first(), new Bitset(this.n));
    for (let i = 0; i < tops.length; i++) {
      const v = tops[i]!;
      if (!win && !c.has(v)) continue;
      rest.delete(v);
      const fits = cut.has(v) ? this.atMost(rest, k - 1) : this.connectedAtMost(rest, k - 1);
      rest.add(v);
      if (fits) return this.fitsWith(part, k, v);
    }
    e.lower = k + 1;
    this.noteIfRectangle(e, c);
    return false;
  }

  /** Records that the part fits in k labels with v on top. */
  private fitsWith(part: Part, k: number, v: number): true {
    part.e.upper = k;
    part.e.choice = part.shape ? part.shape.toCanonical(v) : v;
    this.noteIfRectangle(part.e, part.c);
    return true;
  }

  /** The exact tree-depth of a connected set, by deepening k from its lower bound. */
  treeDepth(c: Bitset): number {
    const { e } = this.entryOf(c);
    while (e.lower < e.upper) this.connectedAtMost(c, e.lower);
    return e.upper;
  }

  /**
   * Labels S (1-based, into `labels`) with at most `k` labels, using the choices the search recorded;
   * only call after atMost(S, k) returned true.
   */
  label(s: Bitset, k: number, labels: Int32Array): void {
    for (const c of this.components(s)) {
      const { e, shape } = this.entryOf(c);
      if (e.upper > k && !this.connectedAtMost(c, k)) throw new Error('label: the set does not fit in k labels');
      const fit = Math.min(e.upper, k);
      if (e.choice < 0) {
        let next = 1;
        c.forEach((v) => (labels[v] = next++));
        continue;
      }
      const top = shape ? shape.fromCanonical(e.choice) : e.choice;
      labels[top] = fit;
      this.label(c.clone().delete(top), fit - 1, labels);
    }
  }
}
