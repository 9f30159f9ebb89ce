/**
 * A hash table from canonical bevelled boxes (height, width, four bevels) to what a construction decided
 * for them: its number of labels and its move (a line kind and value in the canonical frame, or a
 * leaf kind). Open addressing over typed arrays: the constructions look up hundreds of thousands of
 * boxes, and string keys would cost more than the work they save.
 */
export class BoxMemo {
  private keys: Float64Array;
  private values: Int32Array;
  private kinds: Int8Array;
  private lines: Int32Array;
  private extras: Int32Array;
  private used = 0;
  private mask: number;

  constructor(capacityLog2 = 12) {
    const size = 1 << capacityLog2;
    this.mask = size - 1;
    this.keys = new Float64Array(3 * size).fill(-1);
    this.values = new Int32Array(size);
    this.kinds = new Int8Array(size);
    this.lines = new Int32Array(size);
    this.extras = new Int32Array(size).fill(-1);
  }

  get size(): number {
    return this.used;
  }

  // Two whole numbers below 2^21 each in one double (42 bits, exact).
  private static pack(a: number, b: number): number {
    return a * 2_097_152 + b;
  }

  private slot(k0: number, k1: number, k2: number): number {
    // Mix the three words (their low 32 bits are enough to spread boxes of realistic sizes).
    let hsh = Math.imul((k0 | 0) ^ Math.floor(k0 / 4_294_967_296), 0x9e3779b1);
    hsh = Math.imul(hsh ^ (k1 | 0) ^ Math.floor(k1 / 4_294_967_296), 0x85ebca77);
    hsh = Math.imul(hsh ^ (k2 | 0) ^ Math.floor(k2 / 4_294_967_296), 0xc2b2ae3d);
    hsh ^= hsh >>> 15;
    let i = hsh & this.mask;
    for (;;) {
      const at = 3 * i;
      const key0 = this.keys[at]!;
      if (key0 === -1 || (key0 === k0 && this.keys[at + 1] === k1 && this.keys[at + 2] === k2)) return i;
      i = (i + 1) & this.mask;
    }
  }

  /** The slot of a canonical key [h, w, four bevels]: where its entry is, or would go (see has). */
  find(key: ArrayLike<number>): number {
    return this.slot(BoxMemo.pack(key[0]!, key[1]!), BoxMemo.pack(key[2]!, key[3]!), BoxMemo.pack(key[4]!, key[5]!));
  }

  /** Whether a slot returned by find holds an entry. */
  has(slot: number): boolean {
    return this.keys[3 * slot] !== -1;
  }

  value(slot: number): number {
    return this.values[slot]!;
  }

  kind(slot: number): number {
    return this.kinds[slot]!;
  }

  line(slot: number): number {
    return this.lines[slot]!;
  }

  /** A number the owner attaches to an entry (-1 when none), e.g. where its stored labelling is. */
  extra(slot: number): number {
    return this.extras[slot]!;
  }

  setExtra(slot: number, value: number): void {
    this.extras[slot] = value;
  }

  /** Stores an entry for a canonical key; returns its slot (slots move when the table grows). */
  set(key: ArrayLike<number>, value: number, kind: number, line: number): number {
    if (2 * (this.used + 1) > this.mask + 1) this.grow();
    const k0 = BoxMemo.pack(key[0]!, key[1]!);
    const k1 = BoxMemo.pack(key[2]!, key[3]!);
    const k2 = BoxMemo.pack(key[4]!, key[5]!);
    const slot = this.slot(k0, k1, k2);
    if (this.keys[3 * slot] === -1) this.used++;
    this.keys[3 * slot] = k0;
    this.keys[3 * slot + 1] = k1;
    this.keys[3 * slot + 2] = k2;
    this.values[slot] = value;
    this.kinds[slot] = kind;
    this.lines[slot] = line;
    this.extras[slot] = -1;
    return slot;
  }

  private grow(): void {
    const { keys, values, kinds, lines, extras } = this;
    const size = 2 * (this.mask + 1);
    this.mask = size - 1;
    this.keys = new Float64Array(3 * size).fill(-1);
    this.values = new Int32Array(size);
    this.kinds = new Int8Array(size);
    this.lines = new Int32Array(size);
    this.extras = new Int32Array(size).fill(-1);
    for (let i = 0; i < values.length; i++) {
      if (keys[3 * i] === -1) continue;
      const slot = this.slot(keys[3 * i]!, keys[3 * i + 1]!, keys[3 * i + 2]!);
      this.keys[3 * slot] = keys[3 * i]!;
      this.keys[3 * slot + 1] = keys[3 * i + 1]!;
      this.keys[3 * slot + 2] = keys[3 * i + 2]!;
      this.values[slot] = values[i]!;
      this.kinds[slot] = kinds[i]!;
      this.lines[slot] = lines[i]!;
      this.extras[slot] = extras[i]!;
    }
  }
}
