/** An Int32Array that doubles when full; `items` is the current buffer (valid up to `length`, replaced on growth). */
export class GrowableInts {
  items: Int32Array;
  length = 0;

  constructor(capacity: number) {
    this.items = new Int32Array(Math.max(1, capacity));
  }

  push(value: number): void {
    if (this.length === this.items.length) {
      const grown = new Int32Array(2 * this.items.length);
      grown.set(this.items);
      this.items = grown;
    }
    this.items[this.length++] = value;
  }
}
