import { NarrowOverflow, POW2 as SHARED_POW2, topBit as sharedTopBit } from './visible-sets';

// Module-local aliases: the hot loops below then read no imported bindings.
const POW2 = SHARED_POW2;
const topBit = sharedTopBit;

/**
 * The heart of the tree edge ranking: at a vertex with k >= 2 children, given each child's subtree's
 * visible set a_i (as a number, see visible-sets.ts), choose each child edge's label so that the sets
 * the children show through their edges are pairwise disjoint and their union U is least (as a number).
 * (Every path between edges in different children's branches passes through the vertex, so the labels
 * form an edge ranking exactly when each child's subtree is ranked, each child edge's label is one its
 * child does not see, and the shown sets are pairwise disjoint; their union is what the vertex sees.)
 *
 * A child with set a whose edge gets label x (x not in a) shows {x} ∪ {labels of a above x}: as numbers
 * ("a above bit j, plus bit j" for a clear bit j of a), every such candidate is larger than a.
 * Conversely every number b > a contains (bitwise) a candidate: at the highest bit m where they differ,
 * b has it and a does not, so "a above m, plus m" fits inside b. Shrinking each b_i to a candidate inside
 * it keeps them disjoint, so U = min Σ b_i over pairwise bit-disjoint numbers b_i > a_i.
 *
 * That minimum is found bit by bit from the top. A child is "tight" while its b has equalled a on every
 * bit so far; a tight child holding the current bit must get it (two such children cannot both), and a
 * bit no tight child holds may finish one tight child (its b now exceeds its a, its lower bits are free).
 * Finishing the tight child with the largest remainder is never worse: whichever child another solution
 * finishes here can use, inside the bits the largest one would have taken later, a candidate of its own
 * (the containment fact above). So "do bits s .. 0 suffice?" is a greedy run (fits), and U takes each
 * bit only when the bits below cannot do without it. With r bits in U, combine costs O(r^2 k) at worst
 * and far less on ordinary trees (fits usually stops after a step or two).
 */
export class ChildCombiner {
  /** Output of combine: finish[i] is the bit (label - 1) given to child i's edge. */
  readonly finish: Int32Array;
  private readonly rem: Float64Array; // remainders of the tight children, descending
  private readonly who: Int32Array; // which child each remainder belongs to
  private readonly mods: Float64Array; // fits' stripped remainders, ascending

  constructor(maxChildren: number) {
    this.finish = new Int32Array(maxChildren);
    this.rem = new Float64Array(maxChildren);
    this.who = new Int32Array(maxChildren);
    this.mods = new Float64Array(maxChildren);
  }

  /** The least union U for the children's sets values[from .. from + k); fills finish[0 .. k). Throws NarrowOverflow past 53 labels. */
  combine(values: Float64Array, from: number, k: number): number {
    const { rem, who, finish } = this;
    if (k > 53) throw new NarrowOverflow(); // k children's edges need k different labels
    this.sortDescending(values, from, k);
    let lo = 0;
    let t = Math.max(topBit(rem[0]!), k - 1);
    while (!this.fits(lo, k, t)) t++;
    if (t >= 53) throw new NarrowOverflow();
    let union = 0;
    while (lo < k) {
      const top = rem[lo]!;
      const p = POW2[t]!;
      if (top >= p) {
        // The largest tight child holds bit t and keeps it (fits guarantees no other one does).
        union += p;
        this.reinsert(lo, k, top - p);
      } else if (!this.fits(lo, k, t - 1)) {
        union += p;
        finish[who[lo]!] = t;
        lo++;
      }
      t--;
    }
    return union;
  }

  /**
   * Whether bits s .. 0 suffice for the tight remainders rem[lo .. hi) (all below 2^(s + 1)), by the greedy
   * above, without disturbing them: stripped remainders go to a small side list. Free stretches are
   * skipped in one step, and it stops early once the count alone decides (each child needs its own bit;
   * with the largest below 2^(h + 1), bits s .. h + 1 alone finish s - h children).
   */
  private fits(lo: number, hi: number, s: number): boolean {
    if (s >= 53) throw new NarrowOverflow();
    const { rem, mods } = this;
    let i = lo;
    let mc = 0;
    for (;;) {
      const c = hi - i + mc;
      if (c === 0) return true;
      if (c > s + 1) return false;
      const inMods = mc > 0 && (i >= hi || mods[mc - 1]! >= rem[i]!);
      const top = inMods ? mods[mc - 1]! : rem[i]!;
      const h = topBit(top);
      if (s - h >= c) return true;
      if (h === s) {
        const next = inMods ? Math.max(mc > 1 ? mods[mc - 2]! : -1, i < hi ? rem[i]! : -1) : Math.max(mc > 0 ? mods[mc - 1]! : -1, i + 1 < hi ? rem[i + 1]! : -1);
        const p = POW2[s]!;
        if (next >= p) return false; // two tight children hold bit s
        if (inMods) mc--;
        else i++;
        const x = top - p;
        let j = mc;
        while (j > 0 && mods[j - 1]! > x) {
          mods[j] = mods[j - 1]!;
          j--;
        }
        mods[j] = x;
        mc++;
        s--;
      } else {
        // Bits s .. h + 1 are held by nobody: each finishes the largest remaining child.
        let r = s - h;
        if (mc === 0) i += r;
        else {
          while (r-- > 0) {
            if (mc > 0 && (i >= hi || mods[mc - 1]! >= rem[i]!)) mc--;
            else i++;
          }
        }
        s = h;
      }
    }
  }

  /** Replaces rem[lo] by x and moves it down to keep rem[lo .. hi) descending. */
  private reinsert(lo: number, hi: number, x: number): void {
    const { rem, who } = this;
    const owner = who[lo]!;
    let j = lo;
    while (j + 1 < hi && rem[j + 1]! > x) {
      rem[j] = rem[j + 1]!;
      who[j] = who[j + 1]!;
      j++;
    }
    rem[j] = x;
    who[j] = owner;
  }

  private sortDescending(values: Float64Array, from: number, k: number): void {
    const { rem, who } = this;
    if (k <= 32) {
      for (let i = 0; i < k; i++) {
        const x = values[from + i]!;
        let j = i;
        while (j > 0 && rem[j - 1]! < x) {
          rem[j] = rem[j - 1]!;
          who[j] = who[j - 1]!;
          j--;
        }
        rem[j] = x;
        who[j] = i;
      }
      return;
    }
    const order = Int32Array.from({ length: k }, (_, i) => i).sort((a, b) => values[from + b]! - values[from + a]!);
    for (let i = 0; i < k; i++) {
      rem[i] = values[from + order[i]!]!;
      who[i] = order[i]!;
    }
  }
}
