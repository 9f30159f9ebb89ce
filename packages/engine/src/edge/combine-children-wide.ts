/** The bit length of a visible set held as a bigint, minus one: its highest label's bit, -1 when empty. */
export function wideTopBit(x: bigint): number {
  return x === 0n ? -1 : x.toString(2).length - 1;
}

/** The position of the lowest clear bit of x >= 0. */
export function wideLowestClearBit(x: bigint): number {
  return wideTopBit(~x & (x + 1n));
}

/** The set of the given bit positions as a bigint, built once (adding powers one by one would cost O(r^2)). */
function bigintOfBits(bits: readonly number[]): bigint {
  if (bits.length === 0) return 0n;
  let top = 0;
  for (const b of bits) if (b > top) top = b;
  const digits = new Array<string>(top + 1).fill('0');
  for (const b of bits) digits[top - b] = '1';
  return BigInt(`0b${digits.join('')}`);
}

/**
 * ChildCombiner (combine-children.ts, where the method is explained) for visible sets of any size, held
 * as bigints: the same greedy, step for step, for trees that need more than 53 labels (vertices of high
 * degree). Membership of the current bit is read from each remainder's highest bit, so a vertex with
 * many children with empty sets (a big star) costs O(k), not O(k^2) bigint arithmetic. Slower than the
 * doubles, so the tree ranking only falls back to it when the narrow path overflows.
 */
export class WideChildCombiner {
  readonly finish: Int32Array;
  private readonly rem: bigint[];
  private readonly remTop: Int32Array; // highest bit of each remainder
  private readonly who: Int32Array;
  private readonly mods: bigint[];
  private readonly modsTop: Int32Array;

  constructor(maxChildren: number) {
    this.finish = new Int32Array(maxChildren);
    this.rem = new Array<bigint>(maxChildren).fill(0n);
    this.remTop = new Int32Array(maxChildren);
    this.who = new Int32Array(maxChildren);
    this.mods = new Array<bigint>(maxChildren).fill(0n);
    this.modsTop = new Int32Array(maxChildren);
  }

  combine(values: readonly bigint[], from: number, k: number): bigint {
    const { rem, remTop, who, finish } = this;
    const order = Array.from({ length: k }, (_, i) => i).sort((a, b) => (values[from + b]! > values[from + a]! ? 1 : values[from + b]! < values[from + a]! ? -1 : 0));
    for (let i = 0; i < k; i++) {
      rem[i] = values[from + order[i]!]!;
      remTop[i] = wideTopBit(rem[i]!);
      who[i] = order[i]!;
    }
    let lo = 0;
    let t = Math.max(remTop[0]!, k - 1);
    while (!this.fits(lo, k, t)) t++;
    const bits: number[] = [];
    while (lo < k) {
      if (remTop[lo] === t) {
        bits.push(t);
        this.reinsert(lo, k, rem[lo]! - (1n << BigInt(t)));
      } else if (!this.fits(lo, k, t - 1)) {
        bits.push(t);
        finish[who[lo]!] = t;
        lo++;
      }
      t--;
    }
    return bigintOfBits(bits);
  }

  private fits(lo: number, hi: number, s: number): boolean {
    const { rem, remTop, mods, modsTop } = this;
    let i = lo;
    let mc = 0;
    for (;;) {
      const c = hi - i + mc;
      if (c === 0) return true;
      if (c > s + 1) return false;
      const inMods = mc > 0 && (i >= hi || mods[mc - 1]! >= rem[i]!);
      const h = inMods ? modsTop[mc - 1]! : remTop[i]!;
      if (s - h >= c) return true;
      if (h === s) {
        const next = inMods ? (mc > 1 && modsTop[mc - 2]! >= s) || (i < hi && remTop[i]! >= s) : (mc > 0 && modsTop[mc - 1]! >= s) || (i + 1 < hi && remTop[i + 1]! >= s);
        if (next) return false; // two tight children hold bit s
        const x = (inMods ? mods[mc - 1]! : rem[i]!) - (1n << BigInt(s));
        if (inMods) mc--;
        else i++;
        const xTop = wideTopBit(x);
        let j = mc;
        while (j > 0 && mods[j - 1]! > x) {
          mods[j] = mods[j - 1]!;
          modsTop[j] = modsTop[j - 1]!;
          j--;
        }
        mods[j] = x;
        modsTop[j] = xTop;
        mc++;
        s--;
      } else {
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

  private reinsert(lo: number, hi: number, x: bigint): void {
    const { rem, remTop, who } = this;
    const owner = who[lo]!;
    const xTop = wideTopBit(x);
    let j = lo;
    while (j + 1 < hi && rem[j + 1]! > x) {
      rem[j] = rem[j + 1]!;
      remTop[j] = remTop[j + 1]!;
      who[j] = who[j + 1]!;
      j++;
    }
    rem[j] = x;
    remTop[j] = xTop;
    who[j] = owner;
  }
}
