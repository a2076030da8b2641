/** An append-only Float64Array that doubles its buffer when full (amortised O(1) push). */
export class GrowableFloat64 {
  private data: Float64Array;
  length = 0;

  constructor(capacity = 1024) {
    this.data = new Float64Array(capacity);
  }

  push(value: number): void {
    if (this.length === this.data.length) {
      const next = new Float64Array(this.data.length * 2);
      next.set(this.data);
      this.data = next;
    }
    this.data[this.length++] = value;
  }

  get(i: number): number {
    return this.data[i]!;
  }

  /** A copy trimmed to the length, with a buffer of its own (so it can be transferred). */
  toArray(): Float64Array {
    return this.data.slice(0, this.length);
  }
}

/** An append-only Uint32Array that doubles its buffer when full (amortised O(1) push). */
export class GrowableUint32 {
  private data: Uint32Array;
  length = 0;

  constructor(capacity = 1024) {
    this.data = new Uint32Array(capacity);
  }

  push(value: number): void {
    if (this.length === this.data.length) {
      const next = new Uint32Array(this.data.length * 2);
      next.set(this.data);
      this.data = next;
    }
    this.data[this.length++] = value;
  }

  get(i: number): number {
    return this.data[i]!;
  }

  /** A copy trimmed to the length, with a buffer of its own (so it can be transferred). */
  toArray(): Uint32Array {
    return this.data.slice(0, this.length);
  }
}
