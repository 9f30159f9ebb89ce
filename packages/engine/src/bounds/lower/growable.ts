/** An Int32Array stack that doubles when full: the search code's scratch lists without per-item allocation. */
export class IntStack {
  data: Int32Array;
  length = 0;

  constructor(capacity = 64) {
    this.data = new Int32Array(Math.max(4, capacity));
  }

  push(x: number): void {
    if (this.length === this.data.length) {
      const bigger = new Int32Array(this.data.length * 2);
      bigger.set(this.data);
      this.data = bigger;
    }
    this.data[this.length++] = x;
  }
}
