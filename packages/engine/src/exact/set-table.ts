/**
 * A hash set of word strings (vertex sets as Uint32Array words, of any length), open addressing with
 * linear probing over typed arrays: the keys live end to end in one growing arena, so an entry costs a
 * few dozen bytes where a Map of Bitset objects costs kilobytes (measured: bench/results/exact.json),
 * and looking a set up allocates nothing. Entries are numbered 0, 1, 2, … in the order they were added
 * and never move, so their owners keep what they know of entry i in arrays of their own.
 */
export class SetTable {
  /** Entry index + 1 per slot; 0 is an empty slot. */
  private slots: Int32Array;
  private mask: number;
  private arena: Uint32Array;
  private arenaUsed = 0;
  private starts: Int32Array;
  private lengths: Int32Array;
  private hashes: Uint32Array;
  /** Entries added so far. */
  size = 0;

  constructor(initialSlots = 1 << 12) {
    const slots = 1 << Math.max(4, Math.ceil(Math.log2(initialSlots)));
    this.slots = new Int32Array(slots);
    this.mask = slots - 1;
    this.arena = new Uint32Array(slots * 2);
    this.starts = new Int32Array(slots >>> 1);
    this.lengths = new Int32Array(slots >>> 1);
    this.hashes = new Uint32Array(slots >>> 1);
  }

  /** How many entries the owners' per-entry arrays must hold now (grows by doubling). */
  get capacity(): number {
    return this.starts.length;
  }

  /** The FNV-1a hash of words[0 .. length), half-words at a time (the same as Bitset.hash). */
  static hash(words: Uint32Array, length: number): number {
    let h = 0x811c9dc5;
    for (let i = 0; i < length; i++) {
      const w = words[i]!;
      h = Math.imul(h ^ (w & 0xffff), 0x01000193);
      h = Math.imul(h ^ (w >>> 16), 0x01000193);
    }
    return h >>> 0;
  }

  /** The entry holding words[0 .. length), or -1. */
  find(words: Uint32Array, length: number, hash: number): number {
    const { slots, mask, arena, starts, lengths, hashes } = this;
    for (let s = hash & mask; ; s = (s + 1) & mask) {
      const at = slots[s]!;
      if (at === 0) return -1;
      const i = at - 1;
      if (hashes[i] !== hash || lengths[i] !== length) continue;
      const from = starts[i]!;
      let same = true;
      for (let j = 0; j < length; j++) {
        if (arena[from + j] !== words[j]) {
          same = false;
          break;
        }
      }
      if (same) return i;
    }
  }

  /** Adds words[0 .. length) (not present: call find first) and returns its entry index. */
  add(words: Uint32Array, length: number, hash: number): number {
    if ((this.size + 1) * 2 > this.slots.length) this.growSlots();
    if (this.size === this.starts.length) this.growEntries();
    if (this.arenaUsed + length > this.arena.length) {
      const bigger = new Uint32Array(Math.max(this.arena.length * 2, this.arenaUsed + length));
      bigger.set(this.arena.subarray(0, this.arenaUsed));
      this.arena = bigger;
    }
    const i = this.size++;
    this.arena.set(words.subarray(0, length), this.arenaUsed);
    this.starts[i] = this.arenaUsed;
    this.lengths[i] = length;
    this.hashes[i] = hash;
    this.arenaUsed += length;
    let s = hash & this.mask;
    while (this.slots[s] !== 0) s = (s + 1) & this.mask;
    this.slots[s] = i + 1;
    return i;
  }

  /** Bytes held by the table's arrays (what it would hold after growing is about twice this). */
  get bytes(): number {
    return this.slots.byteLength + this.arena.byteLength + this.starts.byteLength + this.lengths.byteLength + this.hashes.byteLength;
  }

  /** Word j of entry i's key. */
  word(i: number, j: number): number {
    return this.arena[this.starts[i]! + j]!;
  }

  /** Entry i's key, copied out. */
  key(i: number): Uint32Array {
    const from = this.starts[i]!;
    return this.arena.slice(from, from + this.lengths[i]!);
  }

  private growSlots(): void {
    const slots = new Int32Array(this.slots.length * 2);
    const mask = slots.length - 1;
    for (let i = 0; i < this.size; i++) {
      let s = this.hashes[i]! & mask;
      while (slots[s] !== 0) s = (s + 1) & mask;
      slots[s] = i + 1;
    }
    this.slots = slots;
    this.mask = mask;
  }

  private growEntries(): void {
    const n = this.starts.length * 2;
    this.starts = grown(this.starts, new Int32Array(n));
    this.lengths = grown(this.lengths, new Int32Array(n));
    this.hashes = grown(this.hashes, new Uint32Array(n));
  }
}

/** `to` with `from` copied into its start (to is the larger array). */
export function grown<T extends Int32Array | Uint32Array | Int16Array | Uint8Array>(from: T, to: T): T {
  to.set(from as never);
  return to;
}
