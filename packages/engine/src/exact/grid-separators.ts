import type { Bitset } from '../graph/bitset';
import type { ShapeCanon } from './shape-canon';

/** What visit hears: the cells of a candidate separator (vertex numbers) in `cells[0..count)`. */
export type SeparatorVisit = (cells: Int32Array, count: number) => boolean;

/** The eight king steps counter-clockwise from east: even ones share an edge, odd ones a corner. */
const KING_DR = [0, -1, -1, -1, 0, 1, 1, 1];
const KING_DC = [1, 1, 0, -1, -1, -1, 0, 1];

/**
 * For a cell's unit squares at odd directions a = 2i + 1 and b = 2j + 1 (entry 4i + j): the edge
 * directions 2e strictly between a and b counter-clockwise, as bits e (the other side holds the rest).
 */
const ARC = Int32Array.from({ length: 16 }, (_, at) => {
  const a = 2 * (at >> 2) + 1;
  const b = 2 * (at & 3) + 1;
  let bits = 0;
  if (a === b) return 0;
  for (let e = (a + 1) & 7; e !== ((b + 1) & 7); e = (e + 2) & 7) bits |= 1 << (e >> 1);
  return bits;
});
/** The high bit and the low bit of each byte lane of a 32-bit word. */
const HIGH_BITS = 0x80808080 | 0;
const LOW_BITS = 0x01010101;

/** Narrows the box at `at` of `boxes` to its intersection with rectangle i of `bounds` (both [r0, r1, c0, c1]). */
function narrow(boxes: Int32Array, at: number, bounds: Int32Array, i: number): void {
  const b = 4 * i;
  boxes[at] = Math.max(boxes[at]!, bounds[b]!);
  boxes[at + 1] = Math.min(boxes[at + 1]!, bounds[b + 1]!);
  boxes[at + 2] = Math.max(boxes[at + 2]!, bounds[b + 2]!);
  boxes[at + 3] = Math.min(boxes[at + 3]!, bounds[b + 3]!);
}

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
    // The rectangles' room (slack minus the path's cells outside them) as byte lanes, four rectangles to
    // a word, and for each cell a mask with a 1 in the lane of every rectangle it lies outside of: a step
    // updates four rectangles at once (SWAR, common practice). A rectangle with more slack than a lane
    // holds is left out (it could only bind paths longer than that). A cell may join the path only if it
    // lies inside every rectangle without room left, so the path keeps their intersection, the tight box.
    const m = rectangles.length / 5;
    const lanes = (m + 3) >> 2;
    const room = new Int32Array(lanes * (maxSize + 2));
    const outMask = new Int32Array(cells * lanes);
    const bounds = new Int32Array(4 * m); // each rectangle in padded-box coordinates
    const tight = new Int32Array(4 * (maxSize + 2)); // the tight box [r0, r1, c0, c1] at each path length
    tight[1] = H - 1;
    tight[3] = W - 1;
    // A cell lies outside a rectangle when its row or its column does: masks by row and by column first.
    const byRow = new Int32Array(H * lanes);
    const byCol = new Int32Array(W * lanes);
    for (let i = 0, at = 0; i < m; i++, at += 5) {
      const slack = rectangles[at + 4]!;
      const rr0 = rectangles[at]! - top;
      const rr1 = rectangles[at + 1]! - top;
      const rc0 = rectangles[at + 2]! - left;
      const rc1 = rectangles[at + 3]! - left;
      bounds[4 * i] = rr0;
      bounds[4 * i + 1] = rr1;
      bounds[4 * i + 2] = rc0;
      bounds[4 * i + 3] = rc1;
      if (slack > 127) continue;
      if (slack === 0) narrow(tight, 0, bounds, i);
      const lane = i >> 2;
      const bit = 1 << (8 * (i & 3));
      room[lane]! |= slack * bit;
      for (let r = 0; r < H; r++) if (r < rr0 || r > rr1) byRow[r * lanes + lane]! |= bit;
      for (let c = 0; c < W; c++) if (c < rc0 || c > rc1) byCol[c * lanes + lane]! |= bit;
    }
    for (let p = 0; p < cells; p++) {
      if (vertexOf[p]! < 0) continue;
      const r = (p / W) | 0;
      const rowAt = r * lanes;
      const colAt = (p - r * W) * lanes;
      const cellAt = p * lanes;
      for (let w = 0; w < lanes; w++) outMask[cellAt + w] = byRow[rowAt + w]! | byCol[colAt + w]!;
    }
    // One copy of the room and of the tight box per path length: entering writes the next copy, leaving
    // only steps back.
    let depth = 0;
    /** Counts p outside its rectangles, or, when one would then hold too many, leaves the counts and says no. */
    const enter = (p: number): boolean => {
      const at = 4 * depth;
      const r = (p / W) | 0;
      const c = p - r * W;
      if (r < tight[at]! || r > tight[at + 1]! || c < tight[at + 2]! || c > tight[at + 3]!) return false;
      tight[at + 4] = tight[at]!;
      tight[at + 5] = tight[at + 1]!;
      tight[at + 6] = tight[at + 2]!;
      tight[at + 7] = tight[at + 3]!;
      const from = depth * lanes;
      const to = from + lanes;
      depth++;
      const base = p * lanes - from;
      for (let w = from; w < to; w++) {
        const mask = outMask[base + w]!;
        const after = (room[w + lanes] = room[w]! - mask);
        if (mask === 0) continue;
        // Lanes are at most 127: with each one's high bit set, subtracting 1 from every lane borrows
        // only in the lanes that were zero.
        let emptied = ~((after | HIGH_BITS) - LOW_BITS) & (mask << 7);
        while (emptied !== 0) {
          const low = emptied & -emptied;
          emptied ^= low;
          narrow(tight, at + 4, bounds, 4 * (w - from) + ((31 - Math.clz32(low)) >> 3));
        }
      }
      return true;
    };
    const leave = (): void => {
      depth--;
    };

    const onPath = new Uint8Array(cells);
    const usedRegion = new Uint8Array(regions);
    const path = new Int32Array(maxSize);
    const out = new Int32Array(maxSize);
    const dist = new Int32Array(cells);
    const queue = new Int32Array(cells);
    // The local test of a minimal separator: it has two full components, each with a neighbour of every
    // one of its cells (the full-component characterisation, common practice), and along the cycle of
    // faces and cells that it is (see the class comment) they lie on its two sides; an edge meets the
    // cycle only at its ends, so both sides of a cell, between the faces the cycle enters and leaves it
    // by, hold an edge to a cell off the path. Where a face might be a missing region's, the test is
    // skipped. `back[i]` is the direction from path[i] to path[i - 1] when that step went through a unit
    // square, else -1.
    const offset = KING_DR.map((dr, d) => dr * W + KING_DC[d]!);
    const squares = new Uint8Array(cells); // bit i: the unit square at direction 2i + 1 has four cells
    const edges = new Uint8Array(cells); // bit e: the cell at direction 2e is in the shape
    for (let p = 0; p < cells; p++) {
      if (vertexOf[p]! < 0) continue;
      for (let e = 0; e < 4; e++) if (vertexOf[p + offset[2 * e]!]! >= 0) edges[p]! |= 1 << e;
      for (let i = 0; i < 4; i++) {
        const corners = (1 << i) | (1 << ((i + 1) & 3));
        if ((edges[p]! & corners) === corners && vertexOf[p + offset[2 * i + 1]!]! >= 0) squares[p]! |= 1 << i;
      }
    }
    /** The unit squares (bits as in `squares`) the cycle may pass from p to its neighbour at d; 0 when one may be a missing region. */
    const facesToward = (p: number, d: number): number => {
      if ((d & 1) === 1) return squares[p]! & (1 << (d >> 1));
      const both = (1 << (d >> 1)) | (1 << (((d + 7) & 7) >> 1));
      return (squares[p]! & both) === both ? both : 0;
    };
    const back = new Int32Array(maxSize);
    /** Whether p, entered from direction `from` and left toward `to`, can have an edge off the path on both sides. */
    const bothSides = (p: number, from: number, to: number): boolean => {
      const a = facesToward(p, from);
      const b = facesToward(p, to);
      if (a === 0 || b === 0) return true;
      let free = edges[p]!;
      for (let e = 0; e < 4; e++) if (onPath[p + offset[2 * e]!]) free &= ~(1 << e);
      if ((to & 1) === 0) free &= ~(1 << (to >> 1));
      for (let i = 0; i < 4; i++) {
        if ((a & (1 << i)) === 0) continue;
        for (let j = 0; j < 4; j++) {
          if (i === j || (b & (1 << j)) === 0) continue;
          const arc = ARC[4 * i + j]!;
          if ((arc & free) !== 0 && (~arc & free) !== 0) return true;
        }
      }
      return false;
    };
    /** The direction from p to its king neighbour q. */
    const toward = (p: number, q: number): number => offset.indexOf(q - p);
    let steps = 0;
    const report = (len: number): boolean => {
      for (let i = 0; i < len; i++) out[i] = vertexOf[path[i]!]!;
      return visit(out, len);
    };
    /** Breadth-first: cells still needed after p to reach the starts (the rim of region `home`, or the first cell of a closed cycle). */
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
      const from = back[len - 1]!;
      for (let d = 0; d < 8; d++) {
        const t = (pr + KING_DR[d]!) * W + pc + KING_DC[d]!;
        if (vertexOf[t]! < 0 || onPath[t] || len + 1 + dist[t]! > maxSize) continue;
        if (from >= 0 && !bothSides(p, from, d)) continue;
        if (step(t, len, extendOpen, (d + 4) & 7)) return true;
      }
      for (let j = 0; j < 4; j++) {
        const o = touches[4 * p + j]!;
        if (o < 0) break;
        if (o <= home || usedRegion[o]) continue;
        usedRegion[o] = 1;
        for (let i = rimStart[o]!; i < rimStart[o + 1]!; i++) {
          const t = rim[i]!;
          if (onPath[t] || len + 1 + dist[t]! > maxSize) continue;
          if (step(t, len, extendOpen, -1)) {
            usedRegion[o] = 0;
            return true;
          }
        }
        usedRegion[o] = 0;
      }
      return false;
    };
    const step = (t: number, len: number, extend: (p: number, len: number) => boolean, from: number): boolean => {
      if (!enter(t)) return false;
      onPath[t] = 1;
      path[len] = t;
      back[len] = from;
      const found = extend(t, len + 1);
      leave();
      onPath[t] = 0;
      return found;
    };
    for (home = 0; home < regions; home++) {
      distances(rim, rimStart[home]!, rimStart[home + 1]!, true);
      usedRegion[home] = 1;
      for (let i = rimStart[home]!; i < rimStart[home + 1]!; i++) {
        const s = rim[i]!;
        if (1 + dist[s]! > maxSize) continue;
        if (step(s, 0, extendOpen, -1)) return true;
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
      if (len >= 4 && kingAdjacent(p, start) && path[1]! < p) {
        const close = toward(p, start);
        if (bothSides(p, back[len - 1]!, close) && bothSides(start, (close + 4) & 7, (back[1]! + 4) & 7) && report(len)) return true;
      }
      if (len === maxSize) return false;
      const pr = (p / W) | 0;
      const pc = p - pr * W;
      const from = back[len - 1]!;
      for (let d = 0; d < 8; d++) {
        const t = (pr + KING_DR[d]!) * W + pc + KING_DC[d]!;
        // dist[t] - 1 more cells after t reach a king neighbour of the first cell.
        if (t <= start || vertexOf[t]! < 0 || onPath[t] || len + dist[t]! > maxSize) continue;
        if (from >= 0 && !bothSides(p, from, d)) continue;
        if (step(t, len, extendClosed, (d + 4) & 7)) return true;
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
      leave();
      distances(one, 0, 1, false);
      if (step(start, 0, extendClosed, -1)) return true;
    }
    return false;
  }
}
