import { grown, SetTable } from './set-table';

/**
 * What the search knows of each vertex set it met (a canonical shape key, or the raw set for general
 * graphs): td >= lower, and td <= upper by labelling `choice` highest (-1 when distinct labels, upper =
 * size, do it). Entries are numbers into typed arrays (see SetTable), so the memo stays small enough
 * for searches of minutes.
 */
export class SearchMemo {
  readonly table: SetTable;
  private lowers: Int32Array;
  private uppers: Int32Array;
  private choices: Int32Array;

  /** @param initialSlots the table's first size (it doubles as it fills): small graphs start small. */
  constructor(initialSlots?: number) {
    this.table = new SetTable(initialSlots);
    this.lowers = new Int32Array(this.table.capacity);
    this.uppers = new Int32Array(this.table.capacity);
    this.choices = new Int32Array(this.table.capacity);
  }

  get size(): number {
    return this.table.size;
  }

  /** Bytes held by the memo's arrays. */
  get bytes(): number {
    return this.table.bytes + this.lowers.byteLength + this.uppers.byteLength + this.choices.byteLength;
  }

  find(words: Uint32Array, length: number, hash: number): number {
    return this.table.find(words, length, hash);
  }

  /** A new entry for a set not yet present (call find first). */
  add(words: Uint32Array, length: number, hash: number, lower: number, upper: number): number {
    const e = this.table.add(words, length, hash);
    if (this.lowers.length < this.table.capacity) {
      const n = this.table.capacity;
      this.lowers = grown(this.lowers, new Int32Array(n));
      this.uppers = grown(this.uppers, new Int32Array(n));
      this.choices = grown(this.choices, new Int32Array(n));
    }
    this.lowers[e] = lower;
    this.uppers[e] = upper;
    this.choices[e] = -1;
    return e;
  }

  lower(e: number): number {
    return this.lowers[e]!;
  }

  upper(e: number): number {
    return this.uppers[e]!;
  }

  choice(e: number): number {
    return this.choices[e]!;
  }

  setLower(e: number, value: number): void {
    this.lowers[e] = value;
  }

  /** Records td <= value with `choice` labelled highest. */
  setUpper(e: number, value: number, choice: number): void {
    this.uppers[e] = value;
    this.choices[e] = choice;
  }
}
