import type { Bitset } from '../graph/bitset';
import type { ShapeCanon } from './shape-canon';

/** What visit hears: the cells of a candidate separator (vertex numbers) in `cells[0..count)`. */
export type SeparatorVisit = (cells: Int32Array, count: number) => boolean;

const KING_DR = [-1, -1, -1, 0, 0, 1, 1, 1];
const KING_DC = [-1, 0, 1, -1, 1, -1, 0, 1];

/**
 * Candidate minimal separators of a connected grid shape, as cycles through its cells and the regions
 * around it. The shape is a plane graph whose faces are the unit squares with four cells and one face per
 * 8-connected region of missing cells (the outside among them); a minimal separator of a plane graph is
 * the vertex set of a cycle in its radial graph, which steps from vertex to vertex through a shared face
 * (Bouchitté, Mazoit & Todinca, "Chordal embeddings of planar graphs", Discrete Math. 2003). Two cells
 * share a square face only if they are king-adjacent, and any two cells on a missing region's rim share
 * that face, so every minimal separator is the cell set of a king path that closes through a missing
 * region, or of a closed king cycle. Some sets listed do not separate, or come more than once: the caller
 * checks the components.
 */
export class GridSeparators {
  /** The shape's layout and its scratch member list (see ShapeCanon.scan). */
  constructor(private readonly canon: ShapeCanon) {}

  /**
   * Calls visit for cell sets X of at most maxSize cells that include every minimal separator of the
   * connected shape `set` with at most maxSize cells and, for each rectangle [r0, r1, c0, c1, slack] of
   * `rectangles` (grid coordinates, inclusive), at most `slack` cells outside it. Stops as soon as visit
   * returns true, and says whether it did. `pulse` is called now and then (to stop a long listing).
   */
  forEach(set: Bitset, maxSize: number, rectangles: Int32Array, visit: SeparatorVisit, pulse: () => void): boolean {
    if (maxSize < 1) return false;
    // The shape in a box padded by one cell all round, so that the outside is one region.
    const canon = this.canon;
    const count = canon.scan(set);
    // Copies: the visits below scan other sets with the same scratch.
    const members = canon.members.slice(0, count);
    const [r0, r1, c0, c1] = Array.from(canon.box) as [number, number, number, number];
    const top = r0 - 1;
    const left = c0 - 1;
    const H = r1 - r0 + 3;
    const W = c1 - c0 + 3;
    const cells = H * W;
    const vertexOf = new Int32Array(cells).fill(-1);
    for (let i = 0; i < count; i++) {
      const v = members[i]!;
      vertexOf[(canon.row[v]! - top) * W + canon.col[v]! - left] = v;
    }
    // Missing cells by 8-connected region.
    const region = new Int32Array(cells).fill(-1);
    let regions = 0;
    const stack = new Int32Array(cells);
    for (let p = 0; p < cells; p++) {
      if (vertexOf[p]! >= 0 || region[p]! >= 0) continue;
      let sp = 0;
      stack[sp++] = p;
      region[p] = regions;
      while (sp > 0) {
        const q = stack[--sp]!;
        const qr = (q / W) | 0;
        const qc = q - qr * W;
        for (let d = 0; d < 8; d++) {
          const rr = qr + KING_DR[d]!;
          const cc = qc + KING_DC[d]!;
          if (rr < 0 || cc < 0 || rr >= H || cc >= W) continue;
          const t = rr * W + cc;
          if (vertexOf[t]! >= 0 || region[t]! >= 0) continue;
          region[t] = regions;
          stack[sp++] = t;
        }
      }
      regions++;
    }
    // Each region's rim (the cells king-adjacent to it), and for each cell the regions it touches (at
    // most four: its eight neighbours alternate with the four it shares an edge with).
    const rimStart = new Int32Array(regions + 1);
    const touches = new Int32Array(4 * cells).fill(-1);
    for (let p = 0; p < cells; p++) {
      if (vertexOf[p]! < 0) continue;
      const pr = (p / W) | 0;
      const pc = p - pr * W;
      let listed = 0;
      for (let d = 0; d < 8; d++) {
        const o = region[(pr + KING_DR[d]!) * W + pc + KING_DC[d]!]!;
        if (o < 0) continue;
        let known = false;
        for (let j = 0; j < listed; j++) if (touches[4 * p + j] === o) known = true;
        if (known) continue;
        touches[4 * p + listed++] = o;
        rimStart[o + 1]!++;
      }
    }
    for (let o = 0; o < regions; o++) rimStart[o + 1]! += rimStart[o]!;
    const rim = new Int32Array(rimStart[regions]!);
    const fill = rimStart.slice(0, regions);
    for (let p = 0; p < cells; p++) for (let j = 0; j < 4 && touches[4 * p + j]! >= 0; j++) rim[fill[touches[4 * p + j]!]!++] = p;
    const touchesRegion = (p: number, o: number) => touches[4 * p] === o || touches[4 * p + 1] === o || touches[4 * p + 2] === o || touches[4 * p + 3] === o;
    // For each cell, the rectangles it lies outside of (a list per cell), and a count per rectangle of
    // the path's cells outside it.
    const m = rectangles.length / 5;
    const slack = new Int32Array(m);
    const outStart = new Int32Array(cells + 1);
    const outList: number[] = [];
    for (let p = 0; p < cells; p++) {
      outStart[p] = outList.length;
      if (vertexOf[p]! < 0) continue;
      const r = ((p / W) | 0) + top;
      const c = (p % W) + left;
      for (let i = 0, at = 0; i < m; i++, at += 5) {
        if (r < rectangles[at]! || r > rectangles[at + 1]! || c < rectangles[at + 2]! || c > rectangles[at + 3]!) outList.push(i);
      }
    }
    outStart[cells] = outList.length;
    for (let i = 0; i < m; i++) slack[i] = rectangles[5 * i + 4]!;
    const outOf = Int32Array.from(outList);
    const outside = new Int32Array(m);
    /** Counts p outside its rectangles, or, when one would then hold too many, leaves the counts and says no. */
    const enter = (p: number): boolean => {
      const from = outStart[p]!;
      const to = outStart[p + 1]!;
      for (let j = from; j < to; j++) {
        const i = outOf[j]!;
        if (outside[i]! >= slack[i]!) {
          for (let u = from; u < j; u++) outside[outOf[u]!]!--;
          return false;
        }
        outside[i]!++;
      }
      return true;
    };
    const leave = (p: number): void => {
      for (let j = outStart[p]!, to = outStart[p + 1]!; j < to; j++) outside[outOf[j]!]!--;
    };

    const onPath = new Uint8Array(cells);
    const usedRegion = new Uint8Array(regions);
    const path = new Int32Array(maxSize);
    const out = new Int32Array(maxSize);
    const dist = new Int32Array(cells);
    const queue = new Int32Array(cells);
    let steps = 0;
    const report = (len: number): boolean => {
      for (let i = 0; i < len; i++) out[i] = vertexOf[path[i]!]!;
      return visit(out, len);
    };
    /** Breadth-first: cells still needed after p to reach the rim of region `home` (or a king neighbour of cell `home`). */
    const distances = (starts: ArrayLike<number>, from: number, to: number, throughRegions: boolean) => {
      dist.fill(-1);
      const seenRegion = new Uint8Array(regions);
      let head = 0;
      let tail = 0;
      for (let i = from; i < to; i++) {
        const p = starts[i]!;
        if (dist[p] === -1) {
          dist[p] = 0;
          queue[tail++] = p;
        }
      }
      while (head < tail) {
        const p = queue[head++]!;
        const pr = (p / W) | 0;
        const pc = p - pr * W;
        const next = dist[p]! + 1;
        for (let d = 0; d < 8; d++) {
          const t = (pr + KING_DR[d]!) * W + pc + KING_DC[d]!;
          if (vertexOf[t]! < 0 || dist[t] !== -1) continue;
          dist[t] = next;
          queue[tail++] = t;
        }
        if (!throughRegions) continue;
        for (let j = 0; j < 4; j++) {
          const o = touches[4 * p + j]!;
          if (o < 0) break;
          if (seenRegion[o]) continue;
          seenRegion[o] = 1;
          for (let i = rimStart[o]!; i < rimStart[o + 1]!; i++) {
            const t = rim[i]!;
            if (dist[t] !== -1) continue;
            dist[t] = next;
            queue[tail++] = t;
          }
        }
      }
    };

    // Paths that leave region `home` and come back to it, through other regions of higher number.
    let home = 0;
    const extendOpen = (p: number, len: number): boolean => {
      if ((++steps & 1023) === 0) pulse();
      if (touchesRegion(p, home) && (len === 1 || path[0]! < p) && report(len)) return true;
      if (len === maxSize) return false;
      const pr = (p / W) | 0;
      const pc = p - pr * W;
      for (let d = 0; d < 8; d++) {
        const t = (pr + KING_DR[d]!) * W + pc + KING_DC[d]!;
        if (vertexOf[t]! < 0 || onPath[t] || len + 1 + dist[t]! > maxSize) continue;
        if (step(t, len, extendOpen)) return true;
      }
      for (let j = 0; j < 4; j++) {
        const o = touches[4 * p + j]!;
        if (o < 0) break;
        if (o <= home || usedRegion[o]) continue;
        usedRegion[o] = 1;
        for (let i = rimStart[o]!; i < rimStart[o + 1]!; i++) {
          const t = rim[i]!;
          if (onPath[t] || len + 1 + dist[t]! > maxSize) continue;
          if (step(t, len, extendOpen)) {
            usedRegion[o] = 0;
            return true;
          }
        }
        usedRegion[o] = 0;
      }
      return false;
    };
    const step = (t: number, len: number, extend: (p: number, len: number) => boolean): boolean => {
      if (!enter(t)) return false;
      onPath[t] = 1;
      path[len] = t;
      const found = extend(t, len + 1);
      leave(t);
      onPath[t] = 0;
      return found;
    };
    for (home = 0; home < regions; home++) {
      distances(rim, rimStart[home]!, rimStart[home + 1]!, true);
      usedRegion[home] = 1;
      for (let i = rimStart[home]!; i < rimStart[home + 1]!; i++) {
        const s = rim[i]!;
        if (1 + dist[s]! > maxSize) continue;
        if (step(s, 0, extendOpen)) return true;
      }
      usedRegion[home] = 0;
    }

    // Closed king cycles through cells only, each listed from its first cell (in box order) and, of its
    // two directions, the one whose second cell comes first.
    if (maxSize < 4) return false;
    let start = 0;
    const kingAdjacent = (p: number, q: number) => {
      const dr = ((p / W) | 0) - ((q / W) | 0);
      const dc = (p % W) - (q % W);
      return dr >= -1 && dr <= 1 && dc >= -1 && dc <= 1;
    };
    const extendClosed = (p: number, len: number): boolean => {
      if ((++steps & 1023) === 0) pulse();
      if (len >= 4 && kingAdjacent(p, start) && path[1]! < p && report(len)) return true;
      if (len === maxSize) return false;
      const pr = (p / W) | 0;
      const pc = p - pr * W;
      for (let d = 0; d < 8; d++) {
        const t = (pr + KING_DR[d]!) * W + pc + KING_DC[d]!;
        // dist[t] - 1 more cells after t reach a king neighbour of the first cell.
        if (t <= start || vertexOf[t]! < 0 || onPath[t] || len + dist[t]! > maxSize) continue;
        if (step(t, len, extendClosed)) return true;
      }
      return false;
    };
    const one = new Int32Array(1);
    for (let i = 0; i < count; i++) {
      one[0] = (canon.row[members[i]!]! - top) * W + canon.col[members[i]!]! - left;
      start = one[0]!;
      // A cycle that encloses a cell spans three rows at least (the shape's rows are 1 to H - 2 of the
      // padded box); and its first cell must keep to the rectangles before distances are worth working out.
      if (((start / W) | 0) + 2 > H - 2) continue;
      if (!enter(start)) continue;
      leave(start);
      distances(one, 0, 1, false);
      if (step(start, 0, extendClosed)) return true;
    }
    return false;
  }
}
