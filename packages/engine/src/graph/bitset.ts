/** Bits counted in one 32-bit word (SWAR popcount). */
export function popcount32(x: number): number {
  x -= (x >>> 1) & 0x55555555;
  x = (x & 0x33333333) + ((x >>> 2) & 0x33333333);
  x = (x + (x >>> 4)) & 0x0f0f0f0f;
  return Math.imul(x, 0x01010101) >>> 24;
}

/**
 * A fixed-size set of small integers 0 .. size - 1 in Uint32Array words: the search code's vertex sets.
 * Methods ending in `With` change this set in place (no allocation, for inner loops); the others return
 * a new set.
 */
export class Bitset {
  readonly size: number;
  readonly words: Uint32Array;

  constructor(size: number, words?: Uint32Array) {
    this.size = size;
    this.words = words ?? new Uint32Array((size + 31) >>> 5);
  }

  static of(size: number, members: Iterable<number>): Bitset {
    const s = new Bitset(size);
    for (const m of members) s.add(m);
    return s;
  }

  /** The set 0 .. size - 1. */
  static full(size: number): Bitset {
    const s = new Bitset(size);
    s.words.fill(0xffffffff);
    const extra = s.words.length * 32 - size;
    if (extra > 0) s.words[s.words.length - 1] = 0xffffffff >>> extra;
    return s;
  }

  has(i: number): boolean {
    return (this.words[i >>> 5]! & (1 << (i & 31))) !== 0;
  }

  add(i: number): this {
    this.words[i >>> 5]! |= 1 << (i & 31);
    return this;
  }

  delete(i: number): this {
    this.words[i >>> 5]! &= ~(1 << (i & 31));
    return this;
  }

  clone(): Bitset {
    return new Bitset(this.size, this.words.slice());
  }

  clear(): this {
    this.words.fill(0);
    return this;
  }

  copyFrom(other: Bitset): this {
    this.words.set(other.words);
    return this;
  }

  andWith(other: Bitset): this {
    const a = this.words;
    const b = other.words;
    for (let i = 0; i < a.length; i++) a[i]! &= b[i]!;
    return this;
  }

  orWith(other: Bitset): this {
    const a = this.words;
    const b = other.words;
    for (let i = 0; i < a.length; i++) a[i]! |= b[i]!;
    return this;
  }

  andNotWith(other: Bitset): this {
    const a = this.words;
    const b = other.words;
    for (let i = 0; i < a.length; i++) a[i]! &= ~b[i]!;
    return this;
  }

  and(other: Bitset): Bitset {
    return this.clone().andWith(other);
  }

  or(other: Bitset): Bitset {
    return this.clone().orWith(other);
  }

  andNot(other: Bitset): Bitset {
    return this.clone().andNotWith(other);
  }

  popcount(): number {
    let c = 0;
    for (const w of this.words) c += popcount32(w);
    return c;
  }

  isEmpty(): boolean {
    for (const w of this.words) if (w !== 0) return false;
    return true;
  }

  intersects(other: Bitset): boolean {
    const a = this.words;
    const b = other.words;
    for (let i = 0; i < a.length; i++) if ((a[i]! & b[i]!) !== 0) return true;
    return false;
  }

  /** True when every member of this set is in other. */
  isSubsetOf(other: Bitset): boolean {
    const a = this.words;
    const b = other.words;
    for (let i = 0; i < a.length; i++) if ((a[i]! & ~b[i]!) !== 0) return false;
    return true;
  }

  equals(other: Bitset): boolean {
    if (this.size !== other.size) return false;
    const a = this.words;
    const b = other.words;
    for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
    return true;
  }

  /** A 32-bit FNV-1a style hash of the words, for hash tables keyed by sets. */
  hash(): number {
    let h = 0x811c9dc5;
    for (const w of this.words) {
      h = Math.imul(h ^ (w & 0xffff), 0x01000193);
      h = Math.imul(h ^ (w >>> 16), 0x01000193);
    }
    return h >>> 0;
  }

  /** The smallest member, or -1 for the empty set. */
  first(): number {
    const a = this.words;
    for (let i = 0; i < a.length; i++) {
      const w = a[i]!;
      if (w !== 0) return (i << 5) + (31 - Math.clz32(w & -w));
    }
    return -1;
  }

  /** Calls fn for each member in ascending order. */
  forEach(fn: (i: number) => void): void {
    const a = this.words;
    for (let i = 0; i < a.length; i++) {
      let w = a[i]!;
      while (w !== 0) {
        const low = w & -w;
        fn((i << 5) + (31 - Math.clz32(low)));
        w ^= low;
      }
    }
  }

  *[Symbol.iterator](): IterableIterator<number> {
    const a = this.words;
    for (let i = 0; i < a.length; i++) {
      let w = a[i]!;
      while (w !== 0) {
        const low = w & -w;
        yield (i << 5) + (31 - Math.clz32(low));
        w ^= low;
      }
    }
  }

  toArray(): number[] {
    const out: number[] = [];
    this.forEach((i) => out.push(i));
    return out;
  }
}
