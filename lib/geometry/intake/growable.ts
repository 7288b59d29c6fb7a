/** Append-only typed-array buffers that double their capacity, for parsers that do not know their output size. */

export class GrowableF64 {
  data: Float64Array;
  length = 0;
  constructor(capacity = 1024) {
    this.data = new Float64Array(Math.max(16, capacity));
  }
  /** Makes room for `n` more values; call before writing `data[length…length+n)` directly. */
  reserve(n: number): void {
    if (this.length + n <= this.data.length) return;
    let cap = this.data.length * 2;
    while (cap < this.length + n) cap *= 2;
    const next = new Float64Array(cap);
    next.set(this.data.subarray(0, this.length));
    this.data = next;
  }
  /** A trimmed copy of the contents. */
  toArray(): Float64Array {
    return this.data.slice(0, this.length);
  }
}

export class GrowableU32 {
  data: Uint32Array;
  length = 0;
  constructor(capacity = 1024) {
    this.data = new Uint32Array(Math.max(16, capacity));
  }
  reserve(n: number): void {
    if (this.length + n <= this.data.length) return;
    let cap = this.data.length * 2;
    while (cap < this.length + n) cap *= 2;
    const next = new Uint32Array(cap);
    next.set(this.data.subarray(0, this.length));
    this.data = next;
  }
  toArray(): Uint32Array {
    return this.data.slice(0, this.length);
  }
}
