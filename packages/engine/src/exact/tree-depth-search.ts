import { floorLog2, grid2RankNumber } from '../formulas/closed-forms';
import { Bitset, popcount32 } from '../graph/bitset';
import type { Graph } from '../graph/graph';
import { CutVertices } from './cut-vertices';
import { SearchStopped } from './search-stop';
import { SearchMemo } from './search-memo';
import { SetMinorMinWidth } from './set-minor-min-width';
import { GridSeparators } from './grid-separators';
import { grown, SetTable } from './set-table';
import { ShapeCanon, type CellFrame } from './shape-canon';

export interface SearchLimits {
  signal?: AbortSignal | undefined;
  /** A flag shared with another thread: non-zero stops the search (a worker's event loop is busy with it). */
  stopFlag?: Int32Array | undefined;
  /** Wall-clock deadline (Date.now() milliseconds). */
  deadline?: number | undefined;
  /**
   * Bytes the search's tables may hold: it stops (reason 'memory-limit', its proven interval kept) once
   * they hold half of it, as each table doubles when it grows.
   */
  memoryBytes?: number | undefined;
}

/** Connected grid shapes of at least this many cells branch over separators, smaller ones over vertices. */
const SEPARATOR_BRANCHING_FROM = 12;

/** One component of a vertex set, with its memo entry and (for grid shapes) its raw-set entry. */
interface Part {
  c: Bitset;
  e: number;
  raw: number;
}

/**
 * Exact tree-depth by search over vertex sets, from the defining recursion (Nešetřil & Ossona de Mendez,
 * Sparsity, 2012): td(empty) = 0, td(G) = max over components, td(G) = 1 + min_v td(G - v) for connected G.
 * Asked in decision form, "td(S) <= k?", every component first checked against its proven bounds, every
 * set's proven bounds memoised, and lower bounds cutting branches that cannot fit: minor-min-width + 1 and the
 * path bound from a breadth-first eccentricity, and for grid shapes the rectangle bound with missing
 * cells (value(R) - |R \ S| for each rectangle R of the bounding box). General graphs branch over the
 * top vertex. Grid shapes branch over minimal separators instead (see separatorAtMost), so the sets a
 * top chain passes through on its way to a split are never memoised; the rectangle bound confines the
 * separator (ShapeCanon.separatorRectangles) as it confines a top (ShapeCanon.topWindow).
 */
export class TreeDepthSearch {
  readonly memo: SearchMemo;
  nodes = 0;
  /**
   * Grid shapes: raw vertex set -> its memo entry and canonical frame (see entryOf), the frame as the
   * symmetry and box of ShapeCanon.frame.
   */
  private readonly raw: SetTable;
  private rawEntry: Int32Array;
  private rawFrame: Int32Array;
  /** The raw-set entry of the set entryOf looked up last (-1 for graphs that are not grid shapes). */
  private lastRaw = -1;
  private readonly n: number;
  private readonly adj: Bitset[];
  /** All vertices, highest degree first: the order in which tops are tried. */
  private readonly byDegree: Uint32Array;
  /** For grid shapes: memo keys up to translation and the 8 symmetries of the square. */
  private readonly canon: ShapeCanon | undefined;
  /** For grid shapes: candidate minimal separators, the branching of shapes above SEPARATOR_BRANCHING_FROM cells. */
  private readonly separators: GridSeparators | undefined;
  /**
   * For grid shapes: a proven lower bound of every full h x w rectangle that fits in the layout, at
   * h * rectangleSide + w (both orientations), exact once the search has solved it: the rectangle bound
   * and the top window read it for every size of every box they scan.
   */
  private readonly rectangleSide: number;
  private readonly rectangleTable: Int32Array;

  constructor(
    g: Graph,
    private readonly limits: SearchLimits = {},
    /** 'vertex' branches over the top vertex on grid shapes too (a second method, for checking). */
    branching: 'auto' | 'vertex' = 'auto',
  ) {
    this.n = g.vertexCount;
    // Small graphs (the exact leaves of the grid constructions, hundreds of them) start with small tables.
    const slots = this.n <= 24 ? 256 : undefined;
    this.memo = new SearchMemo(slots);
    this.raw = new SetTable(slots);
    this.rawEntry = new Int32Array(this.raw.capacity);
    this.rawFrame = new Int32Array(5 * this.raw.capacity);
    this.adj = Array.from({ length: this.n }, (_, v) => Bitset.of(this.n, g.neighbours(v)));
    this.rest = new Bitset(this.n);
    this.frontier = new Bitset(this.n);
    this.grown = new Bitset(this.n);
    this.degreeIn = new Int32Array(this.n);
    this.near = new Bitset(this.n);
    this.reach = new Bitset(this.n);
    this.cuts = new CutVertices(g.offsets, g.targets);
    this.canon = ShapeCanon.applies(g) ? new ShapeCanon(g) : undefined;
    this.separators = this.canon && branching === 'auto' ? new GridSeparators(this.canon) : undefined;
    // Before any is solved: the closed forms for sides 1 and 2 (Bodlaender et al. 1998; Alpert 2010) and
    // the treewidth bound min(h, w) + 1 (td >= tw + 1).
    this.rectangleSide = this.canon ? Math.max(g.layout!.rows, g.layout!.cols) + 1 : 0;
    this.rectangleTable = new Int32Array(this.rectangleSide * this.rectangleSide);
    for (let a = 1; a < this.rectangleSide; a++) {
      for (let b = 1; b < this.rectangleSide; b++) {
        const h = Math.min(a, b);
        const w = Math.max(a, b);
        this.rectangleTable[a * this.rectangleSide + b] = h === 1 ? floorLog2(w) + 1 : h === 2 ? grid2RankNumber(w) : h + 1;
      }
    }
    this.minorMinWidth = this.canon ? undefined : new SetMinorMinWidth(this.n, this.adj);
    this.byDegree = Uint32Array.from({ length: this.n }, (_, v) => v).sort((a, b) => g.degree(b) - g.degree(a) || a - b);
  }

  /** Scratch sets of components(): what is left to place, the last layer reached and the next one. */
  private readonly rest: Bitset;
  private readonly frontier: Bitset;
  private readonly grown: Bitset;
  private readonly cuts: CutVertices;
  /** Scratch of dominatedTops: degrees in the set, a vertex's neighbours in it, and those within two steps. */
  private readonly degreeIn: Int32Array;
  private readonly near: Bitset;
  private readonly reach: Bitset;
  /** General graphs: minor-min-width of a set, never below its degeneracy (grid shapes need neither). */
  private readonly minorMinWidth: SetMinorMinWidth | undefined;

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
   * Proven lower bound for a connected set: the minor-min-width plus one (skipped for grid shapes: their
   * degeneracy is at most 2, and a 2 x 2 block gives the 3 through the rectangle bound), the path bound
   * from a breadth-first eccentricity, and for grid shapes the rectangle bound with missing cells.
   */
  private cheapLowerBound(c: Bitset, size: number): number {
    const byWidth = this.canon ? Math.min(size, 2) : this.minorMinWidth!.bound(c);
    const known = Math.max(byWidth, this.rectangleBound(c));
    // No path in C is longer than C, so the path bound cannot beat ⌊log2 |C|⌋ + 1: skip its search then.
    if (known >= floorLog2(size) + 1) return known;
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
    return Math.max(known, 32 - Math.clz32(ecc + 1));
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
  private readonly rectangleValue = (h: number, w: number): number => this.rectangleTable[h * this.rectangleSide + w]!;

  /**
   * When the set is a full rectangle, remembers its proven lower bound (exact once solved) for the
   * rectangle bound of every shape that contains one like it: a refutation of "td <= k" on a rectangle
   * counts at once, before its value is known.
   */
  private noteIfRectangle(e: number, c: Bitset): void {
    if (!this.canon) return;
    const dims = this.memo.table.word(e, 0); // canonical key: height << 16 | width
    const h = dims >>> 16;
    const w = dims & 0xffff;
    if (c.popcount() !== h * w) return;
    const side = this.rectangleSide;
    const proven = this.memo.lower(e);
    if (proven > this.rectangleTable[h * side + w]!) this.rectangleTable[h * side + w] = this.rectangleTable[w * side + h] = proven;
  }

  private tick(): void {
    if ((++this.nodes & 15) !== 0) return;
    this.checkLimits();
  }

  private readonly checkLimits = (): void => {
    if (this.limits.signal?.aborted || (this.limits.stopFlag && Atomics.load(this.limits.stopFlag, 0) !== 0)) throw new SearchStopped('aborted');
    if (this.limits.deadline !== undefined && Date.now() > this.limits.deadline) throw new SearchStopped('time-limit');
    if (this.limits.memoryBytes !== undefined && (this.nodes & 1023) === 0 && 2 * this.bytes > this.limits.memoryBytes) throw new SearchStopped('memory-limit');
  };

  /** Bytes held by the search's tables (the memo and the raw-set table). */
  get bytes(): number {
    return this.memo.bytes + this.raw.bytes + this.rawEntry.byteLength + this.rawFrame.byteLength;
  }

  /**
   * The memo entry of a connected set (created with its cheap bounds); for grid shapes lastRaw is then
   * the set's raw entry, whose frame maps `choice` back (see frameOf).
   */
  private entryOf(c: Bitset): number {
    const words = c.words;
    const hash = SetTable.hash(words, words.length);
    if (!this.canon) {
      this.lastRaw = -1;
      const known = this.memo.find(words, words.length, hash);
      if (known >= 0) return known;
      const size = c.popcount();
      return this.memo.add(words, words.length, hash, this.cheapLowerBound(c, size), size);
    }
    // Grid shapes: the same cells are met again and again; remember their entry and frame by the raw
    // set, so the canonical form is worked out once per set (common practice).
    const seen = this.raw.find(words, words.length, hash);
    if (seen >= 0) {
      this.lastRaw = seen;
      return this.rawEntry[seen]!;
    }
    const canon = this.canon;
    const length = canon.canonicalKey(c);
    const frame = canon.lastFrame.slice();
    const keyHash = SetTable.hash(canon.keyWords, length);
    let e = this.memo.find(canon.keyWords, length, keyHash);
    if (e < 0) {
      const size = c.popcount();
      const lower = this.cheapLowerBound(c, size); // does not touch the key canonicalKey left
      e = this.memo.add(canon.keyWords, length, keyHash, lower, size);
    }
    const r = this.raw.add(words, words.length, hash);
    if (this.rawEntry.length < this.raw.capacity) {
      this.rawEntry = grown(this.rawEntry, new Int32Array(this.raw.capacity));
      this.rawFrame = grown(this.rawFrame, new Int32Array(5 * this.raw.capacity));
    }
    this.rawEntry[r] = e;
    this.rawFrame.set(frame, 5 * r);
    this.lastRaw = r;
    return e;
  }

  /** A part: a connected set with its entries. */
  private partOf(c: Bitset): Part {
    const e = this.entryOf(c);
    return { c, e, raw: this.lastRaw };
  }

  /** The frame in which the choice of a grid shape's raw entry is written. */
  private frameOf(raw: number): CellFrame {
    const f = this.rawFrame;
    const at = 5 * raw;
    return this.canon!.frame(f[at]!, f[at + 1]!, f[at + 2]!, f[at + 3]!, f[at + 4]!);
  }

  /** The best lower bound proven so far for a vertex set: the largest over its components. */
  provenLower(s: Bitset): number {
    let best = 0;
    for (const c of this.components(s)) best = Math.max(best, this.memo.lower(this.entryOf(c)));
    return best;
  }

  /** Decides td(S) <= k for any vertex set S. */
  atMost(s: Bitset, k: number): boolean {
    const parts = this.components(s).map((c) => this.partOf(c));
    // Every component must fit: look for one already known not to before searching any of them.
    for (const p of parts) if (this.memo.lower(p.e) > k) return false;
    for (const p of parts) if (this.memo.upper(p.e) > k && !this.connectedPartAtMost(p, k)) return false;
    return true;
  }

  /** Decides td(C) <= k for a connected set C, recording what it proves. */
  connectedAtMost(c: Bitset, k: number): boolean {
    return this.connectedPartAtMost(this.partOf(c), k);
  }

  private connectedPartAtMost(part: Part, k: number): boolean {
    const { c, e } = part;
    const memo = this.memo;
    if (memo.upper(e) <= k) return true;
    if (memo.lower(e) > k) return false;
    this.tick();
    // For grid shapes, only tops inside every rectangle that bounds C by k can leave C - v within k - 1.
    const win = this.canon?.topWindow(c, k, this.rectangleValue);
    if (this.canon && !win) {
      memo.setLower(e, k + 1);
      this.noteIfRectangle(e, c);
      return false;
    }
    if (this.separators && c.popcount() >= SEPARATOR_BRANCHING_FROM) return this.separatorAtMost(part, k);
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
    const passed = this.canon ? undefined : this.dominatedTops(c);
    for (let i = 0; i < tops.length; i++) {
      const v = tops[i]!;
      if (!win && !c.has(v)) continue;
      if (passed?.has(v)) continue;
      rest.delete(v);
      const fits = cut.has(v) ? this.atMost(rest, k - 1) : this.connectedAtMost(rest, k - 1);
      rest.add(v);
      if (fits) return this.fitsWith(part, k, v);
    }
    memo.setLower(e, k + 1);
    this.noteIfRectangle(e, c);
    return false;
  }

  /**
   * The vertices of a connected set C that need not be tried as its top: v, when some u of C has
   * N_C(v) − u ⊆ N_C(u). Then C − u is a subgraph of C − v (u standing in for v: every edge of v in C − u
   * goes to a neighbour of u), so td(C − u) ≤ td(C − v) as td never grows on subgraphs, and u does at least
   * as well on top. u must come later in the order by degree in C, then lower index (its degree is never
   * below v's), so a vertex passed over always leads to one that is tried. Leaves are the common case.
   */
  private dominatedTops(c: Bitset): Bitset {
    const passed = new Bitset(this.n); // per call: the search below the caller's loop makes its own
    const cw = c.words;
    const words = cw.length;
    const degree = this.degreeIn;
    c.forEach((v) => {
      const aw = this.adj[v]!.words;
      let d = 0;
      for (let i = 0; i < words; i++) d += popcount32(aw[i]! & cw[i]!);
      degree[v] = d;
    });
    const nw = this.near.words;
    const kw = this.reach.words;
    c.forEach((v) => {
      const aw = this.adj[v]!.words;
      for (let i = 0; i < words; i++) nw[i] = aw[i]! & cw[i]!;
      // Every candidate u is v's neighbour or a neighbour of one (v has a neighbour: C is connected).
      kw.set(nw);
      this.near.forEach((x) => this.reach.orWith(this.adj[x]!));
      for (let i = 0; i < words; i++) kw[i]! &= cw[i]!;
      this.reach.delete(v);
      const dv = degree[v]!;
      for (let i = 0; i < words && !passed.has(v); i++) {
        for (let bits = kw[i]!; bits !== 0; bits &= bits - 1) {
          const u = 32 * i + 31 - Math.clz32(bits & -bits);
          const du = degree[u]!;
          if (du < dv || (du === dv && u > v)) continue;
          // N_C(v) − u ⊆ N(u): no word of N_C(v) has a bit outside N(u) but u's own.
          const uw = this.adj[u]!.words;
          let outside = 0;
          for (let j = 0; j < words && outside === 0; j++) outside = nw[j]! & ~uw[j]! & (j === u >>> 5 ? ~(1 << (u & 31)) : -1);
          if (outside === 0) {
            passed.add(v);
            break;
          }
        }
      }
    });
    return passed;
  }

  /**
   * td(C) <= k for a connected grid shape C of more than two cells (so not complete) by its minimal
   * separators: td(C) = min over them of |X| + max over the components D of C - X of td(D) (DESIGN,
   * "Recursion"), each X of at most k - 1 cells and confined by the rectangle bound.
   */
  private separatorAtMost(part: Part, k: number): boolean {
    const { c, e } = part;
    const rest = new Bitset(this.n);
    let chain: Int32Array | undefined;
    const rectangles = this.canon!.separatorRectangles(c, k, this.rectangleValue, k - 1);
    const found = this.separators!.forEach(
      c,
      k - 1,
      rectangles,
      (cells, count) => {
        this.tick();
        rest.copyFrom(c);
        for (let i = 0; i < count; i++) rest.delete(cells[i]!);
        const comps = this.components(rest);
        if (comps.length < 2) return false;
        const budget = k - count;
        const parts = comps.map((d) => this.partOf(d));
        for (const p of parts) if (this.memo.lower(p.e) > budget) return false;
        for (const p of parts) if (this.memo.upper(p.e) > budget && !this.connectedPartAtMost(p, budget)) return false;
        chain = cells.slice(0, count);
        return true;
      },
      this.checkLimits,
    );
    if (!found) {
      this.memo.setLower(e, k + 1);
      this.noteIfRectangle(e, c);
      return false;
    }
    // C - x1 - ... - xi fits in k - i labels with x(i+1) on top, for as long as it stays connected: the
    // labelling reads the chain back from the memo.
    const set = c.clone();
    let p = part;
    for (let i = 0; i < chain!.length; i++) {
      if (this.memo.upper(p.e) > k - i) this.fitsWith(p, k - i, chain![i]!);
      set.delete(chain![i]!);
      if (i + 1 === chain!.length || this.components(set).length !== 1) break;
      p = this.partOf(set.clone());
    }
    return true;
  }

  /** Records that the part fits in k labels with v on top. */
  private fitsWith(part: Part, k: number, v: number): true {
    this.memo.setUpper(part.e, k, part.raw >= 0 ? this.frameOf(part.raw).toCanonical(v) : v);
    this.noteIfRectangle(part.e, part.c);
    return true;
  }

  /**
   * The exact tree-depth of a connected set, by deepening k from its lower bound; `onLower` hears each
   * lower bound proven on the way (a caller stopped by a limit keeps the last one).
   */
  treeDepth(c: Bitset, onLower?: (lower: number) => void): number {
    const e = this.entryOf(c);
    while (this.memo.lower(e) < this.memo.upper(e)) {
      this.connectedAtMost(c, this.memo.lower(e));
      onLower?.(this.memo.lower(e));
    }
    return this.memo.upper(e);
  }

  /**
   * Labels S (1-based, into `labels`) with at most `k` labels, using the choices the search recorded;
   * only call after atMost(S, k) returned true.
   */
  label(s: Bitset, k: number, labels: Int32Array): void {
    for (const c of this.components(s)) {
      const { e, raw } = this.partOf(c);
      if (this.memo.upper(e) > k && !this.connectedAtMost(c, k)) throw new Error('label: the set does not fit in k labels');
      const fit = Math.min(this.memo.upper(e), k);
      const choice = this.memo.choice(e);
      if (choice < 0) {
        let next = 1;
        c.forEach((v) => (labels[v] = next++));
        continue;
      }
      const top = raw >= 0 ? this.frameOf(raw).fromCanonical(choice) : choice;
      labels[top] = fit;
      this.label(c.clone().delete(top), fit - 1, labels);
    }
  }
}
