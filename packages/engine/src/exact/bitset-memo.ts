import { Bitset } from '../graph/bitset';

/** What the search knows of one vertex set: td >= lower, and td <= upper by removing `choice` first. */
export interface MemoEntry {
  readonly set: Bitset;
  lower: number;
  upper: number;
  /** The vertex to label highest for `upper` labels; -1 when distinct labels (upper = size) do it. */
  choice: number;
}

/**
 * A hash table from vertex sets to what is known of them, so each set met anywhere in the search is
 * decided once. Buckets by the set's hash; the words are compared in full, so a collision never mixes
 * two sets up.
 */
export class BitsetMemo {
  private readonly buckets = new Map<number, MemoEntry[]>();
  size = 0;

  get(set: Bitset): MemoEntry | undefined {
    const bucket = this.buckets.get(set.hash());
    if (!bucket) return undefined;
    for (const e of bucket) if (e.set.equals(set)) return e;
    return undefined;
  }

  /** The entry for set, created with the given bounds when new (the set is copied). */
  entry(set: Bitset, lower: number, upper: number, choice: number): MemoEntry {
    const h = set.hash();
    let bucket = this.buckets.get(h);
    if (!bucket) {
      bucket = [];
      this.buckets.set(h, bucket);
    }
    for (const e of bucket) if (e.set.equals(set)) return e;
    const e: MemoEntry = { set: set.clone(), lower, upper, choice };
    bucket.push(e);
    this.size++;
    return e;
  }
}
