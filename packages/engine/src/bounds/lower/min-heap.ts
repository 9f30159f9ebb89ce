/**
 * A binary min-heap of (key, item) pairs in typed arrays, with lazy deletion left to the caller: push a
 * fresh pair whenever an item's key changes and skip stale pairs when they come out (common practice).
 */
export class LazyMinHeap {
  private keys: Float64Array;
  private items: Int32Array;
  size = 0;

  constructor(capacity = 64) {
    this.keys = new Float64Array(Math.max(4, capacity));
    this.items = new Int32Array(Math.max(4, capacity));
  }

  push(key: number, item: number): void {
    if (this.size === this.keys.length) {
      const keys = new Float64Array(this.size * 2);
      keys.set(this.keys);
      this.keys = keys;
      const items = new Int32Array(this.size * 2);
      items.set(this.items);
      this.items = items;
    }
    const { keys, items } = this;
    let i = this.size++;
    while (i > 0) {
      const parent = (i - 1) >> 1;
      if (keys[parent]! <= key) break;
      keys[i] = keys[parent]!;
      items[i] = items[parent]!;
      i = parent;
    }
    keys[i] = key;
    items[i] = item;
  }

  /** The key at the top; call only when size > 0. */
  peekKey(): number {
    return this.keys[0]!;
  }

  /** Removes the top pair and returns its item; call only when size > 0. */
  pop(): number {
    const { keys, items } = this;
    const top = items[0]!;
    const last = --this.size;
    const key = keys[last]!;
    const item = items[last]!;
    let i = 0;
    for (;;) {
      let child = 2 * i + 1;
      if (child >= last) break;
      if (child + 1 < last && keys[child + 1]! < keys[child]!) child++;
      if (keys[child]! >= key) break;
      keys[i] = keys[child]!;
      items[i] = items[child]!;
      i = child;
    }
    keys[i] = key;
    items[i] = item;
    return top;
  }
}
